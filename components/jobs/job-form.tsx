import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import type { useZodForm } from '@/hooks/use-zod-form';
import type { JobCreateSchema } from '@/shared/schemas/jobs';
import { FormField } from '@/components/ui/form-field';

type JobForm = ReturnType<typeof useZodForm<typeof JobCreateSchema>>;

/** The fields of a job, each with its message beside it (the shared schema's words). */
export function JobFields({ form }: { form: JobForm }) {
  return (
    <View style={styles.stack}>
      <FormField label="Customer" {...form.bind('customerName')} testID="job-customer" autoComplete="off" />
      <FormField label="Site address" {...form.bind('siteAddress')} testID="job-address" />
      <FormField
        label="State (two letters)"
        {...form.bind('state')}
        autoCapitalize="characters"
        maxLength={2}
        hint="Sets the regional efficiency minimum."
        testID="job-state"
      />
      <FormField label="Contact e-mail (optional)" {...form.bind('contactEmail')} keyboardType="email-address" autoCapitalize="none" testID="job-email" />
      <FormField label="Contact phone (optional)" {...form.bind('contactPhone')} keyboardType="phone-pad" testID="job-phone" />
      <FormField label="Notes (optional)" {...form.bind('notes')} multiline testID="job-notes" />
    </View>
  );
}

export const EMPTY_JOB = { customerName: '', siteAddress: '', state: '', contactEmail: '', contactPhone: '', notes: '' };

const styles = StyleSheet.create({ stack: { gap: spacing.sm } });
