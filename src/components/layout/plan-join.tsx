// Joins between lanes in plan. Links and same-deck transfers are drawn from one lane's exit to the
// next lane's entry; an elevator is a square marker at each end, naming the deck it leads to.
import { anchorFor, DRAWING, type PlanFrame } from './drawing-frame';
import type { PlanDeck, PlanJoin } from './layout-model';

const KIND_LABEL = { link: 'link', elevator: 'elevator', lateral: 'lateral transfer', curve: 'curve' } as const;

export function PlanJoinShape({ join, frame }: { join: PlanJoin; frame: PlanFrame }) {
  const { colour } = DRAWING;
  const a = { x: frame.x(join.from.end.x), y: frame.y(join.from.end.y) };
  const b = { x: frame.x(join.to.start.x), y: frame.y(join.to.start.y) };
  const mid = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
  const label = `${KIND_LABEL[join.kind]} ${join.name}: ${join.from.id} to ${join.to.id}`;
  if (join.kind === 'curve') {
    // Bulge outwards from the lanes, on the side the carrier was heading.
    const bulge = 28;
    const dx = join.from.end.x - join.from.start.x;
    const dy = join.from.end.y - join.from.start.y;
    const norm = Math.hypot(dx, dy) || 1;
    const c = { x: mid.x + (dx / norm) * bulge, y: mid.y - (dy / norm) * bulge };
    return (
      <g data-join={join.kind} aria-label={label}>
        <title>{label}</title>
        <path d={`M${a.x},${a.y} Q${c.x},${c.y} ${b.x},${b.y}`} fill="none" stroke={colour.join} strokeWidth={3} />
      </g>
    );
  }
  return (
    <g data-join={join.kind} aria-label={label}>
      <title>{label}</title>
      <line
        x1={a.x}
        y1={a.y}
        x2={b.x}
        y2={b.y}
        stroke={colour.join}
        strokeWidth={join.kind === 'link' ? 1.5 : 3}
        strokeDasharray={join.kind === 'link' ? '4 3' : undefined}
      />
      {join.kind === 'lateral' && (
        <>
          <rect
            x={a.x - 4}
            y={a.y - 4}
            width={8}
            height={8}
            fill={colour.paper}
            stroke={colour.join}
            strokeWidth={1.5}
          />
          <rect
            x={b.x - 4}
            y={b.y - 4}
            width={8}
            height={8}
            fill={colour.paper}
            stroke={colour.join}
            strokeWidth={1.5}
          />
        </>
      )}
    </g>
  );
}

/** The end of an elevator that lies on this deck, labelled with where a carrier there goes next. */
export function ElevatorEnd({
  join,
  frame,
  deckId,
  decks,
}: {
  join: PlanJoin;
  frame: PlanFrame;
  deckId: string;
  decks: readonly PlanDeck[];
}) {
  const { colour } = DRAWING;
  const leaving = join.from.deckId === deckId;
  const point = leaving ? join.from.end : join.to.start;
  const otherDeckId = leaving ? join.to.deckId : join.from.deckId;
  const other = decks.find((d) => d.id === otherDeckId);
  const here = decks.find((d) => d.id === deckId);
  const otherName = other?.name ?? otherDeckId;
  // Up or down is read from the deck heights; without them the words alone say it.
  const rises = other?.elevationMm != null && here?.elevationMm != null ? other.elevationMm > here.elevationMm : null;
  const way = rises === null ? '' : leaving ? (rises ? 'up ' : 'down ') : rises ? 'down ' : 'up ';
  const words = leaving ? `lift ${way}to ${otherName}` : `arrives ${way === '' ? '' : `${way}`}from ${otherName}`;
  const x = frame.x(point.x);
  const y = frame.y(point.y);
  const text = `${join.name}: carriers ${leaving ? `leave this deck ${way}to ${otherName}` : `arrive ${way}from ${otherName}`}`;
  // The arrow points the way the carrier travels at this end: away from the deck when it leaves, onto it when it arrives.
  const arrowUp = rises === null ? leaving : leaving ? rises : !rises;
  const tip = arrowUp ? -6 : 6;
  return (
    <g data-join="elevator" data-elevator-end={leaving ? 'leave' : 'arrive'} aria-label={`Elevator ${text}`}>
      <title>{`Elevator ${text}`}</title>
      <rect x={x - 9} y={y - 9} width={18} height={18} fill={colour.paper} stroke={colour.join} strokeWidth={2} />
      <path
        d={`M${x},${y - tip} L${x},${y + tip} M${x - 4},${y + tip / 2} L${x},${y + tip} L${x + 4},${y + tip / 2}`}
        stroke={colour.join}
        fill="none"
        strokeWidth={1.8}
      />
      <text x={x} y={y + 24} fontSize={10} fill={colour.join} textAnchor={anchorFor(x)}>
        {words}
      </text>
    </g>
  );
}
