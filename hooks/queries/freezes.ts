// Freezes: periods in which no window may be booked. Everyone on staff reads them; admins create, edit, delete.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { freezeListSchema, freezeSchema, type FreezeCreate, type FreezePatch } from '@/shared/freezes';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';
import { windowsKey } from '@/hooks/queries/windows-list';

const FREEZES_ROOT = ['freezes'] as const;

/** Key of every cached freeze list; invalidate after any freeze change. */
export const freezesKey = () => [...FREEZES_ROOT] as const;

/** Every freeze; `enabled` false for tenant users, who may not read them (the API answers 403). */
export function useFreezesQuery(enabled = true) {
  return useQuery({ queryKey: freezesKey(), queryFn: () => apiFetch('/api/freezes', freezeListSchema), enabled });
}

// Create and update answer with the freeze, possibly wrapped; both shapes are accepted.
const freezeReplySchema = z.union([freezeSchema, z.object({ freeze: freezeSchema })]);
const deleteReplySchema = z.unknown();

function useInvalidateFreezes() {
  const queryClient = useQueryClient();
  return async () => {
    // Windows carry freeze checks, so their lists go stale too.
    await Promise.all([
      queryClient.invalidateQueries({ queryKey: freezesKey() }),
      queryClient.invalidateQueries({ queryKey: windowsKey() }),
    ]);
  };
}

export function useFreezeCreateMutation() {
  const invalidate = useInvalidateFreezes();
  return useMutation({
    mutationFn: (input: FreezeCreate) => apiFetch('/api/freezes', freezeReplySchema, jsonBody('POST', input)),
    onSuccess: invalidate,
  });
}

export function useFreezeUpdateMutation() {
  const invalidate = useInvalidateFreezes();
  return useMutation({
    mutationFn: ({ id, patch }: { id: string; patch: FreezePatch }) =>
      apiFetch(`/api/freezes/${encodeURIComponent(id)}`, freezeReplySchema, jsonBody('PATCH', patch)),
    onSuccess: invalidate,
  });
}

export function useFreezeDeleteMutation() {
  const invalidate = useInvalidateFreezes();
  return useMutation({
    mutationFn: (id: string) => apiFetch(`/api/freezes/${encodeURIComponent(id)}`, deleteReplySchema, jsonBody('DELETE')),
    onSuccess: invalidate,
  });
}
