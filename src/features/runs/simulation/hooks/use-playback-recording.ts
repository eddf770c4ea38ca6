// Records a playback window in a Web Worker of its own: the replay of one replication of a stored
// run, followed with progress and ended by Cancel or by leaving the page.
import { useCallback, useEffect, useRef, useState } from 'react';
import type { PlaybackRequestInput, PlaybackTrace } from '../../../../../shared/results/playback';
import type { ValidationIssue } from '../../../../../workers/engine';
import { openPlaybackPort, type PlaybackPort } from '../simulation-port';

export type PlaybackRecording =
  | { status: 'idle' }
  | { status: 'recording'; fraction: number }
  | { status: 'ready'; trace: PlaybackTrace }
  | { status: 'failed'; message: string; issues: ValidationIssue[] };

export function usePlaybackRecording() {
  const [state, setState] = useState<PlaybackRecording>({ status: 'idle' });
  const active = useRef<PlaybackPort | null>(null);

  const stop = useCallback(() => {
    active.current?.terminate();
    active.current = null;
  }, []);

  const record = useCallback(
    async (scenario: unknown, settings: unknown, request: PlaybackRequestInput) => {
      stop();
      const port = openPlaybackPort();
      active.current = port;
      setState({ status: 'recording', fraction: 0 });
      const mine = () => active.current === port;
      try {
        const outcome = await port.playback(
          scenario,
          settings,
          request,
          (p) => mine() && setState({ status: 'recording', fraction: p.fraction }),
        );
        if (!mine()) return;
        setState(
          outcome.ok
            ? { status: 'ready', trace: outcome.trace }
            : { status: 'failed', message: outcome.message, issues: outcome.kind === 'invalid' ? outcome.issues : [] },
        );
      } catch (error) {
        if (mine())
          setState({ status: 'failed', message: error instanceof Error ? error.message : String(error), issues: [] });
      } finally {
        if (mine()) stop();
      }
    },
    [stop],
  );

  const cancel = useCallback(() => {
    stop();
    setState({ status: 'idle' });
  }, [stop]);

  useEffect(() => stop, [stop]);
  return { state, record, cancel };
}
