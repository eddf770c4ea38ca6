// The comparison itself, shared by the page and the printable report: the question and its answer,
// headline figures with intervals, costs, footprint, drawings, station states by step, heatmaps on one
// colour scale and each layout's line balance, then assumptions and cautions.
import type { ReactNode } from 'react';
import type { Scenario } from '../../../../shared/scenario/scenario';
import type { RunResult } from '../../../../shared/results/run-result';
import { footprintOf } from '../../../../shared/costs/bill-of-materials';
import { LineBalanceChart, SpaceTimeHeatmap, type BalanceStep } from '../../../components/charts';
import { answerOf, type RunCost } from '../utils/answer';
import { compareRuns } from '../utils/comparison';
import { heatmapGroups } from '../utils/heatmap-lanes';
import { alignSteps } from '../utils/steps';
import { FootprintTable } from './footprint-table';
import { HeadlineTable } from './headline-table';
import { ModelAssumptions, ReportSafetyCaution } from './model-notes';
import { Section } from './section';
import { StepStateBars } from './step-state-bars';

export interface CompareItem {
  id: string;
  label: string;
  /** Revision, seed and run length, in words. */
  detail: string;
  result: RunResult;
  document: Scenario | null;
  balance: BalanceStep[] | null;
  drawing: ReactNode;
}

export interface CompareViewProps {
  items: readonly CompareItem[];
  stepNames: ReadonlyMap<string, string>;
  costs?: ReadonlyMap<string, RunCost>;
  /** Price list and bills of materials, composed by the page. */
  costSection: ReactNode;
  question: string;
  /** Said in the answer when there are no costs to compare; by default, that no price list is set. */
  withoutCosts?: string;
}

export function CompareView({ items, stepNames, costs, costSection, question, withoutCosts }: CompareViewProps) {
  const comparison = compareRuns(items.map((item) => ({ id: item.id, label: item.label, result: item.result })));
  const areas = new Map(
    items.flatMap((item) => (item.document ? [[item.id, footprintOf(item.document).areaM2] as const] : [])),
  );
  const answer = answerOf(comparison, costs, areas, withoutCosts);
  const groups = heatmapGroups(items);
  return (
    <div className="flex flex-col gap-6" data-testid="comparison">
      <Section title="The question and the answer" id="answer">
        <p className="text-sm text-ink-soft">{question}</p>
        <p className="border-l-4 border-ink pl-4 text-base font-medium text-ink" data-testid="answer">
          {answer.sentence}
        </p>
        {comparison.pairingNote && (
          <p className="text-sm text-caution" data-testid="pairing-note">
            {comparison.pairingNote}
          </p>
        )}
        <ul className="text-sm text-ink-soft">
          {items.map((item) => (
            <li key={item.id}>
              <strong className="text-ink">{item.label}</strong>: {item.detail}
            </li>
          ))}
        </ul>
      </Section>
      <Section title="Headline figures" id="headline">
        <p className="text-sm text-ink-soft">
          Under each run after the first: its difference from {items[0].label} with the 95 %{' '}
          {comparison.pairing === 'paired' ? 'paired-t' : 'Welch'} interval. ● marks a significant difference (the
          interval excludes zero), ○ one that is not.
        </p>
        <HeadlineTable comparison={comparison} />
      </Section>
      {costSection}
      <Section title="Footprint" id="footprint">
        <FootprintTable
          items={items.map((item) => ({
            id: item.id,
            label: item.label,
            footprint: item.document ? footprintOf(item.document) : null,
          }))}
        />
      </Section>
      <Section title="Layouts" id="drawings">
        <div className="grid gap-6 lg:grid-cols-2 print:grid-cols-1">
          {items.map((item) => (
            <figure key={item.id} className="flex flex-col gap-2 break-inside-avoid">
              <figcaption className="font-semibold">{item.label}</figcaption>
              {item.drawing}
            </figure>
          ))}
        </div>
      </Section>
      <Section title="Where each step spends its time" id="states">
        <StepStateBars
          rows={alignSteps(
            items.map((i) => i.result),
            stepNames,
          )}
          labels={items.map((i) => i.label)}
        />
      </Section>
      <Section title="Carriers along the track over time" id="heatmaps">
        <p className="text-sm text-ink-soft">
          All panels share one colour scale: the share of each cell covered by carriers, from 0 to 100 %.
        </p>
        {groups.map((group, i) => (
          <SpaceTimeHeatmap
            key={i}
            lanes={group.lanes}
            timeBinSeconds={group.binSeconds}
            startMinutes={group.startSeconds / 60}
            laneHeight={80}
            title={
              groups.length === 1
                ? 'Carriers along each lane, every layout'
                : `Carriers along each lane (runs with ${Math.round(group.binSeconds / 60)} min time bins)`
            }
            exportName={`compare-heatmap-${i + 1}`}
          />
        ))}
      </Section>
      <Section title="Line balance" id="balance">
        <div className="grid gap-6 lg:grid-cols-2 print:grid-cols-1">
          {items.map((item) =>
            item.balance ? (
              <div key={item.id} className="break-inside-avoid">
                <LineBalanceChart
                  steps={item.balance}
                  taktSeconds={item.result.targetTaktSeconds ?? item.result.taktSeconds.mean}
                  title={`${item.label}: ${item.result.targetTaktSeconds ? 'against the target takt' : 'against the achieved takt'}`}
                  exportName={`compare-balance-${item.id.slice(0, 8)}`}
                />
              </div>
            ) : (
              <p key={item.id} className="text-sm text-ink-soft">
                {item.label}: the scenario is still loading.
              </p>
            ),
          )}
        </div>
      </Section>
      <Section title="Model assumptions" id="assumptions">
        <ModelAssumptions comparison={comparison} />
      </Section>
      <ReportSafetyCaution />
    </div>
  );
}
