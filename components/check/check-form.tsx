import { StyleSheet, View } from 'react-native';
import { Button } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { ToggleGroup } from '@/components/ui/toggle-group';
import { SECTION_KEYS } from './check-sections';
import { updateCheckForm, useCheckForm } from './check-store';
import { OptionalSection } from './optional-section';
import { PART_SLOTS } from './part-slots';
import { PartPicker } from './part-picker';

/** The driveway check's inputs: scope, the parts, the optional facts, and one big button. */
export function CheckForm({ onCheck, busy }: { onCheck(): void; busy: boolean }) {
  const form = useCheckForm();
  return (
    <View style={styles.form}>
      <ToggleGroup
        label="Scope"
        value={form.scope}
        onChange={(scope) => updateCheckForm((s) => ({ ...s, scope }))}
        options={[
          { value: 'new-system', label: 'New system', testID: 'scope-new-system' },
          { value: 'component-replacement', label: 'Replacing a part', testID: 'scope-component-replacement' },
        ]}
      />
      {PART_SLOTS.map((slot) => (
        <PartPicker key={slot} slot={slot} />
      ))}
      <View>
        {SECTION_KEYS.map((key) => (
          <OptionalSection key={key} section={key} />
        ))}
      </View>
      <Button mode="contained" icon="clipboard-check-outline" onPress={onCheck} loading={busy} disabled={busy} contentStyle={styles.check} labelStyle={styles.checkLabel} testID="run-check">
        Check
      </Button>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  check: { minHeight: 64 },
  checkLabel: { fontSize: 20, lineHeight: 28 },
});
