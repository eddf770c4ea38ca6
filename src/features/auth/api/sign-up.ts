// Creating an account and its organisation; the new user is signed in by the server.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import type { SignUpInput } from '../../../../shared/api/auth';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { meQueryOptions } from './get-me';

export const signUp = (input: SignUpInput) => api.post(apiRoutes.signUp, input, z.unknown());

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: async () => {
      queryClient.clear();
      await queryClient.fetchQuery(meQueryOptions());
    },
  });
}
