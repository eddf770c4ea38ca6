// The line-balance picture before any simulation: each step's mean cycle time from its stations'
// distributions (exact moments, not samples), shared over its parallel stations.
import { distributionSchema } from '../../../../../shared/scenario/distribution';
import { distributionMean, distributionVariance } from '../../../../../workers/engine/stats/distribution-moments';
import type { BalanceStep } from '../../../../components/charts';

interface DraftStep {
  id?: string;
  name?: string;
  stations?: ({ cycleTimeSeconds?: unknown } | undefined)[];
}

/** Steps whose stations all have a complete cycle time; a step still being typed is left out. */
export function balanceSteps(steps: readonly (DraftStep | undefined)[] | undefined): BalanceStep[] {
  return (steps ?? []).flatMap((step, index) => {
    const stations = step?.stations ?? [];
    if (!step || stations.length === 0) return [];
    const moments = stations.map((station) => distributionSchema.safeParse(station?.cycleTimeSeconds));
    if (moments.some((m) => !m.success)) return [];
    const means = moments.map((m) => (m.success ? distributionMean(m.data) : 0));
    const variances = moments.map((m) => (m.success ? distributionVariance(m.data) : 0));
    const mean = means.reduce((a, b) => a + b, 0) / stations.length;
    const variance = variances.reduce((a, b) => a + b, 0) / stations.length;
    return [
      {
        id: step.id || `step-${index + 1}`,
        name: step.name || step.id || `Step ${index + 1}`,
        meanCycleSeconds: mean,
        sdCycleSeconds: Math.sqrt(variance),
        parallelStations: stations.length,
      },
    ];
  });
}
