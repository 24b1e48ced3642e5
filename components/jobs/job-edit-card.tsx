import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { ApiError } from '@/hooks/api-client';
import { errorText, fieldProblems } from '@/hooks/error-text';
import { useUpdateJob, type JobDetail } from '@/hooks/use-jobs';
import { useZodForm } from '@/hooks/use-zod-form';
import { JobCreateSchema, type JobStatus } from '@/shared/schemas/jobs';
import { MessageBanner } from '@/components/ui/message-banner';
import { SectionCard } from '@/components/ui/section-card';
import { ToggleGroup } from '@/components/ui/toggle-group';
import { JobFields } from './job-form';
import { jobFormValues, jobPatchFrom } from './job-patch';
import { JOB_STATUS_WORDS } from './job-words';

const STATUS_OPTIONS = (['open', 'closed'] as const).map((value) => ({ value, label: JOB_STATUS_WORDS[value], testID: `job-status-${value}` }));

/** Edits a job's customer, site, state, contact, notes and open/closed; only changed fields are sent (and kept in its history). */
export function JobEditCard({ job, onDone }: { job: JobDetail; onDone(): void }) {
  const form = useZodForm(JobCreateSchema, jobFormValues(job));
  const [status, setStatus] = useState<JobStatus>(job.status);
  const [nothing, setNothing] = useState(false);
  const update = useUpdateJob(job.id);

  const onSave = () => {
    const edited = form.validate();
    if (!edited) return;
    const patch = jobPatchFrom(job, edited, status);
    if (!patch) {
      setNothing(true);
      return;
    }
    setNothing(false);
    update.mutate(patch, {
      onSuccess: onDone,
      onError: (err) => {
        if (err instanceof ApiError && err.kind === 'validation') {
          form.setErrors(Object.fromEntries(fieldProblems(err).map((p) => [String(p.path ?? '').split('.')[0], p.message])));
        }
      },
    });
  };

  return (
    <SectionCard title="Edit job" testID="job-edit">
      <JobFields form={form} />
      <ToggleGroup<JobStatus> label="Status" value={status} onChange={setStatus} options={STATUS_OPTIONS} />
      {nothing ? <Text variant="bodyMedium">Nothing was changed.</Text> : null}
      {update.isError && !(update.error instanceof ApiError && update.error.kind === 'validation') ? (
        <MessageBanner tone="error">{errorText(update.error)}</MessageBanner>
      ) : null}
      {Object.keys(form.errors).length > 0 ? (
        <MessageBanner tone="error" testID="job-edit-errors">
          Some fields need a fix: see the messages under them.
        </MessageBanner>
      ) : null}
      <View style={styles.actions}>
        <Button mode="outlined" onPress={onDone} contentStyle={styles.button} testID="job-edit-cancel">
          Cancel
        </Button>
        <Button mode="contained" onPress={onSave} loading={update.isPending} disabled={update.isPending} contentStyle={styles.button} testID="job-edit-save">
          Save changes
        </Button>
      </View>
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', gap: spacing.sm, justifyContent: 'flex-end', flexWrap: 'wrap' },
  button: { minHeight: TOUCH_TARGET },
});
