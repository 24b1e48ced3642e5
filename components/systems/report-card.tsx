import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useJob } from '@/hooks/use-jobs';
import { useSendEmail } from '@/hooks/use-send-email';
import { useFinalizeSystem, useSendReport, type SystemRecord } from '@/hooks/use-systems';
import { SendReportSchema } from '@/shared/schemas/systems';
import { AppDialog } from '@/components/ui/app-dialog';
import { FormField } from '@/components/ui/form-field';
import { MessageBanner } from '@/components/ui/message-banner';
import { SectionCard } from '@/components/ui/section-card';
import { SendEmailDialog } from '@/components/ui/send-email-dialog';
import { openPdf } from './open-pdf';

/** Finalize the record, open its PDF report, and e-mail it (to the job's contact unless changed). */
export function ReportCard({ record, viewingRevision }: { record: SystemRecord; viewingRevision: number | null }) {
  const job = useJob(record.jobId);
  const finalize = useFinalizeSystem(record.id);
  const send = useSendReport(record.id);
  const [finalizing, setFinalizing] = useState(false);
  const [reason, setReason] = useState('');
  const [reasonError, setReasonError] = useState<string>();
  const email = useSendEmail({
    send,
    defaultAddress: job.data?.contactEmail ?? '',
    schema: SendReportSchema,
    bodyOf: (address, confirm) => ({ to: address, ...(confirm ? { confirm: true } : {}) }),
  });
  const [pdfError, setPdfError] = useState<string | null>(null);
  const openCount = record.openChecklistItems.length;

  const doFinalize = () => {
    if (openCount > 0 && !reason.trim()) {
      setReasonError('Say why items are left open: it prints on the report.');
      return;
    }
    finalize.mutate(
      { revision: record.latestRevision, ...(openCount > 0 ? { openItemsReason: reason.trim() } : {}) },
      { onSuccess: () => setFinalizing(false) },
    );
  };
  const revision = viewingRevision ?? record.latestRevision;
  const openReport = () => {
    setPdfError(null);
    openPdf(`/systems/${record.id}/report.pdf?revision=${revision}`, `system-record-${record.id}-rev-${revision}.pdf`).catch((e) => setPdfError(errorText(e)));
  };

  return (
    <SectionCard title="Report" testID="report-card">
      <Text variant="bodyMedium">
        {record.status === 'final'
          ? `Final since ${record.finalizedAt ? new Date(record.finalizedAt).toLocaleString() : ''}${record.finalizedBy ? ` (${record.finalizedBy.name})` : ''}. A change now makes a new revision.`
          : 'Draft: finalize when the install is closed out; after that, a change makes a new revision.'}
      </Text>
      {record.openItemsReason ? <Text variant="bodySmall">{`Items left open because: ${record.openItemsReason}`}</Text> : null}
      {send.isSuccess ? (
        <MessageBanner tone="success" testID="report-sent">
          {`Report sent to ${send.data.to}.`}
        </MessageBanner>
      ) : null}
      {finalize.isError && !finalizing ? <MessageBanner tone="error">{errorText(finalize.error)}</MessageBanner> : null}
      {pdfError ? <MessageBanner tone="error">{pdfError}</MessageBanner> : null}
      <View style={styles.buttons}>
        {record.status === 'draft' && viewingRevision === null ? (
          <Button mode="contained" icon="lock-check-outline" onPress={() => setFinalizing(true)} contentStyle={styles.button} testID="record-finalize">
            Finalize
          </Button>
        ) : null}
        <Button mode="outlined" icon="file-pdf-box" onPress={openReport} contentStyle={styles.button} testID="record-pdf">
          Open PDF
        </Button>
        <Button mode="outlined" icon="email-outline" onPress={email.open} contentStyle={styles.button} testID="record-send">
          Send report
        </Button>
      </View>

      <AppDialog
        visible={finalizing}
        onDismiss={() => setFinalizing(false)}
        title="Finalize this record?"
        testID="finalize-dialog"
        actions={
          <>
            <Button onPress={() => setFinalizing(false)} contentStyle={styles.button}>
              Cancel
            </Button>
            <Button mode="contained" onPress={doFinalize} loading={finalize.isPending} contentStyle={styles.button} testID="finalize-confirm">
              Finalize
            </Button>
          </>
        }
      >
        <Text variant="bodyMedium">After this the record does not change: an edit makes a new revision and keeps this one.</Text>
        {openCount > 0 ? (
          <FormField
            label={`Why ${openCount === 1 ? 'one checklist item is' : `${openCount} checklist items are`} left open`}
            value={reason}
            onChangeText={setReason}
            error={reasonError}
            multiline
            testID="finalize-reason"
          />
        ) : null}
        {finalize.isError ? <MessageBanner tone="error">{errorText(finalize.error)}</MessageBanner> : null}
      </AppDialog>

      <SendEmailDialog title="E-mail the report" testIdPrefix="send" {...email.dialog} />
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  button: { minHeight: TOUCH_TARGET },
});
