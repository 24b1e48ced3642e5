import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import type { CatalogPrice } from '@/hooks/use-catalog';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { calendarDate, money } from './spec-format';

/** Current price per distributor (the server sends them cheapest first). */
export function PriceList({ prices }: { prices: CatalogPrice[] }) {
  const theme = useTandemTheme();
  if (prices.length === 0) {
    return <Text variant="bodyMedium">No distributor price on file yet. An admin adds prices under Admin → Imports.</Text>;
  }
  return (
    <View testID="catalog-prices">
      {prices.map((p) => (
        <View key={p.distributor} style={[styles.row, { borderBottomColor: theme.colors.outlineVariant }]} testID={`price-${p.distributor}`}>
          <Text variant="bodyLarge" style={styles.name}>
            {p.distributor}
          </Text>
          <View style={styles.amount}>
            <Text variant="titleMedium">{money(p.priceCents, p.currency)}</Text>
            <Text variant="bodySmall" style={{ color: theme.colors.onSurfaceVariant }}>
              since {calendarDate(p.effectiveFrom)}
            </Text>
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, paddingVertical: spacing.sm, borderBottomWidth: StyleSheet.hairlineWidth },
  name: { flex: 1 },
  amount: { alignItems: 'flex-end' },
});
