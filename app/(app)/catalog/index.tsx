import { CatalogBrowser } from '@/components/catalog/catalog-browser';

export default function CatalogScreen() {
  return <CatalogBrowser />;
}
