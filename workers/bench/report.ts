// The benchmark's report: its JSON shape and the plain-text table printed by default.
import type { Measurement } from './measure';
import type { TrackerShare } from './bottleneck-share';
import type { MemoryPoint } from './memory';
import type { QueueCost } from './queue-cost';

type Target = { target: number; measured: number; met: boolean };

export type BenchReport = {
  machine: { node: string; cpus: number; cpuModel: string; loadAverageBefore: number; loadAverageAfter: number };
  scenarios: { name: string; single: Measurement; thirty: Measurement }[];
  large: {
    eventsPerSecond: number;
    eventsPerCpuSecond: number;
    wallMsPerShift: number;
    cpuMsPerShift: number;
    wallMsPerShiftCold: number;
    /** A fresh process: the shift itself, and the process from start to exit. */
    coldProcess: { wallMs: number; processMs: number };
    eventsPerShift: number;
    peakRssMb: number;
  };
  memory: { short: MemoryPoint; long: MemoryPoint; heapGrowthMb: number };
  queues: QueueCost[];
  trackers: TrackerShare[];
  targets: {
    eventsPerSecond: Target;
    wallMsPerShift: Target;
    heapGrowthMb: Target;
    queueEventsRatio: Target;
    trackerCostRatio: Target;
  };
};

const int = (x: number) => Math.round(x).toLocaleString('en-US');
const fixed = (x: number, d = 1) => x.toFixed(d);

function table(head: string[], rows: string[][]): string {
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
  const line = (cells: string[]) =>
    cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join('  ');
  return [line(head), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n');
}

const verdict = (t: Target) => (t.met ? 'met' : 'MISSED');

export function formatReport(r: BenchReport): string {
  const runs = table(
    [
      'scenario (8 h, no warm-up)',
      'reps',
      'events',
      'wall ms',
      'events/s',
      'CPU ms',
      'events/CPU s',
      'peak RSS MB',
      'parts/h',
    ],
    r.scenarios.flatMap((s) =>
      [s.single, s.thirty].map((m) => [
        s.name,
        String(m.replications),
        int(m.events),
        int(m.wallMs),
        int(m.eventsPerSecond),
        int(m.cpuMs),
        int(m.eventsPerCpuSecond),
        fixed(m.peakRssMb),
        fixed(m.throughputPerHour),
      ]),
    ),
  );
  const mem = table(
    ['run length', 'events', 'heap MB (after GC)', 'peak heap MB', 'RSS MB', 'result numbers', 'result bytes'],
    [r.memory.short, r.memory.long].map((p) => [
      `${p.hours} h`,
      int(p.events),
      fixed(p.heapUsedMb),
      fixed(p.peakHeapMb),
      fixed(p.rssMb),
      int(p.resultNumbers),
      int(p.resultBytes),
    ]),
  );
  const queues = table(
    ['queue loop (8 h)', 'parts', 'events', 'events/part', 'µs/part'],
    r.queues.map((q) => [
      `${q.carriers} carriers`,
      int(q.parts),
      int(q.events),
      fixed(q.eventsPerPart),
      fixed(q.usPerPart),
    ]),
  );
  const trackers = table(
    ['bottleneck tracker (8 h)', 'events', 'run ms', 'tracker ms', 'share', 'ns/event'],
    r.trackers.map((x) => [
      `${x.stations} stations`,
      int(x.events),
      int(x.runMs),
      fixed(x.replayMs),
      `${fixed(100 * x.share)} %`,
      fixed(x.nsPerEvent),
    ]),
  );
  const t = r.targets;
  return [
    `Lanewright engine benchmark — Node ${r.machine.node}, ${r.machine.cpus} × ${r.machine.cpuModel}, load average ${fixed(r.machine.loadAverageBefore, 2)} before, ${fixed(r.machine.loadAverageAfter, 2)} after`,
    '',
    runs,
    '',
    `Large line, one 8-hour shift: ${int(r.large.wallMsPerShift)} ms warm (median of 5; ${int(r.large.cpuMsPerShift)} ms of CPU), ${int(r.large.wallMsPerShiftCold)} ms first in this process, ${int(r.large.eventsPerShift)} events`,
    `Cold first shift in a fresh process: ${int(r.large.coldProcess.wallMs)} ms for the shift, ${int(r.large.coldProcess.processMs)} ms from process start to exit`,
    '',
    'Cost per part against carriers in queues (queue loop, warm):',
    queues,
    '',
    'Bottleneck tracker against station count (large line repeated, tracker replayed alone):',
    trackers,
    '',
    'Memory against run length (large line, one replication):',
    mem,
    '',
    'Targets:',
    `  events/s, large line, 30 replications  ≥ ${int(t.eventsPerSecond.target)}: ${int(t.eventsPerSecond.measured)}  ${verdict(t.eventsPerSecond)} (${int(r.large.eventsPerCpuSecond)} per CPU second)`,
    `  wall time of one shift, large line     < ${int(t.wallMsPerShift.target)} ms: ${int(t.wallMsPerShift.measured)} ms  ${verdict(t.wallMsPerShift)}`,
    `  heap growth 8 h → 80 h                 < ${t.heapGrowthMb.target} MB: ${fixed(t.heapGrowthMb.measured, 2)} MB  ${verdict(t.heapGrowthMb)}`,
    `  events/part, 1,000 over 8 carriers     ≤ ${t.queueEventsRatio.target}: ${fixed(t.queueEventsRatio.measured, 2)}  ${verdict(t.queueEventsRatio)}`,
    `  tracker ns/event, 88 over 20 stations  ≤ ${t.trackerCostRatio.target}: ${fixed(t.trackerCostRatio.measured, 2)}  ${verdict(t.trackerCostRatio)}`,
  ].join('\n');
}
