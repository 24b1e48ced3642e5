import { MIN_TARGET_PX } from '@/constants/theme';
import { Button, Text } from 'react-native-paper';
import { z } from 'zod';
import { PasswordSchema, type PublicUser } from '@/shared/schemas/auth';
import { useZodForm } from '@/hooks/use-zod-form';
import { AppDialog } from '@/components/ui/app-dialog';
import { FormField } from '@/components/ui/form-field';

/** Dialog buttons reach the shared 48 px minimum. */
const TARGET = { minHeight: MIN_TARGET_PX };

const ResetSchema = z.object({ password: PasswordSchema });
const EMPTY = { password: '' };

interface Props {
  user: PublicUser | null;
  onDismiss(): void;
  onReset(password: string): void;
}

/** Sets a new password for someone who lost theirs; they can change it under Account. */
export function ResetPasswordDialog({ user, onDismiss, onReset }: Props) {
  const form = useZodForm(ResetSchema, EMPTY);
  const close = () => {
    form.reset();
    onDismiss();
  };
  const submit = () => {
    const input = form.validate();
    if (!input) return;
    onReset(input.password);
    close();
  };
  return (
    <AppDialog
      visible={user !== null}
      onDismiss={close}
      title="Reset password"
      testID="reset-password-dialog"
      actions={
        <>
          <Button contentStyle={TARGET} onPress={close}>
            Cancel
          </Button>
          <Button contentStyle={TARGET} mode="contained" onPress={submit} testID="reset-password-save">
            Set password
          </Button>
        </>
      }
    >
      <Text variant="bodyMedium">A new password for {user?.name}. Tell them in person or by phone, not by e-mail.</Text>
      <FormField
        label="New password"
        secureTextEntry
        {...form.bind('password')}
        hint="At least 10 characters."
        testID="reset-password-input"
      />
    </AppDialog>
  );
}
