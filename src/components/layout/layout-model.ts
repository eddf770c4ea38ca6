// Turns a (draft) scenario into what the drawing shows: lanes per deck in plan, stations at their
// positions, joins between lanes, the footprint and the module count. Pure, so tests can check it.
import { footprint, planLanes, pointAlong, type DraftLane, type Footprint, type PlanLane } from './geometry';

export interface LayoutDraft {
  conveyor?: { kind?: string };
  track?: { widthMm?: unknown };
  decks?: ({ id?: string; name?: string; elevationMm?: unknown } | undefined)[];
  lanes?: (DraftLane | undefined)[];
  links?: ({ fromLaneId?: string; toLaneId?: string } | undefined)[];
  transfers?: ({ id?: string; name?: string; kind?: string; fromLaneId?: string; toLaneId?: string } | undefined)[];
  steps?: (
    | {
        id?: string;
        name?: string;
        stations?: (
          { id?: string; name?: string; laneId?: string; positionMm?: unknown; operation?: string } | undefined
        )[];
      }
    | undefined
  )[];
}

export interface PlanDeck {
  id: string;
  name: string;
  elevationMm: number | null;
}

export interface PlanStation {
  stepIndex: number;
  stationIndex: number;
  id: string;
  name: string;
  stepName: string;
  laneIndex: number;
  deckId: string;
  manual: boolean;
  point: { x: number; y: number };
}

export type JoinKind = 'link' | 'elevator' | 'lateral' | 'curve';

export interface PlanJoin {
  key: string;
  kind: JoinKind;
  name: string;
  from: PlanLane;
  to: PlanLane;
}

export interface LayoutModel {
  widthMm: number;
  decks: PlanDeck[];
  lanes: PlanLane[];
  stations: PlanStation[];
  joins: PlanJoin[];
  footprint: Footprint | null;
  moduleCount: number;
  trackLengthMm: number;
  /** Lanes that could not be drawn yet (incomplete numbers), by index. */
  undrawnLanes: number[];
}

const JOIN_KINDS: readonly string[] = ['elevator', 'lateral', 'curve'];

function stationsOf(draft: LayoutDraft, lanes: readonly PlanLane[]): PlanStation[] {
  const laneById = new Map(lanes.map((lane) => [lane.id, lane]));
  return (draft.steps ?? []).flatMap((step, stepIndex) =>
    (step?.stations ?? []).flatMap((station, stationIndex) => {
      const lane = station?.laneId === undefined ? undefined : laneById.get(station.laneId);
      const position = station?.positionMm;
      if (!station || !lane || typeof position !== 'number' || !Number.isFinite(position)) return [];
      const along = Math.min(Math.max(position, 0), lane.lengthMm);
      return [
        {
          stepIndex,
          stationIndex,
          id: station.id ?? '',
          name: station.name ?? '',
          stepName: step?.name ?? '',
          laneIndex: lane.index,
          deckId: lane.deckId,
          manual: station.operation === 'manual',
          point: pointAlong(lane, along),
        },
      ];
    }),
  );
}

function joinsOf(draft: LayoutDraft, lanes: readonly PlanLane[]): PlanJoin[] {
  const laneById = new Map(lanes.map((lane) => [lane.id, lane]));
  const joins: PlanJoin[] = [];
  (draft.links ?? []).forEach((link, i) => {
    const from = link?.fromLaneId === undefined ? undefined : laneById.get(link.fromLaneId);
    const to = link?.toLaneId === undefined ? undefined : laneById.get(link.toLaneId);
    if (from && to) joins.push({ key: `link-${i}`, kind: 'link', name: `${from.id} → ${to.id}`, from, to });
  });
  (draft.transfers ?? []).forEach((transfer, i) => {
    const from = transfer?.fromLaneId === undefined ? undefined : laneById.get(transfer.fromLaneId);
    const to = transfer?.toLaneId === undefined ? undefined : laneById.get(transfer.toLaneId);
    if (!transfer || !from || !to || !JOIN_KINDS.includes(transfer.kind ?? '')) return;
    joins.push({
      key: `transfer-${i}`,
      kind: transfer.kind as JoinKind,
      name: transfer.name || transfer.id || `transfer ${i + 1}`,
      from,
      to,
    });
  });
  return joins;
}

export function layoutModel(draft: LayoutDraft): LayoutModel {
  const width = draft.track?.widthMm;
  const widthMm = typeof width === 'number' && Number.isFinite(width) && width > 0 ? width : 0;
  const lanes = planLanes(draft.lanes, widthMm);
  const drawn = new Set(lanes.map((lane) => lane.index));
  const decks = (draft.decks ?? []).flatMap((deck) => {
    if (!deck?.id) return [];
    const elevation = deck.elevationMm;
    return [
      {
        id: deck.id,
        name: deck.name || deck.id,
        elevationMm: typeof elevation === 'number' && Number.isFinite(elevation) ? elevation : null,
      },
    ];
  });
  return {
    widthMm,
    decks,
    lanes,
    stations: stationsOf(draft, lanes),
    joins: joinsOf(draft, lanes),
    footprint: footprint(lanes),
    moduleCount: lanes.reduce((sum, lane) => sum + lane.moduleCount, 0),
    trackLengthMm: lanes.reduce((sum, lane) => sum + lane.lengthMm, 0),
    undrawnLanes: (draft.lanes ?? []).map((_, i) => i).filter((i) => !drawn.has(i)),
  };
}
