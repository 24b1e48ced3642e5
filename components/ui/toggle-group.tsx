import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { ToggleChip } from './toggle-chip';

export interface ToggleOption<T extends string> {
  value: T;
  label: string;
  testID?: string;
}

interface Props<T extends string> {
  /** Names the group for screen readers and, when shown, above it. */
  label: string;
  showLabel?: boolean;
  value: T;
  onChange(value: T): void;
  options: readonly ToggleOption<T>[];
}

/** One-of-a-few choice as equal-width 48 px buttons (replaces a segmented control too small for a thumb). */
export function ToggleGroup<T extends string>({ label, showLabel = true, value, onChange, options }: Props<T>) {
  return (
    <View style={styles.field}>
      {showLabel ? <Text variant="labelLarge">{label}</Text> : null}
      <View role="group" aria-label={label} style={styles.row}>
        {options.map((o) => (
          <View key={o.value} style={styles.cell}>
            <ToggleChip label={o.label} selected={o.value === value} onPress={() => onChange(o.value)} testID={o.testID} />
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  row: { flexDirection: 'row', gap: spacing.sm },
  cell: { flex: 1 },
});
