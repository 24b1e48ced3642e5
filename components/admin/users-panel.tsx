import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ActivityIndicator, Button, DataTable, Text } from 'react-native-paper';
import { TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useIsWide } from '@/hooks/use-layout';
import { useCurrentUser } from '@/hooks/use-session';
import { useUpdateUser, useUsers } from '@/hooks/use-users';
import type { PublicUser } from '@/shared/schemas/auth';
import { MessageBanner } from '@/components/ui/message-banner';
import { Screen } from '@/components/ui/screen';
import { AddUserDialog } from './add-user-dialog';
import { ResetPasswordDialog } from './reset-password-dialog';
import { UserRow } from './user-row';

/** Admin → Users: everyone who can sign in, their role and whether they are active. */
export function UsersPanel() {
  const users = useUsers();
  const update = useUpdateUser();
  const me = useCurrentUser();
  const wide = useIsWide();
  const [adding, setAdding] = useState(false);
  const [resetting, setResetting] = useState<PublicUser | null>(null);
  const [done, setDone] = useState<string | null>(null);

  return (
    <Screen
      title="Users"
      subtitle="Who can sign in to Tandem, and what each role may do."
      actions={
        <Button mode="contained" icon="account-plus-outline" onPress={() => setAdding(true)} contentStyle={styles.button} testID="add-user">
          Add user
        </Button>
      }
    >
      {update.isError ? <MessageBanner tone="error">{errorText(update.error)}</MessageBanner> : null}
      {done && !update.isError ? <MessageBanner tone="success">{done}</MessageBanner> : null}
      {users.isPending ? <ActivityIndicator /> : null}
      {users.isError ? <MessageBanner tone="error">{errorText(users.error)}</MessageBanner> : null}
      {users.data && wide ? (
        <DataTable testID="users-table">
          <DataTable.Header>
            <DataTable.Title style={styles.nameCol}>Name</DataTable.Title>
            <DataTable.Title>Role</DataTable.Title>
            <DataTable.Title>Status</DataTable.Title>
            <DataTable.Title style={styles.actionCol}> </DataTable.Title>
          </DataTable.Header>
          {users.data.map((u) => (
            <UserRow key={u.id} user={u} isMe={u.id === me.id} wide onChange={(patch) => update.mutate({ id: u.id, patch })} onResetPassword={() => setResetting(u)} />
          ))}
        </DataTable>
      ) : null}
      {users.data && !wide ? (
        <View testID="users-table">
          {users.data.map((u) => (
            <UserRow key={u.id} user={u} isMe={u.id === me.id} wide={false} onChange={(patch) => update.mutate({ id: u.id, patch })} onResetPassword={() => setResetting(u)} />
          ))}
        </View>
      ) : null}
      <View>
        <Text variant="bodySmall">
          Technicians check systems, take start-up readings and keep job records; estimators also search and price
          replacement coils; admins also import catalogs and prices, set the shop&apos;s rule settings and manage users.
        </Text>
      </View>
      <AddUserDialog visible={adding} onDismiss={() => setAdding(false)} />
      <ResetPasswordDialog
        user={resetting}
        onDismiss={() => setResetting(null)}
        onReset={(password) => resetting && update.mutate({ id: resetting.id, patch: { password } }, { onSuccess: () => setDone(`New password set for ${resetting.name}.`) })}
      />
    </Screen>
  );
}

const styles = StyleSheet.create({
  button: { minHeight: TOUCH_TARGET },
  nameCol: { flex: 2 },
  actionCol: { flex: 1.6, justifyContent: 'flex-end' },
});
