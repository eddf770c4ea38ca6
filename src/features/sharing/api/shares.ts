// Share links of one subject: list, make, withdraw; and the read-only view a link opens.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { okSchema } from '../../../../shared/api/common';
import { apiRoutes } from '../../../../shared/api/routes';
import { createdShareSchema, sharedViewSchema, shareSchema, type ShareKind } from '../../../../shared/api/shares';
import { api } from '../../../lib/api-client';
import { shareKeys } from './keys';

export const useShares = (kind: ShareKind, subjectId: string) =>
  useQuery({
    queryKey: shareKeys.list(kind, subjectId),
    queryFn: ({ signal }) => api.get(apiRoutes.shares, z.array(shareSchema), { signal, query: { kind, subjectId } }),
  });

export function useCreateShare(kind: ShareKind, subjectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (expiresInDays: number) =>
      api.post(apiRoutes.shares, { kind, subjectId, expiresInDays }, createdShareSchema),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareKeys.list(kind, subjectId) }),
  });
}

export function useRevokeShare(kind: ShareKind, subjectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (shareId: string) => api.delete(apiRoutes.share(shareId), okSchema),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareKeys.list(kind, subjectId) }),
  });
}

export const useSharedView = (token: string | null) =>
  useQuery({
    queryKey: shareKeys.view(token ?? ''),
    queryFn: () => api.post(apiRoutes.sharedView, { token }, sharedViewSchema),
    enabled: token !== null,
    retry: false,
    staleTime: Infinity,
  });
