// `npm run bench`: speed and memory of the engine on every example scenario and on a large built-in
// line (three decks, 20 stations, 50 carriers, one 8-hour shift). Prints a table, or with --json
// one JSON object. The targets are checked here and only here, never in timed tests; a missed
// target is reported, not thrown, because figures depend on the machine and its load.
import { readdirSync, readFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { largeLine } from './large-line';
import { measure, warmMedian, type Measurement } from './measure';
import { memoryGrowth } from './memory';
import { formatReport, type BenchReport } from './report';

export const TARGETS = {
  /** Events per second for the full model, across 30 replications. */
  eventsPerSecond: 2_000_000,
  /** Wall time of one 8-hour shift of the large line, one replication, JIT warm. */
  wallMsPerShift: 500,
  /** Heap growth allowed from an 8-hour to an 80-hour run, after garbage collection. */
  heapGrowthMb: 2,
} as const;

const EXAMPLES_DIR = join(import.meta.dirname, '../../shared/examples');
const SHIFT = { hours: 8, warmupMinutes: 0 } as const;

async function scenarioRow(name: string, scenario: unknown): Promise<{ name: string; single: Measurement; thirty: Measurement }> {
  const single = await measure(scenario, { ...SHIFT, replications: 1, seed: 1 });
  const thirty = await measure(scenario, { ...SHIFT, replications: 30, seed: 1 });
  return { name, single, thirty };
}

async function main(): Promise<void> {
  const json = process.argv.includes('--json');
  const loadBefore = loadavg();
  const examples = readdirSync(EXAMPLES_DIR).filter((f) => f.endsWith('.json')).sort();
  const rows = [];
  for (const file of examples) rows.push(await scenarioRow(file, JSON.parse(readFileSync(join(EXAMPLES_DIR, file), 'utf8'))));
  const large = largeLine();
  const shift = await warmMedian(large, { ...SHIFT, replications: 1, seed: 1 }, 5);
  const largeRow = await scenarioRow('large line (built in)', large);
  rows.push(largeRow);
  const memory = await memoryGrowth(large, 8, 80);
  const heapGrowthMb = memory.long.heapUsedMb - memory.short.heapUsedMb;
  const report: BenchReport = {
    machine: { node: process.version, cpus: cpus().length, cpuModel: cpus()[0]?.model ?? 'unknown', loadAverageBefore: loadBefore[0], loadAverageAfter: loadavg()[0] },
    scenarios: rows,
    large: {
      eventsPerSecond: largeRow.thirty.eventsPerSecond,
      eventsPerCpuSecond: largeRow.thirty.eventsPerCpuSecond,
      wallMsPerShift: shift.median.wallMs,
      cpuMsPerShift: shift.median.cpuMs,
      wallMsPerShiftCold: shift.cold.wallMs,
      eventsPerShift: shift.median.events,
      peakRssMb: Math.max(largeRow.single.peakRssMb, largeRow.thirty.peakRssMb),
    },
    memory: { ...memory, heapGrowthMb },
    targets: {
      eventsPerSecond: { target: TARGETS.eventsPerSecond, measured: largeRow.thirty.eventsPerSecond, met: largeRow.thirty.eventsPerSecond >= TARGETS.eventsPerSecond },
      wallMsPerShift: { target: TARGETS.wallMsPerShift, measured: shift.median.wallMs, met: shift.median.wallMs < TARGETS.wallMsPerShift },
      heapGrowthMb: { target: TARGETS.heapGrowthMb, measured: heapGrowthMb, met: heapGrowthMb < TARGETS.heapGrowthMb && memory.long.resultNumbers === memory.short.resultNumbers },
    },
  };
  process.stdout.write(json ? `${JSON.stringify(report)}\n` : `${formatReport(report)}\n`);
}

main().catch((e: unknown) => {
  process.stderr.write(`bench failed: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exit(1);
});
