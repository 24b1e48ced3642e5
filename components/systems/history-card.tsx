import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import type { SystemRecord } from '@/hooks/use-systems';
import { SectionCard } from '@/components/ui/section-card';
import { whenText } from '@/components/jobs/job-words';
import { RECORD_STATUS_WORDS, verdictCodeText } from './record-words';

/** Every revision of the record, newest first; each can be opened as it was saved. */
export function HistoryCard({ record, viewing, onView }: { record: SystemRecord; viewing: number | null; onView(n: number | null): void }) {
  const shown = viewing ?? record.latestRevision;
  return (
    <SectionCard title="History" testID="history-card">
      {[...record.revisions].reverse().map((r) => (
        <View key={r.revision} style={styles.row} testID={`revision-${r.revision}`}>
          <View style={styles.text}>
            <Text variant="titleSmall">{`Revision ${r.revision} · ${RECORD_STATUS_WORDS[r.status]}`}</Text>
            <Text variant="bodySmall">{`${verdictCodeText(r.verdict)} · saved ${whenText(r.savedAt)}${r.savedBy ? ` by ${r.savedBy.name}` : ''}`}</Text>
          </View>
          {r.revision === shown ? (
            <Text variant="labelLarge">Shown</Text>
          ) : (
            <Button
              mode="outlined"
              onPress={() => onView(r.revision === record.latestRevision ? null : r.revision)}
              contentStyle={styles.button}
              accessibilityLabel={`View revision ${r.revision}`}
              testID={`revision-view-${r.revision}`}
            >
              View
            </Button>
          )}
        </View>
      ))}
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, minHeight: TOUCH_TARGET },
  text: { flex: 1, gap: 2 },
  button: { minHeight: TOUCH_TARGET },
});
