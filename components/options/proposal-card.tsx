import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { queryString } from '@/hooks/api-client';
import { errorText } from '@/hooks/error-text';
import { energyParams, useSendProposal } from '@/hooks/use-options';
import { useSendEmail } from '@/hooks/use-send-email';
import { ProposalSendSchema, type EnergyQuery } from '@/shared/schemas/options';
import { MessageBanner } from '@/components/ui/message-banner';
import { SectionCard } from '@/components/ui/section-card';
import { SendEmailDialog } from '@/components/ui/send-email-dialog';
import { openPdf } from '@/components/systems/open-pdf';

interface Props {
  jobId: number;
  contactEmail: string | null;
  energy: EnergyQuery;
  optionCount: number;
}

/** The options as one customer PDF: preview it, or e-mail it (to the job's contact unless changed). */
export function ProposalCard({ jobId, contactEmail, energy, optionCount }: Props) {
  const send = useSendProposal(jobId);
  const email = useSendEmail({
    send,
    defaultAddress: contactEmail ?? '',
    schema: ProposalSendSchema,
    bodyOf: (address, confirm) => ({ to: address.trim(), energy, ...(confirm ? { confirm: true } : {}) }),
  });
  const [pdfError, setPdfError] = useState<string | null>(null);

  const preview = () => {
    setPdfError(null);
    openPdf(`/jobs/${jobId}/proposal.pdf${queryString(energyParams(energy))}`, `proposal-job-${jobId}.pdf`).catch((e) => setPdfError(errorText(e)));
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
        <Button mode="contained" icon="email-outline" onPress={email.open} disabled={optionCount === 0} contentStyle={styles.button} testID="proposal-send">
          Send to customer
        </Button>
      </View>
      <SendEmailDialog title="E-mail the proposal" testIdPrefix="proposal-send" {...email.dialog} />
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  button: { minHeight: TOUCH_TARGET },
});
