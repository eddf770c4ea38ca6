// Side elevation: each deck at its height, its lanes projected onto the layout's long axis, and the
// elevators as vertical connectors between the decks they join. Heights are to their own scale.
import { formatLengthMm } from '../../lib/format';
import { anchorFor, DRAWING } from './drawing-frame';
import type { LayoutModel, PlanDeck } from './layout-model';
import { OverlayCanvas, overlayRegion, type OverlaySpec } from './overlay-canvas';

const HEIGHT_PX = 200;
const LEFT_PX = 150;

/** Where things go in the side elevation: plan points onto the long axis, elevations onto height. */
export interface ElevationFrame {
  alongX: boolean;
  decks: PlanDeck[];
  deckAt: Map<string, number>;
  along: (p: { x: number; y: number }) => number;
  height: (mm: number) => number;
}

export function elevationFrame(model: LayoutModel): ElevationFrame | null {
  const box = model.footprint?.box;
  const decks = model.decks.filter((deck) => deck.elevationMm !== null);
  // With one deck there is nothing to show side-on that the plan does not already say.
  if (!box || decks.length < 2) return null;
  const alongX = box.maxX - box.minX >= box.maxY - box.minY;
  const lo = alongX ? box.minX : box.minY;
  const hi = alongX ? box.maxX : box.maxY;
  const span = Math.max(hi - lo, 1);
  const top = Math.max(...decks.map((d) => d.elevationMm ?? 0), 1);
  return {
    alongX,
    decks,
    deckAt: new Map(decks.map((deck) => [deck.id, deck.elevationMm ?? 0])),
    along: (p) => LEFT_PX + (((alongX ? p.x : p.y) - lo) / span) * (DRAWING.widthPx - LEFT_PX - 40),
    height: (mm) => HEIGHT_PX - 28 - (mm / top) * (HEIGHT_PX - 60),
  };
}

/** With `overlay`, a canvas over the decks of the elevation for the playback's carriers. */
export function ElevationView({ model, overlay }: { model: LayoutModel; overlay?: OverlaySpec }) {
  const { colour } = DRAWING;
  const frame = elevationFrame(model);
  if (!frame) return null;
  const { alongX, decks, deckAt, along, height } = frame;
  return (
    <figure className="flex flex-col gap-1">
      <figcaption className="text-sm font-semibold text-ink">
        Side elevation{' '}
        <span className="font-normal text-ink-soft">
          (looking along the {alongX ? 'north–south' : 'east–west'} axis; heights not to plan scale)
        </span>
      </figcaption>
      {/* On a phone the drawing keeps a legible size and scrolls sideways inside its own box, not the page. */}
      <div className="overflow-x-auto" data-drawing-scroll>
        <div className="relative min-w-[640px]">
          <svg
            viewBox={`0 0 ${DRAWING.widthPx} ${HEIGHT_PX}`}
            className="h-auto w-full rounded-md border border-paper-sunk bg-white"
            role="img"
            aria-label="Side elevation of the decks and elevators"
            fontFamily="IBM Plex Sans, system-ui, sans-serif"
          >
            <line
              x1={LEFT_PX - 10}
              x2={DRAWING.widthPx - 20}
              y1={height(0)}
              y2={height(0)}
              stroke={colour.ink}
              strokeWidth={2}
            />
            <text x={LEFT_PX - 14} y={height(0) + 4} textAnchor="end" fontSize={11} fill={colour.inkSoft}>
              floor
            </text>
            {decks.map((deck) => {
              const y = height(deck.elevationMm ?? 0);
              return (
                <g key={deck.id} data-deck-elevation={deck.id}>
                  <text x={LEFT_PX - 14} y={y + 4} textAnchor="end" fontSize={11} fill={colour.ink}>
                    {deck.name} · {formatLengthMm(deck.elevationMm ?? 0)}
                  </text>
                  <line
                    x1={LEFT_PX - 8}
                    x2={DRAWING.widthPx - 24}
                    y1={y}
                    y2={y}
                    stroke={colour.faint}
                    strokeDasharray="2 4"
                  />
                  {model.lanes
                    .filter((lane) => lane.deckId === deck.id)
                    .map((lane) => {
                      const a = along(lane.start);
                      const b = along(lane.end);
                      return (
                        <line
                          key={lane.index}
                          x1={Math.min(a, b)}
                          x2={Math.max(a, b, Math.min(a, b) + 3)}
                          y1={y}
                          y2={y}
                          stroke={colour.inkSoft}
                          strokeWidth={6}
                        />
                      );
                    })}
                </g>
              );
            })}
            {model.joins
              .filter((join) => join.kind === 'elevator' && deckAt.has(join.from.deckId) && deckAt.has(join.to.deckId))
              .map((join) => {
                const x = along(join.from.end);
                const y1 = height(deckAt.get(join.from.deckId) ?? 0);
                const y2 = height(deckAt.get(join.to.deckId) ?? 0);
                return (
                  <g key={join.key} data-elevator={join.name}>
                    <title>{`Elevator ${join.name}: ${join.from.id} to ${join.to.id}`}</title>
                    <line x1={x} x2={x} y1={y1} y2={y2} stroke={colour.join} strokeWidth={3} />
                    <rect
                      x={x - 7}
                      y={Math.min(y1, y2) - 4}
                      width={14}
                      height={Math.abs(y2 - y1) + 8}
                      fill="none"
                      stroke={colour.join}
                      strokeWidth={1}
                    />
                    <text x={x} y={Math.min(y1, y2) - 10} textAnchor={anchorFor(x)} fontSize={10} fill={colour.join}>
                      {join.name}: {y2 < y1 ? 'lifts up' : 'lowers'}
                    </text>
                  </g>
                );
              })}
          </svg>
          {overlay && (
            <OverlayCanvas
              widthPx={DRAWING.widthPx}
              heightPx={HEIGHT_PX}
              region={overlayRegion(
                {
                  minX: LEFT_PX,
                  maxX: DRAWING.widthPx - 40,
                  minY: Math.min(...decks.map((deck) => height(deck.elevationMm ?? 0))),
                  maxY: Math.max(...decks.map((deck) => height(deck.elevationMm ?? 0))),
                },
                overlay.marginPx,
                DRAWING.widthPx,
                HEIGHT_PX,
              )}
            />
          )}
        </div>
      </div>
    </figure>
  );
}
