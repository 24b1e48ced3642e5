import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Divider, Icon, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import type { SystemRecord } from '@/hooks/use-systems';
import type { ChecklistRow } from '@/shared/checklist';
import type { ChecklistEntry, ChecklistState } from '@/shared/schemas/systems';
import { ChoiceChips } from '@/components/check/choice-chips';
import { FormField } from '@/components/ui/form-field';
import { SectionCard } from '@/components/ui/section-card';
import { CHECKLIST_STATE_WORDS } from './record-words';

const STATE_OPTIONS = (['done', 'not-applicable', 'open'] as const).map((value) => ({ value, label: CHECKLIST_STATE_WORDS[value] }));
const STATE_ICONS: Record<ChecklistState, string> = { done: 'check-circle-outline', 'not-applicable': 'minus-circle-outline', open: 'circle-outline' };

interface Props {
  record: SystemRecord;
  readOnly: boolean;
  onSave(id: string, entry: ChecklistEntry): void;
}

/** The record's checklist, drawn from its own facts: each item with its reason; done, not applicable (why) or open. */
export function ChecklistCard({ record, readOnly, onSave }: Props) {
  const open = record.checklist.filter((r) => r.state === 'open').length;
  return (
    <SectionCard title="Checklist" testID="checklist-card">
      <Text variant="bodyMedium" testID="checklist-open-count">
        {open === 0 ? 'Every item is done or marked not applicable.' : `${open} of ${record.checklist.length} items still open.`}
      </Text>
      {record.checklist.map((row, i) => (
        <View key={row.id} style={styles.item}>
          {i > 0 ? <Divider /> : null}
          <ChecklistItem row={row} readOnly={readOnly} onSave={(entry) => onSave(row.id, entry)} />
        </View>
      ))}
    </SectionCard>
  );
}

function ChecklistItem({ row, readOnly, onSave }: { row: ChecklistRow; readOnly: boolean; onSave(entry: ChecklistEntry): void }) {
  // "Not applicable" waits for its word why before it is saved.
  const [askingWhy, setAskingWhy] = useState(false);
  const [why, setWhy] = useState(row.note ?? '');
  const [error, setError] = useState<string | undefined>();
  const pick = (value: string) => {
    const state = (value || 'open') as ChecklistState;
    if (state === 'not-applicable') {
      setAskingWhy(true);
      return;
    }
    setAskingWhy(false);
    onSave({ state });
  };
  const saveWhy = () => {
    if (!why.trim()) {
      setError('Say why the item does not apply.');
      return;
    }
    setError(undefined);
    setAskingWhy(false);
    onSave({ state: 'not-applicable', note: why.trim() });
  };
  return (
    <View style={styles.itemBody} testID={`checklist-${row.id}`}>
      <View style={styles.titleRow}>
        <Icon source={STATE_ICONS[row.state]} size={22} />
        <Text variant="titleSmall" style={styles.title}>
          {row.title}
        </Text>
        <Text variant="labelLarge" testID={`checklist-state-${row.id}`}>
          {CHECKLIST_STATE_WORDS[row.state]}
        </Text>
      </View>
      <Text variant="bodySmall">{`Why: ${row.reason}`}</Text>
      {row.state === 'not-applicable' && row.note ? <Text variant="bodySmall">{`Not applicable because: ${row.note}`}</Text> : null}
      {readOnly ? null : (
        <ChoiceChips label="State" options={STATE_OPTIONS} value={askingWhy ? 'not-applicable' : row.state} onChange={pick} testID={`checklist-${row.id}-state`} />
      )}
      {askingWhy ? (
        <View style={styles.why}>
          <FormField label="Why it does not apply" value={why} onChangeText={setWhy} error={error} testID={`checklist-${row.id}-why`} />
          <Button mode="contained" onPress={saveWhy} contentStyle={styles.button} testID={`checklist-${row.id}-why-save`}>
            Save
          </Button>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  item: { gap: spacing.sm },
  itemBody: { gap: spacing.xs },
  titleRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  title: { flex: 1 },
  why: { gap: spacing.xs },
  button: { minHeight: TOUCH_TARGET },
});
