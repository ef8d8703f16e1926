/**
 * Brent's bracketing root finder.
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys } from "../core/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const BRENT_FIELDS: readonly string[] = Object.freeze(["tolerance", "maxIterations"]);

/**
 * Options of {@link brentRoot}.
 *
 * @category Root finding
 */
export interface BrentRootOptions {
  /**
   * Absolute tolerance on the root [same unit as x], ≥ 0. The search stops when the
   * bracket is narrower than $2(2\varepsilon|x| + \tfrac12\,\mathrm{tolerance})$. Default 0,
   * i.e. full double precision.
   */
  tolerance?: number;
  /** Iteration cap, integer ≥ 1. Default 200 (Brent's method needs ≲ 60 even in bad cases). */
  maxIterations?: number;
}

/**
 * Finds x in [lower, upper] with f(x) = 0 by Brent's method: inverse quadratic
 * interpolation and secant steps, safeguarded by bisection, so it converges superlinearly
 * for smooth f and never slower than about twice bisection.
 *
 * The bracket must contain a sign change: f(lower)·f(upper) ≤ 0. For a continuous f the
 * result x satisfies |x − x*| ≤ 4ε|x| + tolerance for a true root x* (a discontinuity with
 * a sign change is located in the same way).
 *
 * Throws {@link InputError} when lower or upper is not finite, when f(lower) and f(upper)
 * have the same sign (no root bracketed), when f returns NaN, when an option is out of range,
 * or when the iteration cap is reached.
 *
 * @param f - the function, called with x [any unit]
 * @param lower - one end of the bracket
 * @param upper - the other end (order does not matter)
 * @param options - {@link BrentRootOptions}
 * @returns the root x, in the unit of lower and upper
 * @see R. P. Brent, Algorithms for Minimization without Derivatives (Prentice-Hall 1973), ch. 4, procedure zero
 * @example
 * ```ts
 * import { brentRoot } from "fluxwright";
 * const x = brentRoot((t) => Math.cos(t) - t, 0, 1);
 * console.log(x); // ≈ 0.739085133215161
 * ```
 * @category Root finding
 */
export function brentRoot(
  f: (x: number) => number,
  lower: number,
  upper: number,
  options: BrentRootOptions = {},
): number {
  const where = "brentRoot";
  if (typeof f !== "function") throw new InputError(where, "f", f, "", "a function");
  requireKnownKeys(where, "options", options, BRENT_FIELDS);
  if (!Number.isFinite(lower)) throw new InputError(where, "lower", lower, "", "a finite number");
  if (!Number.isFinite(upper)) throw new InputError(where, "upper", upper, "", "a finite number");
  const tolerance = options.tolerance ?? 0;
  const maxIterations = options.maxIterations ?? 200;
  if (!(tolerance >= 0 && Number.isFinite(tolerance))) {
    throw new InputError(where, "options.tolerance", tolerance, "", "a finite number ≥ 0");
  }
  requireInteger(where, "options.maxIterations", maxIterations, 1);

  const a = lower;
  const b = upper;
  const fa = f(a);
  const fb = f(b);
  if (Number.isNaN(fa)) throw new InputError(where, "f(lower)", fa, "", "a number (not NaN)");
  if (Number.isNaN(fb)) throw new InputError(where, "f(upper)", fb, "", "a number (not NaN)");
  if (fa === 0) return a;
  if (fb === 0) return b;
  if ((fa > 0 && fb > 0) || (fa < 0 && fb < 0)) {
    throw new InputError(
      where,
      "[lower, upper]",
      `[${lower}, ${upper}] with f = [${fa}, ${fb}]`,
      "",
      "a bracket where f changes sign",
    );
  }
  const root = brentBracketed(f, a, b, fa, fb, tolerance, maxIterations, false);
  if (Number.isNaN(root)) {
    if (brentNaNAt === null) throw new InputError(where, "options.maxIterations", maxIterations, "", "large enough to converge");
    throw new InputError(where, `f(${brentNaNAt})`, NaN, "", "a number (not NaN)");
  }
  return root;
}

/** Where the last {@link brentBracketed} call met a NaN value of f (null: it ran out of iterations). */
let brentNaNAt: number | null = null;

/**
 * Brent's iteration on a bracket [a, b] whose end values fa, fb (neither zero) have opposite
 * signs; allocation-free. Returns the root estimate b, or with `sameSideAsB` the end of the final
 * bracket (within the tolerance) on the side where f has the sign of the initial fb: the point
 * where a crossing from a's side to b's side has happened. Returns NaN when f gives NaN or the
 * iterations run out (for the caller to report). Used by {@link brentRoot} and by the event
 * location of `solveOde`.
 *
 * @param f - the function
 * @param a - one end of the bracket
 * @param b - the other end
 * @param fa - f(a)
 * @param fb - f(b)
 * @param tolerance - absolute tolerance on x, ≥ 0
 * @param maxIterations - iteration cap
 * @param sameSideAsB - return the final bracket's end on b's side instead of the best estimate
 * @returns the root (see above) or NaN
 */
export function brentBracketed(
  f: (x: number) => number,
  a: number,
  b: number,
  fa: number,
  fb: number,
  tolerance: number,
  maxIterations: number,
  sameSideAsB: boolean,
): number {
  brentNaNAt = null;
  const positiveSide = fb > 0;
  const eps = Number.EPSILON;
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * eps * Math.abs(b) + 0.5 * tolerance;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return !sameSideAsB || fb === 0 || fb > 0 === positiveSide ? b : c;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      // Interpolation: secant when only two distinct points, else inverse quadratic.
      let p: number;
      let q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
    if (Number.isNaN(fb)) {
      brentNaNAt = b;
      return NaN;
    }
  }
  if (!sameSideAsB) return NaN;
  return fb > 0 === positiveSide ? b : c;
}
