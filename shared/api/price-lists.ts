// An organisation's price list: what one unit of each kind of line equipment costs, in one currency.
// The bill of materials of a scenario (shared/costs) multiplies its counts by these prices.
import { z } from 'zod';
import { isoDateSchema, userRefSchema } from './common';

export const PRICE_LIMITS = {
  /** Above any single piece of line equipment; a larger figure is a unit or typing mistake. */
  unitPriceMax: 100_000_000,
  noteMax: 500,
} as const;

const price = z
  .number({ error: 'must be a number' })
  .finite('must be a finite number')
  .min(0, 'must be zero or more')
  .max(PRICE_LIMITS.unitPriceMax, `must be at most ${PRICE_LIMITS.unitPriceMax.toLocaleString('en')}`)
  .refine((v) => Math.abs(v * 100 - Math.round(v * 100)) < 1e-6, 'must have at most two decimals');

/** The priced items, in the order a bill of materials lists them. */
export const PRICE_ITEMS = [
  'trackPerMetre',
  'carrier',
  'elevator',
  'lateralTransfer',
  'curve',
  'automaticStation',
  'manualStation',
] as const;
export type PriceItem = (typeof PRICE_ITEMS)[number];

export const PRICE_ITEM_LABELS: Record<PriceItem, { label: string; unit: string }> = {
  trackPerMetre: { label: 'Track modules', unit: 'm' },
  carrier: { label: 'Carriers', unit: 'each' },
  elevator: { label: 'Elevators', unit: 'each' },
  lateralTransfer: { label: 'Lateral transfers', unit: 'each' },
  curve: { label: 'Curves', unit: 'each' },
  automaticStation: { label: 'Automatic stations', unit: 'each' },
  manualStation: { label: 'Manual stations', unit: 'each' },
};

export const pricesSchema = z.object({
  trackPerMetre: price,
  carrier: price,
  elevator: price,
  lateralTransfer: price,
  curve: price,
  automaticStation: price,
  manualStation: price,
});

export const savePriceListSchema = z.object({
  currency: z
    .string({ error: 'must be text' })
    .regex(/^[A-Z]{3}$/, 'must be a three-letter currency code in capitals, such as EUR'),
  prices: pricesSchema,
  note: z
    .string({ error: 'must be text' })
    .trim()
    .max(PRICE_LIMITS.noteMax, `must be at most ${PRICE_LIMITS.noteMax} characters`)
    .default(''),
});

export const priceListSchema = savePriceListSchema.extend({
  organisationId: z.uuid(),
  /** Seeded example prices nobody has replaced yet; the screens say they are invented. */
  invented: z.boolean(),
  updatedBy: userRefSchema.nullable(),
  updatedAt: isoDateSchema,
});

/** The answer when an organisation has no price list yet. */
export const priceListAnswerSchema = z.object({ priceList: priceListSchema.nullable() });

export type Prices = z.infer<typeof pricesSchema>;
export type SavePriceListInput = z.input<typeof savePriceListSchema>;
export type PriceList = z.infer<typeof priceListSchema>;
export type PriceListAnswer = z.infer<typeof priceListAnswerSchema>;
