import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import type { ImportCounts as Counts } from '@/hooks/use-imports';
import { useTandemTheme } from '@/hooks/use-tandem-theme';

const ORDER: [keyof Counts, string][] = [
  ['rows', 'Rows'],
  ['inserted', 'New'],
  ['updated', 'Updated'],
  ['unchanged', 'Unchanged'],
  ['rejected', 'Rejected'],
  ['unmatched', 'Not in catalog'],
];

/** The six counts of an import as labelled tiles (numbers with words, never colour alone). */
export function ImportCounts({ counts, testID = 'import-counts' }: { counts: Counts; testID?: string }) {
  const theme = useTandemTheme();
  return (
    <View style={styles.row} testID={testID}>
      {ORDER.map(([key, label]) => {
        const alert = key === 'rejected' && counts.rejected > 0;
        return (
          <View
            key={key}
            testID={`${testID}-${key}`}
            style={[styles.tile, { backgroundColor: alert ? theme.status.blockerContainer : theme.colors.surfaceVariant }]}
            accessibilityLabel={`${label}: ${counts[key]}`}
          >
            <Text variant="headlineSmall">{counts[key].toLocaleString('en-US')}</Text>
            <Text variant="labelMedium">{label}</Text>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  tile: { borderRadius: 10, paddingVertical: spacing.sm, paddingHorizontal: spacing.md, minWidth: 96, flexGrow: 1 },
});
