// `npm run bench:compare -- --base <dir>`: this engine against another checkout of it, in one process,
// runs alternating so both see the same machine load. <dir> holds an earlier tree's workers/ and
// shared/ (for example `git archive main workers shared | tar -x -C <dir>`, with node_modules linked
// in). Two workloads: one 8-hour shift of the large line, and a slice of the demo carrier-sizing study
// (the stacked-loop example at several carrier counts, 30 min warm-up + 8 h). Reports processor time
// (process.cpuUsage, which load on a shared machine disturbs far less than wall time), the median over
// the alternating rounds of each engine's least time, the ratio new : base, and whether both engines
// gave the same throughput.
// Each engine runs in a fresh process of its own, started in its own tree, alternating in time so
// both see the same load. (Loading both into one process, or running a tree from outside its own
// directory, measured one engine against a copy of itself 10–15 % apart.)
import { readFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { spawnSync } from 'node:child_process';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { largeLine } from './large-line';

type RunExperiment = (
  scenario: unknown,
  settings: unknown,
  hooks: { now(): number; yieldToHost(): Promise<void> },
) => Promise<{ events: number; throughputPerHour: { mean: number } }>;

type Workload = { name: string; runs: { scenario: unknown; settings: unknown }[] };
type Timing = { cpuMs: number; events: number; throughput: number[] };

const args = process.argv.slice(2);
const baseArg = args[args.indexOf('--base') + 1];
const roundsArg = args.find((a) => a.startsWith('--rounds='));
const ROUNDS = roundsArg ? Math.max(1, Number(roundsArg.slice(9)) || 7) : 7;

const demo = JSON.parse(
  readFileSync(join(import.meta.dirname, '../../shared/examples/stacked-loop.json'), 'utf8'),
) as unknown;
/** Carrier counts spread over the demo's sizing range (one per station up to what the track holds). */
const DEMO_COUNTS = [6, 14, 22, 30, 38];

const WORKLOADS: Workload[] = [
  {
    name: 'large line, one 8-h shift',
    runs: [{ scenario: largeLine(), settings: { hours: 8, warmupMinutes: 0, replications: 1, seed: 1 } }],
  },
  {
    name: `demo sizing slice (${DEMO_COUNTS.length} counts × 2 reps, 0.5 + 8 h)`,
    runs: DEMO_COUNTS.map((carriers) => ({
      scenario: demo,
      settings: { hours: 8, warmupMinutes: 30, replications: 2, seed: 1, carriers },
    })),
  },
];

const hooks = { now: () => performance.now(), yieldToHost: async () => {} };
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const f = (x: number, d = 0) => x.toFixed(d);

async function time(run: RunExperiment, w: Workload): Promise<Timing> {
  const start = process.cpuUsage();
  let events = 0;
  const throughput: number[] = [];
  for (const r of w.runs) {
    const result = await run(r.scenario, r.settings, hooks);
    events += result.events;
    throughput.push(result.throughputPerHour.mean);
  }
  const cpu = process.cpuUsage(start);
  return { cpuMs: (cpu.user + cpu.system) / 1000, events, throughput };
}

/**
 * In a child process: one engine, one workload, two warm-up runs, then the least processor time of
 * seven. On a loaded machine a run's time only ever grows with the disturbance, so the least of
 * several is the steadiest estimate of the engine's own cost.
 */
async function child(dir: string, workload: number): Promise<void> {
  const { runExperiment } = (await import(pathToFileURL(join(dir, 'workers/engine/index.ts')).href)) as {
    runExperiment: RunExperiment;
  };
  const w = WORKLOADS[workload];
  for (let i = 0; i < 2; i++) await time(runExperiment, w);
  const runs: Timing[] = [];
  for (let i = 0; i < 7; i++) runs.push(await time(runExperiment, w));
  const cpuMs = Math.min(...runs.map((r) => r.cpuMs));
  process.stdout.write(`${JSON.stringify({ cpuMs, events: runs[0].events, throughput: runs[0].throughput })}\n`);
}

function inChild(dir: string, workload: number): Timing {
  // Run from the engine's own tree, so tsx compiles it with that tree's tsconfig.json (class fields as
  // assignments, useDefineForClassFields false). A tree outside the working directory is compiled
  // with esbuild's defaults instead (native class fields), which alone made the same engine about
  // 12 % slower here.
  const out = spawnSync(
    process.execPath,
    [...process.execArgv, import.meta.filename, '--child', dir, String(workload)],
    {
      encoding: 'utf8',
      cwd: dir,
    },
  );
  if (out.status !== 0) throw new Error(`the run of ${dir} failed: ${out.stderr}`);
  return JSON.parse(out.stdout.trim().split('\n').pop() ?? '{}') as Timing;
}

async function main(): Promise<void> {
  const childAt = args.indexOf('--child');
  if (childAt >= 0) return child(args[childAt + 1], Number(args[childAt + 2]));
  if (!baseArg || baseArg.startsWith('--')) throw new Error('give the earlier tree with --base <dir>');
  const dirs = { base: resolve(baseArg), new: resolve(import.meta.dirname, '../..') };
  console.log(
    `Engine A/B: ${ROUNDS} rounds, each a fresh process per engine (least CPU of 7 warm runs), alternating; load average ${f(loadavg()[0], 2)}`,
  );
  for (let k = 0; k < WORKLOADS.length; k++) {
    const cpu = { base: [] as number[], new: [] as number[] };
    const ratios: number[] = [];
    let same = true;
    let events = { base: 0, new: 0 };
    for (let i = 0; i < ROUNDS; i++) {
      const order = i % 2 === 0 ? (['base', 'new'] as const) : (['new', 'base'] as const);
      const t = { base: null as Timing | null, new: null as Timing | null };
      for (const e of order) t[e] = inChild(dirs[e], k);
      cpu.base.push(t.base!.cpuMs);
      cpu.new.push(t.new!.cpuMs);
      ratios.push(t.new!.cpuMs / t.base!.cpuMs);
      events = { base: t.base!.events, new: t.new!.events };
      same &&= t.base!.throughput.every((x, j) => Math.abs(x - t.new!.throughput[j]) <= 1e-9 * Math.abs(x));
    }
    const mb = median(cpu.base);
    const mn = median(cpu.new);
    console.log(
      `${WORKLOADS[k].name}: base ${f(mb)} ms CPU (${f(events.base)} events, ${f(events.base / mb / 1000, 2)} M/CPU s), ` +
        `new ${f(mn)} ms CPU (${f(events.new)} events, ${f(events.new / mn / 1000, 2)} M/CPU s); ` +
        `median ratio new/base ${f(median(ratios), 3)} (range ${f(Math.min(...ratios), 3)}–${f(Math.max(...ratios), 3)}); ` +
        `throughput ${same ? 'identical' : 'DIFFERS'}; load average ${f(loadavg()[0], 2)}`,
    );
  }
}

main().catch((e: unknown) => {
  process.stderr.write(`bench:compare failed: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exit(1);
});
