import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { ActivityIndicator, Button } from 'react-native-paper';
import type { CatalogKind } from '@/shared/schemas/equipment';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useCatalogDetail } from '@/hooks/use-catalog';
import { useIsOnline } from '@/hooks/use-connection';
import { MessageBanner } from '@/components/ui/message-banner';
import { Screen } from '@/components/ui/screen';
import { SectionCard } from '@/components/ui/section-card';
import { KIND_SINGULAR } from './catalog-kind-labels';
import { CombinationList } from './combination-list';
import { summarize } from './item-summary';
import { PriceList } from './price-list';
import { SpecList } from './spec-list';
import { specRows } from './spec-rows';

/** Said instead of a spinner when the part was never opened with a signal: the phone does not hold it. */
export const NOT_ON_PHONE = 'This part is not on the phone yet. It will load here when the signal returns.';

/** One catalog item: every spec in plain words, prices by distributor, the rated combinations it is in. */
export function CatalogDetail({ kind, id }: { kind: CatalogKind; id: number }) {
  const router = useRouter();
  const detail = useCatalogDetail(kind, id);
  const online = useIsOnline();
  // With no signal the query waits paused; a spinner would promise an answer that cannot come.
  const waitingForSignal = detail.isPending && (!online || detail.fetchStatus === 'paused');
  const back = () => (router.canGoBack() ? router.back() : router.replace(`/catalog?kind=${kind}` as never));
  const data = detail.data;
  const summary = data ? summarize(kind, data.item) : undefined;

  return (
    <Screen
      title={summary?.title ?? KIND_SINGULAR[kind]}
      subtitle={summary ? [KIND_SINGULAR[kind], summary.brand].filter(Boolean).join(' · ') : undefined}
      actions={
        <Button icon="arrow-left" mode="outlined" onPress={back} contentStyle={styles.touch} testID="catalog-back">
          Catalog
        </Button>
      }
    >
      {waitingForSignal ? (
        <MessageBanner tone="info" testID="catalog-detail-offline">
          {NOT_ON_PHONE}
        </MessageBanner>
      ) : detail.isPending ? (
        <ActivityIndicator accessibilityLabel="Loading the part" />
      ) : null}
      {detail.isError ? <MessageBanner tone="error">{errorText(detail.error)}</MessageBanner> : null}
      {data ? (
        <View style={styles.body}>
          <SectionCard title="Specifications">
            <SpecList rows={specRows(kind, data.item)} />
          </SectionCard>
          {kind !== 'rated-combinations' ? (
            <SectionCard title={data.pricesVisible === false ? 'In stock' : 'Prices'} testID="catalog-prices-section">
              <PriceList prices={data.prices} pricesVisible={data.pricesVisible !== false} />
            </SectionCard>
          ) : null}
          {kind === 'outdoor-units' || kind === 'indoor-coils' || kind === 'air-handlers' ? (
            <SectionCard title="Rated combinations">
              <CombinationList combinations={data.ratedCombinations} />
            </SectionCard>
          ) : null}
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  body: { gap: spacing.lg },
  touch: { minHeight: TOUCH_TARGET },
});
