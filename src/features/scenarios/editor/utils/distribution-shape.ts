// What the small distribution preview draws: a density over a sensible range for each kind, or the
// samples themselves. Only the shape matters here; the simulation draws from the engine's samplers.
import type { Distribution } from '../../../../../shared/scenario/distribution';
import { gammaFromMeanCv, lognormalFromMeanCv } from '../../../../../shared/scenario/distribution-parameters';
import { gammaLaw, lognormalLaw, normalLaw } from '../../../../../workers/analysis/fitted-densities';

export type PreviewShape = { samples: number[] } | { density: (x: number) => number; domain: [number, number] };

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
          return x <= d.mode
            ? d.mode === d.min
              ? 1
              : (x - d.min) / (d.mode - d.min)
            : d.max === d.mode
              ? 1
              : (d.max - x) / (d.max - d.mode);
        },
        domain: [d.min, d.max],
      };
    case 'normal': {
      const { pdf } = normalLaw(d.mean, d.sd);
      return {
        density: (x) => (x < d.min ? 0 : pdf(x)),
        domain: [Math.max(d.min, d.mean - 4 * d.sd), d.mean + 4 * d.sd],
      };
    }
    case 'lognormal': {
      const { mu, sigma } = lognormalFromMeanCv(d.mean, d.cv);
      return { density: lognormalLaw(mu, sigma).pdf, domain: [0, Math.exp(mu + 3.5 * sigma)] };
    }
    case 'exponential':
      return { density: gammaLaw(1, d.mean).pdf, domain: [0, 5 * d.mean] };
    case 'erlang':
      return { density: gammaLaw(d.k, d.mean / d.k).pdf, domain: [0, d.mean + 5 * (d.mean / Math.sqrt(d.k))] };
    case 'gamma': {
      const { shape, scale } = gammaFromMeanCv(d.mean, d.cv);
      return { density: gammaLaw(shape, scale).pdf, domain: [0, d.mean * (1 + 5 * d.cv)] };
    }
  }
}
