// Watch a recorded window of a run on the layout drawing: carriers moving on every deck and in the
// side elevation, stations ringed in their state colour, a clock, play/pause, speed and a scrubber,
// and the shown moment in words. Each animation frame computes the moment into typed arrays and
// draws it on canvases laid over the drawing; React renders only when play, speed or the settled
// moment change, never at 60 Hz.
import { useEffect, useMemo, useRef, useState } from 'react';
import type { PlaybackTrace } from '../../../../shared/results/playback';
import { Button } from '../../ui/button';
import { planFrame } from '../drawing-frame';
import { elevationFrame } from '../elevation-view';
import { LayoutDrawing } from '../layout-drawing';
import { layoutModel, type LayoutDraft } from '../layout-model';
import { canvasPainter } from './canvas-painter';
import { FrameDetails, type FrameDetailsData } from './frame-details';
import { frameComputer, overlayMarginPx } from './frame-state';
import { carrierRows, frameSentence, stationRows } from './frame-summary';
import { PlaybackKey } from './playback-key';
import { indexTrace } from './trace-index';

export const PLAYBACK_SPEEDS = [1, 2, 5, 10, 30, 60, 100, 300, 1000] as const;

/** Simulated time as h:mm:ss from the start of the replication. */
export function formatSimTime(seconds: number): string {
  const s = Math.max(0, Math.floor(seconds));
  return `${Math.floor(s / 3600)}:${String(Math.floor((s % 3600) / 60)).padStart(2, '0')}:${String(s % 60).padStart(2, '0')}`;
}

/**
 * How a moment is shown: `frame` while playing (texts at most ten times a second, the sentence once a
 * second), `seek` while scrubbing (texts at once, the tables once the scrubber rests), `settle` when the
 * playback stands still (also the tables of every carrier and station).
 */
type ShowMode = 'frame' | 'seek' | 'settle';

export function PlaybackPlayer({ document: scenario, trace }: { document: LayoutDraft; trace: PlaybackTrace }) {
  const model = useMemo(() => layoutModel(scenario), [scenario]);
  const index = useMemo(() => indexTrace(trace), [trace]);
  const overlay = useMemo(
    () => ({
      marginPx: overlayMarginPx(model, trace.carrierLengthMm, model.footprint ? planFrame(model.footprint.box) : null),
    }),
    [model, trace],
  );
  const root = useRef<HTMLDivElement>(null);
  const scrubber = useRef<HTMLInputElement>(null);
  const clock = useRef<HTMLSpanElement>(null);
  const sentence = useRef<HTMLParagraphElement>(null);
  const time = useRef(trace.startSeconds);
  const speed = useRef(60);
  const [speedShown, setSpeedShown] = useState(60);
  const [playing, setPlaying] = useState(false);
  const [details, setDetails] = useState<FrameDetailsData | null>(null);
  const show = useRef<(t: number, mode: ShowMode) => void>(() => undefined);

  useEffect(() => {
    if (!root.current) return;
    const plan = model.footprint ? planFrame(model.footprint.box) : null;
    const computer = frameComputer(model, index, plan, elevationFrame(model));
    const painter = canvasPainter(root.current, model, trace, plan);
    let lastClock = -Infinity;
    let lastSentence = -Infinity;
    let settling: ReturnType<typeof setTimeout> | undefined;
    show.current = (t, mode) => {
      // Scrubbing fills the tables once the scrubber rests, not at every step.
      clearTimeout(settling);
      if (mode === 'seek') settling = setTimeout(() => show.current(time.current, 'settle'), 250);
      const frame = computer.compute(t);
      painter.paint(frame, mode !== 'frame');
      // Text changes cost a layout: ten times a second is enough for the eye.
      const now = performance.now();
      if (mode === 'frame' && now - lastClock < 100) return;
      lastClock = now;
      const hms = formatSimTime(t);
      if (clock.current) clock.current.textContent = hms;
      if (scrubber.current && (mode !== 'frame' || document.activeElement !== scrubber.current))
        scrubber.current.value = String(t);
      if (mode !== 'frame' || now - lastSentence >= 1000) {
        lastSentence = now;
        if (sentence.current) sentence.current.textContent = frameSentence(frame);
      }
      if (mode === 'settle')
        setDetails({ clock: hms, carriers: carrierRows(frame, trace), stations: stationRows(frame, trace) });
    };
    time.current = trace.startSeconds;
    show.current(time.current, 'settle');
    return () => {
      clearTimeout(settling);
      painter.dispose();
    };
  }, [model, index, trace]);

  useEffect(() => {
    if (!playing) return;
    let last = performance.now();
    let frame = requestAnimationFrame(function step(now) {
      time.current = Math.min(time.current + ((now - last) / 1000) * speed.current, trace.endSeconds);
      last = now;
      const atEnd = time.current >= trace.endSeconds;
      show.current(time.current, 'frame');
      if (atEnd) setPlaying(false);
      else frame = requestAnimationFrame(step);
    });
    return () => {
      cancelAnimationFrame(frame);
      show.current(time.current, 'settle');
    };
  }, [playing, trace]);

  const seek = (t: number, mode: ShowMode) => {
    time.current = t;
    show.current(t, mode);
  };
  const togglePlay = () => {
    if (!playing && time.current >= trace.endSeconds) seek(trace.startSeconds, 'seek');
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
          <span
            ref={clock}
            className="inline-block min-w-[7ch] font-semibold text-ink tabular-nums"
            data-playback-clock
          >
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
          onInput={(e) => seek(Number(e.currentTarget.value), 'seek')}
          className="w-full accent-accent"
          aria-label="Position in the recorded window"
          data-playback-scrubber
        />
      </label>
      {/* Announced when the playback stands still; while it plays the sentence changes every second. */}
      <p ref={sentence} className="text-sm text-ink" aria-live={playing ? 'off' : 'polite'} data-playback-summary />
      <PlaybackKey />
      <LayoutDrawing document={scenario} overlay={overlay} />
      {details && <FrameDetails details={details} />}
    </div>
  );
}
