// An organisation's members: the list, a new role, removal, and leaving.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { okSchema } from '../../../../shared/api/common';
import { memberSchema } from '../../../../shared/api/members';
import type { Role } from '../../../../shared/api/roles';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { memberKeys } from './keys';

export const getMembers = (organisationId: string, signal?: AbortSignal) =>
  api.get(apiRoutes.members(organisationId), z.array(memberSchema), { signal });

export const useMembers = (organisationId: string) =>
  useQuery({ queryKey: memberKeys.list(organisationId), queryFn: ({ signal }) => getMembers(organisationId, signal) });

function useMemberMutation<T, R>(organisationId: string, request: (input: T) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: request,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: memberKeys.organisation(organisationId) }),
  });
}

export const useChangeRole = (organisationId: string) =>
  useMemberMutation(organisationId, ({ userId, role }: { userId: string; role: Role }) =>
    api.patch(apiRoutes.member(organisationId, userId), { role }, memberSchema),
  );

export const useRemoveMember = (organisationId: string) =>
  useMemberMutation(organisationId, (userId: string) => api.delete(apiRoutes.member(organisationId, userId), okSchema));

export const useLeaveOrganisation = (organisationId: string) =>
  useMemberMutation(organisationId, () => api.delete(apiRoutes.membership(organisationId), okSchema));
