import { queryOptions, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { ForgotPassword, Me, MeAnswer, ResetCheckAnswer, ResetPassword, SignIn, SignUp } from '@/shared/schemas/auth';
import type { AcceptInvitation, InvitationLookupAnswer } from '@/shared/schemas/people';
import { api } from './api-client';

/** Query keys for the signed-in session. */
export const sessionKeys = {
  all: ['session'] as const,
  me: () => [...sessionKeys.all, 'me'] as const,
  invitation: (token: string) => [...sessionKeys.all, 'invitation', token] as const,
  resetLink: (token: string) => [...sessionKeys.all, 'reset-link', token] as const,
};

/** GET /api/auth/me: the signed-in person, or null. The one source of "who is signed in" on the client. */
export const sessionOptions = () =>
  queryOptions({
    queryKey: sessionKeys.me(),
    queryFn: async () => (await api<MeAnswer>('/auth/me')).user,
    staleTime: 60_000,
  });

/** The session query: `data` is the person (Me), null when signed out, undefined while loading. */
export const useSession = () => useQuery(sessionOptions());

/** The signed-in person; only for screens under the signed-in shell, which renders nothing without one. */
export function useMe(): Me | undefined {
  return useSession().data ?? undefined;
}

/**
 * After the person changes (sign-in, sign-out, sign-up, accepting an invitation),
 * everything cached belonged to someone else: clear it and seed the new session.
 */
function switchPerson(client: QueryClient, user: Me | null) {
  client.removeQueries({ predicate: (q) => q.queryKey[0] !== sessionKeys.all[0] });
  client.setQueryData(sessionKeys.me(), user);
}

/** POST /api/auth/sign-in. */
export function useSignIn() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: SignIn) => api<MeAnswer>('/auth/sign-in', { method: 'POST', json: input }),
    onSuccess: (answer) => switchPerson(client, answer.user),
  });
}

/** POST /api/auth/sign-up: a new shop and its owner, signed in. */
export function useSignUp() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: SignUp) => api<MeAnswer>('/auth/sign-up', { method: 'POST', json: input }),
    onSuccess: (answer) => switchPerson(client, answer.user),
  });
}

/** POST /api/auth/sign-out. */
export function useSignOut() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => api<MeAnswer>('/auth/sign-out', { method: 'POST' }),
    onSuccess: () => switchPerson(client, null),
  });
}

/** POST /api/auth/forgot-password: the answer is the same whether or not the address exists. */
export function useForgotPassword() {
  return useMutation({
    mutationFn: (input: ForgotPassword) => api<{ message: string }>('/auth/forgot-password', { method: 'POST', json: input }),
  });
}

/** Whether a reset link is still good, and for which address. */
export const resetLinkOptions = (token: string) =>
  queryOptions({
    queryKey: sessionKeys.resetLink(token),
    queryFn: () => api<ResetCheckAnswer>('/auth/reset-password/check', { method: 'POST', json: { token } }),
    staleTime: Infinity,
  });
export const useResetLink = (token: string) => useQuery({ ...resetLinkOptions(token), enabled: token.length > 0 });

/** POST /api/auth/reset-password: sets the new password and signs in. */
export function useResetPassword() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: ResetPassword) => api<MeAnswer>('/auth/reset-password', { method: 'POST', json: input }),
    onSuccess: (answer) => switchPerson(client, answer.user),
  });
}

/** What an invitation link is for (shop, address, role). */
export const invitationLinkOptions = (token: string) =>
  queryOptions({
    queryKey: sessionKeys.invitation(token),
    queryFn: () => api<InvitationLookupAnswer>('/invitations/lookup', { method: 'POST', json: { token } }),
    staleTime: Infinity,
  });
export const useInvitationLink = (token: string) => useQuery({ ...invitationLinkOptions(token), enabled: token.length > 0 });

/** POST /api/invitations/accept: sets name and password, signs in. */
export function useAcceptInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: AcceptInvitation) => api<MeAnswer>('/invitations/accept', { method: 'POST', json: input }),
    onSuccess: (answer) => switchPerson(client, answer.user),
  });
}
