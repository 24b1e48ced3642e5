import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { CONTENT_MAX_WIDTH, spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';

interface Props {
  title: string;
  subtitle?: string;
  /** Buttons shown beside the title. */
  actions?: ReactNode;
  children: ReactNode;
  /** Screens that manage their own scrolling (long lists) pass false. */
  scroll?: boolean;
}

/** A screen's frame: heading, optional actions, content capped to a readable width. */
export function Screen({ title, subtitle, actions, children, scroll = true }: Props) {
  const theme = useTandemTheme();
  const body = (
    <View style={styles.inner}>
      <View style={styles.header}>
        <View style={styles.titles}>
          <Text variant="headlineMedium" role="heading" aria-level={1}>
            {title}
          </Text>
          {subtitle ? (
            <Text variant="bodyMedium" style={{ color: theme.colors.onSurfaceVariant }}>
              {subtitle}
            </Text>
          ) : null}
        </View>
        {actions ? <View style={styles.actions}>{actions}</View> : null}
      </View>
      {children}
    </View>
  );
  if (!scroll) return <View style={[styles.fill, { backgroundColor: theme.colors.background }]}>{body}</View>;
  return (
    <ScrollView style={[styles.fill, { backgroundColor: theme.colors.background }]} contentContainerStyle={styles.content} keyboardShouldPersistTaps="handled">
      {body}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  content: { flexGrow: 1 },
  inner: { width: '100%', maxWidth: CONTENT_MAX_WIDTH, alignSelf: 'center', padding: spacing.lg, gap: spacing.lg, flexGrow: 1 },
  header: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.md },
  titles: { flex: 1, minWidth: 200, gap: 2 },
  actions: { flexDirection: 'row', gap: spacing.sm, flexWrap: 'wrap', maxWidth: '100%' },
});
