import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { AppDialog } from '@/components/ui/app-dialog';
import { whenText } from '@/components/jobs/job-words';
import type { Conflict } from './use-record-save';

/** Someone saved the record since this screen loaded: both versions side by side, the tech chooses. */
export function ConflictDialog({ conflict, onKeepMine, onTakeTheirs }: { conflict: Conflict | null; onKeepMine(): void; onTakeTheirs(): void }) {
  const theirs = conflict?.theirs;
  return (
    <AppDialog
      visible={conflict !== null}
      onDismiss={onTakeTheirs}
      title="Saved by someone else"
      testID="conflict-dialog"
      actions={
        <>
          <Button onPress={onTakeTheirs} contentStyle={styles.button} testID="conflict-theirs">
            Take theirs
          </Button>
          <Button mode="contained" onPress={onKeepMine} contentStyle={styles.button} testID="conflict-mine">
            Keep mine
          </Button>
        </>
      }
    >
      {theirs ? (
        <Text variant="bodyMedium">
          {`Revision ${theirs.latestRevision} was saved ${whenText(theirs.savedAt)}${theirs.savedBy ? ` by ${theirs.savedBy.name}` : ''} while you edited. Nothing is lost: choose which to keep.`}
        </Text>
      ) : null}
      {conflict?.rows.length === 0 ? <Text variant="bodyMedium">Your change does not clash with theirs; keeping yours adds it on top.</Text> : null}
      {conflict?.rows.map((row) => (
        <View key={row.key} style={styles.row} testID={`conflict-${row.key}`}>
          <Text variant="titleSmall">{row.label}</Text>
          <Text variant="bodyMedium">{`Yours: ${row.mine}`}</Text>
          <Text variant="bodyMedium">{`Theirs: ${row.theirs}`}</Text>
        </View>
      ))}
    </AppDialog>
  );
}

const styles = StyleSheet.create({ row: { gap: 2, paddingVertical: spacing.xs }, button: { minHeight: TOUCH_TARGET } });
