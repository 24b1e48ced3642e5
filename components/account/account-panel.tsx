import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Card, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { PasswordChangeSchema } from '@/shared/schemas/auth';
import { errorText } from '@/hooks/error-text';
import { useCurrentUser, useSession } from '@/hooks/use-session';
import { useChangeOwnPassword } from '@/hooks/use-users';
import { useZodForm } from '@/hooks/use-zod-form';
import { FormField } from '@/components/ui/form-field';
import { MessageBanner } from '@/components/ui/message-banner';
import { Screen } from '@/components/ui/screen';
import { ROLE_LABELS } from './role-labels';

export function AccountPanel() {
  const user = useCurrentUser();
  const { signOut } = useSession();
  const change = useChangeOwnPassword();
  const form = useZodForm(PasswordChangeSchema, { currentPassword: '', newPassword: '' });
  const [done, setDone] = useState(false);

  const submit = () => {
    setDone(false);
    const input = form.validate();
    if (!input) return;
    change.mutate(input, {
      onSuccess: () => {
        form.reset();
        setDone(true);
      },
    });
  };

  return (
    <Screen title="Account">
      <Card mode="outlined" style={styles.card}>
        <Card.Content style={styles.gap}>
          <Text variant="titleLarge" testID="account-name">
            {user.name}
          </Text>
          <Text variant="bodyLarge">{user.email}</Text>
          <Text variant="bodyMedium" testID="account-role">
            Role: {ROLE_LABELS[user.role]}
          </Text>
        </Card.Content>
      </Card>

      <Card mode="outlined" style={styles.card}>
        <Card.Title title="Change password" titleVariant="titleMedium" />
        <Card.Content style={styles.gap}>
          {change.isError ? <MessageBanner tone="error">{errorText(change.error)}</MessageBanner> : null}
          {done ? <MessageBanner tone="success">Password changed.</MessageBanner> : null}
          <FormField label="Current password" secureTextEntry {...form.bind('currentPassword')} autoComplete="current-password" />
          <FormField
            label="New password"
            secureTextEntry
            {...form.bind('newPassword')}
            hint="At least 10 characters."
            autoComplete="new-password"
          />
          <View style={styles.row}>
            <Button mode="contained-tonal" onPress={submit} loading={change.isPending} contentStyle={styles.button}>
              Change password
            </Button>
          </View>
        </Card.Content>
      </Card>

      <Button mode="outlined" icon="logout" onPress={signOut} testID="sign-out" contentStyle={styles.button} style={styles.signOut}>
        Sign out
      </Button>
    </Screen>
  );
}

const styles = StyleSheet.create({
  card: { maxWidth: 640, width: '100%' },
  gap: { gap: spacing.sm },
  row: { flexDirection: 'row' },
  button: { minHeight: TOUCH_TARGET },
  signOut: { alignSelf: 'flex-start' },
});
