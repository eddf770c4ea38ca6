// Signing out ends the session on the server. The caller then goes to the
// sign-in page with SIGNED_OUT_STATE, where the cached data is forgotten.
import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';

export const signOut = () => api.post(apiRoutes.signOut, {}, z.unknown());

export const useSignOut = () => useMutation({ mutationFn: signOut });
