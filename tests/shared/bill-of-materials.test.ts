// Bills of materials and footprints counted from the two published example layouts, checked against
// counts read off the documents by hand (16 one-metre modules, two elevators or two lateral transfers).
import { describe, expect, it } from 'vitest';
import { scenarioSchema } from '../../shared/scenario/scenario';
import sideBySide from '../../shared/examples/side-by-side-loop.json';
import stacked from '../../shared/examples/stacked-loop.json';
import { billOf, costPerHourlyPart, footprintOf, quantitiesOf } from '../../shared/costs/bill-of-materials';

const prices = {
  trackPerMetre: 1000,
  carrier: 100,
  elevator: 30000,
  lateralTransfer: 20000,
  curve: 5000,
  automaticStation: 40000,
  manualStation: 10000,
};

describe('footprint', () => {
  it('stacked decks share floor: two 8 m lanes on one axis, 200 mm wide, cover 8 m × 0.2 m', () => {
    const f = footprintOf(scenarioSchema.parse(stacked));
    expect(f).toEqual({ areaM2: 1.6, lengthM: 8, widthM: 0.2, decks: 2, trackLengthM: 16, modules: 16 });
  });

  it('side by side lanes 600 mm apart cover 8 m × 0.8 m on one deck', () => {
    const f = footprintOf(scenarioSchema.parse(sideBySide));
    expect(f.areaM2).toBeCloseTo(6.4, 10);
    expect(f.decks).toBe(1);
    expect(f.trackLengthM).toBe(16);
  });
});

describe('bill of materials', () => {
  it('counts transfers by kind and stations by operation', () => {
    expect(quantitiesOf(scenarioSchema.parse(stacked))).toEqual({
      trackPerMetre: 16,
      carrier: 20,
      elevator: 2,
      lateralTransfer: 0,
      curve: 0,
      automaticStation: 4,
      manualStation: 3,
    });
    expect(quantitiesOf(scenarioSchema.parse(sideBySide))).toMatchObject({ elevator: 0, lateralTransfer: 2 });
  });

  it('uses a run’s carrier override and prices every line', () => {
    const bill = billOf(quantitiesOf(scenarioSchema.parse(stacked), 12), prices);
    // 16 × 1000 + 12 × 100 + 2 × 30000 + 4 × 40000 + 3 × 10000 = 267 200
    expect(bill.capitalCost).toBe(267_200);
    expect(bill.lines.find((l) => l.item === 'carrier')).toEqual({
      item: 'carrier',
      quantity: 12,
      unitPrice: 100,
      total: 1200,
    });
  });

  it('cost per part per hour of capacity divides capital by throughput, and has none at zero throughput', () => {
    expect(costPerHourlyPart(267_200, 334)).toBeCloseTo(800, 10);
    expect(costPerHourlyPart(267_200, 0)).toBeNull();
  });
});
