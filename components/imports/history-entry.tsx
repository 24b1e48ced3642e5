import { StyleSheet, View } from 'react-native';
import { Button, DataTable, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import type { ImportView } from '@/hooks/use-imports';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { DecorativeIcon } from '@/components/ui/decorative-icon';
import { dateTime, IMPORT_KIND_LABELS, STATUS_ICONS, STATUS_LABELS } from './import-labels';

interface Props {
  entry: ImportView;
  wide: boolean;
  onRevert(entry: ImportView): void;
}

const countsLine = (c: ImportView['counts']) =>
  `${c.rows} ${c.rows === 1 ? 'row' : 'rows'}: ${c.inserted} new, ${c.updated} updated, ${c.unchanged} unchanged, ${c.rejected} rejected${c.unmatched ? `, ${c.unmatched} not in catalog` : ''}`;

function Status({ entry }: { entry: ImportView }) {
  const theme = useTandemTheme();
  return (
    <View style={styles.status}>
      <DecorativeIcon source={STATUS_ICONS[entry.status]} size={18} color={theme.colors.onSurface} />
      <Text variant="labelLarge">{STATUS_LABELS[entry.status]}</Text>
    </View>
  );
}

/** One past import: a table row on a wide screen, a stacked block on a phone. */
export function HistoryEntry({ entry, wide, onRevert }: Props) {
  const theme = useTandemTheme();
  const what = [IMPORT_KIND_LABELS[entry.kind], entry.distributor].filter(Boolean).join(' · ');
  const who = [entry.uploadedBy, dateTime(entry.createdAt)].filter(Boolean).join(', ');
  const revert =
    entry.status === 'committed' ? (
      <Button mode="outlined" icon="undo-variant" compact onPress={() => onRevert(entry)} contentStyle={styles.touch} testID={`revert-${entry.id}`}>
        Revert
      </Button>
    ) : null;
  if (wide) {
    return (
      // A plain row: DataTable.Row without onPress is marked aria-disabled, and so would be its Revert button.
      <View testID={`history-${entry.id}`} style={[styles.tableRow, { borderBottomColor: theme.colors.outlineVariant }]}>
        <View style={[styles.fileCol, styles.cell]}>
          <Text variant="titleSmall">{entry.fileName}</Text>
          <Text variant="bodySmall">{what}</Text>
        </View>
        <DataTable.Cell style={styles.whenCol}>{who}</DataTable.Cell>
        <View style={[styles.statusCol, styles.cell]}>
          <Status entry={entry} />
        </View>
        <View style={[styles.countsCol, styles.cell]}>
          <Text variant="bodySmall">{countsLine(entry.counts)}</Text>
        </View>
        <View style={[styles.actionCol, styles.cell]}>{revert}</View>
      </View>
    );
  }
  return (
    <View style={[styles.stacked, { borderBottomColor: theme.colors.outlineVariant }]} testID={`history-${entry.id}`}>
      <Text variant="titleSmall">{entry.fileName}</Text>
      <Text variant="bodyMedium">{what}</Text>
      <Text variant="bodySmall" style={{ color: theme.colors.onSurfaceVariant }}>
        {who}
      </Text>
      <Status entry={entry} />
      <Text variant="bodySmall">{countsLine(entry.counts)}</Text>
      {revert ? <View style={styles.stackedAction}>{revert}</View> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  cell: { justifyContent: 'center', paddingVertical: spacing.sm, paddingRight: spacing.sm },
  fileCol: { flex: 2 },
  whenCol: { flex: 1.4 },
  statusCol: { flex: 1.4 },
  countsCol: { flex: 2.4 },
  actionCol: { flex: 1, alignItems: 'flex-end' },
  status: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  stacked: { paddingVertical: spacing.sm, gap: 2, borderBottomWidth: StyleSheet.hairlineWidth },
  stackedAction: { flexDirection: 'row', marginTop: spacing.xs },
  touch: { minHeight: TOUCH_TARGET },
  tableRow: { flexDirection: 'row', minHeight: TOUCH_TARGET, paddingHorizontal: spacing.lg, borderBottomWidth: StyleSheet.hairlineWidth },
});
