import { onlineManager } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Divider, Icon, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { ApiError } from '@/hooks/api-client';
import { errorText } from '@/hooks/error-text';
import { hasWaiting, queueReading } from '@/hooks/record-outbox';
import { useRuleSettings } from '@/hooks/use-rule-settings';
import { useAddReading, type SavedReading, type SystemRecord } from '@/hooks/use-systems';
import type { ReadingCreate } from '@/shared/schemas/systems';
import { getRefrigerant } from '@/shared/refrigerants';
import { DEFAULT_RULE_SETTINGS } from '@/shared/rules/settings';
import { EvacuationSection } from '@/components/readings/evacuation-section';
import { initialEvacuationDraft } from '@/components/readings/evacuation-draft';
import { readNumber } from '@/components/readings/number-text';
import { initialReadingsDraft, liveReadings, type ReadingsDraft } from '@/components/readings/readings-draft';
import { ReadingsForm } from '@/components/readings/readings-form';
import { ReadingsResult } from '@/components/readings/readings-result';
import { readingVerdictWords } from '@/components/readings/reading-verdict';
import { MessageBanner } from '@/components/ui/message-banner';
import { SectionCard } from '@/components/ui/section-card';
import { whenText } from '@/components/jobs/job-words';
import { readingBody } from './reading-body';

/** A fresh form with the record's refrigerant already chosen. */
function draftFor(record: SystemRecord): ReadingsDraft {
  const refrigerant = (record.parts.outdoor?.spec as { refrigerant?: string } | undefined)?.refrigerant;
  return { ...initialReadingsDraft(), ...(refrigerant ? { refrigerant } : {}) };
}

/** Start-up readings on the record: the Readings form with live superheat/subcooling, then the saved ones. */
export function RecordReadingsCard({ record, readOnly }: { record: SystemRecord; readOnly: boolean }) {
  const settings = useRuleSettings().data?.settings ?? DEFAULT_RULE_SETTINGS;
  const add = useAddReading(record.id);
  const [adding, setAdding] = useState(false);
  const [draft, setDraft] = useState<ReadingsDraft>(() => draftFor(record));
  const [evac, setEvac] = useState(initialEvacuationDraft);
  const live = useMemo(() => liveReadings(draft, settings), [draft, settings]);
  const body = readingBody(draft, evac, { charge: live.result !== undefined });
  const altitudeFt = readNumber(draft.values.altitudeFt).value ?? 0;

  const [kept, setKept] = useState(false);
  const done = (keptForLater: boolean) => {
    setKept(keptForLater);
    setDraft(draftFor(record));
    setEvac(initialEvacuationDraft());
    setAdding(false);
  };
  const keep = (reading: ReadingCreate) => {
    // Taken now, sent later: the time is the moment it was read, not the moment the signal returned.
    queueReading(record.id, { ...reading, takenAt: reading.takenAt ?? new Date().toISOString() });
    done(true);
  };
  const save = () => {
    if (!body) return;
    if (!onlineManager.isOnline() || hasWaiting(record.id)) {
      keep(body);
      return;
    }
    add.mutate(body, {
      onSuccess: () => done(false),
      onError: (err) => {
        if (err instanceof ApiError && err.kind === 'network') {
          add.reset();
          keep(body);
        }
      },
    });
  };

  return (
    <SectionCard title="Start-up readings" testID="record-readings">
      {record.readings.length === 0 ? <Text variant="bodyMedium">No readings saved yet.</Text> : null}
      {record.readings.map((r, i) => (
        <View key={r.id} style={styles.saved}>
          {i > 0 ? <Divider /> : null}
          <SavedReadingRow reading={r} />
        </View>
      ))}
      {kept && !adding ? (
        <MessageBanner tone="info" testID="reading-kept">
          Reading kept on this phone: it is sent when the signal returns.
        </MessageBanner>
      ) : null}
      {add.isSuccess && !adding && !kept ? (
        <MessageBanner tone="success" testID="reading-saved">
          Reading saved.
        </MessageBanner>
      ) : null}
      {readOnly ? null : adding ? (
        <View style={styles.form}>
          <ReadingsForm draft={draft} live={live} onChange={setDraft} />
          <ReadingsResult live={live} zeotropic={Boolean(getRefrigerant(draft.refrigerant)?.zeotropic)} />
          <EvacuationSection draft={evac} settings={settings} altitudeFt={altitudeFt} onChange={setEvac} />
          {add.isError ? <MessageBanner tone="error">{errorText(add.error)}</MessageBanner> : null}
          <Text variant="bodySmall">
            {body ? 'Ready to save.' : 'Save needs complete charge readings, an evacuation result or a nitrogen test (pressure and hold time).'}
          </Text>
          <View style={styles.actions}>
            <Button mode="outlined" onPress={() => setAdding(false)} contentStyle={styles.button}>
              Cancel
            </Button>
            <Button mode="contained" onPress={save} disabled={!body || add.isPending} loading={add.isPending} contentStyle={styles.button} testID="reading-save">
              Save reading
            </Button>
          </View>
        </View>
      ) : (
        <Button mode="contained" icon="gauge" onPress={() => setAdding(true)} contentStyle={styles.button} testID="reading-add">
          Add a reading
        </Button>
      )}
    </SectionCard>
  );
}

const f1 = (v: number | undefined) => (v === undefined ? '—' : `${v.toFixed(1)} °F`);

function SavedReadingRow({ reading }: { reading: SavedReading }) {
  const charge = reading.results.charge;
  const verdict = charge ? readingVerdictWords(charge.verdict) : null;
  const test = (name: string, t?: { passed: boolean | null; message: string }) =>
    t ? `${name}: ${t.passed === null ? 'not judged' : t.passed ? 'passed' : 'failed'} — ${t.message}` : null;
  return (
    <View style={styles.savedBody} testID={`saved-reading-${reading.id}`}>
      <Text variant="titleSmall">{`${whenText(reading.takenAt)}${reading.takenBy ? ` · ${reading.takenBy.name}` : ''}${reading.label ? ` · ${reading.label}` : ''}`}</Text>
      {charge && verdict ? (
        <>
          <View style={styles.verdict}>
            <Icon source={verdict.icon} size={20} />
            <Text variant="labelLarge">{verdict.word}</Text>
          </View>
          <Text variant="bodyMedium" testID={`saved-reading-figures-${reading.id}`}>
            {`Superheat ${f1(charge.superheatF)} (target ${f1(charge.targetSuperheatF)}) · Subcooling ${f1(charge.subcoolingF)} (target ${f1(charge.targetSubcoolingF)})`}
          </Text>
          <Text variant="bodySmall">{charge.advice}</Text>
        </>
      ) : null}
      {[test('Evacuation', reading.results.evacuation), test('Nitrogen test', reading.results.pressureTest)].map((line) =>
        line ? (
          <Text key={line} variant="bodySmall">
            {line}
          </Text>
        ) : null,
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  saved: { gap: spacing.sm },
  savedBody: { gap: 2 },
  verdict: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  form: { gap: spacing.lg },
  actions: { flexDirection: 'row', gap: spacing.sm, justifyContent: 'flex-end', flexWrap: 'wrap' },
  button: { minHeight: TOUCH_TARGET },
});
