// Price list row → API shape.
import type { PriceList } from '../../shared/api/price-lists';
import type { PriceListEntity } from '../db/entities';
import { iso, toUserRef } from './common';

export function toPriceList(row: PriceListEntity): PriceList {
  return {
    organisationId: row.organisationId,
    currency: row.currency,
    prices: {
      trackPerMetre: row.trackPerMetre,
      carrier: row.carrier,
      elevator: row.elevator,
      lateralTransfer: row.lateralTransfer,
      curve: row.curve,
      automaticStation: row.automaticStation,
      manualStation: row.manualStation,
    },
    note: row.note,
    invented: row.invented,
    updatedBy: toUserRef(row.updatedBy),
    updatedAt: iso(row.updatedAt),
  };
}
