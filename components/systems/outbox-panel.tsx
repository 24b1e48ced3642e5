import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ActivityIndicator, Button, Card, Icon, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useOutbox } from '@/hooks/use-systems';
import { MessageBanner } from '@/components/ui/message-banner';
import { Screen } from '@/components/ui/screen';
import { pageCount, whenText } from '@/components/jobs/job-words';
import { openPdf } from './open-pdf';

/** Admin → Outbox: every report e-mail, sent or failed, newest first, with the PDF as it was sent. */
export function OutboxPanel() {
  const [page, setPage] = useState(1);
  const outbox = useOutbox(page);
  const [openError, setOpenError] = useState<string | null>(null);
  const pages = outbox.data ? pageCount(outbox.data.total, outbox.data.pageSize) : 1;
  return (
    <Screen title="Outbox" subtitle="Report e-mails sent from Tandem, and any that failed.">
      {outbox.isPending ? <ActivityIndicator accessibilityLabel="Loading the outbox" /> : null}
      {outbox.isError ? <MessageBanner tone="error">{errorText(outbox.error)}</MessageBanner> : null}
      {openError ? <MessageBanner tone="error">{openError}</MessageBanner> : null}
      {outbox.data?.items.length === 0 ? <Text variant="bodyLarge">No report has been sent yet.</Text> : null}
      <View style={styles.list} testID="outbox-list">
        {outbox.data?.items.map((m) => (
          <Card key={m.id} mode="outlined" testID={`outbox-${m.id}`}>
            <Card.Content style={styles.row}>
              <Icon source={m.status === 'sent' ? 'email-check-outline' : 'email-alert-outline'} size={22} />
              <View style={styles.text}>
                <Text variant="titleMedium">{m.subject}</Text>
                <Text variant="bodyMedium">{`${m.status === 'sent' ? 'Sent' : 'Failed'} to ${m.to} · ${whenText(m.sentAt)}`}</Text>
                {m.error ? <Text variant="bodySmall">{`Reason: ${m.error}`}</Text> : null}
              </View>
              {m.attachmentUrl ? (
                <Button
                  mode="outlined"
                  icon="file-pdf-box"
                  contentStyle={styles.button}
                  onPress={() => openPdf(m.attachmentUrl!.replace(/^\/api/, ''), `report-${m.id}.pdf`).catch((e) => setOpenError(errorText(e)))}
                  testID={`outbox-pdf-${m.id}`}
                >
                  Open PDF
                </Button>
              ) : null}
            </Card.Content>
          </Card>
        ))}
      </View>
      {pages > 1 ? (
        <View style={styles.pager}>
          <Button mode="outlined" disabled={page <= 1} onPress={() => setPage((p) => p - 1)} contentStyle={styles.button}>
            Newer
          </Button>
          <Text variant="bodyMedium">{`Page ${page} of ${pages}`}</Text>
          <Button mode="outlined" disabled={page >= pages} onPress={() => setPage((p) => p + 1)} contentStyle={styles.button}>
            Older
          </Button>
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  row: { flexDirection: 'row', gap: spacing.md, alignItems: 'center', flexWrap: 'wrap' },
  text: { flex: 1, minWidth: 200, gap: 2 },
  button: { minHeight: TOUCH_TARGET },
  pager: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: spacing.md },
});
