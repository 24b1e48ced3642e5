import { router } from 'expo-router';
import { useState } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { ActivityIndicator, Button, Text } from 'react-native-paper';
import { CONTENT_MAX_WIDTH, spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useRecordOutbox } from '@/hooks/record-outbox';
import { applyPending } from '@/hooks/record-outbox-queue';
import { useIsWide } from '@/hooks/use-layout';
import { useRevision, useSystem, type SystemRecord } from '@/hooks/use-systems';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { CoverageBlock } from '@/components/check/coverage-block';
import { FindingGroups } from '@/components/check/finding-groups';
import { safetyPoints } from '@/components/check/safety-points';
import { VerdictBanner } from '@/components/check/verdict-banner';
import { readingsSafetyPoints } from '@/components/readings/readings-safety';
import { ConflictDialog } from '@/components/ui/conflict-dialog';
import { MessageBanner } from '@/components/ui/message-banner';
import { SafetyNote } from '@/components/ui/safety-note';
import { SectionCard } from '@/components/ui/section-card';
import { whenText } from '@/components/jobs/job-words';
import { ChecklistCard } from './checklist-card';
import { HistoryCard } from './history-card';
import { recordConflictIntro } from './record-conflict';
import { PhotosCard } from './photos-card';
import { RecordReadingsCard } from './record-readings-card';
import { RECORD_STATUS_WORDS } from './record-words';
import { ReportCard } from './report-card';
import { SerialsCard } from './serials-card';
import { useRecordSave } from './use-record-save';
import { WaitingChanges } from './waiting-changes';

/**
 * A matched-system record: the parts with serials, the verdict as it stood, findings, readings,
 * checklist, photos, finalize / send / PDF and the history. Phone: one column; wide: two.
 */
export function RecordScreen({ id }: { id: number }) {
  const theme = useTandemTheme();
  const wide = useIsWide();
  const latest = useSystem(id);
  const [viewing, setViewing] = useState<number | null>(null);
  const older = useRevision(id, viewing);
  const saver = useRecordSave(latest.data);
  const outbox = useRecordOutbox();

  if (latest.isPending) return <ActivityIndicator style={styles.loading} accessibilityLabel="Loading the record" />;
  if (latest.isError) {
    return (
      <View style={styles.pad}>
        <MessageBanner tone="error">{errorText(latest.error)}</MessageBanner>
      </View>
    );
  }
  // The latest revision as the tech left it on the phone: changes waiting for signal shown in place.
  const record: SystemRecord = viewing !== null && older.data ? older.data : applyPending(latest.data, outbox.items);
  const readOnly = viewing !== null;
  const refrigerant = (record.parts.outdoor?.spec as { refrigerant?: string } | undefined)?.refrigerant;

  const heading = (
    <View style={styles.header}>
      <View style={styles.titles}>
        <Text variant="headlineMedium" accessibilityRole="header">
          {record.label ?? 'System record'}
        </Text>
        <Text variant="bodyMedium" style={{ color: theme.colors.onSurfaceVariant }} testID="record-status">
          {`${RECORD_STATUS_WORDS[record.status]} · revision ${record.revision} of ${record.latestRevision} · saved ${whenText(record.savedAt)}${record.savedBy ? ` by ${record.savedBy.name}` : ''}`}
        </Text>
      </View>
      <Button mode="outlined" icon="arrow-left" onPress={() => router.push(`/jobs/${record.jobId}`)} contentStyle={styles.button} testID="record-job">
        Job
      </Button>
    </View>
  );
  const banners = (
    <>
      {viewing !== null ? (
        <View style={styles.viewing}>
          <MessageBanner tone="info" testID="viewing-revision">
            {older.isPending ? `Loading revision ${viewing}…` : `You are looking at revision ${viewing} as it was saved. It can not be changed.`}
          </MessageBanner>
          <Button mode="contained" onPress={() => setViewing(null)} contentStyle={styles.button}>
            Back to the latest
          </Button>
        </View>
      ) : null}
      {viewing === null ? <WaitingChanges systemId={id} items={outbox.items} sendingId={outbox.sendingId} /> : null}
      {saver.error && !saver.conflict ? <MessageBanner tone="error">{errorText(saver.error)}</MessageBanner> : null}
    </>
  );
  const verdict = (
    <SectionCard title="Compatibility as it stood" testID="record-verdict">
      <VerdictBanner result={record.check} />
      <Text variant="bodySmall">{`Checked when revision ${record.revision} was saved, ${whenText(record.savedAt)}, with rules version ${record.rulesVersion}.`}</Text>
      {viewing === null && record.currentCheck?.differs ? (
        <MessageBanner tone="info" testID="today-differs">
          {record.currentCheck.message}
        </MessageBanner>
      ) : null}
      <FindingGroups findings={record.check.findings} />
      <CoverageBlock coverage={record.check.coverage} />
    </SectionCard>
  );
  const serials = (
    <SerialsCard
      key={`${record.revision}-${record.savedAt}-${JSON.stringify(record.serials)}`}
      record={record}
      readOnly={readOnly}
      saving={saver.pending}
      onSave={(s) => void saver.save({ serials: s }).catch(() => undefined)}
    />
  );
  const checklist = <ChecklistCard record={record} readOnly={readOnly} onSave={(itemId, entry) => void saver.save({ checklist: { [itemId]: entry } }).catch(() => undefined)} />;
  const readings = <RecordReadingsCard record={record} readOnly={readOnly} />;
  const photos = <PhotosCard record={record} />;
  const report = <ReportCard record={record} viewingRevision={viewing} />;
  const history = <HistoryCard record={latest.data} viewing={viewing} onView={setViewing} />;
  const safety = <SafetyNote points={[...safetyPoints(record.check.findings, refrigerant), ...(refrigerant ? readingsSafetyPoints(refrigerant) : [])]} />;
  const conflict = (
    <ConflictDialog
      visible={saver.conflict !== null}
      intro={saver.conflict ? recordConflictIntro(saver.conflict.theirs) : null}
      rows={saver.conflict?.rows ?? []}
      noClashText="Your change does not clash with theirs; keeping yours adds it on top."
      testID="conflict"
      onKeepMine={saver.keepMine}
      onTakeTheirs={saver.takeTheirs}
    />
  );

  if (wide) {
    return (
      <View style={[styles.fill, { backgroundColor: theme.colors.background }]}>
        <View style={styles.inner}>
          <View style={styles.pad}>
            {heading}
            {banners}
          </View>
          <View style={styles.columns}>
            <ScrollView style={styles.column} contentContainerStyle={styles.columnContent} keyboardShouldPersistTaps="handled">
              {verdict}
              {serials}
              {photos}
              {history}
            </ScrollView>
            <ScrollView style={styles.column} contentContainerStyle={styles.columnContent} keyboardShouldPersistTaps="handled">
              {readings}
              {checklist}
              {report}
              {safety}
            </ScrollView>
          </View>
        </View>
        {conflict}
      </View>
    );
  }
  return (
    <View style={[styles.fill, { backgroundColor: theme.colors.background }]}>
      <ScrollView style={styles.fill} contentContainerStyle={styles.columnContent} keyboardShouldPersistTaps="handled" testID="record-scroll">
        {heading}
        {banners}
        {verdict}
        {safety}
        {serials}
        {readings}
        {checklist}
        {photos}
        {report}
        {history}
      </ScrollView>
      {conflict}
    </View>
  );
}

const styles = StyleSheet.create({
  loading: { marginTop: spacing.xxl },
  fill: { flex: 1, minHeight: 0 },
  inner: { flex: 1, minHeight: 0, width: '100%', maxWidth: CONTENT_MAX_WIDTH, alignSelf: 'center' },
  pad: { paddingHorizontal: spacing.lg, paddingTop: spacing.lg, gap: spacing.md },
  header: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.md },
  titles: { flex: 1, minWidth: 200, gap: 2 },
  viewing: { gap: spacing.sm },
  button: { minHeight: TOUCH_TARGET },
  columns: { flex: 1, minHeight: 0, flexDirection: 'row' },
  column: { flex: 1, minHeight: 0 },
  columnContent: { padding: spacing.lg, gap: spacing.lg, paddingBottom: spacing.xxl },
});
