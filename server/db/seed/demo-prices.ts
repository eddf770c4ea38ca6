// Invented example prices for the demo organisation, so its comparison shows costs from the first visit.
// Idempotent and separate from the one-time demo seed: it also fills in demo organisations seeded
// before price lists existed, and never overwrites a list someone has saved.
import type { DataSource } from 'typeorm';
import { PriceListEntity, OrganisationEntity } from '../entities';
import { DEMO_ORGANISATION_ID } from './demo';

/** Round figures of our own invention; no supplier's list. */
export const DEMO_PRICES = {
  currency: 'EUR',
  trackPerMetre: 1400,
  carrier: 2600,
  elevator: 38000,
  lateralTransfer: 24000,
  curve: 9500,
  automaticStation: 55000,
  manualStation: 12000,
  note: 'Invented demo prices for illustration only. Replace them with your own quotations before deciding anything.',
} as const;

export async function seedDemoPrices(ds: DataSource): Promise<void> {
  if (!(await ds.getRepository(OrganisationEntity).existsBy({ id: DEMO_ORGANISATION_ID }))) return;
  await ds
    .createQueryBuilder()
    .insert()
    .into(PriceListEntity)
    .values({ organisationId: DEMO_ORGANISATION_ID, ...DEMO_PRICES, invented: true, updatedById: null })
    .orIgnore()
    .execute();
}
