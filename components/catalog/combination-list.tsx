import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { List, Text } from 'react-native-paper';
import type { RatedCombinationSpec } from '@/shared/schemas/equipment';
import { TOUCH_TARGET } from '@/constants/theme';
import { btuh, ratings } from './spec-format';

/** The rated combinations an item is part of; each opens its own page. */
export function CombinationList({ combinations }: { combinations: (RatedCombinationSpec & { id: number })[] }) {
  const router = useRouter();
  if (combinations.length === 0) {
    return <Text variant="bodyMedium">No rated combination in the catalog includes this item.</Text>;
  }
  return (
    <View testID="catalog-combinations">
      {combinations.map((c) => (
        <List.Item
          key={c.id}
          title={[c.outdoorModel, c.indoorModel, c.airHandlerModel].filter(Boolean).join(' + ')}
          description={[ratings(c), btuh(c.coolingBtuh), c.reference ? `Certificate ${c.reference}` : undefined].filter(Boolean).join(' · ')}
          descriptionNumberOfLines={3}
          right={(props) => (
            <View aria-hidden>
              <List.Icon {...props} icon="chevron-right" />
            </View>
          )}
          onPress={() => router.push(`/catalog/rated-combinations/${c.id}` as never)}
          style={styles.item}
        />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ item: { minHeight: TOUCH_TARGET, paddingHorizontal: 0 } });
