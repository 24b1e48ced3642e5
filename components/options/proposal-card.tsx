import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { queryString } from '@/hooks/api-client';
import { errorText } from '@/hooks/error-text';
import { energyParams, useSendProposal } from '@/hooks/use-options';
import { ProposalSendSchema, type EnergyQuery } from '@/shared/schemas/options';
import { AppDialog } from '@/components/ui/app-dialog';
import { FormField } from '@/components/ui/form-field';
import { MessageBanner } from '@/components/ui/message-banner';
import { SectionCard } from '@/components/ui/section-card';
import { openPdf } from '@/components/systems/open-pdf';
import { recentlySent, rememberSent } from './proposal-sends';

interface Props {
  jobId: number;
  contactEmail: string | null;
  energy: EnergyQuery;
  optionCount: number;
}

/** The options as one customer PDF: preview it, or e-mail it (to the job's contact unless changed). */
export function ProposalCard({ jobId, contactEmail, energy, optionCount }: Props) {
  const send = useSendProposal(jobId);
  const [open, setOpen] = useState(false);
  const [to, setTo] = useState<string | null>(null);
  const [toError, setToError] = useState<string>();
  const [askAgain, setAskAgain] = useState<string | null>(null);
  const [pdfError, setPdfError] = useState<string | null>(null);
  const address = to ?? contactEmail ?? '';

  const preview = () => {
    setPdfError(null);
    openPdf(`/jobs/${jobId}/proposal.pdf${queryString(energyParams(energy))}`, `proposal-job-${jobId}.pdf`).catch((e) => setPdfError(errorText(e)));
  };
  const doSend = (confirmed: boolean) => {
    const parsed = ProposalSendSchema.safeParse({ to: address.trim(), energy });
    if (!parsed.success) {
      setToError(parsed.error.issues[0]?.message);
      return;
    }
    setToError(undefined);
    // Like the record report: sending the same proposal again within a minute asks first.
    const recent = recentlySent(jobId, Date.now());
    if (recent && !confirmed) {
      setAskAgain(`The proposal went to ${recent.to} less than a minute ago. Send it again?`);
      return;
    }
    send.mutate(parsed.data, {
      onSuccess: (r) => {
        rememberSent(jobId, r.to, Date.now());
        setOpen(false);
        setAskAgain(null);
      },
    });
  };

  return (
    <SectionCard title="Proposal" testID="proposal-card">
      <Text variant="bodyMedium">
        {optionCount === 0
          ? 'Add an option first: the proposal shows every option on this job, with its price, check and energy figures.'
          : `One PDF for the customer with ${optionCount === 1 ? 'the option' : `all ${optionCount} options`}, the prices as saved, and the energy figures with their assumptions.`}
      </Text>
      {send.isSuccess ? <MessageBanner tone="success" testID="proposal-sent">{`Proposal sent to ${send.data.to}.`}</MessageBanner> : null}
      {pdfError ? <MessageBanner tone="error">{pdfError}</MessageBanner> : null}
      <View style={styles.buttons}>
        <Button mode="outlined" icon="file-pdf-box" onPress={preview} disabled={optionCount === 0} contentStyle={styles.button} testID="proposal-pdf">
          Preview PDF
        </Button>
        <Button mode="contained" icon="email-outline" onPress={() => setOpen(true)} disabled={optionCount === 0} contentStyle={styles.button} testID="proposal-send">
          Send to customer
        </Button>
      </View>
      <AppDialog
        visible={open}
        onDismiss={() => setOpen(false)}
        title="E-mail the proposal"
        testID="proposal-send-dialog"
        actions={
          <>
            <Button onPress={() => setOpen(false)} contentStyle={styles.button}>
              Cancel
            </Button>
            {askAgain ? (
              <Button mode="contained" onPress={() => doSend(true)} loading={send.isPending} contentStyle={styles.button} testID="proposal-send-again">
                Send again
              </Button>
            ) : (
              <Button mode="contained" onPress={() => doSend(false)} loading={send.isPending} contentStyle={styles.button} testID="proposal-send-confirm">
                Send
              </Button>
            )}
          </>
        }
      >
        <FormField
          label="Send to"
          value={address}
          onChangeText={(v) => {
            setTo(v);
            setAskAgain(null);
          }}
          error={toError}
          keyboardType="email-address"
          autoCapitalize="none"
          testID="proposal-send-to"
        />
        {askAgain ? <MessageBanner tone="info">{askAgain}</MessageBanner> : null}
        {send.isError ? <MessageBanner tone="error">{errorText(send.error)}</MessageBanner> : null}
      </AppDialog>
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  button: { minHeight: TOUCH_TARGET },
});
