import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { REFRIGERANT_IDS } from '@/shared/schemas/fields';
import { spacing } from '@/constants/theme';
import { ToggleChip } from '@/components/ui/toggle-chip';

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
      <View style={styles.row} role="group" aria-label="Refrigerant">
        <Text variant="labelLarge" style={styles.label} aria-hidden>
          Refrigerant
        </Text>
        <View style={styles.chips}>
          {REFRIGERANT_IDS.map((r) => (
            <ToggleChip key={r} label={r} selected={refrigerant === r} onPress={() => onRefrigerant(refrigerant === r ? undefined : r)} testID={`catalog-refrigerant-${r}`} />
          ))}
        </View>
      </View>
      <View style={styles.row} role="group" aria-label="Size in tons">
        <Text variant="labelLarge" style={styles.label} aria-hidden>
          Tons
        </Text>
        <View style={styles.chips}>
          {TON_CHOICES.map((t) => (
            <ToggleChip key={t} label={String(t)} selected={tons === t} onPress={() => onTons(tons === t ? undefined : t)} testID={`catalog-tons-${t}`} />
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
  label: { width: 96, paddingTop: spacing.md },
});
