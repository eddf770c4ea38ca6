// /projects/:projectId/compare/studies/report?studies=a,b : the comparison of studies as a document to
// print or save as PDF, with the same print stylesheet as the comparison of runs.
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { LoadError } from '../../../components/load-error';
import { Button } from '../../../components/ui/button';
import { PageSpinner } from '../../../components/ui/spinner';
import { STUDY_COMPARE_LIMITS } from '../../../features/study-compare/utils/study-comparison';
import { formatDateTime } from '../../../lib/format';
import { ComparedStudies } from './compared-studies';
import { parseRunIds as parseIds } from './use-comparison-data';
import { useStudyComparisonData } from './use-study-comparison-data';

export function CompareStudiesReportRoute() {
  const { projectId = '' } = useParams();
  const [search] = useSearchParams();
  const ids = parseIds(search.get('studies')).slice(0, STUDY_COMPARE_LIMITS.max);
  const data = useStudyComparisonData(projectId, ids);

  if (ids.length < STUDY_COMPARE_LIMITS.min)
    return (
      <p>
        A report needs {STUDY_COMPARE_LIMITS.min} to {STUDY_COMPARE_LIMITS.max} studies in its address.
      </p>
    );
  if (data.failed) return <LoadError what="the comparison" error={data.failed} />;
  if (!data.compared || !data.project.data || !data.allRevisionsLoaded)
    return <PageSpinner label="Preparing the report…" />;

  // As wide as A4 less its margins, so charts are drawn at the width they print at.
  return (
    <article className="report mx-auto flex w-full max-w-[186mm] flex-col gap-6" data-testid="report" data-ready="yes">
      <header className="flex flex-col gap-2 border-b-2 border-ink pb-4">
        <div className="flex flex-wrap items-center justify-between gap-3" data-print="hide">
          <Link
            className="text-sm underline underline-offset-4"
            to={`/projects/${projectId}/compare/studies?studies=${ids.join(',')}`}
          >
            ← Back to the comparison
          </Link>
          <Button onClick={() => window.print()}>Print or save as PDF</Button>
        </div>
        <p className="text-sm font-semibold tracking-wide text-ink-soft uppercase">Lanewright study comparison</p>
        <h1 className="text-3xl font-semibold text-ink">{data.compared.map((s) => s.label).join(' or ')}</h1>
        <p className="text-sm text-ink-soft">
          Project {data.project.data.name} · prepared {formatDateTime(new Date().toISOString())}
        </p>
      </header>
      <ComparedStudies compared={data.compared} scenarios={data.scenarios} details={data.details} />
    </article>
  );
}
