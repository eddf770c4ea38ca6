// Seeded uniform random streams for the simulation kernel. Every station and purpose draws from its
// own stream, keyed by name, so editing one station never reshuffles another's draws, and two
// scenarios run with the same seed and replication share their random numbers where keys match.
import seedrandom from 'seedrandom';

/** A uniform draw in [0, 1), with 2^-32 resolution (Alea's native output). */
export type UniformStream = () => number;

/** Callable as `streams(key)`; `streams.stream(key)` is the same function, for code that reads better so. */
export type StreamFactory = ((key: string) => UniformStream) & {
  stream: (key: string) => UniformStream;
  readonly seed: string;
  readonly replication: number;
};

/**
 * The seed string is a JSON array so that no seed, replication or key can run into the next
 * ("1" + "23" never equals "12" + "3"); a numeric seed and its decimal string give the same streams.
 */
export function streamSeed(seed: string | number, replication: number, key: string): string {
  return JSON.stringify(['lanewright', String(seed), replication, key]);
}

export function createStreamFactory(seed: string | number, replication: number): StreamFactory {
  const stream = (key: string): UniformStream => seedrandom.alea(streamSeed(seed, replication, key));
  return Object.assign(stream, { stream, seed: String(seed), replication });
}
