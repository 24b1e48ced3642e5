import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useJobs } from '@/hooks/use-jobs';
import { useCreateOption, useJobOptions, useSaveOption } from '@/hooks/use-options';
import { MAX_OPTIONS_PER_JOB } from '@/shared/schemas/options';
import { useDebouncedValue } from '@/components/catalog/use-debounced-value';
import type { PickedPart } from '@/components/check/check-store';
import { AppDialog } from '@/components/ui/app-dialog';
import { FormField } from '@/components/ui/form-field';
import { MessageBanner } from '@/components/ui/message-banner';
import { ToggleChip } from '@/components/ui/toggle-chip';

const NEW = 'new';
const JOB_ROWS = 6;

interface Props {
  coil: { id: number; model: string };
  outdoor: PickedPart;
  airHandler?: PickedPart;
}

/**
 * "Add to option": puts this coil (with the outdoor unit and kept air handler it was found for) into an
 * option on a job — an existing one (its coil and outdoor unit are replaced) or a new one named here.
 */
export function AddToOption({ coil, outdoor, airHandler }: Props) {
  const [open, setOpen] = useState(false);
  const [q, setQ] = useState('');
  const settled = useDebouncedValue(q, 250);
  const [jobId, setJobId] = useState<number>();
  const [target, setTarget] = useState<string>(NEW);
  const [name, setName] = useState('');
  const [nameError, setNameError] = useState<string>();
  const jobs = useJobs({ q: settled || undefined, status: 'open', page: 1, pageSize: JOB_ROWS });
  const options = useJobOptions(jobId ?? 0);
  const create = useCreateOption(jobId ?? 0);
  const save = useSaveOption();
  const items = options.data?.items ?? [];
  const full = items.length >= MAX_OPTIONS_PER_JOB;
  const error = create.error ?? save.error;

  const done = () => {
    setOpen(false);
    router.push(`/jobs/options/${jobId}`);
  };
  const add = () => {
    if (!jobId) return;
    const parts = {
      outdoor: { id: outdoor.id },
      indoorCoil: { id: coil.id, kept: false },
      ...(airHandler ? { airHandler: { id: airHandler.id, kept: true } } : {}),
    };
    if (target === NEW) {
      if (!name.trim()) {
        setNameError('Name the option in your own words.');
        return;
      }
      setNameError(undefined);
      create.mutate({ name: name.trim(), ...parts }, { onSuccess: done });
      return;
    }
    const option = items.find((o) => String(o.id) === target);
    if (option) save.mutate({ id: option.id, patch: { revision: option.revision, ...parts } }, { onSuccess: done });
  };

  return (
    <>
      <Button mode="contained" icon="playlist-plus" onPress={() => setOpen(true)} contentStyle={styles.button} style={styles.start} testID="coil-add-to-option">
        Add to option
      </Button>
      <AppDialog
        visible={open}
        onDismiss={() => setOpen(false)}
        title={`Add ${coil.model} to an option`}
        testID="add-to-option-dialog"
        actions={
          <>
            <Button onPress={() => setOpen(false)} contentStyle={styles.button}>
              Cancel
            </Button>
            <Button mode="contained" onPress={add} disabled={!jobId || (target === NEW && full)} loading={create.isPending || save.isPending} contentStyle={styles.button} testID="add-to-option-confirm">
              Add
            </Button>
          </>
        }
      >
        <Text variant="bodyMedium">{`With ${outdoor.label}${airHandler ? ` and the ${airHandler.label} that stays` : ''}.`}</Text>
        <FormField label="Find the job (customer or address)" value={q} onChangeText={setQ} autoCapitalize="none" testID="add-job-search" />
        <View role="group" aria-label="Job" style={styles.chips}>
          {(jobs.data?.items ?? []).map((j) => (
            <ToggleChip
              key={j.id}
              label={`${j.customerName}, ${j.siteAddress}`}
              selected={jobId === j.id}
              onPress={() => {
                setJobId(j.id);
                setTarget(NEW);
              }}
              testID={`add-job-${j.id}`}
            />
          ))}
        </View>
        {jobs.data?.items.length === 0 ? <Text variant="bodySmall">No open job matches.</Text> : null}
        {jobId ? (
          <>
            <Text variant="labelLarge">Option</Text>
            <View role="group" aria-label="Option" style={styles.chips}>
              {items.map((o) => (
                <ToggleChip key={o.id} label={`Replace the coil in “${o.name}”`} selected={target === String(o.id)} onPress={() => setTarget(String(o.id))} testID={`add-option-${o.id}`} />
              ))}
              <ToggleChip label="A new option" selected={target === NEW} onPress={() => setTarget(NEW)} disabled={full} testID="add-option-new" />
            </View>
            {full && target === NEW ? <Text variant="bodySmall">{`This job already has ${MAX_OPTIONS_PER_JOB} options: pick one to change.`}</Text> : null}
            {target === NEW && !full ? (
              <FormField label="New option’s name (your words)" value={name} onChangeText={setName} error={nameError} maxLength={60} testID="add-option-name" />
            ) : null}
          </>
        ) : null}
        {error ? <MessageBanner tone="error">{errorText(error)}</MessageBanner> : null}
      </AppDialog>
    </>
  );
}

const styles = StyleSheet.create({
  button: { minHeight: TOUCH_TARGET },
  start: { alignSelf: 'flex-start' },
  // One choice a line: a long customer name and address wraps inside its chip on a phone.
  chips: { gap: spacing.sm },
});
