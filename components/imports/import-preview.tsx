import { StyleSheet, View } from 'react-native';
import { Button, Card, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useCommitImport, type ImportDetail } from '@/hooks/use-imports';
import { MessageBanner } from '@/components/ui/message-banner';
import { ImportCounts } from './import-counts';
import { decimalNote, IMPORT_KIND_LABELS } from './import-labels';
import { RejectedRows } from './rejected-rows';

interface Props {
  preview: ImportDetail;
  onCommitted(view: ImportDetail): void;
  onDiscard(): void;
}

/** The dry run's result: counts, the rejected rows with reasons, and Commit for the valid rows. */
export function ImportPreview({ preview, onCommitted, onDiscard }: Props) {
  const commit = useCommitImport();
  const valid = preview.counts.rows - preview.counts.rejected;
  const committed = preview.status === 'committed';
  const what = [IMPORT_KIND_LABELS[preview.kind], preview.distributor].filter(Boolean).join(' from ');
  return (
    <Card mode="outlined" testID="import-preview">
      <Card.Content style={styles.gap}>
        <Text variant="titleLarge" accessibilityRole="header">
          {committed ? 'Committed' : 'Preview'}: {preview.fileName}
        </Text>
        <Text variant="bodyMedium">{what}</Text>
        <ImportCounts counts={preview.counts} />
        {preview.kind === 'prices' ? (
          <Text variant="bodyMedium" testID="import-decimal">
            {decimalNote(preview.decimalConvention, preview.decimalSource)}
          </Text>
        ) : null}
        {committed ? (
          <MessageBanner tone="success" testID="import-committed">
            {`Committed ${valid.toLocaleString('en-US')} valid ${valid === 1 ? 'row' : 'rows'} in one go. You can revert it from the history below.`}
          </MessageBanner>
        ) : (
          <Text variant="bodyMedium">
            Nothing is written yet. Commit adds the {valid.toLocaleString('en-US')} valid {valid === 1 ? 'row' : 'rows'} in one transaction
            {preview.counts.rejected > 0 ? '; the rejected rows stay listed on the import and are not written.' : '.'}
          </Text>
        )}
        {preview.kind === 'prices' && preview.counts.unmatched > 0 ? (
          <MessageBanner tone="info">
            {`${preview.counts.unmatched} price rows name models not in the catalog. They are kept and will show once those models are imported.`}
          </MessageBanner>
        ) : null}
        <RejectedRows importId={preview.id} rejected={preview.counts.rejected} errorsTotal={preview.errorsTotal} />
        {commit.isError ? <MessageBanner tone="error">{errorText(commit.error)}</MessageBanner> : null}
        {committed ? null : (
          <View style={styles.actions}>
            <Button
              mode="contained"
              icon="check-all"
              disabled={valid === 0 || commit.isPending}
              loading={commit.isPending}
              onPress={() => commit.mutate(preview.id, { onSuccess: onCommitted })}
              contentStyle={styles.touch}
              testID="import-commit"
            >
              {`Commit ${valid.toLocaleString('en-US')} ${valid === 1 ? 'row' : 'rows'}`}
            </Button>
            <Button mode="text" onPress={onDiscard} contentStyle={styles.touch} testID="import-discard">
              Start over
            </Button>
          </View>
        )}
      </Card.Content>
    </Card>
  );
}

const styles = StyleSheet.create({
  gap: { gap: spacing.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  touch: { minHeight: TOUCH_TARGET },
});
