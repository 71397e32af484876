import { AuthFrame } from '@/components/auth/auth-frame';
import { SignInForm } from '@/components/auth/sign-in-form';
import { SystemStatus } from '@/components/auth/system-status';

/** /sign-in, with the server and database status in the footer. */
export default function SignInScreen() {
  return (
    <AuthFrame footer={<SystemStatus />}>
      <SignInForm />
    </AuthFrame>
  );
}
