// Signing in. The answer's body is not relied on: the session cookie is what
// matters, so the signed-in user is fetched fresh afterwards.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import type { SignInInput } from '../../../../shared/api/auth';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { meQueryOptions } from './get-me';

export const signIn = (input: SignInInput) => api.post(apiRoutes.signIn, input, z.unknown());

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: async () => {
      // Data cached for a previous user must never show to the next one.
      queryClient.clear();
      await queryClient.fetchQuery(meQueryOptions());
    },
  });
}
