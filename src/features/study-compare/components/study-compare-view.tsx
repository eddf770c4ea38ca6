// Studies side by side, shared by the page and the printable report: the question and the answer in
// words, every study's curve with its band on one chart (when they share an axis), each carrier
// sizing's own recommendation, the table of differences at matched points, and what the numbers assume.
import type { ReactNode } from 'react';
import type { Scenario } from '../../../../shared/scenario/scenario';
import {
  recommendCarriers,
  sizingPointsOf,
  stationNamesOf,
  targetPerHourOf,
} from '../../../../workers/studies/carrier-sizing';
import { hasFailed, POINT_STATE_WORDS, pointStatistics } from '../../../../workers/studies/point-statistics';
import { CurvesWithBands } from '../../../components/charts';
import { Card, CardTitle } from '../../../components/ui/card';
import { studyAnswer } from '../utils/study-answer';
import { compareStudies, throughputSeries, type ComparedStudy, type StudyComparison } from '../utils/study-comparison';
import { PointDifferencesTable } from './point-differences-table';

export interface StudyCompareViewProps {
  studies: readonly ComparedStudy[];
  /** Each study's scenario document (for the target and station names), null while loading. */
  scenarios: readonly (Scenario | null)[];
  /** What each study ran, in words (kind, revision, points, replications, seed). */
  details: readonly string[];
  question: string;
  /** Assumptions and cautions, composed by the page. */
  notes: ReactNode;
}

function Part({ title, id, children }: { title: string; id: string; children: ReactNode }) {
  return (
    <Card aria-labelledby={`${id}-title`} className="flex flex-col gap-3 print-section">
      <CardTitle id={`${id}-title`}>{title}</CardTitle>
      {children}
    </Card>
  );
}

const PAIRING_WORDS: Record<StudyComparison['pairing'], string> = {
  paired:
    'Every difference is paired: the matched points drew replication r from the same random numbers (same seed, run length and warm-up), so the paired-t interval applies.',
  welch:
    'The studies used other seeds or run lengths, so their replications cannot be paired: differences use Welch’s interval for independent samples, which is wider. Run them with one seed to compare them with common random numbers.',
  mixed:
    'Some matched points share their random numbers and are paired; the others use Welch’s interval for independent samples. Each difference says which.',
  none: 'No point has finished in two studies yet, so nothing can be compared.',
};

function SizingAdvice({
  comparison,
  scenarios,
}: Pick<StudyCompareViewProps, 'scenarios'> & { comparison: StudyComparison }) {
  return (
    <ul className="flex flex-col gap-2 text-sm" data-testid="study-advice">
      {comparison.studies.map((s, i) => {
        const scenario = scenarios[i];
        if (!scenario) return <li key={s.id}>{s.label}: loading the scenario…</li>;
        const advice = recommendCarriers(
          sizingPointsOf(s.study, pointStatistics(s.study)),
          targetPerHourOf(scenario),
          stationNamesOf(scenario),
        );
        return (
          <li key={s.id}>
            <strong className="text-ink">
              {s.label}:{' '}
              {advice.kind === 'recommend'
                ? `${advice.carriers} carriers`
                : advice.kind === 'unreachable'
                  ? 'target not reached'
                  : 'no recommendation yet'}
            </strong>{' '}
            <span className="text-ink-soft">{advice.text}</span>
          </li>
        );
      })}
    </ul>
  );
}

export function StudyCompareView({ studies, scenarios, details, question, notes }: StudyCompareViewProps) {
  const comparison = compareStudies(studies);
  const target = scenarios[0] ? targetPerHourOf(scenarios[0]) : null;
  const stops = studies.map((_, s) =>
    comparison.rows.flatMap((row) => {
      const stats = row.cells[s]?.stats;
      return row.x !== null && stats && hasFailed(stats.state)
        ? [{ x: row.x, reason: POINT_STATE_WORDS[stats.state] }]
        : [];
    }),
  );
  return (
    <div className="flex flex-col gap-6" data-testid="study-comparison">
      <Part title="The question and the answer" id="study-answer">
        <p className="text-sm text-ink-soft">{question}</p>
        <p className="border-l-4 border-ink pl-4 text-base font-medium text-ink" data-testid="study-answer">
          {studyAnswer(comparison)}
        </p>
        <p className="text-sm text-ink-soft" data-testid="study-pairing">
          {PAIRING_WORDS[comparison.pairing]}
        </p>
        <ul className="text-sm text-ink-soft">
          {studies.map((s, i) => (
            <li key={s.id}>
              <strong className="text-ink">{s.label}</strong>: {details[i]}
            </li>
          ))}
        </ul>
      </Part>
      {comparison.axis && (
        <Part title="Throughput of every study" id="study-curves">
          <CurvesWithBands
            series={throughputSeries(comparison).map((series, s) => ({ ...series, stops: stops[s] }))}
            xQuantity={comparison.axis.label}
            xUnit={comparison.kind === 'carrierSizing' ? 'count' : 'value'}
            yQuantity="Throughput"
            yUnit="parts/h"
            reference={
              target
                ? {
                    value: target,
                    label: `target ${target.toFixed(1)} parts/h (${scenarios[0]!.targetTaktSeconds} s takt of ${studies[0].label})`,
                  }
                : undefined
            }
            title={`Throughput against ${comparison.axis.label.toLowerCase()}`}
            exportName="study-comparison-throughput"
          />
          {stops.some((marks) => marks.length > 0) && (
            <p className="text-sm text-ink-soft">
              ✕ on the axis: a setting with no result (it gridlocked, stopped, was not valid or was not run); it is
              never read as zero.
            </p>
          )}
        </Part>
      )}
      {comparison.kind === 'carrierSizing' && (
        <Part title="Each layout’s carrier count" id="study-advice">
          <SizingAdvice comparison={comparison} scenarios={scenarios} />
        </Part>
      )}
      <Part title="Differences at each point" id="study-differences">
        <PointDifferencesTable comparison={comparison} />
      </Part>
      {notes}
    </div>
  );
}
