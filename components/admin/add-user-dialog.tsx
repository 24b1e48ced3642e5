import { MIN_TARGET_PX } from '@/constants/theme';
import { Button } from 'react-native-paper';
import { ROLES, UserCreateSchema } from '@/shared/schemas/auth';
import { errorText } from '@/hooks/error-text';
import { useCreateUser } from '@/hooks/use-users';
import { useZodForm } from '@/hooks/use-zod-form';
import { ROLE_LABELS } from '@/components/account/role-labels';
import { FormField } from '@/components/ui/form-field';
import { AppDialog } from '@/components/ui/app-dialog';
import { MessageBanner } from '@/components/ui/message-banner';
import { ToggleGroup } from '@/components/ui/toggle-group';

/** Dialog buttons reach the shared 48 px minimum. */
const TARGET = { minHeight: MIN_TARGET_PX };

const EMPTY = { email: '', name: '', role: 'tech' as const, password: '' };

export function AddUserDialog({ visible, onDismiss }: { visible: boolean; onDismiss(): void }) {
  const create = useCreateUser();
  const form = useZodForm(UserCreateSchema, EMPTY);

  const close = () => {
    form.reset();
    create.reset();
    onDismiss();
  };
  const submit = () => {
    const input = form.validate();
    if (input) create.mutate(input, { onSuccess: close });
  };

  return (
    <AppDialog
      visible={visible}
      onDismiss={close}
      title="Add user"
      testID="add-user-dialog"
      actions={
        <>
          <Button contentStyle={TARGET} onPress={close}>
            Cancel
          </Button>
          <Button contentStyle={TARGET} mode="contained" onPress={submit} loading={create.isPending} testID="new-user-save">
            Add
          </Button>
        </>
      }
    >
      {create.isError ? <MessageBanner tone="error">{errorText(create.error)}</MessageBanner> : null}
      <FormField label="Name" {...form.bind('name')} testID="new-user-name" />
      <FormField label="E-mail" {...form.bind('email')} autoCapitalize="none" inputMode="email" testID="new-user-email" />
      <ToggleGroup
        label="Role"
        value={form.values.role}
        onChange={(v) => form.setField('role', v)}
        options={ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r], testID: `new-user-role-${r}` }))}
      />
      <FormField
        label="First password"
        secureTextEntry
        {...form.bind('password')}
        hint="At least 10 characters; they can change it under Account."
        testID="new-user-password"
      />
    </AppDialog>
  );
}
