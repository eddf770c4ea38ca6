// One study's analysis: the summary numbers, the histogram with the fitted densities over it, and the
// candidates table. Engineers turn the samples or a fit into the station's cycle time from here.
import type { TimeStudyDetail } from '../../../../shared/api/time-studies';
import type { Distribution } from '../../../../shared/scenario/distribution';
import { Histogram } from '../../../components/charts';
import { Button } from '../../../components/ui/button';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { empiricalDistribution, fittedDensities, formatSeconds, formatValue } from '../utils/fit-presentation';
import { FitCandidatesTable } from './fit-candidates-table';

interface TimeStudyAnalysisProps {
  study: TimeStudyDetail;
  stationName: string;
  canEdit: boolean;
  onUse: (distribution: Distribution) => void;
}

const RULE_TEXT = {
  'freedman-diaconis': 'Freedman–Diaconis rule',
  sturges: 'Sturges’ rule (over half the samples are equal)',
} as const;

export function TimeStudyAnalysis({ study, stationName, canEdit, onUse }: TimeStudyAnalysisProps) {
  const { summary, histogram, candidates } = study.analysis;
  const empirical = empiricalDistribution(study.samples);
  const stats: Array<[string, string]> = [
    ['Samples', summary.count.toLocaleString('en-GB')],
    ['Mean', formatSeconds(summary.mean)],
    ['Standard deviation', formatSeconds(summary.sd)],
    ['Coefficient of variation', summary.cv === null ? '–' : formatValue(summary.cv)],
    ['Min – max', `${formatSeconds(summary.min)} – ${formatSeconds(summary.max)}`],
    ['Median', formatSeconds(summary.quantiles.p50)],
    ['5 % – 95 %', `${formatSeconds(summary.quantiles.p05)} – ${formatSeconds(summary.quantiles.p95)}`],
  ];

  return (
    <div className="flex flex-col gap-4">
      <dl
        className="grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-4"
        aria-label={`Statistics of ${study.name}`}
      >
        {stats.map(([term, value]) => (
          <div key={term}>
            <dt className="text-ink-soft">{term}</dt>
            <dd className="font-semibold tabular-nums text-ink">{value}</dd>
          </div>
        ))}
      </dl>
      <Histogram
        values={study.samples}
        quantity="Cycle time"
        unit="s"
        fits={fittedDensities(candidates)}
        bins={histogram.bins}
        title={`Measured cycle times, ${stationName}`}
        exportName={`time-study-${study.stationId}`}
      />
      <p className="text-xs text-ink-soft">
        Standard deviation with n − 1; {histogram.bins.length} bins by the {RULE_TEXT[histogram.rule]}. Fits are
        maximum-likelihood; D is the Kolmogorov–Smirnov distance and the p-value its asymptotic approximation, which is
        optimistic because the parameters come from the same samples: compare D between candidates rather than read p as
        a test.
      </p>
      <FitCandidatesTable candidates={candidates} canEdit={canEdit} onUse={onUse} />
      {canEdit &&
        (empirical.ok ? (
          <Button variant="secondary" className="self-start" onClick={() => onUse(empirical.distribution)}>
            Use measured samples
          </Button>
        ) : (
          <ErrorBanner title="The measured samples cannot be used as they are.">{empirical.message}</ErrorBanner>
        ))}
    </div>
  );
}
