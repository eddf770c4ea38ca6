// Why a run ended early. Every early stop carries a reason a user can act on; a gridlock also names
// each carrier and what it waits for.
export type StopReason = 'cancelled' | 'eventBudget' | 'wallClockBudget' | 'gridlock';

export type GridlockEntry = { carrier: number; at: string; waitingFor: string };

export class SimulationStoppedError extends Error {
  override readonly name = 'SimulationStoppedError';

  constructor(
    readonly reason: StopReason,
    message: string,
    readonly gridlock: GridlockEntry[] = [],
  ) {
    super(message);
  }
}

export function isSimulationStopped(e: unknown): e is SimulationStoppedError {
  return e instanceof Error && e.name === 'SimulationStoppedError' && 'reason' in e;
}
