import { MessageChannel, type MessagePort } from 'node:worker_threads';
import * as Comlink from 'comlink';
import nodeEndpoint from 'comlink/dist/umd/node-adapter';
import { afterEach, describe, expect, it } from 'vitest';
import { createWorkerApi, type SimulationWorkerApi } from '../../workers/engine/worker-api';
import { loadExample } from './helpers';

const ports: MessagePort[] = [];

function connect(): Comlink.Remote<SimulationWorkerApi> {
  const { port1, port2 } = new MessageChannel();
  ports.push(port1, port2);
  Comlink.expose(
    createWorkerApi(() => performance.now()),
    nodeEndpoint(port1),
  );
  return Comlink.wrap<SimulationWorkerApi>(nodeEndpoint(port2));
}

afterEach(() => {
  for (const p of ports.splice(0)) p.close();
});

describe('worker API over comlink', () => {
  it('runs a scenario and reports progress through a proxied callback', async () => {
    const remote = connect();
    const fractions: number[] = [];
    const outcome = await remote.run(
      loadExample('side-by-side-loop.json'),
      { hours: 0.25, warmupMinutes: 1, replications: 2 },
      Comlink.proxy((p: { fraction: number }) => void fractions.push(p.fraction)),
    );
    expect(outcome.ok).toBe(true);
    if (outcome.ok) expect(outcome.result.throughputPerHour.mean).toBeGreaterThan(0);
    // Progress messages are fire-and-forget and may trail the result by a moment.
    await new Promise((resolve) => setTimeout(resolve, 100));
    expect(fractions.at(-1)).toBe(1);
  });

  it('answers an invalid scenario with the field paths', async () => {
    const remote = connect();
    const doc = loadExample('stacked-loop.json') as { carriers: { count: number } };
    doc.carriers.count = 0;
    const outcome = await remote.run(doc, {});
    expect(outcome).toMatchObject({ ok: false, kind: 'invalid' });
    if (!outcome.ok && outcome.kind === 'invalid') expect(outcome.issues[0].path).toBe('carriers.count');
  });

  it('cancels a running experiment', async () => {
    const remote = connect();
    let cancelSent = false;
    const outcome = await remote.run(
      loadExample('stacked-loop.json'),
      { hours: 2000, warmupMinutes: 0, replications: 1 },
      Comlink.proxy(() => {
        if (!cancelSent) {
          cancelSent = true;
          void remote.cancel();
        }
      }),
    );
    expect(outcome).toMatchObject({ ok: false, kind: 'stopped', reason: 'cancelled' });
  }, 30_000);
});
