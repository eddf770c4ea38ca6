// Forgotten passwords: ask for a link by e-mail, then choose a new password with it.
import { useMutation } from '@tanstack/react-query';
import {
  checkYourMailSchema,
  type RequestPasswordResetInput,
  type ResetPasswordInput,
} from '../../../../shared/api/account';
import { okSchema } from '../../../../shared/api/common';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';

export const requestPasswordReset = (input: RequestPasswordResetInput) =>
  api.post(apiRoutes.passwordResetRequest, input, checkYourMailSchema);
export const resetPassword = (input: ResetPasswordInput) => api.post(apiRoutes.passwordReset, input, okSchema);

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
export const useResetPassword = () => useMutation({ mutationFn: resetPassword });
