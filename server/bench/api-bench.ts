// `npm run bench:api`: the API under load on loopback. A fresh database with the demo organisation and a
// long run history (`--runs` stored runs of real engine results), 50 signed-in users for `--seconds` per
// round listing projects, listing the project's runs and reading a run. Prints requests per second, p50/p95/
// p99 latency and errors per round and their median; exits non-zero on any error. Bounded in time.
import 'reflect-metadata';
import { median, numberOption } from './bench-options';
import autocannon from 'autocannon';
import { randomUUID } from 'node:crypto';
import { loadavg } from 'node:os';
import { runSettingsSchema } from '../../shared/scenario/run-settings';
import { runSummaryOf } from '../../shared/api/runs';
import { runExperiment } from '../../workers/engine';
import { createDataSource } from '../db/data-source';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from '../db/seed/demo';
import { ProjectEntity, RunEntity, ScenarioEntity, ScenarioRevisionEntity, UserEntity } from '../db/entities';
import { runMigrations } from '../db/migrate';
import { startServer } from '../index';
import { createDatabase, dropDatabase, ensureLocalPostgres } from '../setup/local-postgres';

const USERS = 50;
// Options as `--seconds=30 --rounds=3 --runs=342` (command-line flags, so nothing reads the environment here).
const SECONDS = numberOption('seconds', 30);
const ROUNDS = numberOption('rounds', 3);
const RUNS = numberOption('runs', 342);

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

async function seedHistory(ds: ReturnType<typeof createDataSource>): Promise<{ projectId: string; runId: string }> {
  const project = await ds.getRepository(ProjectEntity).findOneOrFail({ where: {} });
  const scenario = await ds.getRepository(ScenarioEntity).findOneOrFail({ where: { projectId: project.id } });
  const revision = await ds.getRepository(ScenarioRevisionEntity).findOneOrFail({ where: { scenarioId: scenario.id } });
  const author = await ds.getRepository(UserEntity).findOneByOrFail({ email: DEMO_ACCOUNTS[1].email });
  const settings = runSettingsSchema.parse({ hours: 1, warmupMinutes: 5, replications: 3, seed: 2026 });
  const results = await runExperiment(revision.document, settings);
  const summary = runSummaryOf(results);
  const rows = Array.from({ length: RUNS }, (_, i) => ({
    scenarioId: scenario.id,
    revisionId: revision.id,
    clientRunId: randomUUID(),
    name: `History run ${i + 1}`,
    settings,
    seed: results.seed,
    engineVersion: results.engineVersion,
    throughputPerHourMean: summary.throughputPerHour.mean,
    taktSecondsMean: summary.taktSeconds.mean,
    carriers: summary.carriers,
    summary,
    results,
    createdById: author.id,
  }));
  for (let i = 0; i < rows.length; i += 50) await ds.getRepository(RunEntity).insert(rows.slice(i, i + 50));
  const run = await ds
    .getRepository(RunEntity)
    .findOneOrFail({ where: { scenarioId: scenario.id }, select: { id: true } });
  return { projectId: project.id, runId: run.id };
}

async function signIn(url: string, email: string): Promise<string> {
  const res = await fetch(`${url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  if (res.status !== 200) throw new Error(`sign-in answered ${res.status}`);
  return (res.headers.get('set-cookie') ?? '').split(';')[0];
}

interface Round {
  requestsPerSecond: number;
  p50: number;
  p95: number;
  p99: number;
  errors: number;
  requests: number;
  /** What the errors were: answers by status (non-2xx), timeouts (no answer in 10 s), socket errors. */
  breakdown: string;
}

async function round(url: string, paths: string[], cookies: string[]): Promise<Round> {
  const latencies: number[] = [];
  let next = 0;
  let finish: (result: autocannon.Result) => void = () => undefined;
  let fail: (error: unknown) => void = () => undefined;
  const done = new Promise<autocannon.Result>((resolve, reject) => {
    finish = resolve;
    fail = reject;
  });
  const instance = autocannon(
    {
      url,
      connections: USERS,
      duration: SECONDS,
      // Each connection is one user with their own session, cycling through the three reads.
      requests: paths.map((path) => ({
        path,
        method: 'GET' as const,
        setupRequest: (req: autocannon.Request, context: object) => {
          const user = context as { cookie?: string };
          user.cookie ??= cookies[next++ % cookies.length];
          return { ...req, headers: { ...req.headers, Cookie: user.cookie } };
        },
      })),
    },
    (error, result) => (error ? fail(error) : finish(result)),
  );
  const statuses = new Map<number, number>();
  instance.on('response', (_client: unknown, status: number, _bytes: number, responseTime: number) => {
    latencies.push(responseTime);
    if (status >= 300) statuses.set(status, (statuses.get(status) ?? 0) + 1);
  });
  const result = await done;
  latencies.sort((a, b) => a - b);
  return {
    requestsPerSecond: result.requests.total / SECONDS,
    p50: percentile(latencies, 50),
    p95: percentile(latencies, 95),
    p99: percentile(latencies, 99),
    errors: result.errors + result.timeouts + result.non2xx,
    requests: result.requests.total,
    breakdown: [
      ...[...statuses].map(([status, n]) => `${n} × ${status}`),
      `${result.timeouts} timeouts`,
      `${result.errors - result.timeouts} socket errors`,
    ].join(', '),
  };
}

async function main(): Promise<void> {
  const postgres = await ensureLocalPostgres();
  const url = postgres.url('lanewright_bench');
  await dropDatabase(url);
  await createDatabase(url);
  const ds = createDataSource(url);
  await ds.initialize();
  await runMigrations(ds);
  await seedDemo(ds);
  const { projectId, runId } = await seedHistory(ds);
  const server = await startServer({ dataSource: ds, port: 0, host: '127.0.0.1' });
  try {
    const cookies: string[] = [];
    for (let i = 0; i < USERS; i += 1)
      cookies.push(await signIn(server.url, DEMO_ACCOUNTS[i % DEMO_ACCOUNTS.length].email));
    const paths = ['/api/projects', `/api/projects/${projectId}/runs?limit=50`, `/api/runs/${runId}`];
    for (const path of paths) {
      const started = performance.now();
      for (let i = 0; i < 5; i += 1)
        await (await fetch(`${server.url}${path}`, { headers: { Cookie: cookies[0] } })).arrayBuffer();
      console.log(
        `one user, ${path.split('?')[0].replace(/[0-9a-f-]{36}/g, ':id')}: ${((performance.now() - started) / 5).toFixed(1)} ms per request`,
      );
    }
    const sizes = await Promise.all(
      paths.map(
        async (path) =>
          (await (await fetch(`${server.url}${path}`, { headers: { Cookie: cookies[0] } })).arrayBuffer()).byteLength,
      ),
    );
    console.log(
      `${RUNS} stored runs; answer sizes: ${paths.map((p, i) => `${p.split('?')[0].replace(/[0-9a-f-]{36}/g, ':id')} ${(sizes[i] / 1024).toFixed(1)} KB`).join(', ')}`,
    );
    console.log(
      `${USERS} users, ${ROUNDS} round(s) of ${SECONDS} s on loopback; load average ${loadavg()
        .map((n) => n.toFixed(2))
        .join(' ')}\n`,
    );
    console.log('round  requests/s   p50 ms   p95 ms   p99 ms   errors');
    const rounds: Round[] = [];
    for (let r = 0; r < ROUNDS; r += 1) {
      const result = await round(server.url, paths, cookies);
      rounds.push(result);
      console.log(
        `${String(r + 1).padStart(5)}  ${result.requestsPerSecond.toFixed(0).padStart(10)}  ${result.p50.toFixed(0).padStart(7)}  ${result.p95.toFixed(0).padStart(7)}  ${result.p99.toFixed(0).padStart(7)}  ${String(result.errors).padStart(7)}${result.errors > 0 ? `  (${result.breakdown})` : ''}`,
      );
    }
    const errors = rounds.reduce((sum, r) => sum + r.errors, 0);
    console.log(
      `\nmedian: ${median(rounds.map((r) => r.requestsPerSecond)).toFixed(0)} requests/s, p95 ${median(rounds.map((r) => r.p95)).toFixed(0)} ms; errors in all rounds: ${errors}`,
    );
    console.log(
      `load average at the end: ${loadavg()
        .map((n) => n.toFixed(2))
        .join(' ')}`,
    );
    if (errors > 0) process.exitCode = 1;
  } finally {
    await server.close();
    await ds.destroy();
    await dropDatabase(url);
    await postgres.stop();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});
