import { Redirect, useLocalSearchParams } from 'expo-router';
import { CatalogDetail } from '@/components/catalog/catalog-detail';
import { isCatalogKind } from '@/components/catalog/catalog-kind-labels';

export default function CatalogItemScreen() {
  const { kind, id } = useLocalSearchParams<{ kind: string; id: string }>();
  if (!isCatalogKind(kind)) return <Redirect href="/catalog" />;
  return <CatalogDetail kind={kind} id={Number(id)} />;
}
