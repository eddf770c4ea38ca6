// Combines the replications of an experiment into the run result: headline numbers as means with
// 95 % Student t intervals, everything else as means across replications. Numbers in the long series
// are rounded to keep a stored result small; headline numbers keep full precision.
import { STATION_STATES, type RunResult } from '../../../shared/results/run-result';
import type { RunSettings } from '../../../shared/scenario/run-settings';
import { productiveHoursPerYear } from '../calendar/annual';
import type { CompiledLine } from '../model/compile';
import { studentT95 } from '../stats/student-t';
import { TR_CARRYING, TR_HOLDING, TR_IDLE, TR_RETURNING, TRANSFER_STATE_COUNT } from './observer';
import type { ReplicationSummary } from './replication-summary';

const round = (x: number, digits = 4) => {
  const f = 10 ** digits;
  return Math.round(x * f) / f;
};

function interval(values: number[]): { mean: number; ciLow: number; ciHigh: number } {
  const ci = studentT95(values);
  return { mean: ci.mean, ciLow: ci.ciLow, ciHigh: ci.ciHigh };
}

function meanOf(reps: ReplicationSummary[], pick: (r: ReplicationSummary) => number): number {
  let sum = 0;
  for (const r of reps) sum += pick(r);
  return sum / reps.length;
}

function meanQuantiles(reps: ReplicationSummary[], pick: (r: ReplicationSummary) => [number, number, number]) {
  return {
    mean: meanOf(reps, (r) => pick(r)[0]),
    p50: meanOf(reps, (r) => pick(r)[1]),
    p95: meanOf(reps, (r) => pick(r)[2]),
  };
}

function meanArray(arrays: ArrayLike<number>[], digits = 4): number[] {
  const out = new Array<number>(arrays[0].length).fill(0);
  for (const a of arrays) for (let i = 0; i < out.length; i++) out[i] += a[i];
  return out.map((x) => round(x / arrays.length, digits));
}

/** Lead-time histograms of all replications on the coarsest bin width among them (widths differ by powers of two). */
function mergeHistograms(reps: ReplicationSummary[]): { binWidthSeconds: number; counts: number[] } {
  const width = Math.max(...reps.map((r) => r.leadHistogram.binWidth));
  const bins = reps[0].leadHistogram.counts.length;
  const counts = new Array<number>(bins).fill(0);
  for (const r of reps) {
    const factor = Math.round(width / r.leadHistogram.binWidth);
    r.leadHistogram.counts.forEach((n, i) => {
      counts[Math.min(bins - 1, Math.floor(i / factor))] += n;
    });
  }
  return { binWidthSeconds: width, counts };
}

export type CombineInput = {
  line: CompiledLine;
  settings: RunSettings;
  engineVersion: string;
  reps: ReplicationSummary[];
  events: number[];
  timeBins: number;
  positionBins: number;
};

export function combineReplications({
  line,
  settings,
  engineVersion,
  reps,
  events,
  timeBins,
  positionBins,
}: CombineInput): RunResult {
  const s = line.scenario;
  const hoursPerYear = productiveHoursPerYear({ ...s.calendar, breaks: [] });
  const observedSeconds = settings.hours * 3600;
  const stations = s.steps.flatMap((step) => step.stations.map((st) => ({ st, stepId: step.id })));
  const K = STATION_STATES.length;
  const stationResults = stations.map(({ st, stepId }, i) => {
    const share = (k: number) => meanOf(reps, (r) => r.stationShares[i * K + k]);
    const sole = meanOf(reps, (r) => r.sole[i]);
    const shifting = meanOf(reps, (r) => r.shifting[i]);
    return {
      id: st.id,
      name: st.name,
      stepId,
      laneId: st.laneId,
      processing: share(0),
      starved: share(1),
      blocked: share(2),
      down: share(3),
      onBreak: share(4),
      bottleneckShare: sole + shifting,
      soleBottleneckShare: sole,
      shiftingBottleneckShare: shifting,
      meanCycleSeconds: meanOf(reps, (r) => r.meanCycle[i]),
      operationsPerHour: meanOf(reps, (r) => r.operationsPerHour[i]),
      failuresPerHour: meanOf(reps, (r) => r.failuresPerHour[i]),
      meanQueue: meanOf(reps, (r) => r.stationQueue[i]),
    };
  });
  let bottleneck: string | null = null;
  let best = 0;
  for (const st of stationResults) {
    if (st.bottleneckShare > best) {
      best = st.bottleneckShare;
      bottleneck = st.id;
    }
  }
  const transfers = s.transfers.map((t, j) => {
    const k = s.links.length + j;
    const share = (state: number) => meanOf(reps, (r) => r.transferShares[k * TRANSFER_STATE_COUNT + state]);
    const carrying = share(TR_CARRYING);
    const returning = share(TR_RETURNING);
    const idle = share(TR_IDLE);
    const sole = meanOf(reps, (r) => r.transferSole[k]);
    const shifting = meanOf(reps, (r) => r.transferShifting[k]);
    return {
      id: t.id,
      name: t.name,
      kind: t.kind,
      utilisation: 1 - idle,
      blocked: share(TR_HOLDING),
      carrying,
      returning,
      idle,
      busy: carrying + returning,
      bottleneckShare: sole + shifting,
      meanQueue: meanOf(reps, (r) => r.transferQueue[k]),
      movesPerHour: meanOf(reps, (r) => r.transferMovesPerHour[k]),
    };
  });
  // A transfer holds the line when it is the momentary bottleneck more often than any station.
  let bottleneckTransfer: string | null = null;
  for (const t of transfers) {
    if (t.bottleneckShare > best) {
      best = t.bottleneckShare;
      bottleneckTransfer = t.id;
    }
  }
  const throughput = reps.map((r) => r.throughputPerHour);
  return {
    engineVersion,
    seed: String(settings.seed),
    settings,
    scenarioName: s.name,
    conveyor: s.conveyor.kind,
    observedHours: settings.hours,
    throughputPerHour: interval(throughput),
    taktSeconds: interval(reps.map((r) => r.taktSeconds)),
    annualOutput: interval(throughput.map((x) => x * hoursPerYear)),
    targetTaktSeconds: s.targetTaktSeconds ?? null,
    hoursPerYear,
    bottleneckStationId: bottleneck,
    bottleneckTransferId: bottleneckTransfer,
    breakMode: s.calendar.breakMode,
    breakMinutesPerShift: s.calendar.breaks.reduce((sum, b) => sum + b.minutes, 0),
    stations: stationResults,
    transfers,
    lanes: s.lanes.map((lane, l) => ({
      id: lane.id,
      name: lane.name,
      lengthMm: line.laneLengthMm[l],
      capacity: Math.floor((line.laneLengthMm[l] - line.carrierLengthMm) / line.pitchMm) + 1,
      meanCarriers: meanOf(reps, (r) => r.laneMean[l]),
    })),
    carriers: {
      count: line.carrierCount,
      loopTimeSeconds: meanQuantiles(reps, (r) => r.loop),
      moving: meanOf(reps, (r) => r.carrierShares[0]),
      waiting: meanOf(reps, (r) => r.carrierShares[1]),
      working: meanOf(reps, (r) => r.carrierShares[2]),
      inTransfer: meanOf(reps, (r) => r.carrierShares[3]),
    },
    leadTimeSeconds: { ...meanQuantiles(reps, (r) => r.lead), histogram: mergeHistograms(reps) },
    timeInLineSeconds: meanQuantiles(reps, (r) => r.timeInLine),
    departuresPerHour: interval(reps.map((r) => r.departuresPerHour)),
    wip: {
      mean: meanOf(reps, (r) => r.wipMean),
      series: {
        startSeconds: settings.warmupMinutes * 60,
        binSeconds: observedSeconds / timeBins,
        values: meanArray(reps.map((r) => r.wipSeries)),
      },
    },
    parts: {
      loaded: meanOf(reps, (r) => r.loaded),
      output: meanOf(reps, (r) => r.output),
      scrapped: meanOf(reps, (r) => r.scrapped),
      reworked: meanOf(reps, (r) => r.reworked),
    },
    heatmaps: {
      startSeconds: settings.warmupMinutes * 60,
      binSeconds: observedSeconds / timeBins,
      timeBins,
      lanes: s.lanes.map((lane, l) => ({
        laneId: lane.id,
        positionBins,
        occupancy: meanArray(reps.map((r) => r.laneHeat[l])),
      })),
      stationStates: [...STATION_STATES],
      stations: stations.map(({ st }, i) => ({
        stationId: st.id,
        shares: meanArray(reps.map((r) => r.stationTimeline.subarray(i * timeBins * K, (i + 1) * timeBins * K))),
      })),
    },
    events: events.reduce((a, b) => a + b, 0),
    replications: reps.map((r, i) => ({
      replication: i,
      throughputPerHour: r.throughputPerHour,
      taktSeconds: r.taktSeconds,
      output: r.output,
      scrapped: r.scrapped,
      leadTimeMeanSeconds: r.lead[0],
      departuresPerHour: r.departuresPerHour,
      timeInLineMeanSeconds: r.timeInLine[0],
      wipMean: r.wipMean,
      events: events[i],
    })),
  };
}
