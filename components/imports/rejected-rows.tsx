import { StyleSheet, View } from 'react-native';
import { DataTable, Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import type { ImportRowError } from '@/hooks/use-imports';
import { useIsWide } from '@/hooks/use-layout';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { DecorativeIcon } from '@/components/ui/decorative-icon';

/** The rows the importer refused: a table on a wide screen, one block per problem on a phone. */
export function RejectedRows({ errors, rejected }: { errors: ImportRowError[]; rejected: number }) {
  const wide = useIsWide();
  const theme = useTandemTheme();
  if (errors.length === 0) return <Text variant="bodyMedium">Every row is valid.</Text>;
  const heading = (
    <View style={styles.heading}>
      <DecorativeIcon source="alert-octagon-outline" size={22} color={theme.status.blocker} />
      <Text variant="titleMedium" role="heading" aria-level={3}>
        Rejected rows ({rejected})
      </Text>
    </View>
  );
  const more = rejected > 0 && errors.length >= 1000 ? <Text variant="bodySmall">The first 1,000 problems are listed.</Text> : null;
  if (wide) {
    return (
      <View style={styles.gap}>
        {heading}
        <DataTable testID="rejected-rows">
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
        {more}
      </View>
    );
  }
  return (
    <View style={styles.gap} testID="rejected-rows">
      {heading}
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
      {more}
    </View>
  );
}

const styles = StyleSheet.create({
  gap: { gap: spacing.sm },
  heading: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  line: { flex: 0.5 },
  col: { flex: 1 },
  reason: { flex: 2.5 },
  reasonCell: { justifyContent: 'center', paddingVertical: spacing.sm },
  block: { borderLeftWidth: 4, borderRadius: 6, padding: spacing.sm, gap: 2 },
});
