import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ActivityIndicator, Button, Card, Icon, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useRecordOutbox } from '@/hooks/record-outbox';
import { useJob, useUpdateJob } from '@/hooks/use-jobs';
import { useCurrentUser } from '@/hooks/use-session';
import { useJobAttachments, useJobSystems } from '@/hooks/use-systems';
import { MessageBanner } from '@/components/ui/message-banner';
import { Screen } from '@/components/ui/screen';
import { SectionCard } from '@/components/ui/section-card';
import { PhotoThumb } from '@/components/systems/photo-thumb';
import { RECORD_STATUS_WORDS, verdictCodeText } from '@/components/systems/record-words';
import { JobEditCard } from './job-edit-card';
import { fieldWord, JOB_STATUS_WORDS, whenText } from './job-words';

/** A job: the site and contact, its system records, its photos, and close / reopen. */
export function JobDetailScreen({ id }: { id: number }) {
  const job = useJob(id);
  const systems = useJobSystems(id);
  const photos = useJobAttachments(id);
  const update = useUpdateJob(id);
  const [editing, setEditing] = useState(false);
  const waiting = useRecordOutbox().items.filter((i) => i.kind === 'create' && i.jobId === id);
  const user = useCurrentUser();
  if (job.isPending) return <ActivityIndicator style={styles.loading} accessibilityLabel="Loading the job" />;
  if (job.isError) {
    return (
      <Screen title="Job">
        <MessageBanner tone="error">{errorText(job.error)}</MessageBanner>
      </Screen>
    );
  }
  const j = job.data;
  const closed = j.status === 'closed';
  return (
    <Screen
      title={j.customerName}
      subtitle={`${j.siteAddress}, ${j.state} · ${JOB_STATUS_WORDS[j.status]}`}
      actions={
        <>
          <Button mode="outlined" icon="arrow-left" onPress={() => router.push('/jobs')} contentStyle={styles.button}>
            All jobs
          </Button>
          <Button
            mode="outlined"
            icon={closed ? 'folder-open-outline' : 'check-circle-outline'}
            onPress={() => update.mutate({ status: closed ? 'open' : 'closed' })}
            loading={update.isPending}
            contentStyle={styles.button}
            testID="job-toggle-status"
          >
            {closed ? 'Reopen job' : 'Close job'}
          </Button>
        </>
      }
    >
      {update.isError ? <MessageBanner tone="error">{errorText(update.error)}</MessageBanner> : null}
      <SectionCard title="Contact" testID="job-contact">
        <Text variant="bodyMedium">{j.contactEmail ? `E-mail: ${j.contactEmail}` : 'No e-mail given.'}</Text>
        <Text variant="bodyMedium">{j.contactPhone ? `Phone: ${j.contactPhone}` : 'No phone given.'}</Text>
        {j.notes ? <Text variant="bodyMedium">{j.notes}</Text> : null}
        <Text variant="bodySmall">{`Started ${whenText(j.createdAt)}${j.createdBy ? ` by ${j.createdBy.name}` : ''}`}</Text>
        {editing ? null : (
          <Button mode="outlined" icon="pencil-outline" onPress={() => setEditing(true)} style={styles.edit} contentStyle={styles.button} testID="job-edit-open">
            Edit job details
          </Button>
        )}
      </SectionCard>
      {editing ? <JobEditCard key={j.updatedAt} job={j} onDone={() => setEditing(false)} /> : null}
      <SectionCard title="System records" testID="job-records">
        {systems.isPending ? <ActivityIndicator /> : null}
        {systems.isError ? <MessageBanner tone="error">{errorText(systems.error)}</MessageBanner> : null}
        {waiting.map((item) => (
          <View key={item.id} style={styles.row} testID="record-not-sent">
            <Icon source="cloud-upload-outline" size={22} />
            <View style={styles.rowText}>
              <Text variant="titleMedium">{item.kind === 'create' ? `New record: ${item.title}` : ''}</Text>
              <Text variant="bodyMedium">
                {item.problem?.kind === 'refused' ? `Not sent: ${item.problem.message}` : 'Not yet sent: kept on this phone until the signal returns.'}
              </Text>
            </View>
          </View>
        ))}
        {systems.data?.length === 0 && waiting.length === 0 ? <Text variant="bodyMedium">No records yet: run a check and tap “Save to job”.</Text> : null}
        {systems.data?.map((s) => (
          <Card key={s.id} mode="outlined" onPress={() => router.push(`/jobs/systems/${s.id}`)} testID={`record-${s.id}`}>
            <Card.Content style={styles.row}>
              <Icon source="clipboard-text-outline" size={22} />
              <View style={styles.rowText}>
                <Text variant="titleMedium">{s.label ?? ([s.outdoorModel, s.indoorModel ?? s.airHandlerModel].filter(Boolean).join(' with ') || 'System record')}</Text>
                <Text variant="bodyMedium">{`${verdictCodeText(s.verdict)} · ${RECORD_STATUS_WORDS[s.status]} · revision ${s.revision}`}</Text>
              </View>
            </Card.Content>
          </Card>
        ))}
      </SectionCard>
      {user.role !== 'tech' ? (
        <SectionCard title="Options for the customer" testID="job-options">
          <Text variant="bodyMedium">Up to three priced, checked options side by side, a repair-or-replace view, and the proposal to send.</Text>
          <Button mode="contained" icon="scale-balance" onPress={() => router.push(`/jobs/options/${id}`)} contentStyle={styles.button} style={styles.start} testID="open-options">
            Open options
          </Button>
        </SectionCard>
      ) : null}
      <SectionCard title="Photos">
        {photos.data?.length === 0 ? <Text variant="bodyMedium">No photos yet: add them on a record.</Text> : null}
        <View style={styles.photos}>{photos.data?.map((p) => <PhotoThumb key={p.id} photo={p} />)}</View>
      </SectionCard>
      {j.history.length ? (
        <SectionCard title="Changes">
          {j.history.map((h, i) => (
            <Text key={i} variant="bodySmall">
              {`${whenText(h.at)}${h.by ? ` · ${h.by.name}` : ''}: ${h.changes.map((c) => fieldWord(c.field)).join(', ')}`}
            </Text>
          ))}
        </SectionCard>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  loading: { marginTop: spacing.xxl },
  button: { minHeight: TOUCH_TARGET },
  edit: { alignSelf: 'flex-start' },
  row: { flexDirection: 'row', gap: spacing.md, alignItems: 'center', minHeight: TOUCH_TARGET },
  rowText: { flex: 1, gap: 2 },
  start: { alignSelf: 'flex-start' },
  photos: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
