// The track of a scenario: decks, lanes built from standard modules, direct links and transfers
// (elevators, lateral transfers, curves). Every join runs from the end of one lane to the start of
// another, in the direction of travel.
import { z } from 'zod';
import { between, idSchema, labelSchema, nonNegative, positive, wholeBetween } from './units';

export const TRACK_LIMITS = {
  moduleLengthMaxMm: 20_000,
  modulesPerLaneMax: 1_000,
  /** Entries in a lane's module list (each entry repeats one module `count` times). */
  moduleRunsPerLaneMax: 100,
  /** Standard module lengths a track may offer. */
  moduleLengthsMax: 20,
  lanesMax: 200,
  decksMax: 20,
  transfersMax: 400,
  /** Plan coordinates stay within ±1 km: a layout larger than that is a unit mistake. */
  planExtentMm: 1_000_000,
} as const;

export const trackSchema = z.object({
  /** The standard module lengths a lane may be assembled from. */
  moduleLengthsMm: z
    .array(between('each module length (mm)', 1, TRACK_LIMITS.moduleLengthMaxMm), {
      error: 'moduleLengthsMm must be a list',
    })
    .min(1, 'moduleLengthsMm must list at least one standard module length')
    .max(
      TRACK_LIMITS.moduleLengthsMax,
      `moduleLengthsMm may list at most ${TRACK_LIMITS.moduleLengthsMax} standard lengths`,
    ),
  /** Width of a track lane in plan, used for drawing and footprint. */
  widthMm: positive('widthMm'),
});

export const deckSchema = z.object({
  id: idSchema,
  name: labelSchema,
  /** Height of the deck's running surface above the floor. */
  elevationMm: between('elevationMm', 0, 20_000),
});

export const HEADINGS = ['east', 'north', 'west', 'south'] as const;

export const laneModuleSchema = z.object({
  /** Must be one of track.moduleLengthsMm. */
  lengthMm: positive('lengthMm'),
  count: wholeBetween('count', 1, TRACK_LIMITS.modulesPerLaneMax),
});

export const planPointSchema = z.object({
  xMm: between('xMm', -TRACK_LIMITS.planExtentMm, TRACK_LIMITS.planExtentMm),
  yMm: between('yMm', -TRACK_LIMITS.planExtentMm, TRACK_LIMITS.planExtentMm),
});

export const laneSchema = z.object({
  id: idSchema,
  name: labelSchema,
  deckId: idSchema,
  /** Modules in the order carriers travel over them; the lane's length is their sum. */
  modules: z
    .array(laneModuleSchema, { error: 'modules must be a list' })
    .min(1, 'a lane needs at least one module')
    .max(
      TRACK_LIMITS.moduleRunsPerLaneMax,
      `a lane may list at most ${TRACK_LIMITS.moduleRunsPerLaneMax} module entries; give repeated modules a count`,
    ),
  /** Where the lane starts (its entry) in plan, and which way carriers travel from there. */
  start: planPointSchema,
  heading: z.enum(HEADINGS, { error: `heading must be one of ${HEADINGS.join(', ')}` }),
});

/** Lane end to lane start with nothing in between: the carrier rolls straight on. */
export const linkSchema = z.object({
  fromLaneId: idSchema,
  toLaneId: idSchema,
});

const transferBase = {
  id: idSchema,
  name: labelSchema,
  fromLaneId: idSchema,
  toLaneId: idSchema,
};

/** Carries one carrier between decks; the vertical distance comes from the two decks' elevations. */
export const elevatorSchema = z.object({
  ...transferBase,
  kind: z.literal('elevator'),
  /** Time to move the carrier onto and off the platform, together. */
  handlingSeconds: nonNegative('handlingSeconds'),
  liftSpeedMmPerS: positive('liftSpeedMmPerS'),
});

/** Shifts one carrier sideways between two lanes on the same deck. */
export const lateralTransferSchema = z.object({
  ...transferBase,
  kind: z.literal('lateral'),
  handlingSeconds: nonNegative('handlingSeconds'),
  shiftDistanceMm: positive('shiftDistanceMm'),
  shiftSpeedMmPerS: positive('shiftSpeedMmPerS'),
});

/** A curved track segment that one carrier at a time runs through at its speed limit. */
export const curveSchema = z.object({
  ...transferBase,
  kind: z.literal('curve'),
  lengthMm: positive('lengthMm'),
  speedLimitMmPerS: positive('speedLimitMmPerS'),
});

export const TRANSFER_KINDS = ['elevator', 'lateral', 'curve'] as const;

export const transferSchema = z.discriminatedUnion('kind', [elevatorSchema, lateralTransferSchema, curveSchema], {
  error: `kind must be one of ${TRANSFER_KINDS.join(', ')}`,
});

/** Length of a lane from its modules. */
export function laneLengthMm(lane: Pick<Lane, 'modules'>): number {
  let total = 0;
  for (const m of lane.modules) total += m.lengthMm * m.count;
  return total;
}

export function laneModuleCount(lane: Pick<Lane, 'modules'>): number {
  let total = 0;
  for (const m of lane.modules) total += m.count;
  return total;
}

export type Track = z.infer<typeof trackSchema>;
export type Deck = z.infer<typeof deckSchema>;
export type Lane = z.infer<typeof laneSchema>;
export type LaneModule = z.infer<typeof laneModuleSchema>;
export type Heading = (typeof HEADINGS)[number];
export type Link = z.infer<typeof linkSchema>;
export type Transfer = z.infer<typeof transferSchema>;
export type TransferKind = Transfer['kind'];
