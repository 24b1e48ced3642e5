import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, DataTable, Menu, Text } from 'react-native-paper';
import { ROLES, type PublicUser, type UserPatch } from '@/shared/schemas/auth';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { ROLE_LABELS } from '@/components/account/role-labels';

interface Props {
  user: PublicUser;
  isMe: boolean;
  wide: boolean;
  onChange(patch: UserPatch): void;
  onResetPassword(): void;
}

/** Why an admin's own role and active switch are locked (the server refuses these changes too). */
export const OWN_ROW_REASON = 'You can not change your own role or deactivate yourself. Another admin can.';

function RoleMenu({ user, isMe, onChange }: Pick<Props, 'user' | 'isMe' | 'onChange'>) {
  const [open, setOpen] = useState(false);
  // Paper's Menu focuses its anchor when its hide animation ends, and it runs that on mount too: mounted
  // on first use only, so a page of rows does not pull focus (out of an open dialog, say).
  const [used, setUsed] = useState(false);
  const anchor = (
    <Button
      mode="outlined"
      compact
      icon="menu-down"
      contentStyle={styles.touch}
      disabled={isMe}
      accessibilityHint={isMe ? OWN_ROW_REASON : undefined}
      onPress={() => {
        setUsed(true);
        setOpen(true);
      }}
      testID={`role-${user.email}`}
    >
      {ROLE_LABELS[user.role]}
    </Button>
  );
  if (!used) return anchor;
  return (
    <Menu visible={open} onDismiss={() => setOpen(false)} anchor={anchor}>
      {ROLES.map((role) => (
        <Menu.Item
          key={role}
          title={ROLE_LABELS[role]}
          leadingIcon={role === user.role ? 'check' : undefined}
          onPress={() => {
            setOpen(false);
            if (role !== user.role) onChange({ role });
          }}
        />
      ))}
    </Menu>
  );
}

function ActiveToggle({ user, isMe, onChange }: Pick<Props, 'user' | 'isMe' | 'onChange'>) {
  return (
    <Button
      compact
      mode="text"
      contentStyle={styles.touch}
      disabled={isMe}
      accessibilityHint={isMe ? OWN_ROW_REASON : undefined}
      onPress={() => onChange({ active: !user.active })}
      testID={`toggle-active-${user.email}`}
    >
      {user.active ? 'Deactivate' : 'Reactivate'}
    </Button>
  );
}

/** One user: a table row on a wide screen, a stacked entry on a phone. */
function ResetButton({ user, onResetPassword }: Pick<Props, 'user' | 'onResetPassword'>) {
  return (
    <Button compact mode="text" contentStyle={styles.touch} onPress={onResetPassword} testID={`reset-password-${user.email}`}>
      Reset password
    </Button>
  );
}

export function UserRow({ user, isMe, wide, onChange, onResetPassword }: Props) {
  const theme = useTandemTheme();
  const status = user.active ? 'Active' : 'Deactivated';
  const identity = (
    <View style={styles.identity}>
      <Text variant="bodyLarge">
        {user.name}
        {isMe ? ' (you)' : ''}
      </Text>
      <Text variant="bodySmall" style={{ color: theme.colors.onSurfaceVariant }}>
        {user.email}
      </Text>
      {isMe ? (
        <Text variant="bodySmall" style={{ color: theme.colors.onSurfaceVariant }} testID="own-row-reason">
          {OWN_ROW_REASON}
        </Text>
      ) : null}
    </View>
  );
  if (!wide) {
    return (
      <View testID={`user-row-${user.email}`} style={[styles.stacked, { borderBottomColor: theme.colors.outlineVariant }, !user.active && styles.inactive]}>
        {identity}
        <View style={styles.controls}>
          <RoleMenu user={user} isMe={isMe} onChange={onChange} />
          <Text variant="labelMedium" style={styles.status}>
            {status}
          </Text>
          <ActiveToggle user={user} isMe={isMe} onChange={onChange} />
          <ResetButton user={user} onResetPassword={onResetPassword} />
        </View>
      </View>
    );
  }
  return (
    // A plain row, not DataTable.Row: that one is a ripple marked aria-disabled without onPress, which
    // makes the buttons inside read as disabled to assistive tech.
    <View testID={`user-row-${user.email}`} style={[styles.tableRow, { borderBottomColor: theme.colors.outlineVariant }, !user.active && styles.inactive]}>
      <View style={[styles.cell, styles.nameCol]}>{identity}</View>
      {/* Plain cells: DataTable.Cell is a ripple marked aria-disabled (the menu button inside read as
          disabled) and clips its content to one line (the own-row reason ran over the next cell). */}
      <View style={styles.cell}>
        <RoleMenu user={user} isMe={isMe} onChange={onChange} />
      </View>
      <DataTable.Cell>{status}</DataTable.Cell>
      <View style={[styles.actionCol, styles.actions]}>
        <ActiveToggle user={user} isMe={isMe} onChange={onChange} />
        <ResetButton user={user} onResetPassword={onResetPassword} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  identity: { paddingVertical: spacing.xs, flexShrink: 1 },
  nameCol: { flex: 2 },
  cell: { flex: 1, flexDirection: 'row', alignItems: 'center' },
  actionCol: { flex: 1.6, justifyContent: 'flex-end' },
  actions: { flexDirection: 'row', alignItems: 'center' },
  tableRow: { flexDirection: 'row', alignItems: 'center', minHeight: TOUCH_TARGET, paddingHorizontal: spacing.lg, borderBottomWidth: StyleSheet.hairlineWidth },
  touch: { minHeight: TOUCH_TARGET },
  stacked: { paddingVertical: spacing.sm, borderBottomWidth: StyleSheet.hairlineWidth, gap: spacing.xs },
  controls: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
  status: { flex: 1 },
  inactive: { opacity: 0.65 },
});
