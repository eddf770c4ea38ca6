// One lane in plan: a strip to scale, module joints as ticks across it, chevrons for the direction
// of travel and its id at the entry. Clicking or pressing Enter on it selects it.
import type { KeyboardEvent, MouseEvent } from 'react';
import { formatLengthMm } from '../../lib/format';
import { DRAWING, type PlanFrame } from './drawing-frame';
import { directionOf, pointAlong, type PlanLane } from './geometry';

interface PlanLaneProps {
  lane: PlanLane;
  frame: PlanFrame;
  widthMm: number;
  selected: boolean;
  onSelect?: () => void;
}

const ARROW_SPACING_PX = 140;

/** What makes a drawn item pickable: a button to assistive technology, clickable, and Enter or Space on it. */
export function selectable(label: string, selected: boolean, onSelect: (() => void) | undefined) {
  return {
    'data-selected': selected || undefined,
    role: onSelect ? 'button' : 'img',
    tabIndex: onSelect ? 0 : undefined,
    'aria-label': label,
    'aria-pressed': onSelect ? selected : undefined,
    className: onSelect ? 'cursor-pointer focus:outline-none' : undefined,
    onClick: (event: MouseEvent) => {
      event.stopPropagation();
      onSelect?.();
    },
    onKeyDown: (event: KeyboardEvent) => {
      if (onSelect && (event.key === 'Enter' || event.key === ' ')) {
        event.preventDefault();
        onSelect();
      }
    },
  };
}

export function PlanLaneShape({ lane, frame, widthMm, selected, onSelect }: PlanLaneProps) {
  const { colour } = DRAWING;
  const x = frame.x(lane.box.minX);
  const y = frame.y(lane.box.maxY);
  const w = (lane.box.maxX - lane.box.minX) * frame.scale;
  const h = (lane.box.maxY - lane.box.minY) * frame.scale;
  const across = Math.max(widthMm * frame.scale, 6) / 2;
  const { dx, dy } = directionOf(lane.heading);
  const lengthPx = lane.lengthMm * frame.scale;
  const arrows = Math.max(1, Math.floor(lengthPx / ARROW_SPACING_PX));
  const tickEvery = Math.max(1, Math.ceil(lane.jointsMm.length / Math.max(lengthPx / 4, 1)));
  const label = `Lane ${lane.id}${lane.name ? ` (${lane.name})` : ''}, ${formatLengthMm(lane.lengthMm)}, heading ${lane.heading}`;
  const entry = { x: frame.x(lane.start.x), y: frame.y(lane.start.y) };
  return (
    <g data-lane-id={lane.id} data-length-mm={lane.lengthMm} {...selectable(label, selected, onSelect)}>
      <title>{label}</title>
      <rect
        data-lane-body
        x={x}
        y={Math.min(y, frame.y(lane.start.y) - across)}
        width={Math.max(w, 2 * across)}
        height={Math.max(h, 2 * across)}
        fill={selected ? colour.accentSoft : colour.lane}
        stroke={selected ? colour.accent : colour.inkSoft}
        strokeWidth={selected ? 3 : 1}
      />
      {lane.jointsMm
        .filter((_, i) => i % tickEvery === tickEvery - 1)
        .map((mm) => {
          const p = pointAlong(lane, mm);
          const px = frame.x(p.x);
          const py = frame.y(p.y);
          return (
            <line
              key={mm}
              x1={px - dy * across}
              x2={px + dy * across}
              y1={py - dx * across}
              y2={py + dx * across}
              stroke={colour.faint}
              strokeWidth={1}
            />
          );
        })}
      {Array.from({ length: arrows }, (_, i) => {
        const p = pointAlong(lane, ((i + 0.5) / arrows) * lane.lengthMm);
        const cx = frame.x(p.x);
        const cy = frame.y(p.y);
        const size = Math.min(across * 0.8, 7);
        // Plan north is screen up, so the screen direction flips dy.
        const ux = dx;
        const uy = -dy;
        const tip = `${cx + ux * size},${cy + uy * size}`;
        const left = `${cx - ux * size - uy * size},${cy - uy * size + ux * size}`;
        const right = `${cx - ux * size + uy * size},${cy - uy * size - ux * size}`;
        return (
          <polyline key={i} points={`${left} ${tip} ${right}`} fill="none" stroke={colour.inkSoft} strokeWidth={1.5} />
        );
      })}
      <circle cx={entry.x} cy={entry.y} r={3} fill={colour.ink} />
      {/* The id sits just before the entry, away from the station labels above and below the lane. */}
      <text
        x={entry.x - dx * 14}
        y={entry.y + dy * 14 + (dy === 0 ? 4 : dy > 0 ? 8 : 0)}
        textAnchor={dx > 0 ? 'end' : dx < 0 ? 'start' : 'middle'}
        fontSize={11}
        fill={colour.ink}
        fontWeight={selected ? 700 : 500}
      >
        {lane.id}
      </text>
    </g>
  );
}
