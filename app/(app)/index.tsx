import { Redirect } from 'expo-router';
import { useMe } from '@/hooks/use-session';
import { homeFor } from '@/components/nav/nav-items';

/** `/` after sign-in: the first screen the person's role may use. */
export default function Home() {
  const me = useMe();
  return me ? <Redirect href={homeFor(me.role)} /> : null;
}
