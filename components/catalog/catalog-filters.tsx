import { StyleSheet, View } from 'react-native';
import { Chip, Text } from 'react-native-paper';
import { REFRIGERANT_IDS } from '@/shared/schemas/fields';
import { spacing, TOUCH_TARGET } from '@/constants/theme';

/** Nominal sizes a residential split system comes in (tons). */
export const TON_CHOICES = [1.5, 2, 2.5, 3, 3.5, 4, 5] as const;

interface Props {
  refrigerant?: string;
  tons?: number;
  onRefrigerant(value: string | undefined): void;
  onTons(value: number | undefined): void;
}

/** Refrigerant and size chips, all visible (one tap; tap the chosen one again to clear it). */
export function CatalogFilters({ refrigerant, tons, onRefrigerant, onTons }: Props) {
  return (
    <View style={styles.gap}>
      <View style={styles.row} accessibilityLabel="Refrigerant">
        <Text variant="labelLarge" style={styles.label}>
          Refrigerant
        </Text>
        <View style={styles.chips}>
          {REFRIGERANT_IDS.map((r) => (
            <Chip
              key={r}
              selected={refrigerant === r}
              showSelectedOverlay
              onPress={() => onRefrigerant(refrigerant === r ? undefined : r)}
              style={styles.chip}
              testID={`catalog-refrigerant-${r}`}
            >
              {r}
            </Chip>
          ))}
        </View>
      </View>
      <View style={styles.row} accessibilityLabel="Size in tons">
        <Text variant="labelLarge" style={styles.label}>
          Tons
        </Text>
        <View style={styles.chips}>
          {TON_CHOICES.map((t) => (
            <Chip
              key={t}
              selected={tons === t}
              showSelectedOverlay
              onPress={() => onTons(tons === t ? undefined : t)}
              style={styles.chip}
              testID={`catalog-tons-${t}`}
            >
              {String(t)}
            </Chip>
          ))}
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  gap: { gap: spacing.sm },
  row: { flexDirection: 'row', gap: spacing.sm, alignItems: 'flex-start' },
  chips: { flex: 1, flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  label: { width: 96, paddingTop: spacing.sm },
  chip: { minHeight: TOUCH_TARGET - 8, justifyContent: 'center' },
});
