import { StyleSheet, View } from 'react-native';
import { Card, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { DecorativeIcon } from '@/components/ui/decorative-icon';
import type { ItemSummary } from './item-summary';

/** One result on a phone: model first, then brand, refrigerant, size and key facts on their own lines. */
export function CatalogResultCard({ summary, onPress, testID }: { summary: ItemSummary; onPress(): void; testID?: string }) {
  const theme = useTandemTheme();
  const muted = { color: theme.colors.onSurfaceVariant };
  return (
    <Card mode="outlined" onPress={onPress} style={styles.card} testID={testID} accessibilityRole="button">
      <Card.Content style={styles.content}>
        <View style={styles.head}>
          <Text variant="titleMedium" style={styles.title} numberOfLines={2}>
            {summary.title}
          </Text>
          <DecorativeIcon source="chevron-right" size={24} color={theme.colors.onSurfaceVariant} />
        </View>
        {summary.brand ? (
          <Text variant="bodyMedium" style={muted}>
            {summary.brand}
          </Text>
        ) : null}
        <View style={styles.facts}>
          {summary.refrigerants ? <Text variant="labelLarge">{summary.refrigerants}</Text> : null}
          {summary.size ? <Text variant="labelLarge">{summary.size}</Text> : null}
        </View>
        {summary.keyFacts ? <Text variant="bodyMedium">{summary.keyFacts}</Text> : null}
      </Card.Content>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { minHeight: TOUCH_TARGET },
  content: { gap: 2 },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  title: { flex: 1 },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
