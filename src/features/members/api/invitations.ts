// Invitations: the owner's list, inviting, resending and revoking; and the invitee's preview and accept.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { okSchema } from '../../../../shared/api/common';
import {
  acceptedInvitationSchema,
  invitationPreviewSchema,
  invitationSchema,
  type AcceptInvitationInput,
  type InviteMemberInput,
} from '../../../../shared/api/invitations';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { memberKeys } from './keys';

export const useInvitations = (organisationId: string, enabled: boolean) =>
  useQuery({
    queryKey: memberKeys.invitations(organisationId),
    queryFn: ({ signal }) => api.get(apiRoutes.invitations(organisationId), z.array(invitationSchema), { signal }),
    enabled,
  });

function useInvitationMutation<T, R>(organisationId: string, request: (input: T) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: request,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: memberKeys.invitations(organisationId) }),
  });
}

export const useInvite = (organisationId: string) =>
  useInvitationMutation(organisationId, (input: InviteMemberInput) =>
    api.post(apiRoutes.invitations(organisationId), input, invitationSchema),
  );

export const useResendInvitation = (organisationId: string) =>
  useInvitationMutation(organisationId, (invitationId: string) =>
    api.post(apiRoutes.invitationResend(organisationId, invitationId), {}, invitationSchema),
  );

export const useRevokeInvitation = (organisationId: string) =>
  useInvitationMutation(organisationId, (invitationId: string) =>
    api.delete(apiRoutes.invitation(organisationId, invitationId), okSchema),
  );

export const useInvitationPreview = (token: string | null) =>
  useQuery({
    queryKey: [...memberKeys.all, 'preview', token],
    queryFn: () => api.post(apiRoutes.invitationPreview, { token }, invitationPreviewSchema),
    enabled: token !== null,
    retry: false,
  });

export const useAcceptInvitation = () =>
  useMutation({
    mutationFn: (input: AcceptInvitationInput) => api.post(apiRoutes.invitationAccept, input, acceptedInvitationSchema),
  });
