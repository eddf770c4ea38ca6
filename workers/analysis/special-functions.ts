// Special functions the time-study fits need: log-gamma, digamma, trigamma, the regularised incomplete
// gamma function and the standard normal CDF built on it. Written out here so the analysis stays a
// pure module (no DOM, no Node) with no numerical dependency to audit.

const HALF_LN_2PI = 0.5 * Math.log(2 * Math.PI);

/** Below this the asymptotic series are shifted up by the recurrences before use. */
const ASYMPTOTIC_FROM = 20;

/**
 * ln Γ(x) for x > 0 by Stirling's series with four correction terms after shifting x to at least 20
 * (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, eq. 6.1.40): error below 1e-14.
 */
export function lnGamma(x: number): number {
  if (!(x > 0)) return Number.NaN;
  let shift = 0;
  let z = x;
  while (z < ASYMPTOTIC_FROM) {
    shift += Math.log(z);
    z += 1;
  }
  const z2 = z * z;
  const series = 1 / (12 * z) - 1 / (360 * z * z2) + 1 / (1260 * z * z2 * z2) - 1 / (1680 * z * z2 * z2 * z2);
  return (z - 0.5) * Math.log(z) - z + HALF_LN_2PI + series - shift;
}

/** ψ(x) = d/dx ln Γ(x), by ψ(x) = ψ(x + 1) − 1/x and the asymptotic series (A&S 1964, eq. 6.3.18). */
export function digamma(x: number): number {
  let shift = 0;
  let z = x;
  while (z < ASYMPTOTIC_FROM) {
    shift -= 1 / z;
    z += 1;
  }
  const r = 1 / (z * z);
  const series = r * (1 / 12 - r * (1 / 120 - r * (1 / 252 - r * (1 / 240 - r / 132))));
  return Math.log(z) - 0.5 / z - series + shift;
}

/** ψ′(x), by ψ′(x) = ψ′(x + 1) + 1/x² and the asymptotic series (A&S 1964, eq. 6.4.12). */
export function trigamma(x: number): number {
  let shift = 0;
  let z = x;
  while (z < ASYMPTOTIC_FROM) {
    shift += 1 / (z * z);
    z += 1;
  }
  const r = 1 / (z * z);
  const series = 1 / z + r / 2 + (r / z) * (1 / 6 - r * (1 / 30 - r * (1 / 42 - r / 30)));
  return series + shift;
}

const EPSILON = 1e-15;
const MAX_TERMS = 10_000;
const TINY = 1e-300;

/** Σ xⁿ / (a (a+1) … (a+n)), converging quickly for x < a + 1. */
function lowerGammaSeries(a: number, x: number): number {
  let term = 1 / a;
  let sum = term;
  for (let n = 1; n < MAX_TERMS; n += 1) {
    term *= x / (a + n);
    sum += term;
    if (Math.abs(term) < Math.abs(sum) * EPSILON) break;
  }
  return sum * Math.exp(-x + a * Math.log(x) - lnGamma(a));
}

/** Q(a, x) by its continued fraction, evaluated with the modified Lentz method; converges for x ≥ a + 1. */
function upperGammaFraction(a: number, x: number): number {
  let b = x + 1 - a;
  let c = 1 / TINY;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < MAX_TERMS; i += 1) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < TINY) d = TINY;
    c = b + an / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < EPSILON) break;
  }
  return Math.exp(-x + a * Math.log(x) - lnGamma(a)) * h;
}

/**
 * P(a, x) = γ(a, x) / Γ(a), the gamma distribution's CDF at x for shape a and unit scale. Series below
 * a + 1, continued fraction above (Press et al., Numerical Recipes, 3rd ed. 2007, §6.2).
 */
export function regularizedLowerGamma(a: number, x: number): number {
  if (x <= 0) return 0;
  if (!Number.isFinite(x)) return 1;
  return x < a + 1 ? lowerGammaSeries(a, x) : 1 - upperGammaFraction(a, x);
}

/** Φ(z) through erf(t) = P(½, t²) (A&S 1964, eq. 6.5.17), which inherits the incomplete gamma's accuracy. */
export function standardNormalCdf(z: number): number {
  if (Number.isNaN(z)) return Number.NaN;
  const half = 0.5 * regularizedLowerGamma(0.5, 0.5 * z * z);
  return z >= 0 ? 0.5 + half : 0.5 - half;
}
