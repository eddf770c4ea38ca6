// The time-study analysis: descriptive statistics, maximum-likelihood fits and goodness of fit, shared by
// the server (which answers with it) and the client (which draws the fitted densities).
export { analyseTimeStudy, rankCandidates } from './analyse-time-study';
export { lawOf, normalLaw, lognormalLaw, gammaLaw, type FittedLaw } from './fitted-densities';
export { ksStatistic, ksPValue, kolmogorovSurvival } from './kolmogorov-smirnov';
export {
  fitNormal,
  fitLognormal,
  fitGamma,
  type Estimate,
  type NormalParameters,
  type LognormalParameters,
  type GammaParameters,
} from './maximum-likelihood';
export { summarise, histogram, histogramRule, HISTOGRAM_MAX_BINS } from './describe-samples';
export { pairedDifference, welchDifference, type MeanDifference, type DifferenceMethod } from './compare-means';
