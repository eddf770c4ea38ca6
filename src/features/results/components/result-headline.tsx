// The figures a manager reads first: throughput and takt with their 95 % intervals against the
// target, annual output over the calendar's hours, WIP and lead time.
import type { ReactNode } from 'react';
import { BeltBaselineTag } from '../../../components/ui/belt-baseline-tag';
import type { Interval, RunResult } from '../../../../shared/results/run-result';
import {
  formatInterval,
  formatMean1,
  formatMean2,
  formatParts,
  formatPerHour,
  formatSeconds,
  formatTakt,
} from '../../../lib/format-run';
import { taktVerdict } from '../utils/takt-verdict';

const VERDICT_TONE = {
  meets: 'border-accent bg-accent-soft/60',
  misses: 'border-danger bg-danger-soft',
  none: 'border-ink-faint bg-paper-sunk',
} as const;

function Figure({
  label,
  value,
  unit,
  interval,
  children,
}: {
  label: string;
  value: string;
  unit: string;
  interval?: string;
  children?: ReactNode;
}) {
  return (
    <div className="flex flex-col gap-1 rounded-lg border border-paper-sunk bg-paper-raised p-4" data-figure={label}>
      <dt className="text-sm font-semibold text-ink-soft">{label}</dt>
      <dd className="flex flex-col gap-1">
        <span className="text-3xl font-semibold tabular-nums text-ink">
          {value} <span className="text-base font-medium text-ink-soft">{unit}</span>
        </span>
        {interval && <span className="text-sm text-ink-soft tabular-nums">95 % CI {interval}</span>}
        {children}
      </dd>
    </div>
  );
}

const ci = (interval: Interval, format: (v: number) => string) => formatInterval(interval, format);

export function ResultHeadline({ result }: { result: RunResult }) {
  const verdict = taktVerdict(result.taktSeconds, result.targetTaktSeconds);
  const replications = result.settings.replications;
  return (
    <section aria-labelledby="headline-title" className="flex flex-col gap-4">
      <h2 id="headline-title" className="text-xl font-semibold">
        Headline
      </h2>
      {result.conveyor === 'belt' && (
        <p className="flex flex-wrap items-center gap-2 text-sm text-ink-soft">
          <BeltBaselineTag />
          This run models the layout on a belt conveyor, as a baseline to compare carrier layouts with.
        </p>
      )}
      <p
        className={`rounded-md border-l-4 px-4 py-3 font-semibold text-ink ${VERDICT_TONE[verdict.tone]}`}
        data-verdict={verdict.tone}
      >
        {verdict.text}
      </p>
      <dl className="grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <Figure
          label="Throughput"
          value={formatPerHour(result.throughputPerHour.mean)}
          unit="parts/h"
          interval={ci(result.throughputPerHour, formatPerHour)}
        />
        <Figure
          label="Achieved takt"
          value={formatTakt(result.taktSeconds.mean)}
          unit="s"
          interval={ci(result.taktSeconds, formatTakt)}
        >
          <span className="text-sm text-ink-soft">
            {result.targetTaktSeconds === null ? 'No target set' : `Target ${formatTakt(result.targetTaktSeconds)} s`}
          </span>
        </Figure>
        <Figure
          label="Annual output"
          value={formatParts(result.annualOutput.mean)}
          unit="parts/year"
          interval={ci(result.annualOutput, formatParts)}
        >
          <span className="text-sm text-ink-soft">
            Over {formatParts(result.hoursPerYear)} scheduled hours a year (shift calendar)
          </span>
        </Figure>
        <Figure label="Work in progress" value={formatMean2(result.wip.mean)} unit="parts">
          <span className="text-sm text-ink-soft">Time average, on {result.carriers.count} carriers</span>
        </Figure>
        <Figure label="Lead time" value={formatSeconds(result.leadTimeSeconds.mean)} unit="s mean">
          <span className="text-sm text-ink-soft tabular-nums">
            median {formatSeconds(result.leadTimeSeconds.p50)} s, 95th percentile{' '}
            {formatSeconds(result.leadTimeSeconds.p95)} s
          </span>
        </Figure>
        <Figure label="Good parts per replication" value={formatMean1(result.parts.output)} unit="parts">
          <span className="text-sm text-ink-soft tabular-nums">
            Mean of {replications} replications of {result.observedHours} h: {formatMean1(result.parts.loaded)} loaded,{' '}
            {formatMean1(result.parts.scrapped)} scrapped, {formatMean1(result.parts.reworked)} reworked
          </span>
        </Figure>
      </dl>
    </section>
  );
}
