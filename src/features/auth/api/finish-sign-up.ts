// Opening the e-mailed sign-up link makes the account and signs the new owner in.
import { z } from 'zod';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { useStartSession } from './start-session';

export const finishSignUp = (token: string) => api.post(apiRoutes.signUpConfirm, { token }, z.unknown());

export const useFinishSignUp = () => useStartSession(finishSignUp);
