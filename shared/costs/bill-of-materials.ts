// What a scenario is built from, counted from its document, and what it costs under a price list.
// Track is priced by the metre of modules laid (every lane's modules; curves are priced as pieces).
// The carrier count is the run's when a run overrode it, so the bill matches the figures beside it.
import type { Prices, PriceItem } from '../api/price-lists';
import { PRICE_ITEMS } from '../api/price-lists';
import { footprint } from '../scenario/geometry';
import type { Scenario } from '../scenario/scenario';
import { laneLengthMm, laneModuleCount } from '../scenario/track';

export type Footprint = {
  /** Plan area of the bounding rectangle of all lanes; stacked decks share it. */
  areaM2: number;
  lengthM: number;
  widthM: number;
  /** Decks that carry at least one lane. */
  decks: number;
  trackLengthM: number;
  modules: number;
};

export type Quantities = Record<PriceItem, number>;

export type BillLine = { item: PriceItem; quantity: number; unitPrice: number; total: number };

export type Bill = { lines: BillLine[]; capitalCost: number };

type Countable = Pick<Scenario, 'lanes' | 'decks' | 'transfers' | 'steps' | 'carriers' | 'track'>;

export function footprintOf(scenario: Countable): Footprint {
  const box = footprint(scenario);
  let trackMm = 0;
  let modules = 0;
  for (const lane of scenario.lanes) {
    trackMm += laneLengthMm(lane);
    modules += laneModuleCount(lane);
  }
  return {
    areaM2: box.areaM2,
    lengthM: (box.xMaxMm - box.xMinMm) / 1000,
    widthM: (box.yMaxMm - box.yMinMm) / 1000,
    decks: new Set(scenario.lanes.map((lane) => lane.deckId)).size,
    trackLengthM: trackMm / 1000,
    modules,
  };
}

export function quantitiesOf(scenario: Countable, carriers = scenario.carriers.count): Quantities {
  const transfers = (kind: string) => scenario.transfers.filter((t) => t.kind === kind).length;
  const stations = scenario.steps.flatMap((step) => step.stations);
  return {
    trackPerMetre: footprintOf(scenario).trackLengthM,
    carrier: carriers,
    elevator: transfers('elevator'),
    lateralTransfer: transfers('lateral'),
    curve: transfers('curve'),
    automaticStation: stations.filter((s) => s.operation === 'automatic').length,
    manualStation: stations.filter((s) => s.operation === 'manual').length,
  };
}

export function billOf(quantities: Quantities, prices: Prices): Bill {
  const lines = PRICE_ITEMS.map((item) => ({
    item,
    quantity: quantities[item],
    unitPrice: prices[item],
    total: quantities[item] * prices[item],
  }));
  return { lines, capitalCost: lines.reduce((sum, line) => sum + line.total, 0) };
}

/** Capital cost per part per hour of capacity: what one unit of hourly throughput costs to build. */
export function costPerHourlyPart(capitalCost: number, throughputPerHour: number): number | null {
  return throughputPerHour > 0 ? capitalCost / throughputPerHour : null;
}
