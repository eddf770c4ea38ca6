// Replays one replication of a run and records a playback window of it. Because replication r always
// draws from stream (seed, r), the replay repeats the stored run exactly (same scenario revision,
// settings and engine version), so nothing beyond the run's settings needs to be kept on the server.
// The replay stops as soon as the window has passed.
import { PLAYBACK_LIMITS, playbackRequestSchema, type PlaybackTrace } from '../../shared/results/playback';
import { formatIssuePath } from '../../shared/scenario/issue-path';
import { InvalidInputError, prepare, RESULT_POSITION_BINS, RESULT_TIME_BINS, type RunHooks } from './experiment';
import { SimulationStoppedError } from './kernel/stop';
import { compileLine } from './model/compile';
import { Replication } from './replication';
import { TraceRecorder } from './observe/trace';
import { createStreamFactory } from './random/streams';

const SLICE_MS = 50;
const DEFAULT_EVENT_BUDGET = 5_000_000_000;

export async function recordPlayback(
  scenarioInput: unknown,
  settingsInput: unknown,
  requestInput: unknown,
  hooks: RunHooks = {},
  limits: { carrierChangesMax: number; stationChangesMax: number } = PLAYBACK_LIMITS,
): Promise<PlaybackTrace> {
  const { scenario, settings } = prepare(scenarioInput, settingsInput);
  const parsed = playbackRequestSchema.safeParse(requestInput ?? {});
  if (!parsed.success)
    throw new InvalidInputError(
      parsed.error.issues.map((i) => ({ path: `playback.${formatIssuePath(i.path)}`, message: i.message })),
    );
  const request = parsed.data;
  const endSeconds = settings.warmupMinutes * 60 + settings.hours * 3600;
  const issues = [];
  if (request.replication >= settings.replications)
    issues.push({
      path: 'playback.replication',
      message: `the run has ${settings.replications} replication${settings.replications === 1 ? '' : 's'}, numbered from 1 to ${settings.replications}`,
    });
  const windowStart = request.startMinutes * 60;
  if (windowStart >= endSeconds)
    issues.push({
      path: 'playback.startMinutes',
      message: `the window must start before the run ends, at ${endSeconds / 60} min`,
    });
  if (issues.length > 0) throw new InvalidInputError(issues);
  const windowEnd = Math.min(windowStart + request.windowMinutes * 60, endSeconds);

  const line = compileLine(scenario, settings.carriers ?? scenario.carriers.count);
  const replication = new Replication(line, createStreamFactory(settings.seed, request.replication), {
    warmupSeconds: settings.warmupMinutes * 60,
    endSeconds,
    timeBins: RESULT_TIME_BINS,
    positionBins: RESULT_POSITION_BINS,
    eventBudget: hooks.eventBudget ?? DEFAULT_EVENT_BUDGET,
  });
  const trace = new TraceRecorder(line, windowStart, windowEnd, limits);
  replication.state.observer = trace.observe(replication.state.observer);
  trace.attach(replication.state);

  const now = hooks.now ?? (() => Date.now());
  const yieldToHost = hooks.yieldToHost ?? (() => new Promise<void>((resolve) => setTimeout(resolve, 0)));
  for (;;) {
    if (hooks.isCancelled?.()) throw new SimulationStoppedError('cancelled', 'the playback was cancelled');
    const sliceEnd = now() + SLICE_MS;
    // Asked every 1024 events: stop the slice once the window is behind us as well.
    const finished = replication.run(() => trace.done || now() >= sliceEnd);
    hooks.onProgress?.({
      replication: request.replication,
      replications: settings.replications,
      simulatedSeconds: Math.min(replication.state.now, windowEnd),
      totalSeconds: windowEnd,
      fraction: Math.min(replication.state.now / windowEnd, 1),
    });
    if (finished || trace.done) break;
    await yieldToHost();
  }
  return trace.finish(request.replication);
}
