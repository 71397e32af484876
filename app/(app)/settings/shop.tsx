import { ShopSettingsScreen } from '@/components/settings/shop-settings-form';

/** /settings/shop (owner). */
export default function ShopRoute() {
  return <ShopSettingsScreen />;
}
