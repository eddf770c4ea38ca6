// The time-study analysis facade: summary, histogram and the three fitted candidates ranked by their
// Kolmogorov–Smirnov distance. Pure and synchronous; the server calls it when a study is read.
import type { FitCandidate, FittedCandidate, TimeStudyAnalysis } from '../../shared/api/time-studies';
import { distributionSchema, type Distribution } from '../../shared/scenario/distribution';
import { histogram, summarise } from './describe-samples';
import { gammaLaw, lognormalLaw, normalLaw, type FittedLaw } from './fitted-densities';
import { ksPValue, ksStatistic } from './kolmogorov-smirnov';
import { fitGamma, fitLognormal, fitNormal, type Estimate } from './maximum-likelihood';

/** Below this probability of a negative draw the scenario's truncation at 0 s is not worth a note. */
const NEGLIGIBLE_TRUNCATION = 0.001;

interface Usable {
  distribution: Distribution | null;
  note: string | null;
}

function asScenarioDistribution(candidate: unknown): Usable {
  const parsed = distributionSchema.safeParse(candidate);
  if (parsed.success) return { distribution: parsed.data, note: null };
  return {
    distribution: null,
    note: `this fit cannot be used as a cycle time: ${parsed.error.issues[0]?.message ?? 'its parameters are out of range'}`,
  };
}

function goodness(sorted: readonly number[], law: FittedLaw) {
  const d = ksStatistic(sorted, law.cdf);
  return { d, pValue: ksPValue(d, sorted.length) };
}

function candidate<P>(
  kind: FittedCandidate['kind'],
  estimate: Estimate<P>,
  build: (p: P) => { law: FittedLaw; scenario: unknown; note?: string | null },
  sorted: readonly number[],
): FitCandidate {
  if (!estimate.ok) return { kind, status: 'refused', reason: estimate.reason };
  const { law, scenario, note } = build(estimate.parameters);
  const usable = asScenarioDistribution(scenario);
  return {
    kind,
    status: 'fitted',
    parameters: estimate.parameters,
    goodness: goodness(sorted, law),
    distribution: usable.distribution,
    note: usable.note ?? note ?? null,
  } as FitCandidate;
}

function fitAll(sorted: readonly number[]): FitCandidate[] {
  return [
    candidate(
      'normal',
      fitNormal(sorted),
      (p) => {
        const law = normalLaw(p.mean, p.sd);
        const below = law.cdf(0);
        return {
          law,
          scenario: { kind: 'normal', mean: p.mean, sd: p.sd, min: 0 },
          note:
            below > NEGLIGIBLE_TRUNCATION
              ? `${(below * 100).toFixed(1)} % of this normal lies below 0 s; the scenario redraws those, which raises the mean a little`
              : null,
        };
      },
      sorted,
    ),
    candidate(
      'lognormal',
      fitLognormal(sorted),
      (p) => ({ law: lognormalLaw(p.mu, p.sigma), scenario: { kind: 'lognormal', mean: p.mean, cv: p.cv } }),
      sorted,
    ),
    candidate(
      'gamma',
      fitGamma(sorted),
      (p) => ({ law: gammaLaw(p.shape, p.scale), scenario: { kind: 'gamma', mean: p.mean, cv: p.cv } }),
      sorted,
    ),
  ];
}

/** Fitted candidates by ascending D (ties keep the family order), refused ones after them. */
export function rankCandidates(candidates: readonly FitCandidate[]): FitCandidate[] {
  const fitted = candidates
    .filter((c): c is FittedCandidate => c.status === 'fitted')
    .sort((a, b) => a.goodness.d - b.goodness.d);
  return [...fitted, ...candidates.filter((c) => c.status === 'refused')];
}

/** `samples` must hold at least one finite number; the upload check guarantees it. */
export function analyseTimeStudy(samples: readonly number[]): TimeStudyAnalysis {
  const sorted = Float64Array.from(samples).sort();
  const values = Array.from(sorted);
  return { summary: summarise(values), histogram: histogram(values), candidates: rankCandidates(fitAll(values)) };
}
