import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { JobInput } from '@/shared/schemas/jobs';
import type { GuestLink, GuestLinkCreate, GuestLinkDetail, GuestLinkIssued, GuestLinkJobAnswer, GuestLinkList, GuestLinkStatus } from '@/shared/schemas/guest-links';
import { api } from './api-client';
import { jobKeys } from './use-jobs';

/** Query keys for guest links (the staff side). */
export const guestLinkKeys = {
  all: ['guest-links'] as const,
  lists: () => [...guestLinkKeys.all, 'list'] as const,
  list: (status: GuestLinkStatus | undefined) => [...guestLinkKeys.lists(), status ?? 'all'] as const,
  details: () => [...guestLinkKeys.all, 'detail'] as const,
  detail: (id: number) => [...guestLinkKeys.details(), id] as const,
};

/** GET /api/guest-links: walks waiting for review first, then newest. */
export const guestLinksOptions = (status?: GuestLinkStatus) =>
  queryOptions({
    queryKey: guestLinkKeys.list(status),
    queryFn: async () => (await api<GuestLinkList>(status ? `/guest-links?status=${status}` : '/guest-links')).links,
    // A customer may be walking right now: look again when the page comes back into view.
    refetchOnWindowFocus: true,
  });

/** GET /api/guest-links/:id: the link and its walk with steps, readings and photos. */
export const guestLinkOptions = (id: number) =>
  queryOptions({
    queryKey: guestLinkKeys.detail(id),
    queryFn: () => api<GuestLinkDetail>(`/guest-links/${id}`),
    enabled: Number.isSafeInteger(id) && id > 0,
    refetchOnWindowFocus: true,
  });

export const useGuestLinks = (status?: GuestLinkStatus) => useQuery(guestLinksOptions(status));
export const useGuestLink = (id: number) => useQuery(guestLinkOptions(id));

/** Every mutation here changes what the lists and the link page show. */
function useLinkMutation<V, A>(fn: (v: V) => Promise<A>, also?: (client: ReturnType<typeof useQueryClient>) => void) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: () => {
      void client.invalidateQueries({ queryKey: guestLinkKeys.all });
      also?.(client);
    },
  });
}

/** POST /api/guest-links: the answer carries the address to copy, shown this once. */
export const useCreateGuestLink = () => useLinkMutation((input: GuestLinkCreate) => api<GuestLinkIssued>('/guest-links', { method: 'POST', json: input }));

/** POST /api/guest-links/:id/resend: a fresh address (the one before stops working), e-mailed or to copy. */
export const useResendGuestLink = (id: number) =>
  useLinkMutation((by: 'email' | 'copy') => api<GuestLinkIssued>(`/guest-links/${id}/resend`, { method: 'POST', json: { by } }));

/** POST /api/guest-links/:id/revoke. */
export const useRevokeGuestLink = (id: number) => useLinkMutation(() => api<{ link: GuestLink }>(`/guest-links/${id}/revoke`, { method: 'POST', json: {} }));

/** POST /api/guest-links/:id/handled. */
export const useSetGuestLinkHandled = (id: number) =>
  useLinkMutation((handled: boolean) => api<{ link: GuestLink }>(`/guest-links/${id}/handled`, { method: 'POST', json: { handled } }));

/** POST /api/guest-links/:id/job: the customer brought the car in; the walk joins the new job. */
export const useGuestLinkToJob = (id: number) =>
  useLinkMutation(
    (input: JobInput) => api<GuestLinkJobAnswer>(`/guest-links/${id}/job`, { method: 'POST', json: input }),
    (client) => void client.invalidateQueries({ queryKey: jobKeys.all }),
  );
