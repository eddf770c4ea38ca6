// What the loopback fake SMTP server caught. The route exists only while the fake is in use, so a 404
// means "no development mailbox here", not an error.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { mailboxSchema, type Mailbox } from '../../../../shared/api/mailbox';
import { apiRoutes } from '../../../../shared/api/routes';
import { api, isApiRequestError } from '../../../lib/api-client';
import { mailboxKeys } from './keys';

export async function getMailbox(signal?: AbortSignal): Promise<Mailbox | null> {
  try {
    return await api.get(apiRoutes.mailbox, mailboxSchema, { signal });
  } catch (error) {
    if (isApiRequestError(error) && error.status === 404) return null;
    throw error;
  }
}

export const mailboxQueryOptions = (refetchMs?: number) =>
  queryOptions({
    queryKey: mailboxKeys.all,
    queryFn: ({ signal }) => getMailbox(signal),
    staleTime: 60_000,
    refetchInterval: refetchMs,
  });

export const useMailbox = (refetchMs?: number) => useQuery(mailboxQueryOptions(refetchMs));
