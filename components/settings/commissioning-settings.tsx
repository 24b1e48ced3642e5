import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import type { RuleSettings } from '@/shared/rules/types';
import { FormField } from '@/components/ui/form-field';
import { COMMISSIONING_SETTING_FIELDS, defaultHint } from './rules-draft';

interface Props {
  values: Record<string, string>;
  defaults?: RuleSettings;
  errors: Record<string, string>;
  onChange(key: string, value: string): void;
}

/** Admin → Rules, "Start-up readings": the verdict's margins and the evacuation and decay limits. */
export function CommissioningSettings({ values, defaults, errors, onChange }: Props) {
  return (
    <View style={styles.section} testID="commissioning-settings">
      <Text variant="titleMedium" role="heading" aria-level={2}>
        Start-up readings
      </Text>
      <Text variant="bodySmall">
        How far superheat and subcooling may sit from their targets and still read as on target, and what a finished evacuation must show: the deepest vacuum, and the highest reading the decay test may rise to over its hold.
      </Text>
      <View style={styles.grid}>
        {COMMISSIONING_SETTING_FIELDS.map((f) => (
          <FormField
            key={f.key}
            style={styles.cell}
            label={f.label}
            value={values[f.key] ?? ''}
            keyboardType="decimal-pad"
            inputMode="decimal"
            onChangeText={(v) => onChange(f.key, v)}
            error={errors[`settings.${f.key}`]}
            hint={defaults ? defaultHint(defaults[f.key]) : undefined}
            testID={`setting-${f.key}`}
          />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.sm },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, minWidth: 240 },
});
