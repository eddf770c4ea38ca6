// What a playback asks of the engine: which replication of a stored run to replay and which window
// of its simulated time to record. Limits live here so the form, the worker and the tests agree.
import { z } from 'zod';
import { between, wholeBetween } from '../scenario/units';
import { RUN_LIMITS } from '../scenario/run-settings';

export const PLAYBACK_LIMITS = {
  windowMinutesMin: 1,
  /** Two hours of a busy line stays well under the trace caps below. */
  windowMinutesMax: 240,
  /** Carrier changes (moves, stops, transfers, loads) a trace may hold: about 33 bytes each, so 20 MB. */
  carrierChangesMax: 600_000,
  /** Station state changes a trace may hold: about 13 bytes each. */
  stationChangesMax: 300_000,
} as const;

export const playbackRequestSchema = z.object({
  /** Replication index, from 0; replication r replays the stream (seed, r) of the run. */
  replication: wholeBetween('replication', 0, RUN_LIMITS.replicationsMax - 1).default(0),
  /** Where the window starts, in simulated minutes from the start of the replication (warm-up included). */
  startMinutes: between('startMinutes', 0, RUN_LIMITS.hoursMax * 60).default(0),
  windowMinutes: between('windowMinutes', PLAYBACK_LIMITS.windowMinutesMin, PLAYBACK_LIMITS.windowMinutesMax).default(
    30,
  ),
});

export type PlaybackRequest = z.infer<typeof playbackRequestSchema>;
export type PlaybackRequestInput = z.input<typeof playbackRequestSchema>;

/** Carrier flags in a trace. */
export const TRACE_LOADED = 1;

/**
 * A recorded window, in flat typed arrays so it crosses from the worker without copying. Carrier
 * changes are in time order; each says where the carrier is from that moment: on a lane (`where` is
 * the lane index, `posMm` its front's distance from the lane start) or in a transfer (`where` is
 * -1 - connection index, `posMm` 0 at take-over and `destMm` 1 when carried across). A change that
 * starts a move also gives where and when the move ends (`destMm`, `endT`); otherwise they equal the
 * start. Station changes give the state index in the order of STATION_STATES.
 */
export type PlaybackTrace = {
  startSeconds: number;
  endSeconds: number;
  replication: number;
  carrierCount: number;
  carrierLengthMm: number;
  laneIds: string[];
  stationIds: string[];
  /** Per connection (links first, then transfers in document order). */
  connFrom: Int32Array;
  connTo: Int32Array;
  connKind: ('link' | 'elevator' | 'lateral' | 'curve')[];
  carriers: {
    count: number;
    t: Float64Array;
    carrier: Int32Array;
    where: Int32Array;
    posMm: Float32Array;
    destMm: Float32Array;
    endT: Float64Array;
    flags: Uint8Array;
  };
  stations: { count: number; t: Float64Array; station: Int32Array; state: Uint8Array };
};
