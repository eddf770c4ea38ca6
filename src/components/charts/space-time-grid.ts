// The geometry of a space-time heatmap: bins per lane, merging of time bins that would be narrower
// than a screen pixel, and the raster image for one lane.
import { interpolateYlGnBu, rgb } from 'd3';
import { encodePng, pngDataUrl } from './raster';
import { checkPositive, checkShares, firstProblem, type Problem } from './validate';

export interface SpaceTimeLane {
  laneName: string;
  lengthMm: number;
  positionBinMm: number;
  /** Row-major [timeBin][positionBin] share of time a carrier occupies the place, 0..1. */
  values: readonly number[];
}

/**
 * Light for empty track, dark for always occupied. ColorBrewer's YlGnBu (Harrower & Brewer, "ColorBrewer.org",
 * 2003) rises steadily in lightness and is listed there as colour-blind safe.
 */
export const occupancyColour = (share: number): string => interpolateYlGnBu(Math.min(1, Math.max(0, share)));

export const positionBinsOf = (lane: SpaceTimeLane) => Math.ceil(lane.lengthMm / lane.positionBinMm - 1e-9);

export function spaceTimeProblem(lanes: readonly SpaceTimeLane[], timeBinSeconds: number): Problem {
  const first = firstProblem(() => checkPositive(timeBinSeconds, 'timeBinSeconds'));
  if (first) return first;
  let timeBins: number | null = null;
  for (const [i, lane] of lanes.entries()) {
    const problem = firstProblem(
      () => checkPositive(lane.lengthMm, `lanes[${i}].lengthMm`),
      () => checkPositive(lane.positionBinMm, `lanes[${i}].positionBinMm`),
      () => checkShares(lane.values, `lanes[${i}].values`),
    );
    if (problem) return problem;
    const positions = positionBinsOf(lane);
    if (lane.values.length % positions !== 0) {
      return `lanes[${i}].values has ${lane.values.length} entries, not a whole number of time bins of ${positions} position bins (lengthMm ${lane.lengthMm} ÷ positionBinMm ${lane.positionBinMm}, rounded up)`;
    }
    const bins = lane.values.length / positions;
    if (timeBins !== null && bins !== timeBins) {
      return `lanes[${i}].values covers ${bins} time bins but lanes[0] covers ${timeBins}; all lanes must share one time axis`;
    }
    timeBins = bins;
  }
  return null;
}

export interface LaneGrid {
  lane: SpaceTimeLane;
  positions: number;
  /** Columns actually drawn after merging; each covers `merge` original time bins. */
  columns: number;
  merge: number;
  timeBins: number;
  /** Mean share per drawn column and position, column-major like the input. */
  cells: Float64Array;
}

export function laneGrid(lane: SpaceTimeLane, maxColumns: number): LaneGrid {
  const positions = positionBinsOf(lane);
  const timeBins = lane.values.length / positions;
  const merge = Math.max(1, Math.ceil(timeBins / Math.max(1, Math.floor(maxColumns))));
  const columns = Math.ceil(timeBins / merge);
  const cells = new Float64Array(columns * positions);
  for (let c = 0; c < columns; c++) {
    const from = c * merge;
    const to = Math.min(timeBins, from + merge);
    for (let p = 0; p < positions; p++) {
      let sum = 0;
      for (let t = from; t < to; t++) sum += lane.values[t * positions + p];
      cells[c * positions + p] = sum / (to - from);
    }
  }
  return { lane, positions, columns, merge, timeBins, cells };
}

/** 256 steps are finer than the eye can tell apart on this ramp and spare a colour parse per cell. */
const COLOUR_STEPS = Array.from({ length: 256 }, (_, i) => {
  const { r, g, b } = rgb(occupancyColour(i / 255));
  return [r, g, b] as const;
});

/** One pixel per cell; the top image row is the far end of the lane so position rises upwards. */
export function laneImage(grid: LaneGrid): string {
  const { columns, positions, cells } = grid;
  const rgb = new Uint8Array(columns * positions * 3);
  for (let row = 0; row < positions; row++) {
    const p = positions - 1 - row;
    for (let c = 0; c < columns; c++) {
      const step = Math.round(Math.min(1, Math.max(0, cells[c * positions + p])) * 255);
      rgb.set(COLOUR_STEPS[step], (row * columns + c) * 3);
    }
  }
  return pngDataUrl(encodePng(columns, positions, rgb));
}
