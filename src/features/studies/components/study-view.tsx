// A study's page body: what it asks, its progress (running its pending jobs on this device's cores
// when the reader may), its answer and charts, and every point's figures. Opening a running study
// picks up where it stopped.
import { useEffect, useMemo } from 'react';
import { pendingJobs, type StudyDetail } from '../../../../shared/api/studies';
import type { Scenario } from '../../../../shared/scenario/scenario';
import { hasFailed, pointStatistics } from '../../../../workers/studies/point-statistics';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { sharedEnginePool } from '../../../lib/engine/engine-pool';
import { formatCount } from '../../../lib/format';
import { useStudyRunner } from '../hooks/use-study-runner';
import { KIND_LABELS, STATUS_LABELS } from '../utils/labels';
import { CarrierSizingResults } from './carrier-sizing-results';
import { PointTable } from './point-table';
import { ServerStudyProgress } from './server-study-progress';
import { StudyProgress } from './study-progress';
import { SweepResults } from './sweep-results';
import { WhatIfResults } from './what-if-results';

interface StudyViewProps {
  study: StudyDetail;
  scenario: Scenario;
  /** Scenario documents by revision id, as the jobs need them. */
  documents: Record<string, unknown>;
  mayRun: boolean;
}

export function StudyView({ study, scenario, documents, mayRun }: StudyViewProps) {
  const runner = useStudyRunner(study, documents);
  const stats = useMemo(() => pointStatistics(study), [study]);
  const pending = pendingJobs(study).length;
  const { start, running } = runner;
  const inBrowser = study.runOn === 'browser';
  const shouldRun =
    inBrowser && mayRun && study.status === 'running' && pending > 0 && !running && !runner.held && !runner.problem;
  useEffect(() => {
    if (shouldRun) start();
  }, [shouldRun, start]);

  const failed = stats.filter((s) => hasFailed(s.state)).length;
  const s = study.settings;
  return (
    <div className="flex flex-col gap-6">
      <p className="text-ink-soft">
        {KIND_LABELS[study.kind]} of {study.scenarioName}, revision {study.revisionNumber}: {study.pointCount} points ×{' '}
        {s.replications} replications of {s.hours} h after {s.warmupMinutes} min warm-up, seed {String(s.seed)}
        {study.commonRandomNumbers ? ', the same random numbers at every point' : ', separate random numbers per point'}
        . Runs {inBrowser ? 'in the browser' : 'on the server'}. Status: {STATUS_LABELS[study.status]}.
      </p>
      {!inBrowser && <ServerStudyProgress study={study} mayRun={mayRun} />}
      {inBrowser && (pending > 0 || running) && (
        <StudyProgress
          done={runner.running ? runner.done : study.jobsDone}
          total={study.jobCount}
          running={runner.running}
          remainingMs={runner.remainingMs}
          place={`in this browser on ${formatCount(sharedEnginePool().size, 'core')}`}
          onCancel={mayRun ? () => void runner.cancel() : undefined}
          onResume={mayRun && (study.status === 'cancelled' || runner.held) ? () => void runner.resume() : undefined}
        />
      )}
      {runner.problem && (
        <ErrorBanner title="The study stopped">
          {runner.problem} Finished jobs are kept; reload the page to carry on.
        </ErrorBanner>
      )}
      {failed > 0 && (
        <p className="text-sm text-caution" role="status">
          {failed} {failed === 1 ? 'point has' : 'points have'} no result; the table below says why. The other points
          are not affected.
        </p>
      )}
      {study.kind === 'carrierSizing' && <CarrierSizingResults study={study} stats={stats} scenario={scenario} />}
      {study.kind === 'sweep' && <SweepResults study={study} stats={stats} scenario={scenario} />}
      {study.kind === 'whatIf' && <WhatIfResults study={study} stats={stats} />}
      <section aria-labelledby="points-title" className="flex flex-col gap-2">
        <h2 id="points-title" className="text-xl font-semibold">
          Points
        </h2>
        <PointTable stats={stats} />
      </section>
    </div>
  );
}
