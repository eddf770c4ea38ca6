// Signing out ends the session on the server. The caller leaves the signed-in
// pages and then clears the cache (see UserMenu), in that order, so no guarded
// page refetches in between and bounces back with a "return to" address.
import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';

export const signOut = () => api.post(apiRoutes.signOut, {}, z.unknown());

export const useSignOut = () => useMutation({ mutationFn: signOut });
