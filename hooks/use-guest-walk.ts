import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { GuestLinkClosed, GuestWalkState } from '@/shared/schemas/guest-links';
import type { WalkFinish, WalkPhoto, WalkStepAnswer } from '@/shared/schemas/walks';
import type { PhotoFile, WalkSource } from '@/components/walk/walk-source';
import { api } from './api-client';
import { uploadPhoto } from './upload';

/** Query keys for the guest's side of a link. */
export const guestWalkKeys = {
  all: ['guest-walk'] as const,
  open: (token: string) => [...guestWalkKeys.all, 'open', token] as const,
  state: (linkId: number) => [...guestWalkKeys.all, 'state', linkId] as const,
};

/** What opening a link or reading it answers: the link, or the page for a closed link. */
export type GuestOpened = { linkId: number } | GuestLinkClosed;
export type GuestStateAnswer = GuestWalkState | GuestLinkClosed;
export const isClosed = (a: object): a is GuestLinkClosed => 'error' in a;

const guestPath = (linkId: number) => `/guest/links/${linkId}`;

/** POST /api/guest/open: binds this browser to the link (a cookie) and answers its id; 410 is a closed link with the shop's contact. */
export const guestOpenOptions = (token: string) =>
  queryOptions({
    queryKey: guestWalkKeys.open(token),
    queryFn: () => api<GuestOpened>('/guest/open', { method: 'POST', json: { token }, acceptStatuses: [410] }),
    enabled: token.length > 0,
    staleTime: Infinity,
    retry: false,
  });

/** GET /api/guest/links/:id: the link, the safety notice's state and the walk. */
export const guestStateOptions = (linkId: number) =>
  queryOptions({
    queryKey: guestWalkKeys.state(linkId),
    queryFn: () => api<GuestStateAnswer>(guestPath(linkId), { acceptStatuses: [410] }),
    enabled: linkId > 0,
    staleTime: 0,
    retry: false,
  });

export const useGuestOpen = (token: string) => useQuery(guestOpenOptions(token));
export const useGuestState = (linkId: number) => useQuery(guestStateOptions(linkId));

/** POST acknowledge: the guest accepted the safety notice; the walk starts. */
export function useAcknowledgeSafety(linkId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => api<GuestWalkState>(`${guestPath(linkId)}/acknowledge`, { method: 'POST', json: {} }),
    onSuccess: (state) => client.setQueryData(guestWalkKeys.state(linkId), state),
  });
}

/** Multipart upload with progress to the guest photo route; refusals keep the server's words. */
export function uploadGuestPhoto(linkId: number, file: PhotoFile, step: string, onProgress?: (fraction: number) => void): Promise<WalkPhoto> {
  const target = { path: `${guestPath(linkId)}/photos`, unreachable: 'The photo did not reach the shop. Check the connection and try again.' };
  return uploadPhoto(target, file, step, onProgress);
}

/** The walk screen's data source for a guest: the same screen as staff, through the guest routes of one link. */
export function useGuestWalkSource(linkId: number): WalkSource {
  const client = useQueryClient();
  const state = useGuestState(linkId);
  const refresh = () => client.invalidateQueries({ queryKey: guestWalkKeys.state(linkId) });
  const post = async <T>(path: string, json: unknown) => {
    const answer = await api<T>(`${guestPath(linkId)}${path}`, { method: 'POST', json });
    await refresh();
    return answer;
  };
  const data = state.data && !isClosed(state.data) ? (state.data.walk ?? undefined) : undefined;
  return {
    data,
    isLoading: state.isPending,
    error: state.error,
    refetch: () => void state.refetch(),
    sendStep: (input) => post<WalkStepAnswer>('/steps', input),
    undo: (stepId) => post<WalkStepAnswer>('/undo', { stepId }),
    finish: (input: WalkFinish) => post<GuestWalkState>('/finish', input),
    uploadPhoto: async (file, step, onProgress) => {
      const photo = await uploadGuestPhoto(linkId, file, step, onProgress);
      await refresh();
      return photo;
    },
    removePhoto: async (photoId) => {
      await api<void>(`${guestPath(linkId)}/photos/${photoId}`, { method: 'DELETE' });
      await refresh();
    },
    // Guests have no report pages and no job.
    links: { report: null, pdf: null, job: null },
    finishedNote: 'Your check is finished and saved with the shop; it can no longer change. If something else comes up, contact the shop.',
  };
}
