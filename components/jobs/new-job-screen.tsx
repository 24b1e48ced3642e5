import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { Button } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText, fieldProblems } from '@/hooks/error-text';
import { ApiError } from '@/hooks/api-client';
import { useCreateJob } from '@/hooks/use-jobs';
import { useZodForm } from '@/hooks/use-zod-form';
import { JobCreateSchema } from '@/shared/schemas/jobs';
import { MessageBanner } from '@/components/ui/message-banner';
import { Screen } from '@/components/ui/screen';
import { EMPTY_JOB, JobFields } from './job-form';

/** A new job: customer, site, state, contact and notes; on save, the job's page. */
export function NewJobScreen() {
  const form = useZodForm(JobCreateSchema, EMPTY_JOB);
  const create = useCreateJob();
  const onSave = () => {
    const body = form.validate();
    if (!body) return;
    create.mutate(body, {
      onSuccess: (job) => router.replace(`/jobs/${job.id}`),
      onError: (err) => {
        if (err instanceof ApiError && err.kind === 'validation') {
          form.setErrors(Object.fromEntries(fieldProblems(err).map((p) => [String(p.path ?? '').split('.')[0], p.message])));
        }
      },
    });
  };
  return (
    <Screen title="New job" subtitle="The customer's site: its records, photos and reports will live here.">
      <View style={styles.form}>
        <JobFields form={form} />
        {create.isError ? <MessageBanner tone="error">{errorText(create.error)}</MessageBanner> : null}
        <View style={styles.actions}>
          <Button mode="outlined" onPress={() => router.back()} contentStyle={styles.button}>
            Cancel
          </Button>
          <Button mode="contained" onPress={onSave} loading={create.isPending} disabled={create.isPending} contentStyle={styles.button} testID="job-save">
            Save job
          </Button>
        </View>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md, maxWidth: 640, width: '100%' },
  actions: { flexDirection: 'row', gap: spacing.sm, justifyContent: 'flex-end' },
  button: { minHeight: TOUCH_TARGET },
});
