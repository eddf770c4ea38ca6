// Events and wall time per part on the queue loop at several carrier counts: the engine's work per
// part should not grow with the number of carriers standing in queues.
import { measure } from './measure';
import { QUEUE_LOOP_CARRIERS, queueLoop } from './queue-loop';

export type QueueCost = { carriers: number; parts: number; events: number; eventsPerPart: number; usPerPart: number };

const HOURS = 8;

export async function queueCosts(): Promise<QueueCost[]> {
  const out: QueueCost[] = [];
  for (const carriers of QUEUE_LOOP_CARRIERS) {
    const settings = { hours: HOURS, warmupMinutes: 0, replications: 1, seed: 1 };
    await measure(queueLoop(carriers), settings);
    const m = await measure(queueLoop(carriers), { ...settings, seed: 2 });
    const parts = m.throughputPerHour * HOURS;
    out.push({
      carriers,
      parts,
      events: m.events,
      eventsPerPart: m.events / parts,
      usPerPart: (m.wallMs * 1000) / parts,
    });
  }
  return out;
}
