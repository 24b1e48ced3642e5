import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ActivityIndicator, Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useCompatibleCoils } from '@/hooks/use-coils';
import { useIsWide } from '@/hooks/use-layout';
import { CatalogSearch } from '@/components/check/catalog-search';
import type { PickedPart } from '@/components/check/check-store';
import { ChoiceChips } from '@/components/check/choice-chips';
import { useDebouncedValue } from '@/components/catalog/use-debounced-value';
import { FormField } from '@/components/ui/form-field';
import { MessageBanner } from '@/components/ui/message-banner';
import { SafetyNote } from '@/components/ui/safety-note';
import { Screen } from '@/components/ui/screen';
import { SectionCard } from '@/components/ui/section-card';
import { CoilDetail } from './coil-detail';
import { CASED_OPTIONS, CONFIGURATION_OPTIONS, coilsSearchOf, EMPTY_FILTERS, MATERIAL_OPTIONS, TOGGLE_OPTIONS, type CoilFilterState } from './coil-filters';
import { CoilRow, CoilTableHeader } from './coil-row';

const SEARCH_DEBOUNCE_MS = 250;

/** A picked part with a button to choose again, or the catalog search to pick one. */
function PartChoice({ title, slot, picked, onPick }: { title: string; slot: 'outdoor' | 'airHandler'; picked?: PickedPart; onPick(part?: PickedPart): void }) {
  return (
    <View style={styles.part}>
      <Text variant="titleSmall">{title}</Text>
      {picked ? (
        <View style={styles.picked}>
          <Text variant="bodyLarge" testID={`${slot}-picked`}>
            {picked.label}
          </Text>
          <Button mode="outlined" onPress={() => onPick(undefined)} contentStyle={styles.touch} accessibilityLabel={`Change ${title.toLowerCase()}`}>
            Change
          </Button>
        </View>
      ) : (
        <CatalogSearch slot={slot} onPick={onPick} />
      )}
    </View>
  );
}

/** Replacement coils: every catalog coil that passes with the new outdoor unit and the kept air handler or furnace. */
export function CoilsScreen() {
  const wide = useIsWide();
  const [outdoor, setOutdoor] = useState<PickedPart>();
  const [airHandler, setAirHandler] = useState<PickedPart>();
  const [q, setQ] = useState('');
  const [state, setState] = useState('');
  const [filters, setFilters] = useState<CoilFilterState>(EMPTY_FILTERS);
  const [openId, setOpenId] = useState<number>();
  const settledQ = useDebouncedValue(q, SEARCH_DEBOUNCE_MS);
  const search = coilsSearchOf({ outdoorUnitId: outdoor?.id, airHandlerId: airHandler?.id, q: settledQ, state, filters });
  const coils = useCompatibleCoils(search);
  const setFilter = (key: keyof CoilFilterState) => (value: string) => setFilters((f) => ({ ...f, [key]: value }));
  const items = coils.data?.items ?? [];

  return (
    <Screen title="Replacement coils" subtitle="Every coil in the catalog that passes the same checks as the Check screen, with its best current price.">
      <SectionCard title="Parts that stay and the new outdoor unit">
        <PartChoice title="New outdoor unit" slot="outdoor" picked={outdoor} onPick={setOutdoor} />
        <PartChoice title="Air handler or furnace that stays (optional)" slot="airHandler" picked={airHandler} onPick={setAirHandler} />
        <FormField label="Site state (two letters, optional)" value={state} onChangeText={setState} autoCapitalize="characters" maxLength={2} testID="coils-state" hint="Used to check the regional efficiency minimum." />
      </SectionCard>

      {search ? (
        <SectionCard title="Coils">
          <FormField label="Search coils (model, brand, description)" value={q} onChangeText={setQ} autoCapitalize="none" autoCorrect={false} testID="coils-search" />
          <ChoiceChips label="Configuration" options={CONFIGURATION_OPTIONS} value={filters.configuration} onChange={setFilter('configuration')} testID="coils-configuration" />
          <ChoiceChips label="Material" options={MATERIAL_OPTIONS} value={filters.material} onChange={setFilter('material')} testID="coils-material" />
          <ChoiceChips label="Cabinet" options={CASED_OPTIONS} value={filters.cased} onChange={setFilter('cased')} testID="coils-cased" />
          <ChoiceChips label="Show" options={TOGGLE_OPTIONS} value={filters.toggles} onChange={setFilter('toggles')} multi testID="coils-toggles" />
          {coils.isFetching ? <ActivityIndicator accessibilityLabel="Loading coils" /> : null}
          {coils.isError ? <MessageBanner tone="error">{errorText(coils.error)}</MessageBanner> : null}
          {coils.data ? (
            <Text variant="bodyMedium" accessibilityLiveRegion="polite" testID="coils-count">
              {coils.data.total === 0 ? 'No coil in the catalog passes with these parts and filters.' : `${coils.data.total} ${coils.data.total === 1 ? 'coil' : 'coils'}${items.length < coils.data.total ? `, the first ${items.length} shown` : ''}.`}
            </Text>
          ) : null}
          <View style={styles.list}>
            {wide && items.length > 0 ? <CoilTableHeader /> : null}
            {items.map((item) => (
              <View key={item.coil.id}>
                <CoilRow item={item} wide={wide} open={openId === item.coil.id} onPress={() => setOpenId(openId === item.coil.id ? undefined : item.coil.id)} />
                {openId === item.coil.id ? <CoilDetail item={item} state={search.state} outdoor={outdoor} airHandler={airHandler} /> : null}
              </View>
            ))}
          </View>
        </SectionCard>
      ) : (
        <Text variant="bodyMedium">Pick the new outdoor unit to see the coils that work with it.</Text>
      )}
      <SafetyNote points={['Brazing, evacuation and charging a replacement coil are for certified people only; follow the coil’s and the outdoor unit’s installation instructions.']} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  part: { gap: spacing.xs },
  picked: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, flexWrap: 'wrap' },
  // Paper draws the pressable box from contentStyle: the minimum goes there, not on the outer style.
  touch: { minHeight: TOUCH_TARGET },
  list: { gap: spacing.sm },
});
