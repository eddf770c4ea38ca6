// Properties that every valid scenario must keep, checked on random whole lines (fast-check, fixed
// seed so every run tests the same cases): the run ends within its event budget, every number in
// the result is finite, carriers never overlap and none is lost or duplicated (the engine's own
// invariant check after every event), parts are conserved, and time shares add up to 1.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { RunResult } from '../../shared/results/run-result';
import { isSimulationStopped, runExperiment, validateScenario } from '../../workers/engine/index';
import { randomScenario } from '../reference/support/random-scenario';

const PROPERTY_SEED = 7_402_611;
const EVENT_BUDGET = 3_000_000;

function numbers(x: unknown, path: string, out: [string, number][]): [string, number][] {
  if (typeof x === 'number') out.push([path, x]);
  else if (Array.isArray(x)) x.forEach((v, i) => numbers(v, `${path}[${i}]`, out));
  else if (x !== null && typeof x === 'object')
    for (const [k, v] of Object.entries(x)) numbers(v, path ? `${path}.${k}` : k, out);
  return out;
}

function checkResult(r: RunResult, carriers: number): void {
  const bad = numbers(r, '', []).filter(([, v]) => !Number.isFinite(v));
  expect(bad, `non-finite numbers at ${bad.map(([p]) => p).join(', ')}`).toEqual([]);
  for (const s of r.stations) {
    const shares = [s.processing, s.starved, s.blocked, s.down, s.onBreak];
    for (const x of shares) expect(x).toBeGreaterThanOrEqual(-1e-9);
    expect(shares.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 6);
  }
  const c = r.carriers;
  expect(c.moving + c.waiting + c.working + c.inTransfer).toBeCloseTo(1, 6);
  expect(r.wip.mean).toBeGreaterThanOrEqual(0);
  expect(r.wip.mean).toBeLessThanOrEqual(carriers + 1e-9);
  for (const lane of r.lanes) expect(lane.meanCarriers).toBeLessThanOrEqual(lane.capacity + 1e-9);
  for (const t of r.transfers) {
    expect(t.utilisation).toBeGreaterThanOrEqual(-1e-9);
    expect(t.utilisation).toBeLessThanOrEqual(1 + 1e-9);
  }
  // Parts loaded in the window either left it (output or scrap) or are still on the line; the
  // change of WIP across the window is at most the carrier count.
  for (const rep of r.replications) expect(rep.output).toBeGreaterThanOrEqual(0);
  // Output is counted at the unload stations' completions.
  const unloadStep = r.stations[r.stations.length - 1].stepId;
  const unloadOps = r.stations.filter((s) => s.stepId === unloadStep).reduce((sum, s) => sum + s.operationsPerHour, 0);
  expect(unloadOps).toBeCloseTo(r.throughputPerHour.mean, 6);
  const inLine = r.parts.loaded - r.parts.output - r.parts.scrapped;
  expect(Math.abs(inLine)).toBeLessThanOrEqual(carriers + 1e-9);
}

describe('random valid lines keep the engine invariants', () => {
  it('every generated scenario is accepted by validation', () => {
    fc.assert(
      fc.property(randomScenario, (scenario) => {
        const v = validateScenario(scenario);
        expect(v.ok ? [] : v.issues).toEqual([]);
      }),
      { seed: PROPERTY_SEED, numRuns: 300 },
    );
  });

  it('runs end within budget with finite numbers, no overlap, no lost carriers, conserved parts and shares adding to 1', async () => {
    await fc.assert(
      fc.asyncProperty(
        randomScenario,
        fc.record({
          hours: fc.double({ min: 0.1, max: 0.6, noNaN: true }),
          warmupMinutes: fc.integer({ min: 0, max: 10 }),
          replications: fc.integer({ min: 1, max: 2 }),
          seed: fc.nat(),
        }),
        async (scenario, settings) => {
          const carriers = (scenario.carriers as { count: number }).count;
          const outcome = await runExperiment(scenario, settings, {
            checkInvariants: true,
            eventBudget: EVENT_BUDGET,
            yieldToHost: async () => undefined,
          }).catch((e: unknown) => e);
          if (isSimulationStopped(outcome)) throw new Error(`stopped (${outcome.reason}): ${outcome.message}`);
          if (outcome instanceof Error) throw outcome;
          checkResult(outcome as RunResult, carriers);
        },
      ),
      { seed: PROPERTY_SEED, numRuns: 60 },
    );
  }, 120_000);
});
