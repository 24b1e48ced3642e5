import { StyleSheet } from 'react-native';
import { FormField } from '@/components/ui/form-field';

interface Props {
  label: string;
  value: string;
  onChangeText(value: string): void;
  error?: string;
  hint?: string;
  testID?: string;
}

/** A big numeric field for a gauge or thermometer reading (decimal keypad on a phone). */
export function ReadingField({ label, value, onChangeText, error, hint, testID }: Props) {
  return (
    <FormField
      label={label}
      value={value}
      onChangeText={onChangeText}
      error={error}
      hint={hint}
      keyboardType="decimal-pad"
      inputMode="decimal"
      style={styles.field}
      contentStyle={styles.input}
      testID={testID}
    />
  );
}

const styles = StyleSheet.create({
  // One per row on a phone (labels read in full), two per row in a wide column.
  field: { flexGrow: 1, flexBasis: 200 },
  input: { fontSize: 22, minHeight: 56 },
});
