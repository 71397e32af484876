import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Invitation, InvitationsAnswer, Invite, PeopleAnswer, Person, PersonUpdate } from '@/shared/schemas/people';
import { api } from './api-client';

/** Query keys for the shop's people and pending invitations (owner only). */
export const peopleKeys = {
  all: ['people'] as const,
  list: () => [...peopleKeys.all, 'list'] as const,
  invitations: () => [...peopleKeys.all, 'invitations'] as const,
};

/** GET /api/people. */
export const peopleOptions = () =>
  queryOptions({ queryKey: peopleKeys.list(), queryFn: async () => (await api<PeopleAnswer>('/people')).people });
export const usePeople = () => useQuery(peopleOptions());

/** GET /api/invitations: pending ones only. */
export const invitationsOptions = () =>
  queryOptions({ queryKey: peopleKeys.invitations(), queryFn: async () => (await api<InvitationsAnswer>('/invitations')).invitations });
export const useInvitations = () => useQuery(invitationsOptions());

/** PATCH /api/people/:id: role or active flag. */
export function useUpdatePerson() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: number; change: PersonUpdate }) =>
      api<{ person: Person }>(`/people/${id}`, { method: 'PATCH', json: change }),
    onSuccess: () => void client.invalidateQueries({ queryKey: peopleKeys.list() }),
  });
}

/** POST /api/invitations: e-mails a single-use link. */
export function useInvite() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: Invite) => api<{ invitation: Invitation }>('/invitations', { method: 'POST', json: input }),
    onSuccess: () => void client.invalidateQueries({ queryKey: peopleKeys.invitations() }),
  });
}

/** DELETE /api/invitations/:id: the link stops working. */
export function useRevokeInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<void>(`/invitations/${id}`, { method: 'DELETE' }),
    onSuccess: () => void client.invalidateQueries({ queryKey: peopleKeys.invitations() }),
  });
}
