import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { citationWords } from './rule-words';
import { valueWords } from './value-words';

interface BreakerRange {
  mcaAmps: number;
  mocpAmps: number;
  standardSizes: number[];
}

const signed = (oz: number) => (oz > 0 ? `add ${oz} oz` : oz < 0 ? `remove ${-oz} oz` : 'no change');

/** The regional minimum in words: "Southeast region, split heat pump: SEER2 at least 14.3 · …" (no codes or keys). */
function regional(value: unknown): string {
  if (!value || typeof value !== 'object') return String(value);
  const m = value as Record<string, unknown>;
  const floors = ['seer2', 'eer2', 'hspf2'].filter((k) => typeof m[k] === 'number').map((k) => `${k.toUpperCase()} at least ${m[k]}`);
  const where = [m.regionName ? `${m.regionName} region` : '', valueWords('productClass', m.productClass)?.toLowerCase() ?? ''].filter(Boolean).join(', ');
  return `${where}: ${floors.join(' · ')}${typeof m.basis === 'string' ? ` (${citationWords(m.basis)})` : ''}`;
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
      <Text variant="titleMedium" role="heading" aria-level={2}>
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
