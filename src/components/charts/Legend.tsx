// Legends drawn inside the SVG, so an exported picture still explains its colours.
import { useId } from 'react';
import { estimateTextWidth } from './format';
import { ink } from './palette';

export type LegendSwatch =
  | { kind: 'box'; fill: string; stroke?: string; opacity?: number }
  | { kind: 'line'; colour: string; dash?: string; strokeWidth?: number }
  | { kind: 'diamond'; colour: string }
  | { kind: 'whisker'; colour: string };

export interface LegendItem {
  label: string;
  swatch: LegendSwatch;
}

export type LegendSpec =
  | { kind: 'swatches'; items: readonly LegendItem[] }
  | {
      kind: 'ramp';
      label: string;
      interpolate: (t: number) => string;
      domain: readonly [number, number];
      tickFormat: (value: number) => string;
      /** Marks explained beside the ramp, such as a shaded warm-up. */
      extras?: readonly LegendItem[];
    };

const FONT = 12;
const ROW = 20;
const SWATCH = 14;
const RAMP_WIDTH = 240;
const RAMP_HEIGHT = 50;
const RAMP_EXTRAS_X = RAMP_WIDTH + 40;

interface PlacedItem extends LegendItem {
  x: number;
  y: number;
}

/** Flows swatch items left to right, wrapping to new rows within the available width. */
export function layoutSwatches(
  items: readonly LegendItem[],
  maxWidth: number,
): { placed: PlacedItem[]; height: number } {
  const placed: PlacedItem[] = [];
  let x = 0;
  let y = 0;
  for (const item of items) {
    const width = SWATCH + 6 + estimateTextWidth(item.label, FONT);
    if (x > 0 && x + width > maxWidth) {
      x = 0;
      y += ROW;
    }
    placed.push({ ...item, x, y });
    x += width + 18;
  }
  return { placed, height: items.length === 0 ? 0 : y + ROW };
}

export function legendHeight(spec: LegendSpec | undefined, maxWidth: number): number {
  if (!spec) return 0;
  if (spec.kind === 'swatches') return layoutSwatches(spec.items, maxWidth).height;
  if (!spec.extras?.length) return RAMP_HEIGHT;
  const beside = maxWidth - RAMP_EXTRAS_X > 160;
  const extras = layoutSwatches(spec.extras, beside ? maxWidth - RAMP_EXTRAS_X : maxWidth).height;
  return beside ? Math.max(RAMP_HEIGHT, 18 + extras) : RAMP_HEIGHT + 6 + extras;
}

function Swatch({ swatch }: { swatch: LegendSwatch }) {
  const mid = SWATCH / 2;
  switch (swatch.kind) {
    case 'box':
      return (
        <rect
          width={SWATCH}
          height={SWATCH}
          fill={swatch.fill}
          fillOpacity={swatch.opacity}
          stroke={swatch.stroke ?? 'none'}
          strokeWidth={swatch.stroke ? 1.5 : 0}
        />
      );
    case 'line':
      return (
        <line
          x1={0}
          x2={SWATCH + 4}
          y1={mid}
          y2={mid}
          stroke={swatch.colour}
          strokeWidth={swatch.strokeWidth ?? 2.5}
          strokeDasharray={swatch.dash || undefined}
        />
      );
    case 'diamond':
      return (
        <path
          d={`M${mid},1 L${SWATCH - 1},${mid} L${mid},${SWATCH - 1} L1,${mid} Z`}
          fill="white"
          stroke={swatch.colour}
          strokeWidth={1.5}
        />
      );
    case 'whisker':
      return (
        <path
          d={`M${mid},1 V${SWATCH - 1} M${mid - 4},1 H${mid + 4} M${mid - 4},${SWATCH - 1} H${mid + 4}`}
          stroke={swatch.colour}
          strokeWidth={1.5}
          fill="none"
        />
      );
  }
}

export function Legend({ spec, x, y, maxWidth }: { spec: LegendSpec; x: number; y: number; maxWidth: number }) {
  const gradientId = `legend-ramp-${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  if (spec.kind === 'swatches') {
    return (
      <g transform={`translate(${x},${y})`} data-chart-part="legend">
        <SwatchItems items={spec.items} maxWidth={maxWidth} />
      </g>
    );
  }
  const extrasBeside = maxWidth - RAMP_EXTRAS_X > 160;
  const [lo, hi] = spec.domain;
  const stops = Array.from({ length: 11 }, (_, i) => i / 10);
  const ticks = [0, 0.25, 0.5, 0.75, 1];
  return (
    <g transform={`translate(${x},${y})`} data-chart-part="legend">
      <defs>
        <linearGradient id={gradientId}>
          {stops.map((t) => (
            <stop key={t} offset={`${t * 100}%`} stopColor={spec.interpolate(t)} />
          ))}
        </linearGradient>
      </defs>
      <text y={10} fontSize={FONT} fill={ink.DEFAULT} data-legend-item={spec.label}>
        {spec.label}
      </text>
      <rect y={18} width={RAMP_WIDTH} height={12} fill={`url(#${gradientId})`} stroke={ink.faint} strokeWidth={0.5} />
      {ticks.map((t) => (
        <g key={t} transform={`translate(${t * RAMP_WIDTH},30)`}>
          <line y2={4} stroke={ink.soft} />
          <text y={15} textAnchor={t === 0 ? 'start' : t === 1 ? 'end' : 'middle'} fontSize={11} fill={ink.soft}>
            {spec.tickFormat(lo + t * (hi - lo))}
          </text>
        </g>
      ))}
      {spec.extras && spec.extras.length > 0 && (
        <g transform={extrasBeside ? `translate(${RAMP_EXTRAS_X},17)` : `translate(0,${RAMP_HEIGHT + 6})`}>
          <SwatchItems items={spec.extras} maxWidth={extrasBeside ? maxWidth - RAMP_EXTRAS_X : maxWidth} />
        </g>
      )}
    </g>
  );
}

function SwatchItems({ items, maxWidth }: { items: readonly LegendItem[]; maxWidth: number }) {
  return layoutSwatches(items, maxWidth).placed.map((item) => (
    <g key={item.label} transform={`translate(${item.x},${item.y})`} data-legend-item={item.label}>
      <Swatch swatch={item.swatch} />
      <text
        x={SWATCH + 6 + (item.swatch.kind === 'line' ? 4 : 0)}
        y={SWATCH / 2}
        dy="0.35em"
        fontSize={FONT}
        fill={ink.DEFAULT}
      >
        {item.label}
      </text>
    </g>
  ));
}
