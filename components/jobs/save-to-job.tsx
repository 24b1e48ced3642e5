import { onlineManager } from '@tanstack/react-query';
import { router } from 'expo-router';
import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Chip, RadioButton, Text, TextInput } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { ApiError } from '@/hooks/api-client';
import { errorText } from '@/hooks/error-text';
import { queueCreate } from '@/hooks/record-outbox';
import { useCreateJob, useJobs } from '@/hooks/use-jobs';
import { useCreateSystem } from '@/hooks/use-systems';
import { useZodForm } from '@/hooks/use-zod-form';
import { JobCreateSchema } from '@/shared/schemas/jobs';
import { buildCheckRequest } from '@/components/check/build-check-request';
import { useCheckForm } from '@/components/check/check-store';
import { AppDialog } from '@/components/ui/app-dialog';
import { MessageBanner } from '@/components/ui/message-banner';
import { EMPTY_JOB, JobFields } from './job-form';
import { whenText } from './job-words';

/** "Save to job" under a check's answer: pick an open job (search) or start one; the record opens next. */
export function SaveToJob() {
  const [visible, setVisible] = useState(false);
  return (
    <View style={styles.row}>
      <Button mode="contained-tonal" icon="briefcase-plus-outline" onPress={() => setVisible(true)} contentStyle={styles.button} testID="save-to-job">
        Save to job
      </Button>
      {visible ? <SaveToJobDialog onDismiss={() => setVisible(false)} /> : null}
    </View>
  );
}

function SaveToJobDialog({ onDismiss }: { onDismiss(): void }) {
  const checkForm = useCheckForm();
  const [mode, setMode] = useState<'pick' | 'new'>('pick');
  const [text, setText] = useState('');
  const [q, setQ] = useState('');
  const [jobId, setJobId] = useState<number | null>(null);
  useEffect(() => {
    const t = setTimeout(() => setQ(text.trim()), 250);
    return () => clearTimeout(t);
  }, [text]);
  const jobs = useJobs({ q: q || undefined, status: 'open', page: 1, pageSize: 8 });
  const jobForm = useZodForm(JobCreateSchema, EMPTY_JOB);
  const createJob = useCreateJob();
  const createSystem = useCreateSystem();
  const [problem, setProblem] = useState<string | null>(null);
  const busy = createJob.isPending || createSystem.isPending;

  const save = async () => {
    setProblem(null);
    const built = buildCheckRequest(checkForm);
    if (!built.ok) {
      setProblem('The check form has entries to fix first; run the check again.');
      return;
    }
    // No signal: a record on an existing job is kept on the phone and sent when it returns (the job's
    // page shows it as not yet sent); a new job needs the server to give it its number first.
    const keepForLater = (target: number) => {
      queueCreate(target, built.request, `check saved ${whenText(new Date().toISOString())}`);
      onDismiss();
      router.push(`/jobs/${target}`);
    };
    if (!onlineManager.isOnline()) {
      if (mode === 'new') setProblem('A new job needs signal. Pick an existing job to keep this record on the phone until the signal returns.');
      else if (jobId === null) setProblem('Pick a job, or start a new one.');
      else keepForLater(jobId);
      return;
    }
    try {
      let target = jobId;
      if (mode === 'new') {
        const body = jobForm.validate();
        if (!body) return;
        target = (await createJob.mutateAsync(body)).id;
      }
      if (target === null) {
        setProblem('Pick a job, or start a new one.');
        return;
      }
      const saveOn = target;
      const record = await createSystem.mutateAsync({ jobId: saveOn, body: built.request }).catch((err: unknown) => {
        if (err instanceof ApiError && err.kind === 'network') return null;
        throw err;
      });
      if (!record) {
        keepForLater(saveOn);
        return;
      }
      onDismiss();
      router.push(`/jobs/systems/${record.id}`);
    } catch (err) {
      setProblem(errorText(err));
    }
  };

  return (
    <AppDialog
      visible
      onDismiss={onDismiss}
      title="Save to job"
      testID="save-to-job-dialog"
      actions={
        <>
          <Button onPress={onDismiss} contentStyle={styles.button}>
            Cancel
          </Button>
          <Button mode="contained" onPress={() => void save()} loading={busy} disabled={busy} contentStyle={styles.button} testID="save-to-job-confirm">
            Save
          </Button>
        </>
      }
    >
      <View style={styles.modes}>
        <Chip selected={mode === 'pick'} showSelectedCheck onPress={() => setMode('pick')} style={styles.chip} testID="save-to-job-existing">
          Existing job
        </Chip>
        <Chip selected={mode === 'new'} showSelectedCheck onPress={() => setMode('new')} style={styles.chip} testID="save-to-job-new">
          New job
        </Chip>
      </View>
      {mode === 'pick' ? (
        <View style={styles.stack}>
          <TextInput mode="outlined" label="Search customer or address" value={text} onChangeText={setText} testID="save-to-job-search" />
          {jobs.data?.items.length === 0 ? <Text variant="bodyMedium">No open job matches: start a new one.</Text> : null}
          <RadioButton.Group value={jobId === null ? '' : String(jobId)} onValueChange={(v) => setJobId(Number(v))}>
            {jobs.data?.items.map((job) => (
              <RadioButton.Item
                key={job.id}
                value={String(job.id)}
                label={`${job.customerName} — ${job.siteAddress}`}
                style={styles.radio}
                testID={`save-to-job-pick-${job.id}`}
              />
            ))}
          </RadioButton.Group>
        </View>
      ) : (
        <JobFields form={jobForm} />
      )}
      {problem ? <MessageBanner tone="error">{problem}</MessageBanner> : null}
    </AppDialog>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row' },
  button: { minHeight: TOUCH_TARGET },
  modes: { flexDirection: 'row', gap: spacing.sm },
  chip: { minHeight: TOUCH_TARGET, justifyContent: 'center' },
  stack: { gap: spacing.sm },
  radio: { minHeight: TOUCH_TARGET },
});
