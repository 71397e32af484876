import { useLocalSearchParams } from 'expo-router';
import { AuthFrame } from '@/components/auth/auth-frame';
import { ResetPasswordForm } from '@/components/auth/reset-password-form';

/** /reset-password?token=…, opened from the e-mail. */
export default function ResetPasswordScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  return (
    <AuthFrame>
      <ResetPasswordForm token={typeof token === 'string' ? token : ''} />
    </AuthFrame>
  );
}
