import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import type { CompatibleCoil } from '@/shared/schemas/coils';
import { isMissingFacts } from '@/shared/rules/define-rule';
import { FindingGroups } from '@/components/check/finding-groups';
import type { PickedPart } from '@/components/check/check-store';
import { useCurrentUser } from '@/hooks/use-session';
import { AddToOption } from './add-to-option';
import { priceDetail, ratedFigures, regionalWords } from './coil-words';

/** A coil's detail: rating with the outdoor unit, best price and every finding of its check. */
export function CoilDetail({ item, state, outdoor, airHandler }: { item: CompatibleCoil; state?: string; outdoor?: PickedPart; airHandler?: PickedPart }) {
  const user = useCurrentUser();
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
      {outdoor && user.role !== 'tech' && item.verdict !== 'incompatible' ? <AddToOption coil={item.coil} outdoor={outdoor} airHandler={airHandler} /> : null}
      {item.findings.some((f) => !isMissingFacts(f)) ? <FindingGroups findings={item.findings} /> : <Text variant="bodyMedium">No problems found with the facts given.</Text>}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm, padding: spacing.md },
});
