// A scale bar in the drawing's corner: a round length in mm or m, drawn to the plan's scale.
import { formatLengthMm } from '../../lib/format';
import { DRAWING, scaleBarLengthMm, type PlanFrame } from './drawing-frame';

export function ScaleBar({ frame, spanMm, x, y }: { frame: PlanFrame; spanMm: number; x: number; y: number }) {
  const lengthMm = scaleBarLengthMm(spanMm);
  const px = lengthMm * frame.scale;
  const { ink } = DRAWING.colour;
  return (
    <g data-scale-bar-mm={lengthMm} aria-label={`Scale bar: ${formatLengthMm(lengthMm)}`}>
      <rect x={x} y={y - 4} width={px / 2} height={4} fill={ink} />
      <rect x={x + px / 2} y={y - 4} width={px / 2} height={4} fill="white" stroke={ink} strokeWidth={1} />
      <line x1={x} x2={x} y1={y - 8} y2={y + 2} stroke={ink} />
      <line x1={x + px} x2={x + px} y1={y - 8} y2={y + 2} stroke={ink} />
      <text x={x} y={y + 14} fontSize={11} fill={ink}>
        0
      </text>
      <text x={x + px} y={y + 14} fontSize={11} fill={ink} textAnchor="middle">
        {formatLengthMm(lengthMm)}
      </text>
    </g>
  );
}
