// Watch a recorded window of a run on the layout drawing: carriers moving on every deck and in the
// side elevation, stations ringed in their state colour, a clock, play/pause, speed and a scrubber.
import { useEffect, useMemo, useRef, useState } from 'react';
import type { PlaybackTrace } from '../../../../shared/results/playback';
import { STATION_STATES, stateColour, stateLabel } from '../../../components/charts/palette';
import { Button } from '../../../components/ui/button';
import { DRAWING, planFrame } from '../drawing-frame';
import { elevationFrame } from '../elevation-view';
import { LayoutDrawing } from '../layout-drawing';
import { layoutModel, type LayoutDraft } from '../layout-model';
import { createPainter } from './painter';
import { elevationOverlay, planOverlay } from './playback-overlay';
import { indexTrace } from './trace-index';

export const PLAYBACK_SPEEDS = [1, 2, 5, 10, 30, 60, 100, 300, 1000] as const;

/** Simulated time as h:mm:ss from the start of the replication. */
export function formatSimTime(seconds: number): string {
  const s = Math.max(0, Math.floor(seconds));
  return `${Math.floor(s / 3600)}:${String(Math.floor((s % 3600) / 60)).padStart(2, '0')}:${String(s % 60).padStart(2, '0')}`;
}

export function PlaybackPlayer({ document: scenario, trace }: { document: LayoutDraft; trace: PlaybackTrace }) {
  const model = useMemo(() => layoutModel(scenario), [scenario]);
  const index = useMemo(() => indexTrace(trace), [trace]);
  const overlay = useMemo(
    () => ({
      plan: planOverlay(model, trace.stationIds, trace.carrierCount, trace.carrierLengthMm),
      elevation: elevationOverlay(trace.carrierCount),
    }),
    [model, trace],
  );
  const root = useRef<HTMLDivElement>(null);
  const scrubber = useRef<HTMLInputElement>(null);
  const clock = useRef<HTMLSpanElement>(null);
  const time = useRef(trace.startSeconds);
  const speed = useRef(60);
  const [speedShown, setSpeedShown] = useState(60);
  const [playing, setPlaying] = useState(false);
  const paintRef = useRef<(t: number, force?: boolean) => void>(() => undefined);

  useEffect(() => {
    if (!root.current) return;
    const painter = createPainter(
      root.current,
      model,
      index,
      model.footprint ? planFrame(model.footprint.box) : null,
      elevationFrame(model),
    );
    let lastControls = -Infinity;
    paintRef.current = (t, force = false) => {
      painter.paint(t);
      // The clock and the scrubber change text and layout: ten times a second is enough for the eye.
      const now = performance.now();
      if (!force && now - lastControls < 100) return;
      lastControls = now;
      if (clock.current) clock.current.textContent = formatSimTime(t);
      if (scrubber.current && document.activeElement !== scrubber.current) scrubber.current.value = String(t);
    };
    time.current = trace.startSeconds;
    paintRef.current(time.current, true);
  }, [model, index, trace]);

  useEffect(() => {
    if (!playing) return;
    let last = performance.now();
    let frame = requestAnimationFrame(function step(now) {
      time.current = Math.min(time.current + ((now - last) / 1000) * speed.current, trace.endSeconds);
      last = now;
      const atEnd = time.current >= trace.endSeconds;
      paintRef.current(time.current, atEnd);
      if (atEnd) setPlaying(false);
      else frame = requestAnimationFrame(step);
    });
    return () => cancelAnimationFrame(frame);
  }, [playing, trace]);

  const seek = (t: number) => {
    time.current = t;
    paintRef.current(t, true);
  };
  const togglePlay = () => {
    if (!playing && time.current >= trace.endSeconds) seek(trace.startSeconds);
    setPlaying(!playing);
  };

  return (
    <div ref={root} className="flex flex-col gap-4" data-playback>
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
        <Button onClick={togglePlay} aria-pressed={playing} data-playback-toggle>
          {playing ? 'Pause' : 'Play'}
        </Button>
        <label className="flex items-center gap-2 text-sm text-ink">
          Speed
          <select
            className="rounded-md border border-ink-faint bg-paper-raised px-2 py-1"
            value={speedShown}
            onChange={(e) => {
              speed.current = Number(e.target.value);
              setSpeedShown(speed.current);
            }}
            data-playback-speed
          >
            {PLAYBACK_SPEEDS.map((s) => (
              <option key={s} value={s}>
                {s.toLocaleString('en-GB')}×
              </option>
            ))}
          </select>
        </label>
        <p className="text-sm text-ink-soft">
          Simulated time{' '}
          <span ref={clock} className="font-semibold text-ink tabular-nums" data-playback-clock>
            {formatSimTime(trace.startSeconds)}
          </span>{' '}
          <span className="whitespace-nowrap">
            (window {formatSimTime(trace.startSeconds)} to {formatSimTime(trace.endSeconds)})
          </span>
        </p>
      </div>
      <label className="flex flex-col gap-1 text-sm text-ink">
        <span className="sr-only">Position in the recorded window</span>
        <input
          ref={scrubber}
          type="range"
          min={trace.startSeconds}
          max={trace.endSeconds}
          step="any"
          defaultValue={trace.startSeconds}
          onInput={(e) => seek(Number(e.currentTarget.value))}
          className="w-full accent-accent"
          aria-label="Position in the recorded window"
          data-playback-scrubber
        />
      </label>
      <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft" aria-label="Key">
        {STATION_STATES.map((state) => (
          <li key={state} className="flex items-center gap-1">
            <svg width="14" height="14" aria-hidden="true">
              <circle cx="7" cy="7" r="5" fill="none" stroke={stateColour[state]} strokeWidth="3" />
            </svg>
            station {stateLabel[state]}
          </li>
        ))}
        <li className="flex items-center gap-1">
          <svg width="16" height="10" aria-hidden="true">
            <rect x="1" y="1" width="14" height="8" fill={DRAWING.colour.ink} />
          </svg>
          carrier with a part
        </li>
        <li className="flex items-center gap-1">
          <svg width="16" height="10" aria-hidden="true">
            <rect x="1" y="1" width="14" height="8" fill={DRAWING.colour.paper} stroke={DRAWING.colour.ink} />
          </svg>
          empty carrier
        </li>
      </ul>
      <LayoutDrawing document={scenario} overlay={overlay} />
    </div>
  );
}
