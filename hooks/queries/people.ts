// People (admin): the filtered list, invitations and changes to a person; and the invitee's link and acceptance.
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { signInResponseSchema, type Me } from '@/shared/api';
import {
  invitationLinkSchema, invitationSchema, peopleListSchema, personSchema,
  type AcceptInvitation, type InvitationRequest, type PeopleFilter, type RoleAssignment,
} from '@/shared/people';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';
import { meKey } from '@/hooks/queries/me';

const PEOPLE_ROOT = ['people'] as const;

/** Everything about people; invalidate it after any change to a person or an invitation. */
export const peopleKey = () => PEOPLE_ROOT;
export const peopleListKey = (filter: Partial<PeopleFilter>) => [...PEOPLE_ROOT, 'list', filter] as const;
export const invitationLinkKey = (token: string) => ['invitation-link', token] as const;

function queryString(filter: Partial<PeopleFilter>): string {
  const params = Object.entries(filter).filter((entry): entry is [string, string] => typeof entry[1] === 'string' && entry[1] !== '');
  return params.length === 0 ? '' : `?${new URLSearchParams(params).toString()}`;
}

export function usePeopleQuery(filter: Partial<PeopleFilter>, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({
    queryKey: peopleListKey(filter),
    queryFn: () => apiFetch(`/api/users${queryString(filter)}`, peopleListSchema),
    // Typing in the search box must not blank the list between answers.
    placeholderData: keepPreviousData,
    enabled,
  });
}

function usePeopleChange<I, O>(mutationFn: (input: I) => Promise<O>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn, onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleKey() }) });
}

const at = (id: string) => encodeURIComponent(id);

export const useInviteMutation = () =>
  usePeopleChange((input: InvitationRequest) => apiFetch('/api/invitations', invitationSchema, jsonBody('POST', input)));
export const useResendInvitationMutation = () =>
  usePeopleChange((id: string) => apiFetch(`/api/invitations/${at(id)}/resend`, invitationSchema, jsonBody('POST')));
export const useRevokeInvitationMutation = () =>
  usePeopleChange((id: string) => apiFetch(`/api/invitations/${at(id)}`, z.null(), jsonBody('DELETE')));
export const useSetRolesMutation = () =>
  usePeopleChange(({ id, ...body }: RoleAssignment & { id: string }) => apiFetch(`/api/users/${at(id)}/roles`, personSchema, jsonBody('PUT', body)));
export const useDeactivateMutation = () =>
  usePeopleChange((id: string) => apiFetch(`/api/users/${at(id)}/deactivate`, personSchema, jsonBody('POST')));
export const useReactivateMutation = () =>
  usePeopleChange((id: string) => apiFetch(`/api/users/${at(id)}/reactivate`, personSchema, jsonBody('POST')));

/** Whom the link is for while it works; ApiError 404 INVITATION_LINK_INVALID once used, expired, replaced or revoked. */
export function useInvitationLinkQuery(token: string) {
  return useQuery({
    queryKey: invitationLinkKey(token),
    queryFn: () => apiFetch(`/api/invitations/link/${encodeURIComponent(token)}`, invitationLinkSchema),
    enabled: token !== '',
    // A 404 is the answer, not a hiccup: asking again would only count against the attempt limit.
    retry: false,
  });
}

export function useAcceptInvitationMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AcceptInvitation) => apiFetch('/api/invitations/accept', signInResponseSchema, jsonBody('POST', input)),
    onSuccess: ({ user }) => {
      queryClient.removeQueries();
      queryClient.setQueryData<Me>(meKey(), user);
    },
  });
}
