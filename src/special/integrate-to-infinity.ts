/**
 * Integration over [a, ∞) for slowly decaying, possibly oscillatory integrands:
 * interval-by-interval Gauss–Kronrod with Wynn's ε-algorithm on the partial sums.
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys } from "../core/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const INFINITY_FIELDS: readonly string[] = Object.freeze(["relativeTolerance", "absoluteTolerance", "intervalLength", "maxIntervals", "maxSubintervals"]);
import { integrateGk, readTolerances, type IntegrationResult } from "./integrate-adaptive.js";

/**
 * Tolerances and limits of {@link integrateToInfinity}.
 *
 * @category Quadrature
 */
export interface IntegrateToInfinityOptions {
  /** Requested relative error, ≥ 0. Default 1e-10. */
  relativeTolerance?: number;
  /** Requested absolute error [unit of f × unit of x], ≥ 0. Default 0. */
  absoluteTolerance?: number;
  /**
   * Length of the first integration intervals [unit of x], > 0. Best: half the (asymptotic)
   * period of an oscillating integrand, e.g. π/r for a factor J₁(αr) integrated over α.
   * Default 1.
   */
  intervalLength?: number;
  /** Largest number of intervals, integer ≥ 4. Default 400. */
  maxIntervals?: number;
  /** Largest number of Gauss–Kronrod panels per interval, integer ≥ 1. Default 100. */
  maxSubintervals?: number;
}

/** Width of the sliding window of partial sums handed to the ε-algorithm. */
const WINDOW = 40;

/**
 * Wynn's ε-algorithm on the partial sums s[first..]; returns the most advanced even-column
 * estimate and the distance to the previous even column as a crude error.
 */
function wynnEpsilon(s: readonly number[], first: number): { estimate: number; spread: number } {
  const n = s.length - first;
  let prev = new Float64Array(n + 1); // column k − 1 (starts as column −1 = 0)
  let cur = Float64Array.from(s.slice(first)); // column k
  let estimate = cur[n - 1]!;
  let spread = n >= 2 ? Math.abs(cur[n - 1]! - cur[n - 2]!) : Infinity;
  for (let k = 0; cur.length >= 2; k++) {
    const next = new Float64Array(cur.length - 1);
    for (let i = 0; i < next.length; i++) {
      const d = cur[i + 1]! - cur[i]!;
      if (d === 0 || !Number.isFinite(d)) return { estimate, spread: k % 2 === 0 ? spread : spread };
      next[i] = prev[i + 1]! + 1 / d;
    }
    prev = cur;
    cur = next;
    if (k % 2 === 1) {
      // column k + 1 is even: a new estimate
      const e = cur[cur.length - 1]!;
      if (!Number.isFinite(e)) break;
      spread = Math.abs(e - estimate);
      if (cur.length >= 2) spread = Math.max(spread, Math.abs(e - cur[cur.length - 2]!));
      estimate = e;
    }
  }
  return { estimate, spread };
}

/**
 * Integrates f over the semi-infinite interval [a, ∞).
 *
 * The range is cut into consecutive intervals, each integrated by adaptive Gauss–Kronrod
 * ({@link integrateAdaptive}); the partial sums $S_n = \int_a^{x_n} f\,dx$ are accelerated
 * by Wynn's ε-algorithm (the Shanks transformation), which sums alternating series of
 * oscillation half-periods and geometrically decaying tails to high accuracy. While the
 * interval contributions keep one sign and f itself has not changed sign, the interval lengths start doubling, so an
 * algebraic tail $x^{-p}$ becomes a geometric series that the ε-algorithm also sums.
 *
 * $$
 * \int_a^\infty f(x)\,dx = \lim_{n\to\infty} S_n, \qquad
 * \varepsilon^{(n)}_{k+1} = \varepsilon^{(n+1)}_{k-1} + \frac{1}{\varepsilon^{(n+1)}_k - \varepsilon^{(n)}_k}
 * $$
 *
 * Stops when the extrapolated value has settled: error estimate (ε-table spread plus the
 * sum of interval errors) ≤ max(absoluteTolerance, relativeTolerance·|value|). Suitable for
 * Dodd–Deeds-type integrals over a separation constant (products of Bessel functions with
 * algebraic or exponential damping). Not suitable when f decays slower than 1/x (the
 * integral diverges or converges only conditionally without oscillation).
 *
 * Throws {@link InputError} for non-finite a, out-of-range tolerances, interval length or
 * limits. A non-finite integrand value gives `converged: false`. Accuracy: tests check
 * ≤ 1e-10 relative against closed forms (∫ sin x / x, ∫ J₀, ∫ e^{−x}, ∫ x^{−2}) and mpmath.
 *
 * @param f - the integrand, called with x ≥ a [any unit]
 * @param a - lower limit, finite
 * @param options - {@link IntegrateToInfinityOptions}
 * @returns {@link IntegrationResult} with value, errorEstimate, evaluations and converged
 * @see P. Wynn, "On a device for computing the e_m(S_n) transformation", MTAC 10:91–96 (1956)
 * @see R. Piessens et al., QUADPACK (Springer 1983), QAWF (interval-by-interval with ε-extrapolation)
 * @example
 * ```ts
 * import { integrateToInfinity } from "fluxwright";
 * const r = integrateToInfinity((x) => (x === 0 ? 1 : Math.sin(x) / x), 0, { intervalLength: Math.PI });
 * console.log(r.value); // ≈ 1.5707963268
 * ```
 * @category Quadrature
 */
export function integrateToInfinity(
  f: (x: number) => number,
  a: number,
  options: IntegrateToInfinityOptions = {},
): IntegrationResult {
  const where = "integrateToInfinity";
  if (typeof f !== "function") throw new InputError(where, "f", f, "", "a function");
  requireKnownKeys(where, "options", options, INFINITY_FIELDS);
  if (!Number.isFinite(a)) throw new InputError(where, "a", a, "", "a finite number");
  const defaults = { relativeTolerance: 1e-10, ...options };
  const { rel, abs } = readTolerances(where, defaults);
  const intervalLength = options.intervalLength ?? 1;
  const maxIntervals = options.maxIntervals ?? 400;
  const maxSubintervals = options.maxSubintervals ?? 100;
  if (!(intervalLength > 0 && Number.isFinite(intervalLength))) {
    throw new InputError(where, "options.intervalLength", intervalLength, "", "a finite number > 0");
  }
  requireInteger(where, "options.maxIntervals", maxIntervals, 4);
  requireInteger(where, "options.maxSubintervals", maxSubintervals, 1);

  const sums: number[] = [];
  let first = 0; // start of the current ε window (reset when the interval length changes)
  let sum = 0;
  let intervalError = 0;
  let evaluations = 0;
  let h = intervalLength;
  let x = a;
  let sameSign = 0;
  let geometric = false;
  let oscillating = false; // f has changed sign inside some interval
  let positiveSeen: boolean;
  let negativeSeen: boolean;
  const watched = (t: number): number => {
    const v = f(t);
    if (v > 0) positiveSeen = true;
    else if (v < 0) negativeSeen = true;
    return v;
  };
  let lastSign = 0;
  let previousEstimate = NaN;
  let settled = false;
  let best: IntegrationResult = { value: 0, errorEstimate: Infinity, evaluations: 0, converged: false };
  for (let n = 0; n < maxIntervals; n++) {
    positiveSeen = false;
    negativeSeen = false;
    const piece = integrateGk(watched, x, x + h, rel * 1e-3, abs * 1e-3, maxSubintervals);
    if (positiveSeen && negativeSeen) oscillating = true;
    evaluations += piece.evaluations;
    if (!Number.isFinite(piece.value)) {
      return { value: piece.value, errorEstimate: Infinity, evaluations, converged: false };
    }
    x += h;
    sum += piece.value;
    intervalError += piece.errorEstimate;
    sums.push(sum);
    const sign = Math.sign(piece.value);
    sameSign = sign !== 0 && sign === lastSign ? sameSign + 1 : 0;
    lastSign = sign;
    // Raw convergence: an exactly vanishing tail (compact support, underflow).
    if (piece.value === 0 && n >= 2 && sums[n - 1] === sum && sums[n - 2] === sum) {
      return { value: sum, errorEstimate: intervalError, evaluations, converged: true };
    }
    if (sums.length - first > WINDOW) first = sums.length - WINDOW;
    const count = sums.length - first;
    if (count >= 4) {
      const { estimate, spread } = wynnEpsilon(sums, first);
      const change = Number.isFinite(previousEstimate) ? Math.abs(estimate - previousEstimate) : Infinity;
      const errorEstimate = Math.max(spread, change) + intervalError;
      previousEstimate = estimate;
      const tol = Math.max(abs, rel * Math.abs(estimate));
      if (errorEstimate < best.errorEstimate) best = { value: estimate, errorEstimate, evaluations, converged: false };
      // Accept only when two successive extrapolations both meet the tolerance.
      if (errorEstimate <= tol && settled) return { value: estimate, errorEstimate, evaluations, converged: true };
      settled = errorEstimate <= tol;
    }
    // A one-signed tail: from here on every interval doubles (a regular geometric sequence
    // for the ε-algorithm); the ε window restarts once at the switch.
    if (geometric && oscillating) {
      // The tail oscillates after all: back to fixed intervals for good.
      geometric = false;
      h = intervalLength;
      first = sums.length - 1;
      previousEstimate = NaN;
      settled = false;
    } else if (geometric) {
      h *= 2;
    } else if (!oscillating && sameSign >= 3) {
      geometric = true;
      h *= 2;
      first = sums.length - 1;
      previousEstimate = NaN;
      settled = false;
    }
  }
  return { ...best, evaluations, converged: best.errorEstimate <= Math.max(abs, rel * Math.abs(best.value)) };
}
