// Paints one moment of a playback onto marks already in the drawing: moves each carrier's shape on
// the deck it is on (hidden on the others), fills it when loaded, and rings each station in the
// colour of its state. Plain DOM writes into cached elements: the cost per frame is a few hundred
// attribute writes, whatever the trace's length.
import { STATION_STATES, stateColour } from '../../../components/charts/palette';
import { DRAWING, type PlanFrame } from '../drawing-frame';
import type { ElevationFrame } from '../elevation-view';
import { carrierPlacer, elevationPoint, type DrawnPlace } from './carrier-places';
import { ELEVATION_VIEW } from './playback-overlay';
import { carrierAt, stationStateAt, type CarrierPlace, type TraceIndex } from './trace-index';
import type { LayoutModel } from '../layout-model';

/** Writes an attribute only when its value changes (most carriers stand still in most frames), remembering what it wrote. */
const written = new WeakMap<Element, Record<string, string>>();
function set(el: Element, name: string, value: string): void {
  let last = written.get(el);
  if (!last) written.set(el, (last = {}));
  if (last[name] === value) return;
  last[name] = value;
  el.setAttribute(name, value);
}

export interface Painter {
  paint(t: number): void;
}

export function createPainter(
  root: HTMLElement,
  model: LayoutModel,
  index: TraceIndex,
  plan: PlanFrame | null,
  elevation: ElevationFrame | null,
): Painter {
  const { trace } = index;
  const placer = carrierPlacer(model, trace);
  const views = new Map<string, SVGElement[]>();
  for (const el of root.querySelectorAll<SVGElement>('[data-pb-carrier]')) {
    const view = el.dataset.pbView ?? '';
    const list = views.get(view) ?? [];
    list[Number(el.dataset.pbCarrier)] = el;
    views.set(view, list);
  }
  const stations = Array.from(root.querySelectorAll<SVGElement>('[data-pb-station]'));
  const at: CarrierPlace = { lane: -1, posMm: 0, conn: -1, fraction: 0, loaded: false };
  const drawn: DrawnPlace = { deckId: '', x: 0, y: 0, angle: 0, elevationMm: 0 };
  const planViews = [...views.entries()].filter(([view]) => view !== ELEVATION_VIEW);
  const sideView = views.get(ELEVATION_VIEW) ?? [];
  const stateColours = STATION_STATES.map((name) => stateColour[name]);

  return {
    paint(t) {
      for (let c = 0; c < trace.carrierCount; c++) {
        const known = carrierAt(index, c, t, at) && placer.place(at, drawn);
        const fill = at.loaded ? DRAWING.colour.ink : DRAWING.colour.paper;
        const transform =
          known && plan
            ? `translate(${plan.x(drawn.x).toFixed(1)},${plan.y(drawn.y).toFixed(1)}) rotate(${drawn.angle})`
            : '';
        for (const [deckId, marks] of planViews) {
          const mark = marks[c];
          if (!mark) continue;
          if (!transform || drawn.deckId !== deckId) {
            set(mark, 'visibility', 'hidden');
            continue;
          }
          set(mark, 'visibility', 'visible');
          set(mark, 'transform', transform);
          set(mark, 'fill', fill);
        }
        const side = sideView[c];
        if (side && elevation && known) {
          const p = elevationPoint(elevation, drawn);
          set(side, 'visibility', 'visible');
          set(side, 'transform', `translate(${p.x.toFixed(1)},${(p.y - 7).toFixed(1)})`);
          set(side, 'fill', fill);
        }
      }
      for (const ring of stations) {
        const state = stationStateAt(index, Number(ring.dataset.pbStation), t);
        set(ring, 'stroke', state >= 0 ? stateColours[state] : 'transparent');
      }
    },
  };
}
