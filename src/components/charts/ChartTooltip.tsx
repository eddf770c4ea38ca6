// The hover box with exact values; it never takes the pointer, so hovering stays smooth.
import type { TooltipState } from './useChartShell';

const TOOLTIP_WIDTH = 220;

export function ChartTooltip({ tooltip, containerWidth }: { tooltip: TooltipState; containerWidth: number }) {
  const flip = tooltip.x + 16 + TOOLTIP_WIDTH > containerWidth;
  const left = flip ? Math.max(0, tooltip.x - 16 - TOOLTIP_WIDTH) : tooltip.x + 16;
  return (
    <div
      role="tooltip"
      className="pointer-events-none absolute z-10 rounded border border-ink-faint/50 bg-paper-raised px-2.5 py-1.5 text-xs text-ink shadow-md"
      style={{ left, top: tooltip.y + 12, width: TOOLTIP_WIDTH }}
    >
      <div className="mb-0.5 font-semibold">{tooltip.title}</div>
      <dl className="m-0 grid grid-cols-[auto_1fr] gap-x-3">
        {tooltip.rows.map(([label, value]) => (
          <div key={label} className="contents">
            <dt className="text-ink-soft">{label}</dt>
            <dd className="m-0 text-right tabular-nums">{value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
