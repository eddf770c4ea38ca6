// The bottleneck tracker's share of a run, and its cost per engine event, on lines of different
// station counts. One run records every report the tracker receives (station, active, time); the
// same reports are then replayed into a fresh tracker and timed alone. The share is the replay time
// over the run time, both warm and measured in the same process, so machine load largely cancels.
import { compileLine } from '../engine/model/compile';
import { Replication } from '../engine/replication';
import { BottleneckTracker } from '../engine/observe/bottleneck';
import { createStreamFactory } from '../engine/random/streams';
import { validateScenario } from '../engine/validate';

export type TrackerShare = {
  stations: number;
  events: number;
  runMs: number;
  replayMs: number;
  share: number;
  nsPerEvent: number;
};

type Trace = { station: Int32Array; active: Uint8Array; t: Float64Array; length: number };

const HOURS = 8;

function runOnce(scenario: unknown, trace: Trace | null): { events: number; ms: number; tracker: BottleneckTracker } {
  const checked = validateScenario(scenario);
  if (!checked.ok) throw new Error(checked.issues.map((i) => `${i.path}: ${i.message}`).join('; '));
  const line = compileLine(checked.scenario);
  const original = BottleneckTracker.prototype.setActive;
  if (trace) {
    BottleneckTracker.prototype.setActive = function record(
      this: BottleneckTracker,
      station: number,
      active: boolean,
      t: number,
    ) {
      if (trace.length === trace.t.length) grow(trace);
      trace.station[trace.length] = station;
      trace.active[trace.length] = active ? 1 : 0;
      trace.t[trace.length++] = t;
      original.call(this, station, active, t);
    };
  }
  try {
    const started = performance.now();
    const rep = new Replication(line, createStreamFactory('tracker', 0), {
      warmupSeconds: 0,
      endSeconds: HOURS * 3600,
      timeBins: 96,
      positionBins: 48,
      eventBudget: Infinity,
    });
    rep.run(() => false);
    return { events: rep.events, ms: performance.now() - started, tracker: rep.recorder.bottleneck };
  } finally {
    BottleneckTracker.prototype.setActive = original;
  }
}

function grow(trace: Trace): void {
  const n = trace.t.length * 2;
  const station = new Int32Array(n);
  station.set(trace.station);
  const active = new Uint8Array(n);
  active.set(trace.active);
  const t = new Float64Array(n);
  t.set(trace.t);
  Object.assign(trace, { station, active, t });
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

export function trackerShare(scenario: unknown, repeats = 5): TrackerShare {
  const trace: Trace = {
    station: new Int32Array(1 << 16),
    active: new Uint8Array(1 << 16),
    t: new Float64Array(1 << 16),
    length: 0,
  };
  const recorded = runOnce(scenario, trace);
  const template = recorded.tracker;
  const stations = template.sole.length;
  const runs: number[] = [];
  const replays: number[] = [];
  for (let i = 0; i < repeats; i++) {
    runs.push(runOnce(scenario, null).ms);
    const tracker = new BottleneckTracker(template.window, stations, template.bridgeSeconds);
    const started = performance.now();
    for (let k = 0; k < trace.length; k++) tracker.setActive(trace.station[k], trace.active[k] === 1, trace.t[k]);
    tracker.finish(HOURS * 3600);
    replays.push(performance.now() - started);
  }
  const runMs = median(runs);
  const replayMs = median(replays);
  return {
    stations,
    events: recorded.events,
    runMs,
    replayMs,
    share: replayMs / runMs,
    nsPerEvent: (replayMs * 1e6) / recorded.events,
  };
}
