import type { ReactNode } from 'react';
import { StyleSheet } from 'react-native';
import { Card, Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';

/** An outlined card with a level-2 heading: the screen's title stays its one h1. */
export function CoilsSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Card mode="outlined">
      <Card.Content style={styles.content}>
        <Text variant="titleLarge" role="heading" aria-level={2}>
          {title}
        </Text>
        {children}
      </Card.Content>
    </Card>
  );
}

const styles = StyleSheet.create({ content: { gap: spacing.md } });
