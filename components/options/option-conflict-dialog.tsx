import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import type { OptionView } from '@/shared/schemas/options';
import { AppDialog } from '@/components/ui/app-dialog';
import { whenText } from '@/components/jobs/job-words';
import { moneyText } from './option-words';

/** Someone saved the option while it was being edited: say what they saved; the estimator keeps theirs or their own. */
export function OptionConflictDialog({ theirs, mineName, onKeepMine, onTakeTheirs }: { theirs: OptionView | null; mineName: string; onKeepMine(): void; onTakeTheirs(): void }) {
  return (
    <AppDialog
      visible={theirs !== null}
      onDismiss={onTakeTheirs}
      title="Saved by someone else"
      testID="option-conflict-dialog"
      actions={
        <>
          <Button onPress={onTakeTheirs} contentStyle={styles.button} testID="option-conflict-theirs">
            Take theirs
          </Button>
          <Button mode="contained" onPress={onKeepMine} contentStyle={styles.button} testID="option-conflict-mine">
            Keep mine
          </Button>
        </>
      }
    >
      {theirs ? (
        <View style={styles.body}>
          <Text variant="bodyMedium">{`“${theirs.name}” was saved again ${whenText(theirs.updatedAt)} (revision ${theirs.revision}) while you edited. Nothing is lost yet: choose which to keep.`}</Text>
          <Text variant="bodyMedium">{`Theirs: ${theirs.name}, ${theirs.parts.outdoor.model}${theirs.parts.indoorCoil ? ` with ${theirs.parts.indoorCoil.model}` : ''}, ${moneyText(theirs.price.totalCents)}.`}</Text>
          <Text variant="bodyMedium">{`Yours: ${mineName}, as on the form. Keeping yours saves it over theirs.`}</Text>
        </View>
      ) : null}
    </AppDialog>
  );
}

const styles = StyleSheet.create({ body: { gap: spacing.sm }, button: { minHeight: TOUCH_TARGET } });
