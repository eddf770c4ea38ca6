// Studies: many runs of one question (how many carriers, what if this field changed, which station is
// worth speeding up), stored as points and the results of independent jobs. A job is one block of
// replications of one point, fully determined by the study's definition, so any host (browser
// workers today, server workers later) can run it and the server keeps each job's result once.
import { z } from 'zod';
import { runSettingsSchema, type RunSettings } from '../scenario/run-settings';
import { pointChangeSchema } from '../studies/point-changes';
import { CARRIER_COUNT_PATH } from '../studies/sweepable-fields';
import {
  blockSeriesJsonSchema,
  replicationFiguresSchema,
  replicationSummaryJsonSchema,
} from '../studies/replication-summary-json';
import { isoDateSchema, nameSchema, userRefSchema, uuidSchema } from './common';

export const STUDY_KINDS = ['carrierSizing', 'sweep', 'whatIf'] as const;
export const STUDY_STATUSES = ['running', 'done', 'cancelled', 'failedPoints'] as const;
/**
 * `gridlock`: the point's carriers locked the track; `skipped`: a carrier-sizing point above a count
 * that already gridlocked, not run because more carriers on the same track only lock it sooner.
 */
export const JOB_OUTCOMES = ['done', 'invalid', 'stopped', 'gridlock', 'skipped'] as const;
export const FAILED_OUTCOMES = ['invalid', 'stopped', 'gridlock', 'skipped'] as const;
/** Where a study's jobs run: the author's browser tab, or the server's worker processes. */
export const STUDY_RUN_PLACES = ['browser', 'server'] as const;

export const STUDY_LIMITS = {
  pointsMax: 400,
  jobsMax: 4_000,
  changesPerPointMax: 4,
  /** Simulated hours (warm-up included) over every point and replication: about an hour of two cores. */
  simulatedHoursMax: 50_000,
  labelMaxLength: 120,
  messageMaxLength: 2_000,
} as const;

/**
 * Server studies may be far larger than a tab should carry; the job and hour limits replace the browser's
 * ones. Every organisation may run `concurrentPerOrganisation` server studies at once.
 */
export const SERVER_STUDY_LIMITS = {
  jobsMax: 10_000,
  /** About 40 counts × 4 layouts × 30 replications of a 168 h week, with room to spare. */
  simulatedHoursMax: 1_000_000,
  concurrentPerOrganisation: 3,
} as const;

/** Above this many simulated hours the form suggests the server: roughly ten minutes of a two-core laptop. */
export const SERVER_SUGGESTED_ABOVE_HOURS = 5_000;

/** Simulated hours of a study: points × replications × (hours + warm-up). */
export function studySimulatedHours(s: {
  points: readonly unknown[];
  settings: { replications: number; hours: number; warmupMinutes: number };
}): number {
  return s.points.length * s.settings.replications * (s.settings.hours + s.settings.warmupMinutes / 60);
}

export const studyKindSchema = z.enum(STUDY_KINDS, { error: `must be one of ${STUDY_KINDS.join(', ')}` });
export const studyStatusSchema = z.enum(STUDY_STATUSES);
export const studyRunPlaceSchema = z.enum(STUDY_RUN_PLACES, { error: 'must be browser or server' });

export const studyPointSchema = z.object({
  label: z
    .string({ error: 'must be text' })
    .trim()
    .min(1, 'is required')
    .max(STUDY_LIMITS.labelMaxLength, `must be at most ${STUDY_LIMITS.labelMaxLength} characters`),
  /** The revision this point runs; the study's revision when absent. */
  revisionId: uuidSchema.optional(),
  changes: z
    .array(pointChangeSchema, { error: 'must be a list' })
    .max(STUDY_LIMITS.changesPerPointMax, `a point may change at most ${STUDY_LIMITS.changesPerPointMax} fields`)
    .default([]),
});

/** Layout of the chart axes for sweeps (one or two swept paths); carrier sizing and what-if read their points. */
export const studyAxesSchema = z
  .array(z.object({ path: z.string().max(200), label: z.string().max(STUDY_LIMITS.labelMaxLength) }))
  .max(2)
  .default([]);

export const createStudySchema = z
  .object({
    name: nameSchema,
    kind: studyKindSchema,
    revisionId: uuidSchema,
    settings: runSettingsSchema,
    /** Every point draws replication r from the same streams, so differences between points are paired. */
    commonRandomNumbers: z.boolean({ error: 'must be true or false' }).default(true),
    /** Replications per job; the last job of a point takes the remainder. */
    blockSize: z.int({ error: 'must be a whole number' }).min(1, 'must be at least 1').optional(),
    /** What-if: the share by which each station's cycle time is shortened (0.1 = 10 %). */
    reduction: z.number().gt(0, 'must be above 0').lt(1, 'must be below 1').optional(),
    /** The browser runs the jobs in the author's tab; the server queues them for its worker processes. */
    runOn: studyRunPlaceSchema.default('browser'),
    axes: studyAxesSchema,
    points: z
      .array(studyPointSchema, { error: 'must be a list' })
      .min(1, 'a study needs at least one point')
      .max(STUDY_LIMITS.pointsMax, `a study may have at most ${STUDY_LIMITS.pointsMax} points; use a coarser grid`),
  })
  .superRefine((s, ctx) => {
    const limits = s.runOn === 'server' ? SERVER_STUDY_LIMITS : STUDY_LIMITS;
    const where = s.runOn === 'server' ? 'on the server' : 'in the browser (run larger studies on the server)';
    const block = s.blockSize ?? s.settings.replications;
    if (block > s.settings.replications)
      ctx.addIssue({
        code: 'custom',
        path: ['blockSize'],
        message: `must not exceed the replications (${s.settings.replications})`,
      });
    const jobs = s.points.length * Math.ceil(s.settings.replications / Math.min(block, s.settings.replications));
    if (jobs > limits.jobsMax)
      ctx.addIssue({
        code: 'custom',
        path: ['blockSize'],
        message: `the study would have ${jobs} jobs; at most ${limits.jobsMax} are allowed ${where}, so use larger blocks or fewer points`,
      });
    const hours = studySimulatedHours(s);
    if (hours > limits.simulatedHoursMax) {
      ctx.addIssue({
        code: 'custom',
        path: ['settings', 'hours'],
        message: `the study would simulate ${Math.round(hours)} hours (points × replications × (hours + warm-up)); at most ${limits.simulatedHoursMax} are allowed ${where}`,
      });
    }
  });

export const updateStudySchema = z
  .object({
    name: nameSchema.optional(),
    status: z.enum(['running', 'cancelled'], { error: 'must be running (resume) or cancelled' }).optional(),
  })
  .refine((b) => b.name !== undefined || b.status !== undefined, {
    message: 'give a name or a status',
    path: ['status'],
  });

const jobKeyShape = {
  pointIndex: z.int({ error: 'must be a whole number' }).min(0, 'must be 0 or more'),
  first: z.int({ error: 'must be a whole number' }).min(0, 'must be 0 or more'),
  count: z.int({ error: 'must be a whole number' }).min(1, 'must be at least 1'),
};

export const saveJobResultSchema = z.discriminatedUnion(
  'outcome',
  [
    z.object({
      ...jobKeyShape,
      outcome: z.literal('done'),
      engineVersion: z.string().max(40),
      summaries: z.array(replicationSummaryJsonSchema).min(1),
      /** The block's mean heatmap series; may be left out only when every summary carries its own. */
      series: blockSeriesJsonSchema.optional(),
      events: z.array(z.number().nonnegative()).min(1),
    }),
    z.object({
      ...jobKeyShape,
      outcome: z.enum(FAILED_OUTCOMES),
      message: z.string().trim().min(1, 'is required').max(STUDY_LIMITS.messageMaxLength),
    }),
  ],
  { error: `outcome must be one of ${JOB_OUTCOMES.join(', ')}` },
);

export const studyListItemSchema = z.object({
  id: uuidSchema,
  projectId: uuidSchema,
  name: z.string(),
  kind: studyKindSchema,
  revisionId: uuidSchema,
  scenarioId: uuidSchema,
  scenarioName: z.string(),
  revisionNumber: z.number().int().positive(),
  settings: runSettingsSchema,
  commonRandomNumbers: z.boolean(),
  blockSize: z.number().int().positive(),
  reduction: z.number().nullable(),
  status: studyStatusSchema,
  runOn: studyRunPlaceSchema,
  pointCount: z.number().int().nonnegative(),
  jobCount: z.number().int().nonnegative(),
  jobsDone: z.number().int().nonnegative(),
  createdBy: userRefSchema.nullable(),
  createdAt: isoDateSchema,
  updatedAt: isoDateSchema,
});

export const storedPointSchema = z.object({
  index: z.number().int(),
  label: z.string(),
  revisionId: uuidSchema,
  changes: z.array(pointChangeSchema),
});

export const jobResultSchema = z.object({
  pointIndex: z.number().int(),
  first: z.number().int(),
  count: z.number().int(),
  outcome: z.enum(JOB_OUTCOMES),
  message: z.string().nullable(),
  figures: z.array(replicationFiguresSchema),
});

export const studyDetailSchema = studyListItemSchema.extend({
  axes: z.array(z.object({ path: z.string(), label: z.string() })),
  points: z.array(storedPointSchema),
  results: z.array(jobResultSchema),
});

/** A finished job's replications as the engine's combineBlocks reads them. */
export const jobBlockSchema = z.object({
  first: z.number().int(),
  summaries: z.array(replicationSummaryJsonSchema),
  events: z.array(z.number()),
  series: blockSeriesJsonSchema.optional(),
});
export const pointBlocksSchema = z.object({
  pointIndex: z.number().int(),
  engineVersion: z.string().nullable(),
  blocks: z.array(jobBlockSchema),
});

/** A server job that kept failing (worker crashes, time limit, errors) after its retries. */
export const failedJobSchema = z.object({
  pointIndex: z.number().int(),
  first: z.number().int(),
  count: z.number().int(),
  reason: z.string(),
  failedAt: isoDateSchema,
});

/** A server study's progress, polled by the study page while it runs. */
export const studyProgressSchema = z.object({
  status: studyStatusSchema,
  jobCount: z.number().int(),
  jobsDone: z.number().int(),
  failedJobs: z.array(failedJobSchema),
  /** From the pace of the last finished jobs; null until there is a pace to go by. */
  remainingMs: z.number().nonnegative().nullable(),
  /**
   * Seconds since the study was queued or last stored a result, when that is over a minute and no
   * worker holds one of its jobs: most likely no study worker is running. Null otherwise.
   */
  idleSeconds: z.number().int().nonnegative().nullable(),
  finishedAt: isoDateSchema.nullable(),
});

export const saveJobResultAnswerSchema = z.object({
  saved: z.boolean(),
  status: studyStatusSchema,
  jobsDone: z.number().int(),
});

/** One unit of work: plain data, so a Web Worker or a server process can run it as it is. */
export type StudyJob = {
  studyId: string;
  pointIndex: number;
  revisionId: string;
  changes: z.infer<typeof pointChangeSchema>[];
  settings: RunSettings;
  first: number;
  count: number;
};

type JobSource = Pick<StudyDetail, 'id' | 'settings' | 'commonRandomNumbers' | 'blockSize' | 'points'>;

/** Without common random numbers each point gets its own seed, derived from the study's. */
export function pointSeed(
  settings: RunSettings,
  commonRandomNumbers: boolean,
  pointIndex: number,
): RunSettings['seed'] {
  return commonRandomNumbers ? settings.seed : `${settings.seed}/point-${pointIndex}`;
}

export function studyJobs(study: JobSource): StudyJob[] {
  const { replications } = study.settings;
  const jobs: StudyJob[] = [];
  for (const point of study.points) {
    const settings = { ...study.settings, seed: pointSeed(study.settings, study.commonRandomNumbers, point.index) };
    for (let first = 0; first < replications; first += study.blockSize) {
      jobs.push({
        studyId: study.id,
        pointIndex: point.index,
        revisionId: point.revisionId,
        changes: point.changes,
        settings,
        first,
        count: Math.min(study.blockSize, replications - first),
      });
    }
  }
  return jobs;
}

export const jobKey = (j: { pointIndex: number; first: number }) => `${j.pointIndex}:${j.first}`;

/** Jobs without a stored result, in point order. */
export function pendingJobs(study: JobSource & Pick<StudyDetail, 'results'>): StudyJob[] {
  const done = new Set(study.results.map(jobKey));
  return studyJobs(study).filter((j) => !done.has(jobKey(j)));
}

/** The carrier count a job sets, or null when it leaves the count alone. */
export const carriersOf = (job: Pick<StudyJob, 'changes'>): number | null =>
  job.changes.find((c) => c.path === CARRIER_COUNT_PATH && c.op === 'set')?.value ?? null;

/** The fewest carriers among points that gridlocked, or null. */
export function gridlockCeiling(locked: readonly Pick<StudyJob, 'changes'>[]): number | null {
  const counts = locked.map(carriersOf).filter((n): n is number => n !== null);
  return counts.length > 0 ? Math.min(...counts) : null;
}

/** Why a carrier-sizing job is not run (its count is above one that gridlocked), or null. */
export function gridlockSkipReason(ceiling: number | null, job: Pick<StudyJob, 'changes'>): string | null {
  const n = carriersOf(job);
  return ceiling !== null && n !== null && n > ceiling
    ? `not run: ${ceiling} carriers already gridlock this track, and more carriers only lock it sooner`
    : null;
}

/**
 * Carrier sizing stops adding counts above the first that gridlocks: more carriers on the same track
 * only lock it sooner. Ask `skip` as each job starts (the reason it is not run, or null) and tell
 * `record` each outcome, so jobs already queued behind a gridlock are skipped too. The server's
 * workers apply the same rule from the stored results (server/worker/gridlock-skip.ts).
 */
export function gridlockGuard(study: Pick<StudyDetail, 'kind' | 'points' | 'results'>) {
  let ceiling =
    study.kind === 'carrierSizing'
      ? gridlockCeiling(study.results.filter((r) => r.outcome === 'gridlock').map((r) => study.points[r.pointIndex]))
      : null;
  return {
    skip: (job: Pick<StudyJob, 'changes'>): string | null => gridlockSkipReason(ceiling, job),
    record(job: Pick<StudyJob, 'changes'>, outcome: string): void {
      const n = carriersOf(job);
      if (study.kind === 'carrierSizing' && outcome === 'gridlock' && n !== null) ceiling = Math.min(ceiling ?? n, n);
    },
  };
}

export type StudyKind = z.infer<typeof studyKindSchema>;
export type StudyStatus = z.infer<typeof studyStatusSchema>;
export type StudyRunPlace = z.infer<typeof studyRunPlaceSchema>;
export type FailedJob = z.infer<typeof failedJobSchema>;
export type StudyProgress = z.infer<typeof studyProgressSchema>;
export type StudyPointInput = z.input<typeof studyPointSchema>;
export type CreateStudyInput = z.input<typeof createStudySchema>;
export type UpdateStudyInput = z.infer<typeof updateStudySchema>;
export type SaveJobResultInput = z.infer<typeof saveJobResultSchema>;
export type StudyListItem = z.infer<typeof studyListItemSchema>;
export type StudyDetail = z.infer<typeof studyDetailSchema>;
export type JobResult = z.infer<typeof jobResultSchema>;
export type PointBlocks = z.infer<typeof pointBlocksSchema>;
export type SaveJobResultAnswer = z.infer<typeof saveJobResultAnswerSchema>;
