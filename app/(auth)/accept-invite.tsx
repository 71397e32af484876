import { useLocalSearchParams } from 'expo-router';
import { AuthFrame } from '@/components/auth/auth-frame';
import { AcceptInviteForm } from '@/components/auth/accept-invite-form';

/** /accept-invite?token=…, opened from the invitation e-mail. */
export default function AcceptInviteScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  return (
    <AuthFrame>
      <AcceptInviteForm token={typeof token === 'string' ? token : ''} />
    </AuthFrame>
  );
}
