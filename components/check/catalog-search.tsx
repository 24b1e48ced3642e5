import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ActivityIndicator, List, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useCatalogLookup } from '@/hooks/use-catalog-lookup';
import { useDebouncedValue } from '@/components/catalog/use-debounced-value';
import { FormField } from '@/components/ui/form-field';
import type { PickedPart } from './check-store';
import { PART_INFO, type PartSlot } from './part-slots';

/** Searching as you type takes a breath between keys, not a request per key. */
const SEARCH_DEBOUNCE_MS = 250;

function describe(item: Record<string, unknown>): string {
  const bits = [item.brand, item.refrigerant ?? (Array.isArray(item.refrigerants) ? item.refrigerants.join('/') : undefined)];
  if (item.nominalTons) bits.push(`${item.nominalTons} tons`);
  else if (item.minTons && item.maxTons) bits.push(`${item.minTons}–${item.maxTons} tons`);
  if (item.airflowCfm) bits.push(`${item.airflowCfm} CFM`);
  return bits.filter(Boolean).join(' · ');
}

/** Catalog search for one part; picking keeps the item's whole spec (for an offline check later). */
export function CatalogSearch({ slot, onPick }: { slot: PartSlot; onPick(part: PickedPart): void }) {
  const [q, setQ] = useState('');
  const settled = useDebouncedValue(q, SEARCH_DEBOUNCE_MS);
  const lookup = useCatalogLookup(PART_INFO[slot].kind, settled);
  return (
    <View style={styles.box}>
      <FormField label="Search the catalog (model, brand)" value={q} onChangeText={setQ} autoCapitalize="none" autoCorrect={false} testID={`${slot}-search`} />
      {lookup.isFetching ? <ActivityIndicator /> : null}
      {lookup.isError ? <Text variant="bodySmall">{errorText(lookup.error)} Type it from the nameplate instead.</Text> : null}
      {lookup.data && settled.trim().length >= 2 && lookup.data.items.length === 0 ? (
        <Text variant="bodySmall">Nothing in the catalog matches. Type it from the nameplate instead.</Text>
      ) : null}
      {settled.trim().length >= 2
        ? lookup.data?.items.map((item) => {
            const { id, ...spec } = item as Record<string, unknown> & { id: number };
            const model = String(spec.model ?? `#${id}`);
            return (
              <List.Item
                key={id}
                title={model}
                description={describe(spec)}
                left={(p) => (
                  <View aria-hidden>
                    <List.Icon {...p} icon="plus-circle-outline" />
                  </View>
                )}
                onPress={() => {
                  setQ('');
                  onPick({ id, label: model, spec });
                }}
                style={styles.item}
                testID={`${slot}-result-${model}`}
              />
            );
          })
        : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.xs },
  item: { minHeight: TOUCH_TARGET },
});
