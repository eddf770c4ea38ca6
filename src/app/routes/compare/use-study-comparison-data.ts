// Everything a comparison of studies needs, gathered from three features: the studies with their
// results, the scenario revisions they ran (target takt, station names) and the project. Composed here
// because features never import one another.
import { useQueries } from '@tanstack/react-query';
import { useMemo } from 'react';
import type { StudyDetail } from '../../../../shared/api/studies';
import type { Scenario } from '../../../../shared/scenario/scenario';
import { useProject } from '../../../features/projects/api/get-project';
import { scenarioRevisionQueryOptions } from '../../../features/scenarios/api/get-revision';
import { studyQueryOptions } from '../../../features/studies/api/get-study';
import { KIND_LABELS } from '../../../features/studies/utils/labels';
import { labelStudies, type ComparedStudy } from '../../../features/study-compare/utils/study-comparison';

function detailOf(study: StudyDetail): string {
  const s = study.settings;
  return `${KIND_LABELS[study.kind].toLowerCase()} “${study.name}”, revision ${study.revisionNumber}, ${study.pointCount} points × ${s.replications} replications of ${s.hours} h after ${s.warmupMinutes} min warm-up, seed ${String(s.seed)}${study.commonRandomNumbers ? '' : ' (own random numbers per point)'}, ${study.jobsDone} of ${study.jobCount} jobs done`;
}

export function useStudyComparisonData(projectId: string, studyIds: readonly string[]) {
  const project = useProject(projectId);
  const studies = useQueries({ queries: studyIds.map((id) => studyQueryOptions(id)) });
  const revisions = useQueries({
    queries: studies.map((study) => ({
      ...scenarioRevisionQueryOptions(study.data?.scenarioId ?? '', study.data?.revisionNumber ?? 0),
      enabled: Boolean(study.data),
    })),
  });
  const studyData = studies.map((s) => s.data);
  const loaded = studyData.every(Boolean) ? (studyData as StudyDetail[]) : null;
  // Queries hand back new arrays on every render; ids and progress say when the data really changed.
  // Null while loading, so an empty comparison never stands in for one still on its way.
  const studyKey = loaded ? loaded.map((s) => `${s.id}:${s.jobsDone}:${s.status}`).join() : null;
  const revisionKey = revisions.map((r) => r.data?.id ?? '').join();
  const compared = useMemo<ComparedStudy[] | null>(() => (loaded ? labelStudies(loaded) : null), [studyKey]);
  const details = useMemo(() => loaded?.map(detailOf) ?? [], [studyKey]);
  const scenarios = useMemo<(Scenario | null)[]>(() => revisions.map((r) => r.data?.document ?? null), [revisionKey]);
  return {
    project,
    compared,
    details,
    scenarios,
    failed: studies.find((s) => s.isError)?.error ?? project.error ?? null,
    allRevisionsLoaded: revisions.every((r) => r.data),
  };
}
