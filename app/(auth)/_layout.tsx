import { Slot } from 'expo-router';

/** Sign-in screens: each composes its form inside AuthFrame. The gate lives in the root layout. */
export default function AuthLayout() {
  return <Slot />;
}
