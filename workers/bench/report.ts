// The benchmark's report: its JSON shape and the plain-text table printed by default.
import type { Measurement } from './measure';
import type { MemoryPoint } from './memory';

type Target = { target: number; measured: number; met: boolean };

export type BenchReport = {
  machine: { node: string; cpus: number; cpuModel: string; loadAverageBefore: number; loadAverageAfter: number };
  scenarios: { name: string; single: Measurement; thirty: Measurement }[];
  large: { eventsPerSecond: number; eventsPerCpuSecond: number; wallMsPerShift: number; cpuMsPerShift: number; wallMsPerShiftCold: number; eventsPerShift: number; peakRssMb: number };
  memory: { short: MemoryPoint; long: MemoryPoint; heapGrowthMb: number };
  targets: { eventsPerSecond: Target; wallMsPerShift: Target; heapGrowthMb: Target };
};

const int = (x: number) => Math.round(x).toLocaleString('en-US');
const fixed = (x: number, d = 1) => x.toFixed(d);

function table(head: string[], rows: string[][]): string {
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
  const line = (cells: string[]) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join('  ');
  return [line(head), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n');
}

const verdict = (t: Target) => (t.met ? 'met' : 'MISSED');

export function formatReport(r: BenchReport): string {
  const runs = table(
    ['scenario (8 h, no warm-up)', 'reps', 'events', 'wall ms', 'events/s', 'CPU ms', 'events/CPU s', 'peak RSS MB', 'parts/h'],
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
    [r.memory.short, r.memory.long].map((p) => [`${p.hours} h`, int(p.events), fixed(p.heapUsedMb), fixed(p.peakHeapMb), fixed(p.rssMb), int(p.resultNumbers), int(p.resultBytes)]),
  );
  const t = r.targets;
  return [
    `Lanewright engine benchmark — Node ${r.machine.node}, ${r.machine.cpus} × ${r.machine.cpuModel}, load average ${fixed(r.machine.loadAverageBefore, 2)} before, ${fixed(r.machine.loadAverageAfter, 2)} after`,
    '',
    runs,
    '',
    `Large line, one 8-hour shift: ${int(r.large.wallMsPerShift)} ms warm (median of 5; ${int(r.large.cpuMsPerShift)} ms of CPU), ${int(r.large.wallMsPerShiftCold)} ms cold, ${int(r.large.eventsPerShift)} events`,
    '',
    'Memory against run length (large line, one replication):',
    mem,
    '',
    'Targets:',
    `  events/s, large line, 30 replications  ≥ ${int(t.eventsPerSecond.target)}: ${int(t.eventsPerSecond.measured)}  ${verdict(t.eventsPerSecond)} (${int(r.large.eventsPerCpuSecond)} per CPU second)`,
    `  wall time of one shift, large line     < ${int(t.wallMsPerShift.target)} ms: ${int(t.wallMsPerShift.measured)} ms  ${verdict(t.wallMsPerShift)}`,
    `  heap growth 8 h → 80 h                 < ${t.heapGrowthMb.target} MB: ${fixed(t.heapGrowthMb.measured, 2)} MB  ${verdict(t.heapGrowthMb)}`,
  ].join('\n');
}
