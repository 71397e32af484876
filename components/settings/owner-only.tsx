import type { ReactNode } from 'react';
import { Screen } from '@/components/screen';
import { Notice } from '@/components/notice';
import { useMe } from '@/hooks/use-session';

/** Settings are the owner's: other roles get a plain explanation instead of a page of refusals. */
export function OwnerOnly({ children }: { children: ReactNode }) {
  const me = useMe();
  if (!me) return null;
  if (me.role !== 'owner') {
    return (
      <Screen testID="settings-owner-only">
        <Notice tone="info" title="Settings are for the shop owner">
          Ask the owner of your shop to change people, roles or shop settings.
        </Notice>
      </Screen>
    );
  }
  return <>{children}</>;
}
