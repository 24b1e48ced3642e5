import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ActivityIndicator, List, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { ApiError } from '@/hooks/api-client';
import { errorText } from '@/hooks/error-text';
import type { CatalogEntry } from '@/hooks/use-catalog';
import { useHeldCatalogSearch } from '@/hooks/use-catalog-held';
import { useCatalogLookup } from '@/hooks/use-catalog-lookup';
import { useIsOnline } from '@/hooks/use-connection';
import { useDebouncedValue } from '@/components/catalog/use-debounced-value';
import { FormField } from '@/components/ui/form-field';
import type { PickedPart } from './check-store';
import { describePart } from './part-description';
import { PART_INFO, type PartSlot } from './part-slots';

/** Searching as you type takes a breath between keys, not a request per key. */
const SEARCH_DEBOUNCE_MS = 250;
/** Rows shown from the phone's own parts (a phone screen's worth). */
const HELD_ROWS = 8;

const partsWord = (n: number) => (n === 1 ? 'part' : 'parts');

/**
 * Catalog search for one part; picking keeps the item's whole spec (for an offline check later).
 * With no signal it searches the parts saved on this phone instead, and says so.
 */
export function CatalogSearch({ slot, onPick }: { slot: PartSlot; onPick(part: PickedPart): void }) {
  const [q, setQ] = useState('');
  const settled = useDebouncedValue(q, SEARCH_DEBOUNCE_MS);
  const kind = PART_INFO[slot].kind;
  const online = useIsOnline();
  const lookup = useCatalogLookup(kind, settled);
  const searching = settled.trim().length >= 2;
  const unreachable = lookup.error instanceof ApiError && lookup.error.kind === 'network';
  const fromPhone = !online || unreachable;
  const held = useHeldCatalogSearch(kind, settled, {}, fromPhone && searching);
  const items: CatalogEntry[] = fromPhone ? held.items.slice(0, HELD_ROWS) : (lookup.data?.items ?? []);

  return (
    <View style={styles.box}>
      <FormField label="Search the catalog (model, brand)" value={q} onChangeText={setQ} autoCapitalize="none" autoCorrect={false} testID={`${slot}-search`} />
      {!fromPhone && lookup.isFetching ? <ActivityIndicator accessibilityLabel="Searching" /> : null}
      {!fromPhone && lookup.isError ? <Text variant="bodySmall">{errorText(lookup.error)} Type it from the nameplate instead.</Text> : null}
      {fromPhone && searching ? (
        <Text variant="bodySmall" testID={`${slot}-search-offline`}>
          {held.heldCount
            ? `No connection: searching the ${held.heldCount} ${partsWord(held.heldCount)} saved on this phone.`
            : 'No connection, and no parts of this kind are saved on this phone yet. Type it from the nameplate instead.'}
        </Text>
      ) : null}
      {searching && items.length === 0 && (fromPhone ? held.heldCount > 0 : !!lookup.data && !lookup.isFetching) ? (
        <Text variant="bodySmall">{fromPhone ? 'None of them match.' : 'Nothing in the catalog matches.'} Type it from the nameplate instead.</Text>
      ) : null}
      {searching
        ? items.map((item) => {
            const { id, ...spec } = item as Record<string, unknown> & { id: number };
            const model = String(spec.model ?? `#${id}`);
            return (
              <List.Item
                key={id}
                title={model}
                description={describePart(kind, spec)}
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
