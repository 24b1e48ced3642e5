import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import type { SystemRecord } from '@/hooks/use-systems';
import { SerialsSchema, type Serials } from '@/shared/schemas/systems';
import { FormField } from '@/components/ui/form-field';
import { SectionCard } from '@/components/ui/section-card';
import { SERIAL_SLOTS, type SerialSlot } from './record-words';

interface Props {
  record: SystemRecord;
  readOnly: boolean;
  saving: boolean;
  onSave(serials: Partial<Serials>): void;
}

/** The parts with their models, and a serial number field for each (typed from the nameplate). */
export function SerialsCard({ record, readOnly, saving, onSave }: Props) {
  const slots = SERIAL_SLOTS.filter(({ slot }) => record.parts[slot]);
  const [draft, setDraft] = useState<Partial<Record<SerialSlot, string>>>(() => ({ ...record.serials }));
  const [errors, setErrors] = useState<Partial<Record<SerialSlot, string>>>({});
  const changed = slots.some(({ slot }) => (draft[slot] ?? '') !== (record.serials[slot] ?? ''));

  const save = () => {
    const body = Object.fromEntries(slots.map(({ slot }) => [slot, (draft[slot] ?? '').trim() || undefined]));
    const parsed = SerialsSchema.safeParse(body);
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message === 'Too small: expected string to have >=1 characters' ? 'enter the serial' : i.message])));
      return;
    }
    setErrors({});
    onSave(parsed.data);
  };

  return (
    <SectionCard title="Parts and serial numbers" testID="serials-card">
      {slots.map(({ slot, label }) => {
        const part = record.parts[slot]!;
        const model = part.spec.model ?? 'typed from the nameplate';
        return (
          <View key={slot} style={styles.part}>
            <Text variant="titleSmall">{`${label}: ${model}${part.kept ? ' (kept)' : ''}`}</Text>
            {readOnly ? (
              <Text variant="bodyMedium" testID={`serial-text-${slot}`}>{`Serial: ${record.serials[slot] ?? 'not recorded'}`}</Text>
            ) : (
              <FormField
                label={`${label} serial number`}
                value={draft[slot] ?? ''}
                onChangeText={(v) => setDraft((d) => ({ ...d, [slot]: v }))}
                error={errors[slot]}
                autoCapitalize="characters"
                autoCorrect={false}
                testID={`serial-${slot}`}
              />
            )}
          </View>
        );
      })}
      {readOnly ? null : (
        <Button mode="contained" onPress={save} disabled={!changed || saving} loading={saving} contentStyle={styles.button} testID="serials-save">
          Save serial numbers
        </Button>
      )}
    </SectionCard>
  );
}

const styles = StyleSheet.create({ part: { gap: spacing.xs }, button: { minHeight: TOUCH_TARGET } });
