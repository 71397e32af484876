import { useLocalSearchParams } from 'expo-router';
import { GuestWalkPage } from '@/components/guest/guest-walk-page';

/** /g/<token>: a customer's guided check by guest link; no account, outside the signed-in shell. */
export default function GuestLinkScreen() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <GuestWalkPage token={typeof token === 'string' ? token : ''} />;
}
