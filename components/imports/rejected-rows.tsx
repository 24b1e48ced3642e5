import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, DataTable, Icon, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { fetchImportErrorsCsv, useImportErrors, type ImportRowError } from '@/hooks/use-imports';
import { useIsWide } from '@/hooks/use-layout';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { MessageBanner } from '@/components/ui/message-banner';
import { saveFile } from './save-file';

const PAGE_SIZE = 50;

interface Props {
  importId: number;
  /** Rows rejected and problems found (a row may have several). */
  rejected: number;
  errorsTotal: number;
}

/** The rows the importer refused, a page at a time: a table on a wide screen, one block per problem on a phone. */
export function RejectedRows({ importId, rejected, errorsTotal }: Props) {
  const [page, setPage] = useState(1);
  const [downloadError, setDownloadError] = useState<string | null>(null);
  const wide = useIsWide();
  const theme = useTandemTheme();
  const query = useImportErrors(importId, page, PAGE_SIZE);
  if (rejected === 0 && errorsTotal === 0) return <Text variant="bodyMedium">Every row is valid.</Text>;
  const data = query.data;
  const pages = data ? Math.max(1, Math.ceil(data.stored / PAGE_SIZE)) : 1;
  const download = async () => {
    setDownloadError(null);
    try {
      await saveFile(await fetchImportErrorsCsv(importId), `import-${importId}-rejected-rows.csv`);
    } catch (err) {
      setDownloadError(errorText(err));
    }
  };
  return (
    <View style={styles.gap} testID="rejected-rows">
      <View style={styles.heading}>
        <Icon source="alert-octagon-outline" size={22} color={theme.status.blocker} />
        <Text variant="titleMedium" accessibilityRole="header">
          Rejected rows ({rejected.toLocaleString('en-US')})
        </Text>
      </View>
      {data && data.stored < data.errorsTotal ? (
        <Text variant="bodySmall" testID="rejected-rows-bounded">
          {`${data.errorsTotal.toLocaleString('en-US')} problems found; the first ${data.stored.toLocaleString('en-US')} are kept. Fix those and upload again to see the rest.`}
        </Text>
      ) : null}
      {query.isError ? <MessageBanner tone="error">{errorText(query.error)}</MessageBanner> : null}
      {data ? (wide ? <ErrorTable errors={data.errors} /> : <ErrorBlocks errors={data.errors} />) : <Text variant="bodyMedium">Loading the rejected rows…</Text>}
      <View style={styles.pager}>
        <Button mode="text" icon="chevron-left" disabled={page <= 1} onPress={() => setPage((p) => p - 1)} contentStyle={styles.touch} testID="rejected-prev">
          Previous
        </Button>
        <Text variant="bodyMedium" testID="rejected-page">{`Page ${page} of ${pages}`}</Text>
        <Button mode="text" icon="chevron-right" disabled={page >= pages} onPress={() => setPage((p) => p + 1)} contentStyle={styles.touch} testID="rejected-next">
          Next
        </Button>
        <Button mode="outlined" icon="download-outline" onPress={download} contentStyle={styles.touch} testID="rejected-download">
          Download as CSV
        </Button>
      </View>
      {downloadError ? <MessageBanner tone="error">{downloadError}</MessageBanner> : null}
    </View>
  );
}

function ErrorTable({ errors }: { errors: ImportRowError[] }) {
  return (
    <DataTable>
      <DataTable.Header>
        <DataTable.Title style={styles.line}>Line</DataTable.Title>
        <DataTable.Title style={styles.col}>Column</DataTable.Title>
        <DataTable.Title style={styles.col}>Value</DataTable.Title>
        <DataTable.Title style={styles.reason}>Reason</DataTable.Title>
      </DataTable.Header>
      {errors.map((e, i) => (
        <DataTable.Row key={`${e.row}-${e.column}-${i}`} testID={`rejected-row-${e.row}`}>
          <DataTable.Cell style={styles.line}>{e.row}</DataTable.Cell>
          <DataTable.Cell style={styles.col}>{e.column || '—'}</DataTable.Cell>
          <DataTable.Cell style={styles.col}>{e.value || '(blank)'}</DataTable.Cell>
          <View style={[styles.reason, styles.reasonCell]}>
            <Text variant="bodyMedium">{e.message}</Text>
          </View>
        </DataTable.Row>
      ))}
    </DataTable>
  );
}

function ErrorBlocks({ errors }: { errors: ImportRowError[] }) {
  const theme = useTandemTheme();
  return (
    <View style={styles.gap}>
      {errors.map((e, i) => (
        <View key={`${e.row}-${e.column}-${i}`} style={[styles.block, { borderLeftColor: theme.status.blocker, backgroundColor: theme.status.blockerContainer }]} testID={`rejected-row-${e.row}`}>
          <Text variant="labelLarge">
            Line {e.row}
            {e.column ? ` · ${e.column}` : ''}
            {e.value ? ` · “${e.value}”` : ''}
          </Text>
          <Text variant="bodyMedium">{e.message}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  gap: { gap: spacing.sm },
  heading: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  pager: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  touch: { minHeight: TOUCH_TARGET },
  line: { flex: 0.5 },
  col: { flex: 1 },
  reason: { flex: 2.5 },
  reasonCell: { justifyContent: 'center', paddingVertical: spacing.sm },
  block: { borderLeftWidth: 4, borderRadius: 6, padding: spacing.sm, gap: 2 },
});
