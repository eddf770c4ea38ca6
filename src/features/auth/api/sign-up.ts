// Asking for an account: the server mails a link that finishes it, so nobody is signed in yet.
import { useMutation } from '@tanstack/react-query';
import { checkYourMailSchema } from '../../../../shared/api/account';
import type { SignUpInput } from '../../../../shared/api/auth';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';

export const signUp = (input: SignUpInput) => api.post(apiRoutes.signUp, input, checkYourMailSchema);

export const useSignUp = () => useMutation({ mutationFn: signUp });
