import { ShopSettingsPanel } from '@/components/settings/shop-settings-panel';

export default function PricingScreen() {
  return <ShopSettingsPanel />;
}
