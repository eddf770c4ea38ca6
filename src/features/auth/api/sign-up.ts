// Creating an account and its organisation; the server signs the new user in.
import { z } from 'zod';
import type { SignUpInput } from '../../../../shared/api/auth';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { useStartSession } from './start-session';

export const signUp = (input: SignUpInput) => api.post(apiRoutes.signUp, input, z.unknown());

export const useSignUp = () => useStartSession(signUp);
