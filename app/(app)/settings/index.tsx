import { SettingsHome } from '@/components/settings/settings-home';

/** /settings (owner): links to People and Shop, and the system status. */
export default function SettingsScreen() {
  return <SettingsHome />;
}
