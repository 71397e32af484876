import { Slot } from 'expo-router';
import { SignedInFrame } from '@/components/nav/signed-in-frame';

/**
 * The signed-in shell: header with the person, navigation for their role.
 * Screens under app/(app)/ render inside it; read the person with useMe()
 * from hooks/use-session.ts.
 */
export default function AppLayout() {
  return (
    <SignedInFrame>
      <Slot />
    </SignedInFrame>
  );
}
