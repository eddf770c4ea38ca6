// The playback's current frame in words, for people who cannot see the canvas and for anyone who
// wants exact figures: a one-line count of carriers and station states, and a row per carrier and
// per station. Reads the same frame arrays the painter draws.
import type { PlaybackTrace } from '../../../../shared/results/playback';
import { STATION_STATES, stateLabel } from '../../charts/palette';
import { formatCount, formatLengthMm } from '../../../lib/format';
import { PLACE_CONNECTION, PLACE_LANE, type FrameState } from './frame-state';

export interface CarrierRow {
  carrier: number;
  where: string;
  moving: boolean;
  loaded: boolean;
}

export interface StationRow {
  id: string;
  state: string;
}

type SummaryTrace = Pick<PlaybackTrace, 'laneIds' | 'stationIds' | 'connFrom' | 'connTo' | 'connKind'>;

const CONNECTION_WORD = { link: 'link', elevator: 'elevator', lateral: 'lateral transfer', curve: 'curve' } as const;

export function carrierRows(frame: FrameState, trace: SummaryTrace): CarrierRow[] {
  return Array.from(frame.placeKind, (kind, c) => {
    const i = frame.placeIndex[c];
    const where =
      kind === PLACE_LANE
        ? `lane ${trace.laneIds[i] ?? i + 1}, front at ${formatLengthMm(Math.round(frame.posMm[c]))}`
        : kind === PLACE_CONNECTION
          ? `${CONNECTION_WORD[trace.connKind[i]] ?? 'transfer'} from lane ${trace.laneIds[trace.connFrom[i]]} to lane ${trace.laneIds[trace.connTo[i]]}`
          : 'not known yet';
    return { carrier: c + 1, where, moving: frame.moving[c] === 1, loaded: frame.loaded[c] === 1 };
  });
}

export function stationRows(frame: FrameState, trace: SummaryTrace): StationRow[] {
  return trace.stationIds.map((id, s) => {
    const state = STATION_STATES[frame.stationState[s]];
    return { id, state: state ? stateLabel[state] : 'not known yet' };
  });
}

/** One sentence: how many carriers move, stand and carry parts, and how many stations are in each state. */
export function frameSentence(frame: FrameState): string {
  let moving = 0;
  let loaded = 0;
  let known = 0;
  for (let c = 0; c < frame.placeKind.length; c++) {
    if (frame.placeKind[c] === 0) continue;
    known++;
    moving += frame.moving[c];
    loaded += frame.loaded[c];
  }
  const states = new Array<number>(STATION_STATES.length).fill(0);
  for (const state of frame.stationState) if (state >= 0) states[state]++;
  const stations = STATION_STATES.flatMap((state, i) => (states[i] > 0 ? [`${states[i]} ${stateLabel[state]}`] : []));
  return (
    `${formatCount(known, 'carrier')} on the track: ${moving.toLocaleString('en-GB')} moving, ` +
    `${(known - moving).toLocaleString('en-GB')} standing, ${loaded.toLocaleString('en-GB')} with a part. ` +
    `Stations: ${stations.length ? stations.join(', ') : 'none known yet'}.`
  );
}
