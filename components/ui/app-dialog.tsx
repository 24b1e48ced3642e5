import type { ReactNode } from 'react';
import { StyleSheet } from 'react-native';
import { Dialog, Portal } from 'react-native-paper';
import { spacing } from '@/constants/theme';

interface Props {
  visible: boolean;
  onDismiss(): void;
  title: string;
  /** The buttons, Cancel first. */
  actions: ReactNode;
  children: ReactNode;
  testID?: string;
}

/** A modal dialog sized for a phone and capped on a wide screen. */
export function AppDialog({ visible, onDismiss, title, actions, children, testID }: Props) {
  return (
    <Portal>
      <Dialog visible={visible} onDismiss={onDismiss} style={styles.dialog} testID={testID}>
        <Dialog.Title>{title}</Dialog.Title>
        <Dialog.Content style={styles.content}>{children}</Dialog.Content>
        <Dialog.Actions>{actions}</Dialog.Actions>
      </Dialog>
    </Portal>
  );
}

const styles = StyleSheet.create({
  dialog: { maxWidth: 520, width: '92%', alignSelf: 'center' },
  content: { gap: spacing.sm },
});
