// The organisation's price list, or null when nobody has entered one.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { priceListAnswerSchema } from '../../../../shared/api/price-lists';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { costKeys } from './keys';

export const getPriceList = (organisationId: string, signal?: AbortSignal) =>
  api.get(apiRoutes.priceList(organisationId), priceListAnswerSchema, { signal });

export const priceListQueryOptions = (organisationId: string) =>
  queryOptions({
    queryKey: costKeys.priceList(organisationId),
    queryFn: ({ signal }) => getPriceList(organisationId, signal),
  });

export const usePriceList = (organisationId: string | undefined) =>
  useQuery({ ...priceListQueryOptions(organisationId ?? ''), enabled: Boolean(organisationId) });
