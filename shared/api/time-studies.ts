// Time studies: measured cycle times of one station, uploaded as a CSV file, with the analysis that
// summarises them and fits candidate distributions. The analysis is computed from the stored samples,
// so it is one shape for the server's answer, the client's panel and the tests.
import { z } from 'zod';
import { distributionSchema } from '../scenario/distribution';
import { idSchema } from '../scenario/units';
import { isoDateSchema, nameSchema, userRefSchema, uuidSchema } from './common';

export const TIME_STUDY_LIMITS = {
  /** A 100,000-row file of times with a few columns fits comfortably below this. */
  fileBytes: 1024 * 1024,
  rows: 100_000,
  /**
   * The longest cycle time a study may hold: one day. A longer "cycle" is a unit mistake (minutes or
   * milliseconds read as seconds) or a corrupt cell, and values like 1e308 overflow every sum taken of them.
   */
  maxSeconds: 86_400,
  extensions: ['.csv', '.txt'],
} as const;

/** The text fields of the multipart upload; the file itself travels in the part named `file`. */
export const uploadTimeStudyFieldsSchema = z.object({
  stationId: idSchema,
  name: nameSchema.optional(),
});

export const listTimeStudiesQuerySchema = z.object({
  stationId: idSchema.optional(),
});

export const sampleSummarySchema = z.object({
  count: z.number().int(),
  mean: z.number(),
  /** Sample standard deviation with the n − 1 denominator. */
  sd: z.number(),
  /** sd / mean; null when the mean is zero. */
  cv: z.number().nullable(),
  min: z.number(),
  max: z.number(),
  /** Quantiles at 5, 25, 50, 75 and 95 % by linear interpolation between order statistics. */
  quantiles: z.object({ p05: z.number(), p25: z.number(), p50: z.number(), p75: z.number(), p95: z.number() }),
});

export const HISTOGRAM_RULES = ['freedman-diaconis', 'sturges'] as const;

export const histogramSchema = z.object({
  /** Freedman–Diaconis, or Sturges where the interquartile range is zero. */
  rule: z.enum(HISTOGRAM_RULES),
  binWidth: z.number(),
  bins: z.array(z.object({ x0: z.number(), x1: z.number(), count: z.number().int() })),
});

export const FIT_KINDS = ['normal', 'lognormal', 'gamma'] as const;
export const fitKindSchema = z.enum(FIT_KINDS);

export const goodnessOfFitSchema = z.object({
  /** Kolmogorov–Smirnov statistic: the largest gap between the samples' step CDF and the fitted CDF. */
  d: z.number(),
  /** Asymptotic Kolmogorov p-value with Stephens' small-sample factor; optimistic because the parameters were fitted. */
  pValue: z.number(),
});

const fittedBase = {
  status: z.literal('fitted'),
  goodness: goodnessOfFitSchema,
  /** The scenario distribution this fit becomes; null with `note` when the scenario schema cannot hold it. */
  distribution: distributionSchema.nullable(),
  note: z.string().nullable(),
};

export const fittedCandidateSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('normal'), ...fittedBase, parameters: z.object({ mean: z.number(), sd: z.number() }) }),
  z.object({
    kind: z.literal('lognormal'),
    ...fittedBase,
    parameters: z.object({ mu: z.number(), sigma: z.number(), mean: z.number(), cv: z.number() }),
  }),
  z.object({
    kind: z.literal('gamma'),
    ...fittedBase,
    parameters: z.object({ shape: z.number(), scale: z.number(), mean: z.number(), cv: z.number() }),
  }),
]);

export const refusedCandidateSchema = z.object({
  kind: fitKindSchema,
  status: z.literal('refused'),
  reason: z.string(),
});

export const fitCandidateSchema = z.union([fittedCandidateSchema, refusedCandidateSchema]);

export const timeStudyAnalysisSchema = z.object({
  summary: sampleSummarySchema,
  histogram: histogramSchema,
  /** Fitted candidates best first (smallest D), then the refused ones. */
  candidates: z.array(fitCandidateSchema),
});

export const timeStudyListItemSchema = z.object({
  id: uuidSchema,
  scenarioId: uuidSchema,
  stationId: z.string(),
  name: z.string(),
  /** The uploaded file's name, for the engineer's reference. */
  fileName: z.string(),
  column: z.string(),
  count: z.number().int(),
  mean: z.number(),
  sd: z.number(),
  createdBy: userRefSchema.nullable(),
  createdAt: isoDateSchema,
});

export const timeStudyListSchema = z.array(timeStudyListItemSchema);

export const timeStudyDetailSchema = timeStudyListItemSchema.extend({
  samples: z.array(z.number()),
  analysis: timeStudyAnalysisSchema,
});

export type UploadTimeStudyFields = z.infer<typeof uploadTimeStudyFieldsSchema>;
export type ListTimeStudiesQuery = z.infer<typeof listTimeStudiesQuerySchema>;
export type SampleSummary = z.infer<typeof sampleSummarySchema>;
export type TimeStudyHistogram = z.infer<typeof histogramSchema>;
export type HistogramRule = (typeof HISTOGRAM_RULES)[number];
export type FitKind = z.infer<typeof fitKindSchema>;
export type GoodnessOfFit = z.infer<typeof goodnessOfFitSchema>;
export type FittedCandidate = z.infer<typeof fittedCandidateSchema>;
export type RefusedCandidate = z.infer<typeof refusedCandidateSchema>;
export type FitCandidate = z.infer<typeof fitCandidateSchema>;
export type TimeStudyAnalysis = z.infer<typeof timeStudyAnalysisSchema>;
export type TimeStudyListItem = z.infer<typeof timeStudyListItemSchema>;
export type TimeStudyDetail = z.infer<typeof timeStudyDetailSchema>;
