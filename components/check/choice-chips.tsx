import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { ToggleChip } from '@/components/ui/toggle-chip';
import type { Option } from './field-types';

interface Props {
  label: string;
  options: readonly Option[];
  /** Single choice: the value; multi: values joined by ';'. '' is not given. */
  value: string;
  onChange(value: string): void;
  multi?: boolean;
  /** Marks a fact the check needs ("required" said in words, not only a star). */
  required?: boolean;
  error?: string;
  hint?: string;
  testID?: string;
}

/** Choices as big chips (no dropdown to aim at); tapping the chosen one again clears it. */
export function ChoiceChips({ label, options, value, onChange, multi, required, error, hint, testID }: Props) {
  const theme = useTandemTheme();
  const chosen = value === '' ? [] : value.split(';');
  const toggle = (v: string) => {
    if (!multi) return onChange(chosen.includes(v) ? '' : v);
    const next = chosen.includes(v) ? chosen.filter((c) => c !== v) : [...chosen, v];
    onChange(next.join(';'));
  };
  const name = required ? `${label} (required)` : label;
  return (
    <View style={styles.field} testID={testID}>
      <Text variant="labelLarge" aria-hidden>
        {name}
      </Text>
      <View role="group" aria-label={name} style={styles.row}>
        {options.map((o) => (
          <ToggleChip key={o.value} label={o.label} selected={chosen.includes(o.value)} onPress={() => toggle(o.value)} testID={testID ? `${testID}-${o.value}` : undefined} />
        ))}
      </View>
      {error ? (
        <Text variant="bodySmall" style={{ color: theme.colors.error }} role="alert" testID={testID ? `${testID}-error` : undefined}>
          ⚠ {error}
        </Text>
      ) : hint ? (
        <Text variant="bodySmall">{hint}</Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
