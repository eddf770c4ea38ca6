// Checks that a run's memory does not grow with its length: the same line simulated for 8 and for
// 80 hours, heap and RSS read after a full garbage collection, and the size of the result (whose
// series and heatmaps have a fixed number of bins, so it holds as many numbers either way).
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { runExperiment } from '../engine/index';

setFlagsFromString('--expose-gc');
const collect = runInNewContext('gc') as () => void;

export type MemoryPoint = {
  hours: number;
  events: number;
  heapUsedMb: number;
  rssMb: number;
  peakHeapMb: number;
  resultBytes: number;
  resultNumbers: number;
};

const MB = 1024 * 1024;

/** Numbers in the result: fixed by the bins whatever the run length (its bytes grow a little as counts gain digits). */
function countNumbers(x: unknown): number {
  if (typeof x === 'number') return 1;
  if (Array.isArray(x)) return x.reduce((n: number, v) => n + countNumbers(v), 0);
  if (x !== null && typeof x === 'object') return Object.values(x).reduce((n: number, v) => n + countNumbers(v), 0);
  return 0;
}

async function point(scenario: unknown, hours: number): Promise<MemoryPoint> {
  collect();
  let peakHeap = process.memoryUsage().heapUsed;
  const result = await runExperiment(
    scenario,
    { hours, warmupMinutes: 0, replications: 1, seed: 'memory' },
    {
      now: () => performance.now(),
      yieldToHost: async () => {
        const heap = process.memoryUsage().heapUsed;
        if (heap > peakHeap) peakHeap = heap;
      },
    },
  );
  const resultBytes = JSON.stringify(result).length;
  const resultNumbers = countNumbers(result);
  collect();
  const usage = process.memoryUsage();
  return {
    hours,
    events: result.events,
    heapUsedMb: usage.heapUsed / MB,
    rssMb: usage.rss / MB,
    peakHeapMb: peakHeap / MB,
    resultBytes,
    resultNumbers,
  };
}

export async function memoryGrowth(
  scenario: unknown,
  shortHours: number,
  longHours: number,
): Promise<{ short: MemoryPoint; long: MemoryPoint }> {
  await point(scenario, shortHours);
  const short = await point(scenario, shortHours);
  const long = await point(scenario, longHours);
  return { short, long };
}
