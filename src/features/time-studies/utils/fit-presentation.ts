// How candidates read on screen: family names, parameter summaries, the densities drawn over the
// histogram, and the scenario distributions the "use" buttons hand to the station form.
import type { FitCandidate, FitKind, FittedCandidate } from '../../../../shared/api/time-studies';
import { distributionSchema, type Distribution } from '../../../../shared/scenario/distribution';
import { lawOf } from '../../../../workers/analysis/fitted-densities';
import type { FittedDensity } from '../../../components/charts';

export const FAMILY_LABEL: Record<FitKind, string> = { normal: 'Normal', lognormal: 'Lognormal', gamma: 'Gamma' };

const significant = new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 4 });

export function formatValue(value: number): string {
  return significant.format(value);
}

export function formatSeconds(value: number): string {
  return `${formatValue(value)} s`;
}

export function parameterText(candidate: FittedCandidate): string {
  switch (candidate.kind) {
    case 'normal':
      return `mean ${formatSeconds(candidate.parameters.mean)}, sd ${formatSeconds(candidate.parameters.sd)}`;
    case 'lognormal':
      return `mean ${formatSeconds(candidate.parameters.mean)}, cv ${formatValue(candidate.parameters.cv)} (log-scale μ ${formatValue(candidate.parameters.mu)}, σ ${formatValue(candidate.parameters.sigma)})`;
    case 'gamma':
      return `mean ${formatSeconds(candidate.parameters.mean)}, cv ${formatValue(candidate.parameters.cv)} (shape ${formatValue(candidate.parameters.shape)}, scale ${formatSeconds(candidate.parameters.scale)})`;
  }
}

export const isFitted = (candidate: FitCandidate): candidate is FittedCandidate => candidate.status === 'fitted';

export function fittedDensities(candidates: readonly FitCandidate[]): FittedDensity[] {
  return candidates
    .filter(isFitted)
    .map((candidate) => ({ label: `${FAMILY_LABEL[candidate.kind]} fit`, pdf: lawOf(candidate).pdf }));
}

export type UsableDistribution = { ok: true; distribution: Distribution } | { ok: false; message: string };

/** The measured samples as an empirical cycle time, checked by the scenario schema the editor uses. */
export function empiricalDistribution(samples: readonly number[]): UsableDistribution {
  const parsed = distributionSchema.safeParse({ kind: 'empirical', samples: [...samples] });
  return parsed.success
    ? { ok: true, distribution: parsed.data }
    : { ok: false, message: parsed.error.issues[0]?.message ?? 'the samples cannot be used' };
}

export function describeDistribution(distribution: Distribution): string {
  switch (distribution.kind) {
    case 'empirical':
      return `the ${distribution.samples.length.toLocaleString('en-GB')} measured samples`;
    case 'normal':
      return `a normal fit (mean ${formatSeconds(distribution.mean)}, sd ${formatSeconds(distribution.sd)})`;
    case 'lognormal':
    case 'gamma':
      return `a ${distribution.kind} fit (mean ${formatSeconds(distribution.mean)}, cv ${formatValue(distribution.cv)})`;
    default:
      return `a ${distribution.kind} distribution`;
  }
}
