import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { setTypedField, useCheckForm } from './check-store';
import { nameplateFields } from './nameplate-fields';
import type { PartSlot } from './part-slots';
import { SpecField } from './spec-field';

/** A part typed from its nameplate: the shared spec schema's fields, the key ones first. */
export function NameplateForm({ slot }: { slot: PartSlot }) {
  const form = useCheckForm();
  const [showAll, setShowAll] = useState(false);
  const fields = nameplateFields(slot);
  const values = form.parts[slot].typed;
  // A field with an error or a value stays visible even when the rest are folded away.
  const shown = fields.filter((f) => showAll || f.essential || values[f.key] || form.errors[`${slot}.${f.key}`]);
  return (
    <View style={styles.form}>
      {shown.map((f) => (
        <SpecField
          key={f.key}
          field={f}
          value={values[f.key] ?? ''}
          onChange={(v) => setTypedField(slot, f.key, v)}
          error={form.errors[`${slot}.${f.key}`]}
          testID={`${slot}-field-${f.key}`}
        />
      ))}
      <Button mode="text" icon={showAll ? 'chevron-up' : 'chevron-down'} onPress={() => setShowAll(!showAll)} contentStyle={styles.button}>
        {showAll ? 'Fewer nameplate fields' : `More nameplate fields (${fields.length - shown.length})`}
      </Button>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  button: { minHeight: TOUCH_TARGET },
});
