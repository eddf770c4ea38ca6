// Runs one experiment in a Web Worker and follows it: progress with a time-left estimate, the
// engine's validation issues (with field paths, so an editor can place them), a stop reason, or the
// result. The page never waits on the engine: all of it happens in the worker.
import { useCallback, useEffect, useRef, useState } from 'react';
import type { RunResult } from '../../../../../shared/results/run-result';
import type { GridlockEntry, StopReason, ValidationIssue } from '../../../../../workers/engine';
import { useOpenSimulationPort } from '../simulation-context';
import type { SimulationPort } from '../simulation-port';
import { describeProgress, type RunProgress } from '../utils/progress';

export type SimulationOutcome =
  | { status: 'finished'; result: RunResult }
  | { status: 'invalid'; message: string; issues: ValidationIssue[] }
  | { status: 'stopped'; reason: StopReason; message: string; gridlock: GridlockEntry[] }
  | { status: 'cancelled' }
  | { status: 'failed'; message: string };

export type SimulationStatus = 'idle' | 'running' | SimulationOutcome['status'];

export interface SimulationState {
  status: SimulationStatus;
  progress: RunProgress | null;
  outcome: SimulationOutcome | null;
}

interface ActiveRun {
  port: SimulationPort;
  settle: (outcome: SimulationOutcome) => void;
}

const IDLE: SimulationState = { status: 'idle', progress: null, outcome: null };

export function useSimulation() {
  const openPort = useOpenSimulationPort();
  const [state, setState] = useState<SimulationState>(IDLE);
  const active = useRef<ActiveRun | null>(null);

  /** Ends the current run, if any, with the given outcome; later messages from its worker are ignored. */
  const finish = useCallback((run: ActiveRun, outcome: SimulationOutcome) => {
    if (active.current !== run) return;
    active.current = null;
    run.port.terminate();
    setState((previous) => ({ status: outcome.status, progress: previous.progress, outcome }));
    run.settle(outcome);
  }, []);

  const start = useCallback(
    (scenario: unknown, settings: unknown): Promise<SimulationOutcome> => {
      if (active.current) finish(active.current, { status: 'cancelled' });
      return new Promise<SimulationOutcome>((settle) => {
        const run: ActiveRun = { port: openPort(), settle };
        active.current = run;
        setState({ status: 'running', progress: null, outcome: null });
        const started = performance.now();
        run.port
          .run(scenario, settings, (progress) => {
            if (active.current === run)
              setState((previous) => ({
                ...previous,
                progress: describeProgress(progress, performance.now() - started),
              }));
          })
          .then(
            (answer) =>
              finish(
                run,
                answer.ok
                  ? { status: 'finished', result: answer.result }
                  : answer.kind === 'invalid'
                    ? { status: 'invalid', message: answer.message, issues: answer.issues }
                    : answer.reason === 'cancelled'
                      ? { status: 'cancelled' }
                      : {
                          status: 'stopped',
                          reason: answer.reason,
                          message: answer.message,
                          gridlock: answer.gridlock,
                        },
              ),
            (error: unknown) =>
              finish(run, { status: 'failed', message: error instanceof Error ? error.message : String(error) }),
          );
      });
    },
    [finish, openPort],
  );

  const cancel = useCallback(() => {
    if (active.current) finish(active.current, { status: 'cancelled' });
  }, [finish]);

  const reset = useCallback(() => {
    if (active.current) finish(active.current, { status: 'cancelled' });
    setState(IDLE);
  }, [finish]);

  useEffect(
    () => () => {
      const run = active.current;
      active.current = null;
      run?.port.terminate();
    },
    [],
  );

  return { ...state, start, cancel, reset };
}
