// Price lists: every member reads, owners and engineers replace, other organisations see nothing,
// and every bad field is named by its path. Limits are tested at the limit and just past it.
import { describe, expect, it } from 'vitest';
import { PRICE_LIMITS, priceListAnswerSchema, type SavePriceListInput } from '../../shared/api/price-lists';
import { apiRoutes } from '../../shared/api/routes';
import { OrganisationEntity, PriceListEntity } from '../../server/db/entities';
import { DEMO_ORGANISATION_ID } from '../../server/db/seed/demo';
import { seedDemoPrices } from '../../server/db/seed/demo-prices';
import { useCleanDatabase } from './fixtures/database';
import { useOrganisation, type Actor } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db, { contentPerTest: false });

const validList = (): SavePriceListInput => ({
  currency: 'EUR',
  prices: {
    trackPerMetre: 1200.5,
    carrier: 2500,
    elevator: 40000,
    lateralTransfer: 20000,
    curve: 8000,
    automaticStation: 50000,
    manualStation: 10000,
  },
  note: 'Quoted in spring',
});

const put = (actor: Actor, body: unknown, organisationId = org.people.organisationId) =>
  org.people
    .as(actor)
    .put(apiRoutes.priceList(organisationId))
    .send(body as object);

describe('price list roles', () => {
  it.each([
    ['anonymous', 401, 401],
    ['outsider', 404, 404],
    ['viewer', 200, 403],
    ['engineer', 200, 200],
    ['owner', 200, 200],
  ] as const)('%s reads with %d and saves with %d', async (actor, readStatus, saveStatus) => {
    const read = await org.people.as(actor).get(apiRoutes.priceList(org.people.organisationId));
    expect(read.status).toBe(readStatus);
    const saved = await put(actor, validList());
    expect(saved.status).toBe(saveStatus);
  });

  it('another organisation’s list answers 404 even to its members’ colleagues elsewhere', async () => {
    const res = await org.people.engineer.agent.get(apiRoutes.priceList(org.people.outsider.organisationId));
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});

describe('saving a price list', () => {
  it('answers null before the first save, then the saved list with who saved it', async () => {
    await db().getRepository(PriceListEntity).clear();
    const empty = await org.people.viewer.agent.get(apiRoutes.priceList(org.people.organisationId));
    expect(empty.body).toEqual({ priceList: null });
    const saved = await put('engineer', validList());
    const answer = priceListAnswerSchema.parse(saved.body);
    expect(answer.priceList?.prices.trackPerMetre).toBe(1200.5);
    expect(answer.priceList?.invented).toBe(false);
    expect(answer.priceList?.updatedBy?.email).toBe(org.people.engineer.email);
    const again = await put('owner', { ...validList(), currency: 'CHF' });
    expect(again.body.priceList.currency).toBe('CHF');
    expect(await db().getRepository(PriceListEntity).countBy({ organisationId: org.people.organisationId })).toBe(1);
  });

  it('keeps cents exactly', async () => {
    const res = await put('engineer', { ...validList(), prices: { ...validList().prices, carrier: 1234567.89 } });
    expect(res.body.priceList.prices.carrier).toBe(1234567.89);
  });

  it('names every bad field by its path', async () => {
    const res = await put('engineer', {
      currency: 'euro',
      prices: { ...validList().prices, carrier: -1, curve: 'cheap', elevator: 1.234 },
    });
    expect(res.status).toBe(400);
    const paths = res.body.error.fields.map((f: { path: string }) => f.path).sort();
    expect(paths).toEqual(['currency', 'prices.carrier', 'prices.curve', 'prices.elevator']);
    expect(res.body.error.message).toMatch(/prices\.carrier must be zero or more/);
  });

  it('says a missing price is required', async () => {
    const { manualStation: _dropped, ...prices } = validList().prices;
    const res = await put('engineer', { ...validList(), prices });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual([{ path: 'prices.manualStation', message: 'is required' }]);
  });

  it('accepts prices and notes at their limits and refuses them just past', async () => {
    const atLimit = await put('engineer', {
      ...validList(),
      prices: { ...validList().prices, elevator: PRICE_LIMITS.unitPriceMax, carrier: 0 },
      note: 'n'.repeat(PRICE_LIMITS.noteMax),
    });
    expect(atLimit.status).toBe(200);
    expect(atLimit.body.priceList.prices.elevator).toBe(PRICE_LIMITS.unitPriceMax);
    const past = await put('engineer', {
      ...validList(),
      prices: { ...validList().prices, elevator: PRICE_LIMITS.unitPriceMax + 1 },
      note: 'n'.repeat(PRICE_LIMITS.noteMax + 1),
    });
    expect(past.status).toBe(400);
    expect(past.body.error.fields.map((f: { path: string }) => f.path).sort()).toEqual(['note', 'prices.elevator']);
  });
});

describe('demo prices', () => {
  it('are seeded once for the demo organisation, marked invented, and never overwrite a saved list', async () => {
    await seedDemoPrices(db());
    expect(await db().getRepository(PriceListEntity).existsBy({ organisationId: DEMO_ORGANISATION_ID })).toBe(false);
    await db().getRepository(OrganisationEntity).save({ id: DEMO_ORGANISATION_ID, name: 'Demo plant' });
    await seedDemoPrices(db());
    await seedDemoPrices(db());
    const seeded = await db().getRepository(PriceListEntity).findOneByOrFail({ organisationId: DEMO_ORGANISATION_ID });
    expect(seeded.invented).toBe(true);
    expect(seeded.note).toMatch(/Invented/);
    await db()
      .getRepository(PriceListEntity)
      .update({ organisationId: DEMO_ORGANISATION_ID }, { carrier: 1, invented: false });
    await seedDemoPrices(db());
    const kept = await db().getRepository(PriceListEntity).findOneByOrFail({ organisationId: DEMO_ORGANISATION_ID });
    expect(kept.carrier).toBe(1);
    expect(kept.invented).toBe(false);
  });
});
