import { useLocalSearchParams } from 'expo-router';
import { LinkPage } from '@/components/support/link-page';

/** /support/:id: one guest link, its walk, and what support can do with it. */
export default function GuestLinkScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <LinkPage id={/^\d+$/.test(id ?? '') ? Number(id) : 0} />;
}
