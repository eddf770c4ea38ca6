// Closed-form and exact recursive results from queueing theory that the reference checks compare
// the engine against. Written here from the published derivations, independently of the engine.

/**
 * Exact Mean Value Analysis of a closed single-class network of FCFS stations with exponential
 * service and one infinite-server (pure delay) node, for populations 1..maxN. Station k has
 * servers[k] identical servers (1 when not given), so its service rate with j carriers present is
 * min(j, servers[k]) / s_k: a load-dependent station. Reiser & Lavenberg, "Mean-value analysis of
 * closed multichain queuing networks", J. ACM 27(2), 1980 (single chain; the load-dependent case
 * with marginal queue-length probabilities): with α_k(j) = min(j, c_k),
 *   R_k(n) = Σ_{j=1..n} j s_k / α_k(j) · p_k(j − 1 | n − 1),   X(n) = n / (Z + Σ R_k(n)),
 *   p_k(j | n) = X(n) s_k / α_k(j) · p_k(j − 1 | n − 1) for j ≥ 1,   p_k(0 | n) = 1 − Σ_{j≥1} p_k(j | n).
 * With one server this is R_k(n) = s_k (1 + Q_k(n − 1)). Returns X(n) per second, index n − 1.
 */
export function mvaThroughput(
  serviceMeansSeconds: readonly number[],
  delaySeconds: number,
  maxN: number,
  servers: readonly number[] = serviceMeansSeconds.map(() => 1),
): number[] {
  // p[k][j]: probability of j carriers at station k with the previous population.
  let p = serviceMeansSeconds.map(() => [1]);
  const out: number[] = [];
  for (let n = 1; n <= maxN; n++) {
    const residence = serviceMeansSeconds.map((s, k) => {
      let r = 0;
      for (let j = 1; j <= n; j++) r += ((j * s) / Math.min(j, servers[k])) * (p[k][j - 1] ?? 0);
      return r;
    });
    const x = n / (delaySeconds + residence.reduce((a, b) => a + b, 0));
    p = serviceMeansSeconds.map((s, k) => {
      const next = [0];
      for (let j = 1; j <= n; j++) next.push(((x * s) / Math.min(j, servers[k])) * (p[k][j - 1] ?? 0));
      next[0] = 1 - next.slice(1).reduce((a, b) => a + b, 0);
      return next;
    });
    out.push(x);
  }
  return out;
}

/**
 * Throughput of the finite-source single-server queue (machine-interference model) with n customers,
 * mean think time z and exponential service s: X = (1 − p0)/s, p0 = 1 / Σ_{j=0..n} n!/(n−j)! (s/z)^j.
 * Kleinrock, "Queueing Systems, Vol. 1: Theory", 1975, §3.8 (M/M/1//M; section recalled from memory);
 * used to check mvaThroughput.
 */
export function finiteSourceThroughput(serviceSeconds: number, thinkSeconds: number, n: number): number {
  let term = 1;
  let sum = 1;
  for (let j = 1; j <= n; j++) {
    term *= (n - j + 1) * (serviceSeconds / thinkSeconds);
    sum += term;
  }
  return (1 - 1 / sum) / serviceSeconds;
}

export type TwoMachineLine = {
  /** Stationary probabilities of n = 0 .. capacity parts between the machines' outputs. */
  probabilities: number[];
  throughput: number;
  /** Share of time the first machine holds a finished part it cannot pass on. */
  blocked: number;
  /** Share of time the second machine has nothing to work on. */
  starved: number;
};

/**
 * Two exponential machines with a finite buffer, blocking after service; the first machine is never
 * starved and the second never blocked. The state n counts parts that the first machine has finished
 * and the second has not: n = capacity means the first machine is blocked, n = 0 the second starved.
 * With b places between the machines, capacity = b + 2 (the places at both machines count), the
 * convention of Buzacott & Shanthikumar, "Stochastic Models of Manufacturing Systems", 1993, ch. 3
 * (two-stage flow line with blocking), and of Gershwin, "Manufacturing Systems Engineering", 1994,
 * ch. 3 (two-machine lines; chapters recalled from memory). The chain is birth–death: up at rate mu1 while n < capacity, down
 * at rate mu2 while n > 0; so p_n ∝ (mu1/mu2)^n and TH = mu1 (1 − p_capacity) = mu2 (1 − p_0).
 */
export function twoMachineLine(mu1: number, mu2: number, placesBetween: number): TwoMachineLine {
  const capacity = placesBetween + 2;
  const rho = mu1 / mu2;
  const weights = Array.from({ length: capacity + 1 }, (_, n) => rho ** n);
  const total = weights.reduce((a, b) => a + b, 0);
  const probabilities = weights.map((w) => w / total);
  const blocked = probabilities[capacity];
  const starved = probabilities[0];
  return { probabilities, throughput: mu1 * (1 - blocked), blocked, starved };
}

/**
 * Rest-to-rest move time on a trapezoidal velocity profile: D/v + v/a when the move reaches top speed
 * (D ≥ v²/a), else the triangular 2√(D/a). Biagiotti & Melchiorri, "Trajectory Planning for Automatic
 * Machines and Robots", Springer 2008, §3.2 (section recalled from memory). Written out here so the
 * reference checks do not lean on the engine's own motion code.
 */
export function trapezoidMoveSeconds(distanceMm: number, vMax: number, aMax: number): number {
  if (distanceMm <= 0) return 0;
  return distanceMm >= (vMax * vMax) / aMax ? distanceMm / vMax + vMax / aMax : 2 * Math.sqrt(distanceMm / aMax);
}
