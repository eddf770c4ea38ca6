// /runs/:runId/playback : watch a window of a stored run. The browser replays the chosen replication
// from the run's seed, revision and settings in a Web Worker and records the window, so nothing
// beyond the run itself is kept on the server. Composes the runs feature (the run and its
// revision), the simulation feature (the worker) and the layout feature (the drawing and player).
import { useState, type FormEvent } from 'react';
import { useParams } from 'react-router-dom';
import { PLAYBACK_LIMITS, playbackRequestSchema } from '../../../shared/results/playback';
import { LoadError } from '../../components/load-error';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { Button } from '../../components/ui/button';
import { Card, CardTitle } from '../../components/ui/card';
import { TextField } from '../../components/ui/field';
import { PageHeader } from '../../components/ui/page-header';
import { PageSpinner } from '../../components/ui/spinner';
import { PlaybackPlayer } from '../../components/layout/playback/playback-player';
import { useScenarioRevision } from '../../features/scenarios/api/get-revision';
import { useRun } from '../../features/runs/api/get-run';
import { usePlaybackRecording } from '../../features/runs/simulation/hooks/use-playback-recording';

type FieldErrors = Partial<Record<'replication' | 'startMinutes' | 'windowMinutes', string>>;

/** Reads a number typed with either decimal separator; anything else becomes NaN and a message. */
const typed = (value: FormDataEntryValue | null) =>
  typeof value === 'string' && value.trim() !== '' ? Number(value.trim().replace(',', '.')) : NaN;

export function PlaybackRoute() {
  const { runId = '' } = useParams();
  const run = useRun(runId);
  const revision = useScenarioRevision(run.data?.scenarioId ?? '', run.data?.revisionNumber);
  const { state, record, cancel } = usePlaybackRecording();
  const [errors, setErrors] = useState<FieldErrors>({});

  if (run.isPending) return <PageSpinner label="Loading the run…" />;
  if (run.isError) return <LoadError what="the run" error={run.error} onRetry={() => void run.refetch()} />;
  const { data } = run;
  const settings = data.settings;

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (!revision.data) return;
    const form = new FormData(event.currentTarget);
    const input = {
      replication: typed(form.get('replication')) - 1,
      startMinutes: typed(form.get('startMinutes')),
      windowMinutes: typed(form.get('windowMinutes')),
    };
    const parsed = playbackRequestSchema.safeParse(input);
    const next: FieldErrors = {};
    if (!parsed.success)
      for (const issue of parsed.error.issues)
        next[issue.path[0] as keyof FieldErrors] ??= issue.message.replace(
          /replication must be from 0 to \d+/,
          `replication must be from 1 to ${settings.replications}`,
        );
    else if (parsed.data.replication >= settings.replications)
      next.replication = `replication must be from 1 to ${settings.replications}`;
    setErrors(next);
    if (parsed.success && Object.keys(next).length === 0) void record(revision.data.document, settings, parsed.data);
  };

  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        title={`Playback of ${data.name}`}
        trail={
          <Breadcrumbs
            items={[
              { label: 'Projects', to: '/' },
              { label: data.scenarioName, to: `/scenarios/${data.scenarioId}` },
              { label: 'Run', to: `/runs/${data.id}` },
              { label: 'Playback' },
            ]}
          />
        }
        description="Replays one replication of this run in your browser, from the same revision, seed and settings, and shows a window of it on the layout."
      />
      <Card aria-labelledby="playback-request-title" className="flex flex-col gap-4">
        <CardTitle id="playback-request-title">Window to watch</CardTitle>
        <form className="grid grid-cols-1 gap-4 sm:grid-cols-4 sm:items-end" onSubmit={onSubmit} noValidate>
          <TextField
            label="Replication"
            name="replication"
            inputMode="numeric"
            defaultValue="1"
            hint={`1 to ${settings.replications}`}
            error={errors.replication}
          />
          <TextField
            label="Start (minutes)"
            name="startMinutes"
            inputMode="decimal"
            defaultValue={String(settings.warmupMinutes)}
            hint="from the start, warm-up included"
            error={errors.startMinutes}
          />
          <TextField
            label="Length (minutes)"
            name="windowMinutes"
            inputMode="decimal"
            defaultValue="30"
            hint={`${PLAYBACK_LIMITS.windowMinutesMin} to ${PLAYBACK_LIMITS.windowMinutesMax}`}
            error={errors.windowMinutes}
          />
          <div className="flex gap-2 pb-7">
            <Button
              type="submit"
              pending={state.status === 'recording'}
              pendingLabel="Recording…"
              disabled={!revision.data}
              data-playback-record
            >
              Record window
            </Button>
            {state.status === 'recording' && (
              <Button variant="secondary" onClick={cancel}>
                Cancel
              </Button>
            )}
          </div>
        </form>
        {state.status === 'recording' && (
          <p className="text-sm text-ink-soft" aria-live="polite">
            Replaying… {Math.round(state.fraction * 100)} %
          </p>
        )}
        {state.status === 'failed' && (
          <p role="alert" className="rounded-md border border-danger/40 bg-danger-soft p-3 text-sm text-danger">
            {state.issues.length > 0 ? state.issues.map((i) => i.message).join('; ') : state.message}
          </p>
        )}
        {revision.isError && (
          <LoadError
            what="the scenario revision of this run"
            error={revision.error}
            onRetry={() => void revision.refetch()}
          />
        )}
      </Card>
      {state.status === 'ready' && revision.data && (
        <Card aria-labelledby="playback-title" className="flex flex-col gap-4">
          <CardTitle id="playback-title">Replication {state.trace.replication + 1}</CardTitle>
          <p className="max-w-prose text-sm text-ink-soft">
            Carriers are drawn where the simulation had them, moving at an even speed between the stops it recorded
            (acceleration and braking are not shown). Stations are ringed in the colour of their state.
          </p>
          <PlaybackPlayer document={revision.data.document} trace={state.trace} />
        </Card>
      )}
    </div>
  );
}
