// /projects/:projectId/compare/studies?studies=a,b : two to four studies side by side, for example the
// carrier sizing of a stacked and of a side-by-side layout on one chart with paired differences.
import { useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { LoadError } from '../../../components/load-error';
import { Breadcrumbs } from '../../../components/ui/breadcrumbs';
import { ButtonLink } from '../../../components/ui/button';
import { Card, CardTitle } from '../../../components/ui/card';
import { PageHeader } from '../../../components/ui/page-header';
import { PageSpinner } from '../../../components/ui/spinner';
import { useStudies } from '../../../features/studies/api/get-studies';
import { KIND_LABELS } from '../../../features/studies/utils/labels';
import { StudyPicker } from '../../../features/study-compare/components/study-picker';
import { STUDY_COMPARE_LIMITS } from '../../../features/study-compare/utils/study-comparison';
import { ComparedStudies } from './compared-studies';
import { parseRunIds as parseIds } from './use-comparison-data';
import { useStudyComparisonData } from './use-study-comparison-data';

export function CompareStudiesRoute() {
  const { projectId = '' } = useParams();
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const askedFor = parseIds(search.get('studies'));
  const ids = askedFor.slice(0, STUDY_COMPARE_LIMITS.max);
  const data = useStudyComparisonData(projectId, ids);
  const studies = useStudies(projectId);

  if (data.project.isPending) return <PageSpinner label="Loading the project…" />;
  if (data.project.isError)
    return <LoadError what="the project" error={data.project.error} onRetry={() => void data.project.refetch()} />;
  const comparing = ids.length >= STUDY_COMPARE_LIMITS.min;

  return (
    <div className="flex flex-col gap-8 overflow-x-clip">
      <PageHeader
        title="Compare studies"
        trail={
          <Breadcrumbs
            items={[
              { label: 'Projects', to: '/' },
              { label: data.project.data.name, to: `/projects/${projectId}` },
              { label: 'Studies', to: `/projects/${projectId}/studies` },
              { label: 'Compare' },
            ]}
          />
        }
        description="Two to four studies on one chart with 95 % intervals, and at every point they share the difference with its interval: paired where the points drew the same random numbers, Welch’s otherwise."
        actions={
          comparing && data.compared ? (
            <ButtonLink to={`/projects/${projectId}/compare/studies/report?studies=${ids.join(',')}`}>
              Printable report
            </ButtonLink>
          ) : undefined
        }
      />
      <Card aria-labelledby="pick-studies-title" className="flex flex-col gap-3" data-print="hide">
        <CardTitle id="pick-studies-title">Studies to compare</CardTitle>
        {studies.isPending && <PageSpinner label="Loading studies…" />}
        {studies.isError && <LoadError what="the studies" error={studies.error} />}
        {studies.data && (
          <StudyPicker
            key={ids.join()}
            studies={studies.data}
            selectedIds={ids}
            kindLabels={KIND_LABELS}
            onCompare={(chosen) => navigate(`/projects/${projectId}/compare/studies?studies=${chosen.join(',')}`)}
          />
        )}
      </Card>
      {askedFor.length > STUDY_COMPARE_LIMITS.max && (
        <p className="text-sm font-medium text-caution">
          The address names {askedFor.length} studies; a comparison holds at most {STUDY_COMPARE_LIMITS.max}, so the
          first {STUDY_COMPARE_LIMITS.max} are shown.
        </p>
      )}
      {comparing && data.failed && <LoadError what="a study of the comparison" error={data.failed} />}
      {comparing && !data.failed && !data.compared && <PageSpinner label="Loading the studies…" />}
      {comparing && data.compared && (
        <ComparedStudies compared={data.compared} scenarios={data.scenarios} details={data.details} />
      )}
    </div>
  );
}
