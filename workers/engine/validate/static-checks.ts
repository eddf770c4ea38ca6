// Checks that need the whole scenario understood as a line, run after the schema has accepted the
// document: every step has a station, every station can be reached from loading and the loop back
// to loading closes, the carriers fit on the track, elevators actually lift.
import type { Scenario } from '../../../shared/scenario/scenario';
import { laneLengthMm } from '../../../shared/scenario/track';
import { compileLine } from '../model/compile';

export type ValidationIssue = { path: string; message: string };

/** Carriers one lane holds end to end: its length over the carrier pitch. */
export function laneSlots(s: Scenario, lane: Scenario['lanes'][number]): number {
  const pitch = s.conveyor.kind === 'belt' ? s.conveyor.pitchMm : s.carriers.lengthMm + s.carriers.minGapMm;
  return Math.floor(laneLengthMm(lane) / pitch);
}

/** Carriers the track holds when every lane is full (length over carrier pitch) plus one per transfer. */
export function trackCapacity(s: Scenario): number {
  let total = s.transfers.length;
  for (const lane of s.lanes) total += laneSlots(s, lane);
  return total;
}

export function checkCarrierCount(s: Scenario, count: number, path: string): ValidationIssue[] {
  const capacity = trackCapacity(s);
  if (count <= capacity) return [];
  return [
    {
      path,
      message: `${count} carriers do not fit: the track holds ${capacity} (each lane's length over carrier length plus gap, plus one per transfer); use fewer carriers or longer lanes`,
    },
  ];
}

function checkElevators(s: Scenario): ValidationIssue[] {
  const elevation = new Map(s.lanes.map((l) => [l.id, s.decks.find((d) => d.id === l.deckId)?.elevationMm ?? 0]));
  const issues: ValidationIssue[] = [];
  s.transfers.forEach((t, i) => {
    if (t.kind === 'elevator' && elevation.get(t.fromLaneId) === elevation.get(t.toLaneId)) {
      issues.push({
        path: `transfers[${i}].toLaneId`,
        message: "the two decks have the same elevation, so the elevator lifts nothing; set the decks' elevationMm",
      });
    }
  });
  return issues;
}

function checkReachability(s: Scenario): ValidationIssue[] {
  const line = compileLine(s);
  const loadStation = line.stepStations[0][0];
  const loadLane = line.stationLane[loadStation];
  const n = line.laneCount;
  const { cost } = line.routes;
  const laneName = (i: number) => `"${s.lanes[i].id}"`;
  const issues: ValidationIssue[] = [];
  if (cost[loadLane * n + loadLane] === Infinity) {
    issues.push({
      path: 'steps[0].stations[0].laneId',
      message: `no track leads from the end of lane ${laneName(loadLane)} back to its start, so carriers cannot return to loading; the loop must close (add links or transfers)`,
    });
  }
  s.steps.forEach((step, i) =>
    step.stations.forEach((station, j) => {
      const lane = line.stationLane[line.stepStations[i][j]];
      const path = `steps[${i}].stations[${j}].laneId`;
      if (lane === loadLane) return;
      if (cost[loadLane * n + lane] === Infinity) {
        issues.push({
          path,
          message: `station "${station.id}" on lane ${laneName(lane)} cannot be reached from the load station's lane ${laneName(loadLane)}`,
        });
      } else if (cost[lane * n + loadLane] === Infinity) {
        issues.push({
          path,
          message: `no track leads from lane ${laneName(lane)} back to the load station's lane ${laneName(loadLane)}; the loop must close`,
        });
      }
    }),
  );
  return issues;
}

export function staticChecks(s: Scenario): ValidationIssue[] {
  const issues: ValidationIssue[] = [];
  s.steps.forEach((step, i) => {
    if (step.stations.length === 0)
      issues.push({ path: `steps[${i}].stations`, message: `step "${step.id}" has no station; add at least one` });
  });
  issues.push(...checkElevators(s));
  issues.push(...checkCarrierCount(s, s.carriers.count, 'carriers.count'));
  if (issues.some((i) => i.path.endsWith('.stations'))) return issues;
  return [...issues, ...checkReachability(s)];
}
