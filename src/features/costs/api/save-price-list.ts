// Replacing the organisation's price list (owners and engineers).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { priceListAnswerSchema, type SavePriceListInput } from '../../../../shared/api/price-lists';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { costKeys } from './keys';

export const savePriceList = (organisationId: string, input: SavePriceListInput) =>
  api.put(apiRoutes.priceList(organisationId), input, priceListAnswerSchema);

export function useSavePriceList(organisationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SavePriceListInput) => savePriceList(organisationId, input),
    onSuccess: (answer) => queryClient.setQueryData(costKeys.priceList(organisationId), answer),
  });
}
