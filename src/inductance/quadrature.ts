/**
 * Private adaptive Gauss–Legendre quadrature for the nested coil integrals (no allocation per
 * panel, closures only at the call sites). A panel is accepted when the 10-point rule on the
 * whole panel and on its two halves agree within the local tolerance.
 *
 * @packageDocumentation
 */

/** Nodes and weights of the n-point Gauss–Legendre rule on [-1, 1], by Newton's method. */
function gaussLegendre(n: number): { x: Float64Array; w: Float64Array } {
  const x = new Float64Array(n);
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let t = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let it = 0; it < 100; it++) {
      let p0 = 1;
      let p1 = t;
      for (let j = 2; j <= n; j++) {
        const p2 = ((2 * j - 1) * t * p1 - (j - 1) * p0) / j;
        p0 = p1;
        p1 = p2;
      }
      dp = (n * (t * p1 - p0)) / (t * t - 1);
      const dt = p1 / dp;
      t -= dt;
      if (Math.abs(dt) < 1e-16) break;
    }
    x[i] = t;
    w[i] = 2 / ((1 - t * t) * dp * dp);
  }
  return { x, w };
}

const RULE = gaussLegendre(10);

const GX = RULE.x;
const GW = RULE.w;

/** 10-point Gauss–Legendre estimate of ∫_a^b f. */
export function panel(f: (x: number) => number, a: number, b: number): number {
  const h = 0.5 * (b - a);
  const c = 0.5 * (a + b);
  let s = 0;
  for (let i = 0; i < 10; i++) s += (GW[i] as number) * f(c + h * (GX[i] as number));
  return s * h;
}

function refine(
  f: (x: number) => number,
  a: number,
  b: number,
  whole: number,
  tolerance: number,
  depth: number,
): number {
  const mid = 0.5 * (a + b);
  const left = panel(f, a, mid);
  const right = panel(f, mid, b);
  const both = left + right;
  const diff = Math.abs(both - whole);
  // (a NaN difference stops the refinement: the caller's result is then NaN, never a hang)
  if (!(diff > tolerance) || diff <= 1e-15 * Math.abs(both) || depth >= 30 || !(mid > a && mid < b)) return both;
  const t = tolerance;
  return refine(f, a, mid, left, t, depth + 1) + refine(f, mid, b, right, t, depth + 1);
}

/**
 * Adaptive ∫_a^b f(x) dx to a relative tolerance (relative to the first estimate of the
 * whole integral, plus a tiny absolute floor).
 */
export function integrate(f: (x: number) => number, a: number, b: number, relativeTolerance: number, absoluteTolerance = 0): number {
  if (a === b) return 0;
  const whole = panel(f, a, b);
  const tol = relativeTolerance * Math.abs(whole) + absoluteTolerance + 1e-300;
  return refine(f, a, b, whole, tol, 0);
}

/** Adaptive ∫_a^b f(x) dx to an absolute tolerance. */
export function integrateAbsolute(f: (x: number) => number, a: number, b: number, absoluteTolerance: number): number {
  if (a === b) return 0;
  return refine(f, a, b, panel(f, a, b), absoluteTolerance, 0);
}

/**
 * Adaptive ∫_a^b f(x) dx for an integrand with an integrable (logarithmic or |x|·log) singularity
 * at x = a: substitution x = a + (b − a) t³ clusters the nodes there and makes the integrand
 * smooth enough for Gauss–Legendre. `b` may be below `a`.
 */
export function integrateSingularAtStart(
  f: (x: number) => number,
  a: number,
  b: number,
  relativeTolerance: number,
  absoluteTolerance = 0,
): number {
  if (a === b) return 0;
  const d = b - a;
  return integrate(
    (t: number): number => {
      const t2 = t * t;
      return 3 * d * t2 * f(a + d * t2 * t);
    },
    0,
    1,
    relativeTolerance,
    absoluteTolerance,
  );
}
