import type { ReactNode } from 'react';
import { StyleSheet } from 'react-native';
import { Card, Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';

/** An outlined card headed by a title (a heading for screen readers). */
export function SectionCard({ title, children, testID }: { title: string; children: ReactNode; testID?: string }) {
  return (
    <Card mode="outlined" testID={testID}>
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
