// The playback's marks over the layout drawing: a ring round each station for its state and one
// carrier shape per carrier on every deck and in the side elevation. They are drawn once, hidden;
// the player moves and colours them directly every frame, so React never re-renders at 60 Hz.
import { DRAWING, type PlanFrame } from '../drawing-frame';
import type { ElevationFrame } from '../elevation-view';
import type { LayoutModel, PlanDeck } from '../layout-model';

export const ELEVATION_VIEW = '@elevation';

function CarrierMarks({
  count,
  view,
  lengthPx,
  widthPx,
}: {
  count: number;
  view: string;
  lengthPx: number;
  widthPx: number;
}) {
  return (
    <g data-pb-carriers={view} pointerEvents="none">
      {Array.from({ length: count }, (_, c) => (
        <rect
          key={c}
          data-pb-carrier={c}
          data-pb-view={view}
          x={-lengthPx / 2}
          y={-widthPx / 2}
          width={lengthPx}
          height={widthPx}
          rx={1.5}
          stroke={DRAWING.colour.ink}
          strokeWidth={1.5}
          fill={DRAWING.colour.paper}
          visibility="hidden"
        />
      ))}
    </g>
  );
}

export function planOverlay(
  model: LayoutModel,
  stationIds: readonly string[],
  carrierCount: number,
  carrierLengthMm: number,
) {
  const traceIndex = new Map(stationIds.map((id, i) => [id, i]));
  return (deck: PlanDeck, frame: PlanFrame) => {
    const lengthPx = Math.max(carrierLengthMm * frame.scale, 5);
    const widthPx = Math.max(model.widthMm * frame.scale * 0.75, 6);
    return (
      <g data-pb-deck={deck.id}>
        {model.stations
          .filter((station) => station.deckId === deck.id && traceIndex.has(station.id))
          .map((station) => (
            <circle
              key={station.id}
              data-pb-station={traceIndex.get(station.id)}
              cx={frame.x(station.point.x)}
              cy={frame.y(station.point.y)}
              r={11}
              fill="none"
              strokeWidth={4}
              stroke="transparent"
              pointerEvents="none"
            />
          ))}
        <CarrierMarks count={carrierCount} view={deck.id} lengthPx={lengthPx} widthPx={widthPx} />
      </g>
    );
  };
}

export function elevationOverlay(carrierCount: number) {
  return (_frame: ElevationFrame) => (
    <CarrierMarks count={carrierCount} view={ELEVATION_VIEW} lengthPx={8} widthPx={6} />
  );
}
