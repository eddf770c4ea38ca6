// Number formatting shared by axes, tooltips and the screen-reader tables of the charts.
import { format } from 'd3';

const fixed1 = format(',.1f');
const fixed2 = format(',.2f');
const general = format(',.4~g');
const percent1 = format('.1%');

/** Exact enough for a tooltip: up to four significant digits, thousands separated. */
export const formatNumber = (value: number): string => (Number.isFinite(value) ? general(value) : String(value));
export const formatOne = (value: number): string => fixed1(value);
export const formatTwo = (value: number): string => fixed2(value);
export const formatShare = (share: number): string => percent1(share);

/** Width of a label in px; Plex Sans averages about 0.55 em per character, 0.6 leaves slack. */
export const estimateTextWidth = (text: string, fontSize: number): number => text.length * fontSize * 0.6;
