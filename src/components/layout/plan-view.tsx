// The plan of one deck: its lanes to scale, joins, elevator ends, stations labelled with their step,
// and a scale bar. Every deck uses the same frame, so the plans stack into one comparable picture.
import { DRAWING, type PlanFrame } from './drawing-frame';
import type { LayoutModel, PlanDeck, PlanStation } from './layout-model';
import { PlanLaneShape, selectable } from './plan-lane';
import { ElevatorEnd, PlanJoinShape } from './plan-join';
import { OverlayCanvas, overlayRegion, type OverlaySpec } from './overlay-canvas';
import { ScaleBar } from './scale-bar';
import { isLaneSelected, isStationSelected, type LayoutSelection } from './selection';

interface PlanViewProps {
  model: LayoutModel;
  deck: PlanDeck;
  frame: PlanFrame;
  selection: LayoutSelection;
  onSelect?: (selection: LayoutSelection) => void;
  /** A canvas over the plan's track for the playback's carriers and station states. */
  overlay?: OverlaySpec;
}

function StationMarker({
  station,
  frame,
  selected,
  labelBelow,
  onSelect,
}: {
  station: PlanStation;
  frame: PlanFrame;
  selected: boolean;
  labelBelow: boolean;
  onSelect?: () => void;
}) {
  const { colour } = DRAWING;
  const x = frame.x(station.point.x);
  const y = frame.y(station.point.y);
  const r = selected ? 8 : 6;
  const label = `Station ${station.id}${station.name ? ` (${station.name})` : ''}, step ${station.stepName}, ${station.manual ? 'manual' : 'automatic'}`;
  return (
    <g data-station-id={station.id} {...selectable(label, selected, onSelect)}>
      <title>{label}</title>
      {/* Manual stations are drawn hollow and automatic ones filled, so print in grey still tells them apart. */}
      <circle
        cx={x}
        cy={y}
        r={r}
        fill={station.manual ? colour.paper : selected ? colour.accent : colour.ink}
        stroke={selected ? colour.accent : colour.ink}
        strokeWidth={selected ? 3 : 2}
      />
      <text
        x={x}
        y={labelBelow ? y + r + 13 : y - r - 16}
        fontSize={11}
        fill={colour.ink}
        textAnchor="middle"
        fontWeight={selected ? 700 : 600}
      >
        {station.id}
      </text>
      <text x={x} y={labelBelow ? y + r + 25 : y - r - 5} fontSize={10} fill={colour.inkSoft} textAnchor="middle">
        {station.stepName.length > 18 ? `${station.stepName.slice(0, 17)}…` : station.stepName}
      </text>
    </g>
  );
}

export function PlanView({ model, deck, frame, selection, onSelect, overlay }: PlanViewProps) {
  const lanes = model.lanes.filter((lane) => lane.deckId === deck.id);
  const stations = model.stations.filter((station) => station.deckId === deck.id);
  const onDeck = (laneDeck: string) => laneDeck === deck.id;
  const flat = model.joins.filter(
    (join) => join.kind !== 'elevator' && onDeck(join.from.deckId) && onDeck(join.to.deckId),
  );
  const lifts = model.joins.filter(
    (join) => join.kind === 'elevator' && (onDeck(join.from.deckId) || onDeck(join.to.deckId)),
  );
  const span = model.footprint ? Math.max(model.footprint.box.maxX - model.footprint.box.minX, 1) : 1;
  const title = `Plan of ${deck.name}${deck.elevationMm === null ? '' : ` at ${deck.elevationMm} mm`}`;
  return (
    <figure className="flex flex-col gap-1">
      <figcaption className="text-sm font-semibold text-ink">
        {deck.name}{' '}
        <span className="font-normal text-ink-soft">
          plan{deck.elevationMm === null ? '' : `, running surface at ${deck.elevationMm} mm`}
        </span>
      </figcaption>
      {/* On a phone the drawing keeps a legible size and scrolls sideways inside its own box, not the page. */}
      <div className="overflow-x-auto" data-drawing-scroll>
        <div className="relative min-w-[640px]">
          <svg
            viewBox={`0 0 ${DRAWING.widthPx} ${frame.heightPx}`}
            className="h-auto w-full rounded-md border border-paper-sunk bg-white"
            role="group"
            aria-label={title}
            data-deck-id={deck.id}
            fontFamily="IBM Plex Sans, system-ui, sans-serif"
          >
            {lanes.length === 0 && (
              <text
                x={DRAWING.widthPx / 2}
                y={frame.heightPx / 2}
                textAnchor="middle"
                fontSize={13}
                fill={DRAWING.colour.inkSoft}
              >
                No lanes on this deck yet
              </text>
            )}
            {flat.map((join) => (
              <PlanJoinShape key={join.key} join={join} frame={frame} />
            ))}
            {lanes.map((lane) => (
              <PlanLaneShape
                key={lane.index}
                lane={lane}
                frame={frame}
                widthMm={model.widthMm}
                selected={isLaneSelected(selection, lane.index)}
                onSelect={onSelect && (() => onSelect({ kind: 'lane', index: lane.index }))}
              />
            ))}
            {lifts.map((join) => (
              <ElevatorEnd key={join.key} join={join} frame={frame} deckId={deck.id} decks={model.decks} />
            ))}
            {stations.map((station, i) => (
              <StationMarker
                key={`${station.stepIndex}-${station.stationIndex}`}
                station={station}
                frame={frame}
                labelBelow={i % 2 === 1}
                selected={isStationSelected(selection, station.stepIndex, station.stationIndex)}
                onSelect={
                  onSelect &&
                  (() =>
                    onSelect({ kind: 'station', stepIndex: station.stepIndex, stationIndex: station.stationIndex }))
                }
              />
            ))}
            <ScaleBar frame={frame} spanMm={span} x={DRAWING.padPx} y={frame.heightPx - 14} />
            <text x={DRAWING.widthPx - 12} y={20} textAnchor="end" fontSize={11} fill={DRAWING.colour.inkSoft}>
              N ↑
            </text>
          </svg>
          {overlay && model.footprint && (
            <OverlayCanvas
              widthPx={DRAWING.widthPx}
              heightPx={frame.heightPx}
              deckId={deck.id}
              region={overlayRegion(
                {
                  minX: frame.x(model.footprint.box.minX),
                  maxX: frame.x(model.footprint.box.maxX),
                  minY: frame.y(model.footprint.box.maxY),
                  maxY: frame.y(model.footprint.box.minY),
                },
                overlay.marginPx,
                DRAWING.widthPx,
                frame.heightPx,
              )}
            />
          )}
        </div>
      </div>
    </figure>
  );
}
