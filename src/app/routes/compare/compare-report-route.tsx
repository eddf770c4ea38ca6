// /projects/:projectId/compare/report?runs=a,b : the comparison as a document to print or save as
// PDF. The print stylesheet drops the app's frame and buttons and keeps sections whole where they fit.
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { LoadError } from '../../../components/load-error';
import { Button } from '../../../components/ui/button';
import { PageSpinner } from '../../../components/ui/spinner';
import { CompareView } from '../../../features/compare/components/compare-view';
import { COMPARE_LIMITS } from '../../../features/compare/utils/comparison';
import { formatDateTime } from '../../../lib/format';
import { CostSection } from './cost-section';
import { COMPARE_QUESTION } from './question';
import { parseRunIds, useComparisonData } from './use-comparison-data';

export function CompareReportRoute() {
  const { projectId = '' } = useParams();
  const [search] = useSearchParams();
  const runIds = parseRunIds(search.get('runs')).slice(0, COMPARE_LIMITS.max);
  const data = useComparisonData(projectId, runIds);

  if (runIds.length < COMPARE_LIMITS.min)
    return (
      <p>
        A report needs {COMPARE_LIMITS.min} to {COMPARE_LIMITS.max} runs in its address.
      </p>
    );
  if (data.failed) return <LoadError what="the comparison" error={data.failed} />;
  if (!data.items || !data.project.data || !data.allRevisionsLoaded)
    return <PageSpinner label="Preparing the report…" />;

  // The page is as wide as A4 less its margins, so charts are drawn at the width they print at.
  return (
    <article
      className="report mx-auto flex w-full max-w-[186mm] flex-col gap-6"
      data-testid="report"
      data-ready={data.priceListSettled ? 'yes' : 'no'}
    >
      <header className="flex flex-col gap-2 border-b-2 border-ink pb-4">
        <div className="flex flex-wrap items-center justify-between gap-3" data-print="hide">
          <Link
            className="text-sm underline underline-offset-4"
            to={`/projects/${projectId}/compare?runs=${runIds.join(',')}`}
          >
            ← Back to the comparison
          </Link>
          <Button onClick={() => window.print()}>Print or save as PDF</Button>
        </div>
        <p className="text-sm font-semibold tracking-wide text-ink-soft uppercase">Lanewright layout comparison</p>
        <h1 className="text-3xl font-semibold text-ink">{data.items.map((i) => i.label).join(' or ')}</h1>
        <p className="text-sm text-ink-soft">
          Project {data.project.data.name} · prepared {formatDateTime(new Date().toISOString())}
        </p>
      </header>
      <CompareView
        items={data.items}
        stepNames={data.stepNames}
        costs={data.pricing.costs}
        question={COMPARE_QUESTION}
        costSection={
          <CostSection
            organisationId={data.project.data.organisationId}
            priceList={data.priceList}
            scenarios={data.pricing.scenarios}
            mayEdit={false}
          />
        }
      />
    </article>
  );
}
