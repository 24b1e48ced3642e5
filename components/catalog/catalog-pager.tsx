import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';

/** "Previous / 21–40 of 95 / Next": big buttons instead of a tiny page widget. */
export function CatalogPager({ page, pageSize, total, onPage }: { page: number; pageSize: number; total: number; onPage(page: number): void }) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <View style={styles.row}>
      <Button icon="chevron-left" disabled={page <= 1} onPress={() => onPage(page - 1)} contentStyle={styles.touch} testID="catalog-prev">
        Previous
      </Button>
      <Text variant="labelLarge" testID="catalog-range" style={styles.range}>
        {total === 0 ? 'No items' : `${first}–${last} of ${total}`}
      </Text>
      <Button icon="chevron-right" disabled={page >= pages} onPress={() => onPage(page + 1)} contentStyle={[styles.touch, styles.reverse]} testID="catalog-next">
        Next
      </Button>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
  range: { textAlign: 'center', flex: 1 },
  touch: { minHeight: TOUCH_TARGET },
  reverse: { flexDirection: 'row-reverse' },
});
