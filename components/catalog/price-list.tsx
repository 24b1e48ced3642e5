import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import type { CatalogPrice } from '@/hooks/use-catalog';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { calendarDate, money } from './spec-format';

/**
 * Current price per distributor (the server sends them cheapest first). A tech gets no amounts
 * (pricing stays with the office), so each row then says where the part is in stock.
 */
export function PriceList({ prices, pricesVisible = true }: { prices: CatalogPrice[]; pricesVisible?: boolean }) {
  const theme = useTandemTheme();
  if (prices.length === 0) {
    return (
      <Text variant="bodyMedium">
        {pricesVisible ? 'No distributor price on file yet. An admin adds prices under Admin → Imports.' : 'No distributor on file stocks this part yet.'}
      </Text>
    );
  }
  return (
    <View testID="catalog-prices">
      {prices.map((p) => (
        <View key={p.distributor} style={[styles.row, { borderBottomColor: theme.colors.outlineVariant }]} testID={`price-${p.distributor}`}>
          <Text variant="bodyLarge" style={styles.name}>
            {p.priceCents === undefined ? `In stock at ${p.distributor}` : p.distributor}
          </Text>
          <View style={styles.amount}>
            {p.priceCents !== undefined ? <Text variant="titleMedium">{money(p.priceCents, p.currency)}</Text> : null}
            <Text variant="bodySmall" style={{ color: theme.colors.onSurfaceVariant }}>
              {p.priceCents === undefined ? `Listed since ${calendarDate(p.effectiveFrom)}` : `since ${calendarDate(p.effectiveFrom)}`}
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
