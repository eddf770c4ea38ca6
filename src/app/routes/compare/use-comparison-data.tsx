// Everything a comparison of stored runs needs, gathered from four features: the runs with their
// results, the revisions they were computed from (for drawings, footprints, bills and line balance),
// the project's organisation and its price list. Composed here because features never import one another.
import { useQueries } from '@tanstack/react-query';
import { useMemo } from 'react';
import type { PriceList } from '../../../../shared/api/price-lists';
import type { RunDetail } from '../../../../shared/api/runs';
import type { Revision } from '../../../../shared/api/scenarios';
import type { Scenario } from '../../../../shared/scenario/scenario';
import { billOf, costPerHourlyPart, quantitiesOf } from '../../../../shared/costs/bill-of-materials';
import type { CompareItem } from '../../../features/compare/components/compare-view';
import type { RunCost } from '../../../features/compare/utils/answer';
import type { PricedScenario } from '../../../features/costs/components/bill-of-materials-table';
import { usePriceList } from '../../../features/costs/api/get-price-list';
import { balanceSteps } from '../../../features/scenarios/editor/utils/line-balance';
import { LayoutDrawing } from '../../../components/layout/layout-drawing';
import { useProject } from '../../../features/projects/api/get-project';
import { scenarioRevisionQueryOptions } from '../../../features/scenarios/api/get-revision';
import { runQueryOptions } from '../../../features/runs/api/get-run';

export function parseRunIds(text: string | null): string[] {
  return (text ?? '')
    .split(',')
    .map((s) => s.trim())
    .filter(Boolean);
}

/** Scenario names, with the run name added where two runs come from one scenario. */
function labelsOf(runs: readonly RunDetail[]): string[] {
  return runs.map((run) =>
    runs.filter((r) => r.scenarioName === run.scenarioName).length > 1
      ? `${run.scenarioName} (${run.name})`
      : run.scenarioName,
  );
}

function detailOf(run: RunDetail): string {
  const s = run.settings;
  const carriers = run.results.carriers.count;
  return `revision ${run.revisionNumber}, ${carriers} carriers, seed ${run.seed}, ${s.replications} × ${s.hours} h after ${s.warmupMinutes} min warm-up`;
}

/** The comparison's columns: one per run, with its scenario revision's drawing once that has loaded. */
export function compareItemsOf(runs: readonly RunDetail[], documents: readonly (Scenario | null)[]): CompareItem[] {
  const labels = labelsOf(runs);
  return runs.map((run, i) => {
    const document = documents[i] ?? null;
    return {
      id: run.id,
      label: labels[i],
      detail: detailOf(run),
      result: run.results,
      document,
      balance: document ? balanceSteps(document.steps) : null,
      drawing: document ? (
        <LayoutDrawing document={document} />
      ) : (
        <p className="text-sm text-ink-soft">Loading the drawing…</p>
      ),
    };
  });
}

export const stepNamesOf = (documents: readonly (Scenario | null)[]) =>
  new Map(documents.flatMap((d) => d?.steps.map((s) => [s.id, s.name] as const) ?? []));

function priced(items: readonly CompareItem[], priceList: PriceList | null) {
  if (!priceList) return { scenarios: [] as PricedScenario[], costs: undefined };
  const scenarios = items.flatMap((item) => {
    if (!item.document) return [];
    const bill = billOf(quantitiesOf(item.document, item.result.carriers.count), priceList.prices);
    return [
      {
        id: item.id,
        label: item.label,
        bill,
        perHourlyPart: costPerHourlyPart(bill.capitalCost, item.result.throughputPerHour.mean),
      },
    ];
  });
  const costs = new Map<string, RunCost>(
    scenarios.map((s) => [
      s.id,
      { capitalCost: s.bill.capitalCost, perHourlyPart: s.perHourlyPart, currency: priceList.currency },
    ]),
  );
  return { scenarios, costs: scenarios.length === items.length ? costs : undefined };
}

export function useComparisonData(projectId: string, runIds: readonly string[]) {
  const project = useProject(projectId);
  const runs = useQueries({ queries: runIds.map((id) => runQueryOptions(id)) });
  const revisions = useQueries({
    queries: runs.map((run) => ({
      ...scenarioRevisionQueryOptions(run.data?.scenarioId ?? '', run.data?.revisionNumber ?? 0),
      enabled: Boolean(run.data),
    })),
  });
  const priceList = usePriceList(project.data?.organisationId);

  const runData = runs.map((r) => r.data);
  const revisionData = revisions.map((r) => r.data);
  const loaded = runData.every(Boolean) ? (runData as RunDetail[]) : null;
  // Queries hand back new arrays on every render; the ids say when the data really changed.
  // Null while loading, so an empty comparison never stands in for one still on its way.
  const runKey = loaded ? loaded.map((r) => r.id).join() : null;
  const revisionKey = revisionData.map((r) => r?.id ?? '').join();
  const items = useMemo(
    () =>
      loaded
        ? compareItemsOf(
            loaded,
            revisionData.map((r: Revision | undefined) => r?.document ?? null),
          )
        : null,
    [runKey, revisionKey],
  );
  const stepNames = useMemo(() => stepNamesOf(revisionData.map((r) => r?.document ?? null)), [revisionKey]);
  const list = priceList.data?.priceList ?? null;
  const pricing = useMemo(() => (items ? priced(items, list) : { scenarios: [], costs: undefined }), [items, list]);

  const failed = runs.find((r) => r.isError)?.error ?? project.error ?? null;
  return {
    project,
    items,
    stepNames,
    priceList: list,
    priceListSettled: priceList.isSuccess || priceList.isError,
    pricing,
    failed,
    allRevisionsLoaded: revisions.every((r) => r.data),
  };
}
