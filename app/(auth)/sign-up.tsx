import { AuthFrame } from '@/components/auth/auth-frame';
import { SignUpForm } from '@/components/auth/sign-up-form';

/** /sign-up: a new shop and its owner. */
export default function SignUpScreen() {
  return (
    <AuthFrame>
      <SignUpForm />
    </AuthFrame>
  );
}
