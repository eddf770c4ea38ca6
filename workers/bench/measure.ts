// Times one experiment through the engine's public facade: wall and processor time, events per
// second and the peak resident set size, sampled between the engine's slices (about every 50 ms) and at the end.
import type { RunSettingsInput } from '../../shared/scenario/run-settings';
import { runExperiment } from '../engine/index';

export type Measurement = {
  replications: number;
  hours: number;
  events: number;
  wallMs: number;
  /** Processor time of this process (user + system); on a shared machine it shows what the wall time would be unloaded. */
  cpuMs: number;
  eventsPerSecond: number;
  eventsPerCpuSecond: number;
  peakRssMb: number;
  throughputPerHour: number;
};

const MB = 1024 * 1024;

export async function measure(scenario: unknown, settings: RunSettingsInput): Promise<Measurement> {
  let peak = process.memoryUsage.rss();
  const sample = () => {
    const rss = process.memoryUsage.rss();
    if (rss > peak) peak = rss;
  };
  const started = performance.now();
  const cpuStart = process.cpuUsage();
  const result = await runExperiment(scenario, settings, {
    now: () => performance.now(),
    yieldToHost: async () => sample(),
  });
  const wallMs = performance.now() - started;
  const cpu = process.cpuUsage(cpuStart);
  const cpuMs = (cpu.user + cpu.system) / 1000;
  sample();
  return {
    replications: result.replications.length,
    hours: result.observedHours,
    events: result.events,
    wallMs,
    cpuMs,
    eventsPerSecond: result.events / (wallMs / 1000),
    eventsPerCpuSecond: result.events / (cpuMs / 1000),
    peakRssMb: peak / MB,
    throughputPerHour: result.throughputPerHour.mean,
  };
}

/** The median of n single runs after one untimed run that lets the JIT compile the hot path. */
export async function warmMedian(
  scenario: unknown,
  settings: RunSettingsInput,
  n: number,
): Promise<{ cold: Measurement; median: Measurement }> {
  const cold = await measure(scenario, settings);
  const runs: Measurement[] = [];
  for (let i = 0; i < n; i++) runs.push(await measure(scenario, { ...settings, seed: `warm-${i}` }));
  runs.sort((a, b) => a.wallMs - b.wallMs);
  return { cold, median: runs[Math.floor(n / 2)] };
}
