import { router } from 'expo-router';
import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ActivityIndicator, Button, Card, Text, TextInput } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useJobs } from '@/hooks/use-jobs';
import type { JobStatus } from '@/shared/schemas/jobs';
import { MessageBanner } from '@/components/ui/message-banner';
import { DecorativeIcon } from '@/components/ui/decorative-icon';
import { Screen } from '@/components/ui/screen';
import { ToggleGroup } from '@/components/ui/toggle-group';
import { JOB_STATUS_WORDS, jobLine, pageCount, whenText } from './job-words';

const PAGE_SIZE = 20;
const FILTERS: { value: JobStatus | 'all'; label: string }[] = [
  { value: 'all', label: 'All' },
  { value: 'open', label: 'Open' },
  { value: 'closed', label: 'Closed' },
];

/** Jobs: newest first, searched by customer or address as the tech types, filtered by status, paged. */
export function JobsListScreen() {
  const [text, setText] = useState('');
  const [q, setQ] = useState('');
  const [status, setStatus] = useState<JobStatus | 'all'>('all');
  const [page, setPage] = useState(1);
  // A short pause after typing so each keystroke is not a request.
  useEffect(() => {
    const t = setTimeout(() => {
      setQ(text.trim());
      setPage(1);
    }, 250);
    return () => clearTimeout(t);
  }, [text]);
  const jobs = useJobs({ q: q || undefined, status: status === 'all' ? undefined : status, page, pageSize: PAGE_SIZE });
  const pages = jobs.data ? pageCount(jobs.data.total, PAGE_SIZE) : 1;

  return (
    <Screen
      title="Jobs"
      subtitle="Each customer's site with its system records, photos and reports."
      actions={
        <Button mode="contained" icon="plus" onPress={() => router.push('/jobs/new')} contentStyle={styles.button} testID="new-job">
          New job
        </Button>
      }
    >
      <TextInput
        mode="outlined"
        label="Search customer or address"
        value={text}
        onChangeText={setText}
        accessibilityLabel="Search customer or address"
        testID="jobs-search"
      />
      <ToggleGroup
        label="Status"
        showLabel={false}
        value={status}
        onChange={(v) => {
          setStatus(v);
          setPage(1);
        }}
        options={FILTERS.map((f) => ({ ...f, testID: `jobs-filter-${f.value}` }))}
      />
      {jobs.isPending ? <ActivityIndicator accessibilityLabel="Loading jobs" /> : null}
      {jobs.isError ? <MessageBanner tone="error">{errorText(jobs.error)}</MessageBanner> : null}
      {jobs.data && jobs.data.items.length === 0 ? (
        <Text variant="bodyLarge" testID="jobs-empty">
          {q || status !== 'all' ? 'No job matches.' : 'No jobs yet: start one with New job, or save a check to a job.'}
        </Text>
      ) : null}
      <View style={styles.list} testID="jobs-list">
        {jobs.data?.items.map((job) => (
          <Card key={job.id} mode="outlined" onPress={() => router.push(`/jobs/${job.id}`)} testID={`job-${job.id}`} accessibilityLabel={jobLine(job)}>
            <Card.Content style={styles.card}>
              <View style={styles.cardText}>
                <Text variant="titleMedium">{job.customerName}</Text>
                <Text variant="bodyMedium">{`${job.siteAddress}, ${job.state}`}</Text>
                <Text variant="bodySmall">{`Started ${whenText(job.createdAt)}`}</Text>
              </View>
              <View style={styles.status}>
                <DecorativeIcon source={job.status === 'open' ? 'progress-wrench' : 'check-circle-outline'} size={20} />
                <Text variant="labelLarge">{JOB_STATUS_WORDS[job.status]}</Text>
              </View>
            </Card.Content>
          </Card>
        ))}
      </View>
      {jobs.data && pages > 1 ? (
        <View style={styles.pager}>
          <Button mode="outlined" disabled={page <= 1} onPress={() => setPage((p) => p - 1)} contentStyle={styles.button} testID="jobs-prev">
            Newer
          </Button>
          <Text variant="bodyMedium">{`Page ${page} of ${pages}`}</Text>
          <Button mode="outlined" disabled={page >= pages} onPress={() => setPage((p) => p + 1)} contentStyle={styles.button} testID="jobs-next">
            Older
          </Button>
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  button: { minHeight: TOUCH_TARGET },
  list: { gap: spacing.sm },
  card: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, minHeight: TOUCH_TARGET },
  cardText: { flex: 1, gap: 2 },
  status: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  pager: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: spacing.md },
});
