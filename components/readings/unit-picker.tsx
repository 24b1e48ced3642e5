import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { CatalogSearch } from '@/components/check/catalog-search';
import { applyUnit } from './apply-unit';
import type { ReadingsDraft } from './readings-draft';

/** Optional: take the refrigerant and target subcooling from an outdoor unit in the catalog. */
export function UnitPicker({ draft, onChange }: { draft: ReadingsDraft; onChange(next: ReadingsDraft): void }) {
  const [open, setOpen] = useState(false);
  if (!open) {
    return (
      <View style={styles.row}>
        {draft.unitLabel ? (
          <Text variant="bodyMedium" style={styles.grow} testID="readings-unit">
            From the catalog: {draft.unitLabel}
          </Text>
        ) : null}
        <Button mode="text" icon="magnify" onPress={() => setOpen(true)} contentStyle={styles.button} testID="readings-pick-unit">
          {draft.unitLabel ? 'Another unit' : 'Take it from a catalog outdoor unit'}
        </Button>
      </View>
    );
  }
  return (
    <View style={styles.box}>
      <CatalogSearch
        slot="outdoor"
        onPick={(unit) => {
          onChange(applyUnit(draft, unit));
          setOpen(false);
        }}
      />
      <Button mode="text" onPress={() => setOpen(false)} contentStyle={styles.button}>
        Close the search
      </Button>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.sm },
  grow: { flexGrow: 1 },
  box: { gap: spacing.xs },
  button: { minHeight: TOUCH_TARGET },
});
