// The Kolmogorov–Smirnov goodness-of-fit figure: the statistic D against a fitted CDF and its
// approximate p-value from the asymptotic Kolmogorov distribution.

/**
 * D = sup |Fₙ(x) − F(x)| for ascending `sorted` samples: at each order statistic x₍ᵢ₎ the larger of
 * i/n − F(x₍ᵢ₎) and F(x₍ᵢ₎) − (i−1)/n (Conover, Practical Nonparametric Statistics, 3rd ed. 1999, §6.1).
 * Ties need no special case: the first and last of a tied run give the two one-sided gaps.
 */
export function ksStatistic(sorted: readonly number[], cdf: (x: number) => number): number {
  const n = sorted.length;
  let d = 0;
  for (let i = 0; i < n; i += 1) {
    const f = cdf(sorted[i]);
    d = Math.max(d, (i + 1) / n - f, f - i / n);
  }
  return d;
}

/**
 * Q_KS(λ) = 2 Σ (−1)^(j−1) exp(−2 j² λ²), the Kolmogorov limiting survival function. For small λ that
 * series converges slowly, so the equivalent theta-function form is used there (Press et al., Numerical
 * Recipes, 3rd ed. 2007, §6.14.12; section number recalled from memory).
 */
export function kolmogorovSurvival(lambda: number): number {
  if (!(lambda > 0)) return 1;
  if (lambda < 1.18) {
    const y = Math.exp(-(Math.PI * Math.PI) / (8 * lambda * lambda));
    let sum = 0;
    for (let j = 1; j <= 7; j += 2) sum += y ** (j * j);
    return 1 - (Math.sqrt(2 * Math.PI) / lambda) * sum;
  }
  let sum = 0;
  for (let j = 1; j <= 100; j += 1) {
    const term = Math.exp(-2 * j * j * lambda * lambda);
    sum += (j % 2 === 1 ? 1 : -1) * term;
    if (term < 1e-17) break;
  }
  return Math.min(1, Math.max(0, 2 * sum));
}

/**
 * Approximate p-value of D from n samples: Q_KS((√n + 0.12 + 0.11/√n) · D), Stephens' modification that
 * makes the asymptotic law usable from n ≈ 5 (M. A. Stephens, "Use of the Kolmogorov–Smirnov, Cramér–von
 * Mises and related statistics without extensive tables", JRSS B 32, 1970; as given in Numerical
 * Recipes, 3rd ed. 2007, §14.3.3). With parameters fitted from the same samples the true p-value is
 * smaller (Lilliefors 1967), so it ranks candidates rather than tests them.
 */
export function ksPValue(d: number, n: number): number {
  const root = Math.sqrt(n);
  return kolmogorovSurvival((root + 0.12 + 0.11 / root) * d);
}
