import { describe, expect, it } from 'vitest';
import { footprint } from '../../shared/scenario/geometry';
import { scenarioSchema } from '../../shared/scenario/scenario';
import { loadExample } from './helpers';

describe('layout geometry', () => {
  it('measures a stacked loop as one lane footprint and side by side as two', () => {
    const stacked = footprint(scenarioSchema.parse(loadExample('stacked-loop.json')));
    const sideBySide = footprint(scenarioSchema.parse(loadExample('side-by-side-loop.json')));
    // 8 m lanes, 200 mm wide; side by side the lane axes are 600 mm apart.
    expect(stacked.areaM2).toBeCloseTo(8 * 0.2, 9);
    expect(sideBySide.areaM2).toBeCloseTo(8 * 0.8, 9);
  });
});
