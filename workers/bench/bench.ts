// `npm run bench`: speed and memory of the engine on every example scenario and on a large built-in
// line (three decks, 20 stations, 50 carriers, one 8-hour shift), the cost per part on a queue loop
// at 8 to 1,000 carriers, and the bottleneck tracker's share at 20 and 88 stations. Events are
// counted as the engine counts them: entries taken off its event queue. Prints a table, or with
// --json one JSON object. The targets are checked here and only here, never in timed tests; a missed
// target is reported, not thrown, because figures depend on the machine and its load.
import { readdirSync, readFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { trackerShare } from './bottleneck-share';
import { coldShift } from './cold';
import { largeLine } from './large-line';
import { measure, warmMedian, type Measurement } from './measure';
import { memoryGrowth } from './memory';
import { queueCosts } from './queue-cost';
import { formatReport, type BenchReport } from './report';

export const TARGETS = {
  /** Events per second for the full model, across 30 replications. */
  eventsPerSecond: 4_000_000,
  /** Wall time of one 8-hour shift of the large line, one replication, JIT warm, on a quiet machine. */
  wallMsPerShift: 60,
  /** Heap growth allowed from an 8-hour to an 80-hour run, after garbage collection. */
  heapGrowthMb: 2,
  /** Events per part on the queue loop at 1,000 carriers over the figure at 8. */
  queueEventsRatio: 2,
  /** Tracker cost per event at 88 stations over the cost at 20 (1 means independent of the station count). */
  trackerCostRatio: 1.5,
} as const;

/** Copies of the large line's work decks for the tracker check: 1 gives 20 stations, 5 gives 88. */
const TRACKER_COPIES = [1, 5] as const;

const EXAMPLES_DIR = join(import.meta.dirname, '../../shared/examples');
const SHIFT = { hours: 8, warmupMinutes: 0 } as const;

async function scenarioRow(
  name: string,
  scenario: unknown,
): Promise<{ name: string; single: Measurement; thirty: Measurement }> {
  const single = await measure(scenario, { ...SHIFT, replications: 1, seed: 1 });
  const thirty = await measure(scenario, { ...SHIFT, replications: 30, seed: 1 });
  return { name, single, thirty };
}

async function main(): Promise<void> {
  const json = process.argv.includes('--json');
  const loadBefore = loadavg();
  const examples = readdirSync(EXAMPLES_DIR)
    .filter((f) => f.endsWith('.json'))
    .sort();
  const rows = [];
  for (const file of examples)
    rows.push(await scenarioRow(file, JSON.parse(readFileSync(join(EXAMPLES_DIR, file), 'utf8'))));
  const large = largeLine();
  const shift = await warmMedian(large, { ...SHIFT, replications: 1, seed: 1 }, 5);
  const largeRow = await scenarioRow('large line (built in)', large);
  rows.push(largeRow);
  const memory = await memoryGrowth(large, 8, 80);
  const heapGrowthMb = memory.long.heapUsedMb - memory.short.heapUsedMb;
  const queues = await queueCosts();
  const queueEventsRatio = queues[queues.length - 1].eventsPerPart / queues[0].eventsPerPart;
  const trackers = TRACKER_COPIES.map((copies) => trackerShare(largeLine(50 * copies, copies)));
  const trackerCostRatio = trackers[trackers.length - 1].nsPerEvent / trackers[0].nsPerEvent;
  const cold = coldShift();
  const report: BenchReport = {
    machine: {
      node: process.version,
      cpus: cpus().length,
      cpuModel: cpus()[0]?.model ?? 'unknown',
      loadAverageBefore: loadBefore[0],
      loadAverageAfter: loadavg()[0],
    },
    scenarios: rows,
    large: {
      eventsPerSecond: largeRow.thirty.eventsPerSecond,
      eventsPerCpuSecond: largeRow.thirty.eventsPerCpuSecond,
      wallMsPerShift: shift.median.wallMs,
      cpuMsPerShift: shift.median.cpuMs,
      wallMsPerShiftCold: shift.cold.wallMs,
      coldProcess: { wallMs: cold.run.wallMs, processMs: cold.processMs },
      eventsPerShift: shift.median.events,
      peakRssMb: Math.max(largeRow.single.peakRssMb, largeRow.thirty.peakRssMb),
    },
    memory: { ...memory, heapGrowthMb },
    queues,
    trackers,
    targets: {
      eventsPerSecond: {
        target: TARGETS.eventsPerSecond,
        measured: largeRow.thirty.eventsPerSecond,
        met: largeRow.thirty.eventsPerSecond >= TARGETS.eventsPerSecond,
      },
      wallMsPerShift: {
        target: TARGETS.wallMsPerShift,
        measured: shift.median.wallMs,
        met: shift.median.wallMs < TARGETS.wallMsPerShift,
      },
      heapGrowthMb: {
        target: TARGETS.heapGrowthMb,
        measured: heapGrowthMb,
        met: heapGrowthMb < TARGETS.heapGrowthMb && memory.long.resultNumbers === memory.short.resultNumbers,
      },
      queueEventsRatio: {
        target: TARGETS.queueEventsRatio,
        measured: queueEventsRatio,
        met: queueEventsRatio <= TARGETS.queueEventsRatio,
      },
      trackerCostRatio: {
        target: TARGETS.trackerCostRatio,
        measured: trackerCostRatio,
        met: trackerCostRatio <= TARGETS.trackerCostRatio,
      },
    },
  };
  process.stdout.write(json ? `${JSON.stringify(report)}\n` : `${formatReport(report)}\n`);
}

main().catch((e: unknown) => {
  process.stderr.write(`bench failed: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exit(1);
});
