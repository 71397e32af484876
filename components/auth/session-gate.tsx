import { useEffect, type ReactNode } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { useGlobalSearchParams, usePathname, useRouter, useSegments } from 'expo-router';
import { ApiError } from '@/hooks/api-client';
import { sessionKeys, useSession } from '@/hooks/use-session';
import { gateRedirect } from './gate-rules';
import { peekDeepLink, takeDeepLink } from './deep-link';

/**
 * The sign-in gate, mounted once by the root layout. It reads the session
 * query and moves people between the `(auth)` and `(app)` groups by the rules
 * in gate-rules.ts. When any request answers 401 (the session ended or the
 * person was deactivated) the session is re-read, so the gate reacts at once.
 */
export function SessionGate({ children }: { children: ReactNode }) {
  const session = useSession();
  const segments = useSegments();
  const pathname = usePathname();
  const { next } = useGlobalSearchParams<{ next?: string }>();
  const router = useRouter();
  const client = useQueryClient();

  const user = session.isError ? undefined : session.data;
  const target = gateRedirect({ user, segments, pathname, next, deepLink: peekDeepLink() });

  // Keyed by a string so the effect runs once per destination, not per render.
  const targetKey = target ? JSON.stringify(target) : '';
  useEffect(() => {
    if (!targetKey) return;
    const dest = JSON.parse(targetKey) as { pathname: string; params?: { next: string } };
    // Sent to sign-in with the deep link as `next`: it travels in the URL from here on.
    if (dest.params?.next) takeDeepLink();
    router.replace(dest as never);
  }, [targetKey, router]);

  useEffect(() => {
    const onError = (error: unknown) => {
      if (error instanceof ApiError && error.status === 401 && error.code === 'unauthenticated') {
        void client.invalidateQueries({ queryKey: sessionKeys.me() });
      }
    };
    const unsubQueries = client.getQueryCache().subscribe((e) => {
      if (e.type === 'updated' && e.action.type === 'error') onError(e.action.error);
    });
    const unsubMutations = client.getMutationCache().subscribe((e) => {
      if (e.type === 'updated' && e.action.type === 'error') onError(e.action.error);
    });
    return () => {
      unsubQueries();
      unsubMutations();
    };
  }, [client]);

  return <>{children}</>;
}
