import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { CONTENT_MAX_WIDTH, spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';

/**
 * The check screen's own frame: like ui/Screen, but bounded (minHeight 0) so the scroll views inside
 * scroll themselves instead of the whole page, which lets the phone layout scroll to the result.
 */
export function CheckFrame({ children }: { children: ReactNode }) {
  const theme = useTandemTheme();
  return (
    <View style={[styles.fill, { backgroundColor: theme.colors.background }]}>
      <View style={styles.inner}>{children}</View>
    </View>
  );
}

export function CheckHeading({ actions }: { actions: ReactNode }) {
  const theme = useTandemTheme();
  return (
    <View style={styles.header}>
      <View style={styles.titles}>
        <Text variant="headlineMedium" role="heading" aria-level={1}>
          Check
        </Text>
        <Text variant="bodyMedium" style={{ color: theme.colors.onSurfaceVariant }}>
          Will these parts work together, and why not?
        </Text>
      </View>
      <View>{actions}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1, minHeight: 0 },
  inner: { flex: 1, minHeight: 0, width: '100%', maxWidth: CONTENT_MAX_WIDTH, alignSelf: 'center' },
  header: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.md },
  titles: { flex: 1, minWidth: 200, gap: 2 },
});
