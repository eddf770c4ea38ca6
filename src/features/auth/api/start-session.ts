// Shared by sign-in and sign-up: after either succeeds the session cookie is
// set, so whatever was cached for a previous user goes and the new user is
// fetched fresh. The answer's body is not relied on.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { removeUserData } from './forget-session';
import { meQueryOptions } from './get-me';

export function useStartSession<TInput>(request: (input: TInput) => Promise<unknown>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: request,
    onSuccess: async () => {
      removeUserData(queryClient);
      await queryClient.fetchQuery({ ...meQueryOptions(), staleTime: 0 });
    },
  });
}
