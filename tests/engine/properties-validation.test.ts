// Properties of validation on random whole lines (fast-check, fixed seed): a line whose stations
// cannot all hold a carrier at once, or whose stations fail after no work at all, is refused with the
// exact field path instead of being simulated into a misleading result.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { validateScenario } from '../../workers/engine/index';
import { randomScenario } from '../reference/support/random-scenario';

const PROPERTY_SEED = 4_918_203;

type Doc = {
  lanes: { id: string; modules: { lengthMm: number; count: number }[] }[];
  carriers: { lengthMm: number; minGapMm: number };
  conveyor?: { kind: string; speedMmPerS?: number; stopAndLocateSeconds?: number; pitchMm?: number };
  steps: { stations: { laneId: string; positionMm: number; failures?: unknown }[] }[];
};

const issuesAt = (doc: unknown, path: string) => {
  const v = validateScenario(doc);
  return v.ok ? [] : v.issues.filter((i) => i.path === path);
};

describe('validation refuses lines that cannot work as drawn', () => {
  it('on a belt, a station closer than the pallet pitch to another is refused at its position', () => {
    fc.assert(
      fc.property(randomScenario, fc.integer({ min: 1, max: 200 }), (scenario, extra) => {
        const doc = structuredClone(scenario) as Doc;
        const carrierPitch = doc.carriers.lengthMm + doc.carriers.minGapMm;
        const pallet = carrierPitch + extra;
        const first = doc.steps[0].stations[0];
        const second = doc.steps[doc.steps.length - 1].stations[0];
        const lane = doc.lanes.find((l) => l.id === first.laneId);
        const laneLength = lane ? lane.modules.reduce((sum, m) => sum + m.lengthMm * m.count, 0) : 0;
        // The unload station goes just inside one pallet pitch after the load station (never closer
        // than the carrier pitch, so only the belt rule can object to it).
        second.laneId = first.laneId;
        second.positionMm = first.positionMm + Math.max(carrierPitch, pallet - 1);
        fc.pre(second.positionMm <= laneLength);
        const path = `steps[${doc.steps.length - 1}].stations[0].positionMm`;
        doc.conveyor = { kind: 'carriers' };
        fc.pre(issuesAt(doc, path).length === 0);
        doc.conveyor = { kind: 'belt', speedMmPerS: 250, stopAndLocateSeconds: 1, pitchMm: pallet };
        expect(issuesAt(doc, path).length).toBeGreaterThan(0);
      }),
      { seed: PROPERTY_SEED, numRuns: 100 },
    );
  });

  it('a time between failures with a zero mean is refused at its field', () => {
    fc.assert(
      fc.property(randomScenario, (scenario) => {
        const doc = structuredClone(scenario) as Doc;
        doc.steps[0].stations[0].failures = {
          timeBetweenFailuresSeconds: { kind: 'fixed', value: 0 },
          timeToRepairSeconds: { kind: 'fixed', value: 5 },
        };
        expect(issuesAt(doc, 'steps[0].stations[0].failures.timeBetweenFailuresSeconds')).toHaveLength(1);
      }),
      { seed: PROPERTY_SEED, numRuns: 50 },
    );
  });
});
