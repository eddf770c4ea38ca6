// What the small distribution preview draws: a density over a sensible range for each kind, or the
// samples themselves. Only the shape matters here; the simulation draws from the engine's samplers.
import type { Distribution } from '../../../../shared/scenario/distribution';

export type PreviewShape =
  | { samples: number[] }
  | { density: (x: number) => number; domain: [number, number] };

/**
 * ln Γ(x) by the Lanczos approximation with g = 7 and nine coefficients (Press et al., Numerical
 * Recipes, 3rd ed. 2007, §6.1; coefficients recalled from memory); ample for drawing a curve.
 */
const LANCZOS = [0.999_999_999_999_809_9, 676.520_368_121_885_1, -1259.139_216_722_402_8, 771.323_428_777_653_1, -176.615_029_162_140_6, 12.507_343_278_686_905, -0.138_571_095_265_720_12, 9.984_369_578_019_571_6e-6, 1.505_632_735_149_311_6e-7];

function lnGamma(x: number): number {
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - lnGamma(1 - x);
  const z = x - 1;
  let a = LANCZOS[0];
  const t = z + 7.5;
  for (let i = 1; i < 9; i += 1) a += LANCZOS[i] / (z + i);
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(a);
}

function gammaDensity(shape: number, scale: number) {
  const norm = -lnGamma(shape) - shape * Math.log(scale);
  return (x: number) => (x <= 0 ? 0 : Math.exp(norm + (shape - 1) * Math.log(x) - x / scale));
}

export function previewShape(d: Distribution): PreviewShape {
  switch (d.kind) {
    case 'fixed':
      return { samples: [d.value] };
    case 'empirical':
      return { samples: d.samples };
    case 'uniform': {
      const pad = (d.max - d.min) * 0.15;
      return { density: (x) => (x >= d.min && x <= d.max ? 1 : 0), domain: [Math.max(0, d.min - pad), d.max + pad] };
    }
    case 'triangular':
      return {
        density: (x) => {
          if (x < d.min || x > d.max) return 0;
          return x <= d.mode ? (d.mode === d.min ? 1 : (x - d.min) / (d.mode - d.min)) : d.max === d.mode ? 1 : (d.max - x) / (d.max - d.mode);
        },
        domain: [d.min, d.max],
      };
    case 'normal':
      return { density: (x) => (x < d.min ? 0 : Math.exp(-0.5 * ((x - d.mean) / d.sd) ** 2)), domain: [Math.max(d.min, d.mean - 4 * d.sd), d.mean + 4 * d.sd] };
    case 'lognormal': {
      const s2 = Math.log(1 + d.cv * d.cv);
      const mu = Math.log(d.mean) - s2 / 2;
      return { density: (x) => (x <= 0 ? 0 : Math.exp(-((Math.log(x) - mu) ** 2) / (2 * s2)) / x), domain: [0, Math.exp(mu + 3.5 * Math.sqrt(s2))] };
    }
    case 'exponential':
      return { density: (x) => Math.exp(-x / d.mean), domain: [0, 5 * d.mean] };
    case 'erlang':
      return { density: gammaDensity(d.k, d.mean / d.k), domain: [0, d.mean + 5 * (d.mean / Math.sqrt(d.k))] };
    case 'gamma': {
      const shape = 1 / (d.cv * d.cv);
      return { density: gammaDensity(shape, d.mean / shape), domain: [0, d.mean * (1 + 5 * d.cv)] };
    }
  }
}
