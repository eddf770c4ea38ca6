// Checks across the parts of a scenario that a field-by-field schema cannot make: unique ids, every
// reference pointing at something that exists, geometry that fits. Each issue names the exact path.
import type { z } from 'zod';
import type { ScenarioShape } from './scenario-shape';
import type { Distribution } from './distribution';
import { PROCESS_LIMITS } from './process';
import { laneLengthMm } from './track';

type Ctx = z.core.$RefinementCtx<ScenarioShape>;
type Path = (string | number)[];

function knownList(ids: Iterable<string>): string {
  const list = [...ids];
  if (list.length === 0) return 'none defined';
  return list.length > 12 ? `${list.slice(0, 12).join(', ')}, …` : list.join(', ');
}

function unique(ctx: Ctx, kind: string, items: { id: string; path: Path }[]): Map<string, number> {
  const seen = new Map<string, number>();
  items.forEach((item, index) => {
    if (seen.has(item.id))
      ctx.addIssue({
        code: 'custom',
        path: [...item.path, 'id'],
        message: `${kind} id "${item.id}" is used twice; ids must be unique`,
      });
    else seen.set(item.id, index);
  });
  return seen;
}

function mustExist(ctx: Ctx, ids: Map<string, number>, kind: string, id: string, path: Path): boolean {
  if (ids.has(id)) return true;
  ctx.addIssue({ code: 'custom', path, message: `no ${kind} "${id}"; known ${kind}s: ${knownList(ids.keys())}` });
  return false;
}

function checkTrack(s: ScenarioShape, ctx: Ctx, deckIds: Map<string, number>, laneIds: Map<string, number>): void {
  const modules = new Set(s.track.moduleLengthsMm);
  s.lanes.forEach((lane, i) => {
    mustExist(ctx, deckIds, 'deck', lane.deckId, ['lanes', i, 'deckId']);
    lane.modules.forEach((m, j) => {
      if (!modules.has(m.lengthMm)) {
        ctx.addIssue({
          code: 'custom',
          path: ['lanes', i, 'modules', j, 'lengthMm'],
          message: `${m.lengthMm} mm is not a standard module; track.moduleLengthsMm lists ${[...modules].join(', ')}`,
        });
      }
    });
  });
  const deckOf = (laneId: string) => s.decks[deckIds.get(s.lanes[laneIds.get(laneId) ?? -1]?.deckId ?? '') ?? -1];
  s.links.forEach((link, i) => {
    const ok =
      mustExist(ctx, laneIds, 'lane', link.fromLaneId, ['links', i, 'fromLaneId']) &&
      mustExist(ctx, laneIds, 'lane', link.toLaneId, ['links', i, 'toLaneId']);
    if (ok && deckOf(link.fromLaneId) !== deckOf(link.toLaneId)) {
      ctx.addIssue({
        code: 'custom',
        path: ['links', i, 'toLaneId'],
        message: 'a direct link joins lanes on the same deck; use an elevator between decks',
      });
    }
  });
  s.transfers.forEach((t, i) => {
    const ok =
      mustExist(ctx, laneIds, 'lane', t.fromLaneId, ['transfers', i, 'fromLaneId']) &&
      mustExist(ctx, laneIds, 'lane', t.toLaneId, ['transfers', i, 'toLaneId']);
    if (!ok) return;
    const sameDeck = deckOf(t.fromLaneId) === deckOf(t.toLaneId);
    if (t.kind === 'elevator' && sameDeck) {
      ctx.addIssue({
        code: 'custom',
        path: ['transfers', i, 'toLaneId'],
        message: 'an elevator joins lanes on different decks; use a lateral transfer or curve on one deck',
      });
    }
    if (t.kind !== 'elevator' && !sameDeck) {
      ctx.addIssue({
        code: 'custom',
        path: ['transfers', i, 'toLaneId'],
        message: `a ${t.kind} joins lanes on the same deck; use an elevator between decks`,
      });
    }
  });
}

function checkStations(s: ScenarioShape, ctx: Ctx, laneIds: Map<string, number>): void {
  // On a belt, queued pallets keep the belt's pitch centre to centre, so two stations closer than
  // that can never both hold a pallet.
  const belt = s.conveyor.kind === 'belt' ? s.conveyor.pitchMm : 0;
  const pitch = Math.max(s.carriers.lengthMm + s.carriers.minGapMm, belt);
  const spacing =
    belt >= s.carriers.lengthMm + s.carriers.minGapMm
      ? `the belt's pallet pitch (${pitch} mm)`
      : `one carrier length plus gap (${pitch} mm)`;
  const byLane = new Map<string, { position: number; path: Path }[]>();
  s.steps.forEach((step, i) =>
    step.stations.forEach((station, j) => {
      const path: Path = ['steps', i, 'stations', j];
      if (station.pausesForBreaks && station.operation !== 'manual') {
        ctx.addIssue({
          code: 'custom',
          path: [...path, 'pausesForBreaks'],
          message: 'only a manual station pauses for breaks; set operation to "manual" or pausesForBreaks to false',
        });
      }
      if (!mustExist(ctx, laneIds, 'lane', station.laneId, [...path, 'laneId'])) return;
      const length = laneLengthMm(s.lanes[laneIds.get(station.laneId) ?? 0]);
      if (station.positionMm < s.carriers.lengthMm || station.positionMm > length) {
        ctx.addIssue({
          code: 'custom',
          path: [...path, 'positionMm'],
          message: `must be from ${s.carriers.lengthMm} mm (one carrier length, so the whole carrier is on the lane) to the lane's length, ${length} mm`,
        });
        return;
      }
      const list = byLane.get(station.laneId) ?? [];
      list.push({ position: station.positionMm, path });
      byLane.set(station.laneId, list);
    }),
  );
  // Sorted by position, a station too close to any other is too close to its neighbour: n log n, not n².
  for (const [laneId, list] of byLane) {
    list.sort((a, b) => a.position - b.position);
    for (let k = 1; k < list.length; k += 1) {
      if (list[k].position - list[k - 1].position < pitch) {
        ctx.addIssue({
          code: 'custom',
          path: [...list[k].path, 'positionMm'],
          message: `is closer than ${spacing} to the station at ${list[k - 1].position} mm on lane "${laneId}"`,
        });
      }
    }
  }
}

function empiricalSamples(d: Distribution): number {
  return d.kind === 'empirical' ? d.samples.length : 0;
}

function checkTotals(s: ScenarioShape, ctx: Ctx): void {
  const stations = s.steps.flatMap((step) => step.stations);
  if (stations.length > PROCESS_LIMITS.stationsMax) {
    ctx.addIssue({
      code: 'custom',
      path: ['steps'],
      message: `the line has ${stations.length} stations; at most ${PROCESS_LIMITS.stationsMax} are allowed`,
    });
  }
  const samples = stations.reduce(
    (sum, st) =>
      sum +
      empiricalSamples(st.cycleTimeSeconds) +
      (st.failures
        ? empiricalSamples(st.failures.timeBetweenFailuresSeconds) + empiricalSamples(st.failures.timeToRepairSeconds)
        : 0),
    0,
  );
  if (samples > PROCESS_LIMITS.empiricalSamplesTotalMax) {
    ctx.addIssue({
      code: 'custom',
      path: ['steps'],
      message: `empirical distributions hold ${samples} measured times in all; at most ${PROCESS_LIMITS.empiricalSamplesTotalMax} are allowed: thin the time studies or fit distributions`,
    });
  }
}

function checkSteps(s: ScenarioShape, ctx: Ctx, stepIds: Map<string, number>): void {
  const last = s.steps.length - 1;
  s.steps.forEach((step, i) => {
    if (step.kind === 'load' && i !== 0)
      ctx.addIssue({
        code: 'custom',
        path: ['steps', i, 'kind'],
        message: 'load must be the first step, and only the first',
      });
    if (step.kind === 'unload' && i !== last)
      ctx.addIssue({
        code: 'custom',
        path: ['steps', i, 'kind'],
        message: 'unload must be the last step, and only the last',
      });
    if (step.kind !== 'inspect') return;
    if (step.rejectShare + step.reworkShare > 1) {
      ctx.addIssue({
        code: 'custom',
        path: ['steps', i, 'reworkShare'],
        message: `rejectShare + reworkShare is ${step.rejectShare + step.reworkShare}; together they must be at most 1`,
      });
    }
    if (step.reworkShare > 0 && step.reworkStepId === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['steps', i, 'reworkStepId'],
        message: 'is required when reworkShare is above zero: name the step rework goes back to',
      });
    }
    if (step.reworkStepId === undefined) return;
    if (!mustExist(ctx, stepIds, 'step', step.reworkStepId, ['steps', i, 'reworkStepId'])) return;
    const target = stepIds.get(step.reworkStepId) ?? 0;
    if (target === 0 || target > i) {
      ctx.addIssue({
        code: 'custom',
        path: ['steps', i, 'reworkStepId'],
        message: `rework goes back to a step after load and no later than this inspection; "${step.reworkStepId}" is step ${target}`,
      });
    }
  });
  if (s.steps[0]?.kind !== 'load')
    ctx.addIssue({ code: 'custom', path: ['steps', 0, 'kind'], message: 'the first step must be a load step' });
  if (s.steps[last]?.kind !== 'unload')
    ctx.addIssue({ code: 'custom', path: ['steps', last, 'kind'], message: 'the last step must be an unload step' });
}

export function checkReferences(s: ScenarioShape, ctx: Ctx): void {
  const deckIds = unique(
    ctx,
    'deck',
    s.decks.map((d, i) => ({ id: d.id, path: ['decks', i] })),
  );
  const laneIds = unique(
    ctx,
    'lane',
    s.lanes.map((l, i) => ({ id: l.id, path: ['lanes', i] })),
  );
  unique(
    ctx,
    'transfer',
    s.transfers.map((t, i) => ({ id: t.id, path: ['transfers', i] })),
  );
  const stepIds = unique(
    ctx,
    'step',
    s.steps.map((st, i) => ({ id: st.id, path: ['steps', i] })),
  );
  unique(
    ctx,
    'station',
    s.steps.flatMap((st, i) =>
      st.stations.map((station, j) => ({ id: station.id, path: ['steps', i, 'stations', j] })),
    ),
  );
  checkTrack(s, ctx, deckIds, laneIds);
  checkStations(s, ctx, laneIds);
  checkSteps(s, ctx, stepIds);
  checkTotals(s, ctx);
  if (s.conveyor.kind === 'belt' && s.conveyor.pitchMm < s.carriers.lengthMm) {
    ctx.addIssue({
      code: 'custom',
      path: ['conveyor', 'pitchMm'],
      message: `must be at least the carrier length, ${s.carriers.lengthMm} mm`,
    });
  }
}
