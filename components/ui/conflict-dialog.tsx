import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { AppDialog } from './app-dialog';
import type { ConflictRow } from './conflict-row';

interface Props {
  visible: boolean;
  /** Who saved what and when, in words; null while nothing is known about their version. */
  intro: string | null;
  /** Each field where the two versions differ: yours beside theirs. */
  rows: ConflictRow[];
  /** Said instead of the rows when the two versions do not clash. */
  noClashText: string;
  /** Prefix of the test ids: `${testID}-dialog`, `-mine`, `-theirs` and `-${row.key}`. */
  testID: string;
  onKeepMine(): void;
  onTakeTheirs(): void;
}

/** Someone saved the same thing while it was being edited: both versions side by side, the user chooses. */
export function ConflictDialog({ visible, intro, rows, noClashText, testID, onKeepMine, onTakeTheirs }: Props) {
  return (
    <AppDialog
      visible={visible}
      onDismiss={onTakeTheirs}
      title="Saved by someone else"
      testID={`${testID}-dialog`}
      actions={
        <>
          <Button onPress={onTakeTheirs} contentStyle={styles.button} testID={`${testID}-theirs`}>
            Take theirs
          </Button>
          <Button mode="contained" onPress={onKeepMine} contentStyle={styles.button} testID={`${testID}-mine`}>
            Keep mine
          </Button>
        </>
      }
    >
      {intro ? <Text variant="bodyMedium">{intro}</Text> : null}
      {visible && rows.length === 0 ? <Text variant="bodyMedium">{noClashText}</Text> : null}
      {rows.map((row) => (
        <View key={row.key} style={styles.row} testID={`${testID}-${row.key}`}>
          <Text variant="titleSmall">{row.label}</Text>
          <Text variant="bodyMedium">{`Yours: ${row.mine}`}</Text>
          <Text variant="bodyMedium">{`Theirs: ${row.theirs}`}</Text>
        </View>
      ))}
    </AppDialog>
  );
}

const styles = StyleSheet.create({ row: { gap: 2, paddingVertical: spacing.xs }, button: { minHeight: TOUCH_TARGET } });
