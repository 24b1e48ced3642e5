import { StyleSheet, View } from 'react-native';
import { Chip, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import type { Option } from './field-types';

interface Props {
  label: string;
  options: readonly Option[];
  /** Single choice: the value; multi: values joined by ';'. '' is not given. */
  value: string;
  onChange(value: string): void;
  multi?: boolean;
  error?: string;
  hint?: string;
  testID?: string;
}

/** Choices as big chips (no dropdown to aim at); tapping the chosen one again clears it. */
export function ChoiceChips({ label, options, value, onChange, multi, error, hint, testID }: Props) {
  const theme = useTandemTheme();
  const chosen = value === '' ? [] : value.split(';');
  const toggle = (v: string) => {
    if (!multi) return onChange(chosen.includes(v) ? '' : v);
    const next = chosen.includes(v) ? chosen.filter((c) => c !== v) : [...chosen, v];
    onChange(next.join(';'));
  };
  return (
    <View style={styles.field} testID={testID}>
      <Text variant="labelLarge">{label}</Text>
      <View style={styles.row}>
        {options.map((o) => {
          const selected = chosen.includes(o.value);
          return (
            <Chip
              key={o.value}
              selected={selected}
              showSelectedOverlay
              onPress={() => toggle(o.value)}
              style={styles.chip}
              accessibilityLabel={`${label}: ${o.label}`}
              accessibilityState={{ selected }}
              testID={testID ? `${testID}-${o.value}` : undefined}
            >
              {o.label}
            </Chip>
          );
        })}
      </View>
      {error ? (
        <Text variant="bodySmall" style={{ color: theme.colors.error }}>
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
  chip: { minHeight: TOUCH_TARGET - 8, justifyContent: 'center' },
});
