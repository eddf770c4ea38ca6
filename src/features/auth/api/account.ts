// The signed-in user's own password and other sessions.
import { useMutation } from '@tanstack/react-query';
import { signedOutOthersSchema, type ChangePasswordInput } from '../../../../shared/api/account';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';

export const changePassword = (input: ChangePasswordInput) =>
  api.post(apiRoutes.accountPassword, input, signedOutOthersSchema);
export const signOutOtherSessions = () => api.delete(apiRoutes.accountOtherSessions, signedOutOthersSchema);

export const useChangePassword = () => useMutation({ mutationFn: changePassword });
export const useSignOutOtherSessions = () => useMutation({ mutationFn: signOutOtherSessions });
