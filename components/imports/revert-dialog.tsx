import { MIN_TARGET_PX } from '@/constants/theme';
import { Button, Text } from 'react-native-paper';
import { errorText } from '@/hooks/error-text';
import { useRevertImport, type ImportView } from '@/hooks/use-imports';
import { AppDialog } from '@/components/ui/app-dialog';
import { MessageBanner } from '@/components/ui/message-banner';
import { IMPORT_KIND_LABELS } from './import-labels';

/** Dialog buttons reach the shared 48 px minimum. */
const TARGET = { minHeight: MIN_TARGET_PX };

/** Asks before undoing an import: what it inserted goes, what it updated comes back as it was. */
export function RevertDialog({ target, onDismiss }: { target: ImportView | null; onDismiss(): void }) {
  const revert = useRevertImport();
  const close = () => {
    revert.reset();
    onDismiss();
  };
  return (
    <AppDialog
      visible={target !== null}
      onDismiss={close}
      title="Revert this import?"
      testID="revert-dialog"
      actions={
        <>
          <Button contentStyle={TARGET} onPress={close} testID="revert-cancel">
            Keep it
          </Button>
          <Button
            mode="contained"
            loading={revert.isPending}
            onPress={() => target && revert.mutate(target.id, { onSuccess: close })}
            testID="revert-confirm"
          >
            Revert
          </Button>
        </>
      }
    >
      {target ? (
        <Text variant="bodyMedium">
          {IMPORT_KIND_LABELS[target.kind]} from “{target.fileName}”: the {target.counts.inserted} rows it added are removed and the{' '}
          {target.counts.updated} rows it changed go back to what they were, all in one step.
        </Text>
      ) : null}
      {revert.isError ? <MessageBanner tone="error">{errorText(revert.error)}</MessageBanner> : null}
    </AppDialog>
  );
}
