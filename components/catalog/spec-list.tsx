import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { useIsWide } from '@/hooks/use-layout';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import type { SpecRow } from './spec-rows';

/** Label and value pairs; two columns of pairs on a wide screen, one on a phone. */
export function SpecList({ rows }: { rows: SpecRow[] }) {
  const theme = useTandemTheme();
  const wide = useIsWide();
  return (
    <View style={[styles.list, wide && styles.grid]} testID="catalog-specs">
      {rows.map((r) => (
        <View key={r.label} style={[styles.row, wide && styles.half, { borderBottomColor: theme.colors.outlineVariant }]}>
          <Text variant="bodyMedium" style={[styles.label, { color: theme.colors.onSurfaceVariant }]}>
            {r.label}
          </Text>
          <Text variant="bodyLarge" style={styles.value}>
            {r.value}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  grid: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.xl },
  row: { flexDirection: 'row', gap: spacing.md, paddingVertical: spacing.sm, borderBottomWidth: StyleSheet.hairlineWidth },
  half: { width: '48%' },
  label: { flex: 1 },
  value: { flex: 1.3 },
});
