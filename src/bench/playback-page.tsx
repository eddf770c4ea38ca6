// The page `npm run bench:playback` opens: the triple-deck example with 50 carriers, a 30-minute
// window recorded by the real engine in this page, and the real player. The driver
// (playback-bench.ts) times the page's animation frames from outside, and calls benchPaint to time
// the player's own script per frame (computing the moment and issuing the canvas drawing).
import '../index.css';
import { createRoot } from 'react-dom/client';
import tripleDeck from '../../shared/examples/triple-deck.json';
import { recordPlayback } from '../../workers/engine';
import { planFrame } from '../components/layout/drawing-frame';
import { elevationFrame } from '../components/layout/elevation-view';
import { layoutModel, type LayoutDraft } from '../components/layout/layout-model';
import { canvasPainter } from '../components/layout/playback/canvas-painter';
import { frameComputer } from '../components/layout/playback/frame-state';
import { PlaybackPlayer } from '../components/layout/playback/playback-player';
import { indexTrace } from '../components/layout/playback/trace-index';

const CARRIERS = 50;

const trace = await recordPlayback(
  tripleDeck,
  { hours: 1, warmupMinutes: 10, replications: 1, seed: 1, carriers: CARRIERS },
  { startMinutes: 10, windowMinutes: 30 },
);
createRoot(document.getElementById('root') as HTMLElement).render(
  <PlaybackPlayer document={tripleDeck as LayoutDraft} trace={trace} />,
);

/** Milliseconds of script per frame over `frames` frames one simulated second apart. */
Object.assign(window, {
  benchPaint(frames: number): number {
    const root = document.querySelector<HTMLElement>('[data-playback]') as HTMLElement;
    const model = layoutModel(tripleDeck as LayoutDraft);
    const plan = model.footprint ? planFrame(model.footprint.box) : null;
    const computer = frameComputer(model, indexTrace(trace), plan, elevationFrame(model));
    const painter = canvasPainter(root, model, trace, plan);
    const started = performance.now();
    for (let i = 0; i < frames; i++) painter.paint(computer.compute(trace.startSeconds + i));
    const ms = (performance.now() - started) / frames;
    painter.dispose();
    return ms;
  },
});
