// Invented sample data for the chart gallery: a small valve-cartridge assembly line, made up for
// Lanewright. Deterministic so screenshots compare across changes.
import type { BalanceStep } from './LineBalanceChart';
import type { SpaceTimeLane } from './space-time-grid';
import type { StationStateBarsStation } from './StationStateBars';
import type { SweepPoint } from './CurveWithBand';

/** mulberry32: a tiny seeded generator, enough for made-up pictures. */
function seeded(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const galleryStations = [
  { id: 'load', name: 'Load housing' },
  { id: 'oring', name: 'O-ring press' },
  { id: 'screw', name: 'Screw cap' },
  { id: 'fit', name: 'Manual fitting' },
  { id: 'leak', name: 'Leak test' },
  { id: 'unload', name: 'Unload' },
];

export const galleryStates = ['processing', 'starved', 'blocked', 'down'] as const;

export function galleryTimeline(bins = 120): number[] {
  const random = seeded(7);
  const shares: number[] = [];
  galleryStations.forEach((_, s) => {
    for (let b = 0; b < bins; b++) {
      const failing = s === 4 && b > 60 && b < 66;
      const base = s === 3 ? [0.9, 0.05, 0.05, 0] : s === 2 ? [0.4, 0.2, 0.4, 0] : [0.55, 0.35, 0.1, 0];
      const noisy = failing ? [0.1, 0, 0, 0.9] : base.map((v) => v * (0.5 + random()));
      const sum = noisy.reduce((a, v) => a + v, 0);
      shares.push(...noisy.map((v) => v / sum));
    }
  });
  return shares;
}

export function galleryLanes(timeBins = 240): SpaceTimeLane[] {
  const random = seeded(11);
  const lane = (laneName: string, stationsAt: number[], queueBias: number): SpaceTimeLane => {
    const lengthMm = 4800;
    const positionBinMm = 100;
    const positions = lengthMm / positionBinMm;
    const values: number[] = [];
    for (let t = 0; t < timeBins; t++) {
      const fill = Math.min(1, t / 30);
      for (let p = 0; p < positions; p++) {
        const atStation = stationsAt.some((s) => Math.abs(p - s) < 1);
        const queue = stationsAt.some((s) => p < s && s - p < 6 * queueBias * (0.6 + 0.4 * Math.sin(t / 17 + s)));
        const share = atStation ? 0.85 + 0.15 * random() : queue ? 0.45 + 0.4 * random() : 0.06 * random();
        values.push(share * fill);
      }
    }
    return { laneName, lengthMm, positionBinMm, values };
  };
  return [lane('Upper work lane', [6, 14, 22, 30, 38, 44], 1), lane('Lower return lane', [46], 0.4)];
}

export const galleryStateBars: StationStateBarsStation[] = [
  { id: 'load', name: 'Load housing', shares: { processing: 0.52, starved: 0.31, blocked: 0.15, down: 0.02 } },
  { id: 'oring', name: 'O-ring press', shares: { processing: 0.68, starved: 0.12, blocked: 0.17, down: 0.03 } },
  { id: 'screw', name: 'Screw cap', shares: { processing: 0.41, starved: 0.2, blocked: 0.37, down: 0.02 } },
  { id: 'fit', name: 'Manual fitting', shares: { processing: 0.91, starved: 0.04, blocked: 0.02, down: 0.03 } },
  { id: 'leak', name: 'Leak test', shares: { processing: 0.63, starved: 0.22, blocked: 0.01, down: 0.14 } },
  { id: 'unload', name: 'Unload', shares: { processing: 0.44, starved: 0.56, blocked: 0, down: 0 } },
];

export const galleryBalance: BalanceStep[] = [
  { id: 'load', name: 'Load housing', meanCycleSeconds: 5.2, sdCycleSeconds: 0.4, parallelStations: 1 },
  { id: 'oring', name: 'O-ring press', meanCycleSeconds: 9, sdCycleSeconds: 0.2, parallelStations: 1 },
  { id: 'screw', name: 'Screw cap', meanCycleSeconds: 4, sdCycleSeconds: 0.3, parallelStations: 1 },
  { id: 'fit', name: 'Manual fitting', meanCycleSeconds: 21, sdCycleSeconds: 3, parallelStations: 2 },
  { id: 'leak', name: 'Leak test', meanCycleSeconds: 8.4, sdCycleSeconds: 0.9, parallelStations: 1 },
  { id: 'unload', name: 'Unload', meanCycleSeconds: 4.5, sdCycleSeconds: 0.5, parallelStations: 1 },
];

/** Lead times in minutes drawn from a lognormal shape (Box–Muller on the seeded generator). */
export function galleryLeadTimes(n = 600): number[] {
  const random = seeded(3);
  return Array.from({ length: n }, () => {
    const z = Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
    return Math.exp(Math.log(6) + 0.25 * z);
  });
}

export function galleryWip(points = 97) {
  const random = seeded(5);
  const times = Array.from({ length: points }, (_, i) => i * 5);
  const values = times.map((t) => 18 * (1 - Math.exp(-t / 40)) + 2 * Math.sin(t / 35) + random());
  return {
    times,
    values,
    lower: values.map((v, i) => v - 1.2 - 0.01 * i),
    upper: values.map((v, i) => v + 1.2 + 0.01 * i),
  };
}

export const gallerySweep: SweepPoint[] = [8, 10, 12, 14, 16, 18, 20, 22, 24].map((carriers) => {
  const mean = 240 * (1 - Math.exp(-(carriers - 4) / 4.2)) - (carriers > 20 ? (carriers - 20) * 6 : 0);
  const half = 4 + 0.4 * carriers;
  return { x: carriers, mean, lower: mean - half, upper: mean + half };
});
