import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import type { CompatibleCoil } from '@/shared/schemas/coils';
import { FindingGroups } from '@/components/check/finding-groups';
import { priceDetail, ratedFigures, regionalWords } from './coil-words';

/** A coil's detail: rating with the outdoor unit, best price and every finding of its check. */
export function CoilDetail({ item, state }: { item: CompatibleCoil; state?: string }) {
  const regional = regionalWords(item, state);
  return (
    <View style={styles.box} testID={`coil-detail-${item.coil.model}`}>
      <Text variant="titleMedium" role="heading" aria-level={3}>
        {item.coil.model}
        {item.coil.brand ? ` · ${item.coil.brand}` : ''}
      </Text>
      {item.coil.description ? <Text variant="bodyMedium">{item.coil.description}</Text> : null}
      <Text variant="bodyMedium">Rating: {ratedFigures(item)}</Text>
      {regional ? <Text variant="bodyMedium">{regional}</Text> : null}
      <Text variant="bodyMedium">Best price: {priceDetail(item)}</Text>
      {item.findings.length > 0 ? <FindingGroups findings={item.findings} /> : <Text variant="bodyMedium">No findings: every rule passed.</Text>}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm, padding: spacing.md },
});
