import { useLocalSearchParams, useRouter } from 'expo-router';
import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ActivityIndicator, ProgressBar, Text } from 'react-native-paper';
import type { CatalogKind } from '@/shared/schemas/equipment';
import { spacing } from '@/constants/theme';
import { ApiError } from '@/hooks/api-client';
import { errorText } from '@/hooks/error-text';
import { useCatalogList } from '@/hooks/use-catalog';
import { useHeldCatalogSearch } from '@/hooks/use-catalog-held';
import { useIsOnline } from '@/hooks/use-connection';
import { useIsWide } from '@/hooks/use-layout';
import { FormField } from '@/components/ui/form-field';
import { MessageBanner } from '@/components/ui/message-banner';
import { Screen } from '@/components/ui/screen';
import { CatalogFilters } from './catalog-filters';
import { isCatalogKind, KIND_LABELS, KIND_SINGULAR } from './catalog-kind-labels';
import { CatalogPager } from './catalog-pager';
import { CatalogResultCard } from './catalog-result-card';
import { CatalogResultTable } from './catalog-result-table';
import { summarize } from './item-summary';
import { KindSwitcher } from './kind-switcher';
import { useDebouncedValue } from './use-debounced-value';

const PAGE_SIZE = 20;
/** With no signal, the held parts are shown on one page (a phone holds tens, not thousands). */
const HELD_MAX_ROWS = 50;
const SEARCH_DEBOUNCE_MS = 250;

type Params = { kind?: string; q?: string; refrigerant?: string; tons?: string; page?: string };

/** Catalog tab: pick a kind, search as you type, filter, page. The choices live in the URL (back and reload keep them). */
export function CatalogBrowser() {
  const params = useLocalSearchParams<Params>();
  const router = useRouter();
  const wide = useIsWide();
  const kind: CatalogKind = isCatalogKind(params.kind) ? params.kind : 'outdoor-units';
  const page = Math.max(1, Number(params.page) || 1);
  const tons = params.tons ? Number(params.tons) : undefined;
  const [text, setText] = useState(params.q ?? '');
  const q = useDebouncedValue(text.trim(), SEARCH_DEBOUNCE_MS);

  const setParams = (next: Partial<Params>) => router.setParams({ ...next } as never);
  useEffect(() => {
    if ((params.q ?? '') !== q) setParams({ q: q || undefined, page: undefined });
    // Only the debounced text drives this; params and setParams change on every render.
  }, [q]);

  const withFilters = kind !== 'rated-combinations';
  const list = useCatalogList(kind, {
    q: q || undefined,
    refrigerant: withFilters ? params.refrigerant : undefined,
    tons: withFilters ? tons : undefined,
    page,
    pageSize: PAGE_SIZE,
  });
  // No signal: the parts saved on this phone answer instead of a request that can not succeed.
  const online = useIsOnline();
  const fromPhone = !online || (list.error instanceof ApiError && list.error.kind === 'network');
  const held = useHeldCatalogSearch(kind, q, { refrigerant: withFilters ? params.refrigerant : undefined, tons: withFilters ? tons : undefined }, fromPhone);
  const items = fromPhone ? held.items.slice(0, HELD_MAX_ROWS) : (list.data?.items ?? []);
  const rows = items.map((item) => ({ id: item.id, summary: summarize(kind, item) }));
  const kindWords = KIND_LABELS[kind].toLowerCase();
  const open = (id: number) => router.push(`/catalog/${kind}/${id}` as never);

  return (
    <Screen title="Catalog" subtitle="Equipment, metering kits and rated combinations, with current distributor prices.">
      <KindSwitcher value={kind} onChange={(k) => setParams({ kind: k, page: undefined, refrigerant: undefined, tons: undefined })} />
      {/* A labelled field, not a search bar: its icon buttons were 40 px targets with names unlike their looks. */}
      <FormField
        label={`Search ${KIND_LABELS[kind].toLowerCase()}`}
        placeholder="Model, brand or description"
        value={text}
        onChangeText={setText}
        autoCapitalize="none"
        autoCorrect={false}
        testID="catalog-search"
      />
      {withFilters ? (
        <CatalogFilters
          refrigerant={params.refrigerant}
          tons={tons}
          onRefrigerant={(r) => setParams({ refrigerant: r, page: undefined })}
          onTons={(t) => setParams({ tons: t === undefined ? undefined : String(t), page: undefined })}
        />
      ) : null}
      {/* A thin bar while a new search runs over the previous results (kept on screen). */}
      {/* Paper's ProgressBar is 100% tall on the web: the wrapper gives it its 4 px. */}
      <View style={styles.progress}>
        <ProgressBar indeterminate visible={!fromPhone && list.isFetching && !list.isPending} aria-label="Searching the catalog" />
      </View>
      {!fromPhone && list.isPending ? <ActivityIndicator accessibilityLabel="Loading the catalog" /> : null}
      {!fromPhone && list.isError ? <MessageBanner tone="error">{errorText(list.error)}</MessageBanner> : null}
      {fromPhone ? (
        <MessageBanner tone="info" testID="catalog-offline">
          {held.heldCount
            ? `No connection: searching the ${held.heldCount} ${held.heldCount === 1 ? KIND_SINGULAR[kind].toLowerCase() : kindWords} saved on this phone${held.items.length > HELD_MAX_ROWS ? ` (first ${HELD_MAX_ROWS} shown)` : ''}.`
            : `No connection, and no ${kindWords} are saved on this phone yet. Parts you search or open while connected are kept here.`}
        </MessageBanner>
      ) : null}
      {(fromPhone ? held.heldCount > 0 : !!list.data) && rows.length === 0 ? (
        <Text variant="bodyLarge" testID="catalog-empty">
          Nothing in {kindWords}{fromPhone ? ' saved on this phone' : ''} matches{q ? ` “${q}”` : ''}. Try fewer letters or clear a filter.
        </Text>
      ) : null}
      {rows.length > 0 && wide ? <CatalogResultTable kind={kind} rows={rows} onOpen={open} /> : null}
      {rows.length > 0 && !wide ? (
        <View style={styles.cards} testID="catalog-results">
          {rows.map(({ id, summary }) => (
            <CatalogResultCard key={id} summary={summary} onPress={() => open(id)} testID={`catalog-item-${summary.title}`} />
          ))}
        </View>
      ) : null}
      {!fromPhone && list.data && list.data.total > 0 ? (
        <CatalogPager page={list.data.page} pageSize={list.data.pageSize} total={list.data.total} onPage={(p) => setParams({ page: String(p) })} />
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  cards: { gap: spacing.sm },
  progress: { height: 4 },
});
