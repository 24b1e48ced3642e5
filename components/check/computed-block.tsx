import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';

interface BreakerRange {
  mcaAmps: number;
  mocpAmps: number;
  standardSizes: number[];
}

const signed = (oz: number) => (oz > 0 ? `add ${oz} oz` : oz < 0 ? `remove ${-oz} oz` : 'no change');

function regional(value: unknown): string {
  if (!value || typeof value !== 'object') return String(value);
  // The shared efficiency module's own record: show its figures as "key value" pairs.
  return Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined && v !== null && typeof v !== 'object')
    .map(([k, v]) => `${k} ${v}`)
    .join(' · ');
}

function rated(value: unknown): string {
  const c = value as Record<string, unknown>;
  const figures = ['seer2', 'eer2', 'hspf2'].filter((k) => c[k] !== undefined).map((k) => `${k.toUpperCase()} ${c[k]}`);
  const models = [c.outdoorModel, c.indoorModel, c.airHandlerModel].filter(Boolean).join(' + ');
  return [models, ...figures, c.reference ? `ref. ${c.reference}` : ''].filter(Boolean).join(' · ');
}

/** The numbers a tech wants beside the findings. */
export function ComputedBlock({ computed }: { computed: Record<string, unknown> }) {
  const rows: [string, string][] = [];
  if (typeof computed.cfmPerTon === 'number') rows.push(['Airflow', `${computed.cfmPerTon} CFM per ton`]);
  if (typeof computed.chargeAdjustmentOz === 'number') rows.push(['Charge for the line length', signed(computed.chargeAdjustmentOz)]);
  const breaker = computed.breakerRange as BreakerRange | undefined;
  if (breaker) {
    const sizes = breaker.standardSizes.length ? `standard sizes ${breaker.standardSizes.join(', ')} A` : 'no standard size in range';
    rows.push(['Breaker range', `${breaker.mcaAmps}–${breaker.mocpAmps} A (MCA–MOCP); ${sizes}`]);
  }
  if (computed.regionalMinimum) rows.push(['Regional minimum', regional(computed.regionalMinimum)]);
  if (computed.ratedCombination) rows.push(['Rated combination', rated(computed.ratedCombination)]);
  if (!rows.length) return null;
  return (
    <View style={styles.box} testID="computed">
      <Text variant="titleMedium" accessibilityRole="header">
        Numbers
      </Text>
      {rows.map(([label, value]) => (
        <View key={label} style={styles.row}>
          <Text variant="labelLarge">{label}</Text>
          <Text variant="bodyLarge">{value}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm },
  row: { gap: 2 },
});
