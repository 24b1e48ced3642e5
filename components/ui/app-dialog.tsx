import { useId, useRef, type ReactNode } from 'react';
import { Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { Portal, Surface, Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { useFocusTrap } from './use-focus-trap';

interface Props {
  visible: boolean;
  onDismiss(): void;
  title: string;
  /** The buttons, Cancel first. */
  actions: ReactNode;
  children: ReactNode;
  testID?: string;
}

/**
 * A modal dialog sized for a phone and capped on a wide screen: a real dialog for assistive tech
 * (role dialog, aria-modal, named by its title) that holds focus while open and returns it on close.
 */
export function AppDialog({ visible, onDismiss, title, actions, children, testID }: Props) {
  const theme = useTandemTheme();
  const box = useRef<View>(null);
  const titleId = `dialog-title-${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  useFocusTrap(box, visible, onDismiss);
  if (!visible) return null;
  return (
    <Portal>
      <View style={styles.overlay}>
        {/* The scrim closes the dialog on a tap; it is no control of its own for keyboards or readers. */}
        <Pressable style={[StyleSheet.absoluteFill, { backgroundColor: theme.colors.backdrop }]} onPress={onDismiss} focusable={false} aria-hidden />
        <Surface elevation={3} style={[styles.dialog, { backgroundColor: theme.colors.elevation.level3 }]}>
          <View ref={box} role="dialog" aria-modal aria-labelledby={titleId} tabIndex={-1} testID={testID} style={styles.inner}>
            <Text variant="headlineSmall" role="heading" aria-level={2} nativeID={titleId} style={styles.title}>
              {title}
            </Text>
            <ScrollView style={styles.scroll} contentContainerStyle={styles.content} keyboardShouldPersistTaps="handled">
              {children}
            </ScrollView>
            <View style={styles.actions}>{actions}</View>
          </View>
        </Surface>
      </View>
    </Portal>
  );
}

const styles = StyleSheet.create({
  overlay: { position: 'absolute', top: 0, right: 0, bottom: 0, left: 0, alignItems: 'center', justifyContent: 'center', padding: spacing.md },
  dialog: { maxWidth: 520, width: '92%', borderRadius: 24, maxHeight: '90%' },
  inner: { padding: spacing.xl, gap: spacing.md, maxHeight: '100%' },
  title: { marginBottom: spacing.xs },
  scroll: { flexGrow: 0 },
  content: { gap: spacing.sm },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', flexWrap: 'wrap', gap: spacing.sm },
});
