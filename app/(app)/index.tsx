import { useState } from 'react';
import { Redirect } from 'expo-router';
import { useMe } from '@/hooks/use-session';
import { homeFor } from '@/shared/nav-items';
import { safeNext } from '@/components/auth/gate-rules';
import { takeDeepLink } from '@/components/auth/deep-link';

/** `/` after sign-in: the page first opened (a reload), else the first screen the person's role may use. */
export default function Home() {
  const me = useMe();
  const [deepLink] = useState(() => safeNext(takeDeepLink()));
  return me ? <Redirect href={(deepLink ?? homeFor(me.role)) as never} /> : null;
}
