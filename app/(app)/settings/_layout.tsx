import { Slot } from 'expo-router';
import { OwnerOnly } from '@/components/settings/owner-only';

/** Settings pages: owner only (the API refuses other roles as well). */
export default function SettingsLayout() {
  return (
    <OwnerOnly>
      <Slot />
    </OwnerOnly>
  );
}
