// Signing in with e-mail and password.
import { z } from 'zod';
import type { SignInInput } from '../../../../shared/api/auth';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { useStartSession } from './start-session';

export const signIn = (input: SignInInput) => api.post(apiRoutes.signIn, input, z.unknown());

export const useSignIn = () => useStartSession(signIn);
