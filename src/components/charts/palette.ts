// Chart colours. SVG marks carry their colours as attributes (not CSS classes) so an exported SVG or
// PNG keeps them; the values come from the Tailwind palette so the app and the charts never drift.
import { STATION_STATES, type StationState } from '../../../shared/results/run-result';
import tailwindConfig from '../../../tailwind.config';

const colours = tailwindConfig.theme.extend.colors;

export const ink = colours.ink;
export const paper = colours.paper;
export const accent = colours.accent;

/** The station states are the result's own (shared/results/run-result.ts); the charts only colour and name them. */
export { STATION_STATES, type StationState };

export const stateColour: Record<StationState, string> = colours.state;

export const stateLabel: Record<StationState, string> = {
  processing: 'processing',
  starved: 'starved',
  blocked: 'blocked',
  down: 'down',
  onBreak: 'on break',
};

/** A state's column name in CSV exports: snake case, and the break state under its meaning. */
export const stateCsvName = (state: string): string =>
  state === 'idle' ? 'on_break' : state.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

/**
 * Series colours for lines and fitted curves: the Okabe–Ito set (Okabe & Ito, "Color Universal
 * Design", 2008), which stays distinguishable for the common forms of colour blindness. Dash patterns
 * go with them so series differ by more than hue.
 */
export const seriesColours = ['#0072b2', '#d55e00', '#009e73', '#cc79a7', '#e69f00', '#56b4e9'] as const;
export const seriesDashes = ['', '6 3', '2 3', '8 3 2 3', '1 2', '10 4'] as const;

export const seriesStyle = (index: number) => ({
  colour: seriesColours[index % seriesColours.length],
  dash: seriesDashes[index % seriesDashes.length],
});

export const FONT_FAMILY = '"IBM Plex Sans", system-ui, "Segoe UI", Arial, sans-serif';
