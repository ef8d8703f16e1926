/**
 * Closed-form tools for waveforms of the form $h(t) = A\cos\omega t + B\sin\omega t + C + Dt$
 * (a sinusoid plus a ramp): the solution of every mode of an ideal piecewise-linear resonant
 * tank. Internal, shared by the converter kernels: the first down-crossing (mode changes), the
 * peak and the integral of the square over a segment (waveform figures).
 *
 * Kernels: no input checks; the callers pass finite values.
 *
 * @packageDocumentation
 */
import { brentRoot } from "../special/index.js";
import { brentBracketed } from "../special/internal.js";

/**
 * The waveform being searched, h = A cos ωt + B sin ωt + C + Dt, with the zero band and the
 * root tolerance: slots of a typed array, not module variables (a number written to a module
 * variable is boxed on every write; a typed-array slot is written in place).
 */
const H_A = 0;
const H_B = 1;
const H_C = 2;
const H_D = 3;
const H_W = 4;
const H_TOL = 5;
const H_ROOT_TOL = 6;
const h = new Float64Array(7);
function hEval(t: number): number {
  const w = h[H_W] ?? 1;
  return (h[H_A] ?? 0) * Math.cos(w * t) + (h[H_B] ?? 0) * Math.sin(w * t) + (h[H_C] ?? 0) + (h[H_D] ?? 0) * t;
}

/**
 * First t in (0, tmax] where $h(t) = A\cos\omega t + B\sin\omega t + C + Dt$, non-negative at 0,
 * becomes ≤ 0. h is split at its extrema, found in closed form, into monotone pieces; the
 * crossing is bracketed in the first piece that changes sign and solved by Brent's method,
 * by default to the last few ulp (`tolerance` 0; a positive one, absolute in t, stops earlier
 * where the crossing only seeds a later solve). Returns Infinity when h stays positive.
 */
export function firstDownCrossing(A: number, B: number, C: number, D: number, w: number, tmax: number, tolerance = 0): number {
  h[H_ROOT_TOL] = tolerance;
  h[H_A] = A;
  h[H_B] = B;
  h[H_C] = C;
  h[H_D] = D;
  h[H_W] = w;
  const R = Math.hypot(A, B);
  h[H_TOL] = 1e-13 * (R + Math.abs(C) + Math.abs(D) * tmax);
  // h'(t) = wR cos(wt + β) + D, β = atan2(A, B)
  let tl = 0;
  let hl = hEval(0);
  const monotone = !(w > 0) || !(R > 0) || Math.abs(D) >= w * R;
  if (monotone) return crossIn(0, hl, tmax, hEval(tmax));
  const beta = Math.atan2(A, B);
  const gamma = Math.acos(-D / (w * R));
  const period = (2 * Math.PI) / w;
  let t1 = (gamma - beta) / w;
  let t2 = (-gamma - beta) / w;
  t1 -= Math.floor(t1 / period) * period;
  t2 -= Math.floor(t2 / period) * period;
  if (t1 <= 0) t1 += period;
  if (t2 <= 0) t2 += period;
  for (let guard = 0; guard < 100000; guard++) {
    const tr = Math.min(t1, t2, tmax);
    const hr = hEval(tr);
    const root = crossIn(tl, hl, tr, hr);
    if (root !== Infinity) return root;
    if (tr >= tmax) return Infinity;
    if (tr === t1) t1 += period;
    else t2 += period;
    tl = tr;
    hl = hr;
  }
  return Infinity;
}

/** The crossing inside one monotone piece; a start at zero (within rounding) counts only if h then clearly goes negative. */
function crossIn(tl: number, hl: number, tr: number, hr: number): number {
  const hTol = h[H_TOL] ?? 0;
  const rootTolerance = h[H_ROOT_TOL] ?? 0;
  if (hl <= hTol) return hr < -hTol ? tl : Infinity;
  if (hr > 0) return Infinity;
  if (hr === 0) return tr;
  // hl > 0 > hr: Brent's iteration on the bracket directly (the end values are known); the
  // checking entry point only for what it reports (NaN values, no convergence)
  const root = Number.isNaN(hr) ? NaN : brentBracketed(hEval, tl, tr, hl, hr, rootTolerance, 200, false);
  return Number.isNaN(root) ? brentRoot(hEval, tl, tr, { tolerance: rootTolerance }) : root;
}

/** max |c + a cos(wt) + b sin(wt)| for t in [0, tmax] (w > 0). */
export function sinusoidPeak(c: number, a: number, b: number, w: number, tmax: number): number {
  let best = Math.max(Math.abs(c + a), Math.abs(c + a * Math.cos(w * tmax) + b * Math.sin(w * tmax)));
  const R = Math.hypot(a, b);
  if (!(R > 0)) return best;
  let t = Math.atan2(b, a) / w;
  const half = Math.PI / w;
  t -= Math.floor(t / half) * half;
  for (let k = 0; t <= tmax && k < 100000; k++) {
    best = Math.max(best, Math.abs(c + a * Math.cos(w * t) + b * Math.sin(w * t)));
    t += half;
  }
  return best;
}

/** ∫_0^τ (a cos t + b sin t)² dt. */
export function squareIntegral(a: number, b: number, tau: number): number {
  const s2 = Math.sin(2 * tau);
  const s = Math.sin(tau);
  return 0.5 * (a * a + b * b) * tau + 0.25 * (a * a - b * b) * s2 + a * b * s * s;
}

function rampSinusoid(A: number, B: number, C: number, D: number, w: number, t: number): number {
  return A * Math.cos(w * t) + B * Math.sin(w * t) + C + D * t;
}

/** Largest |h| on [0, τ] for h = A cos wt + B sin wt + C + D t (extrema at the roots of h′, in closed form). */
export function rampSinusoidPeak(A: number, B: number, C: number, D: number, w: number, tau: number): number {
  // h' = −Aw sin + Bw cos + D = R cos(wt + φ) + D, φ = atan2(A, B)
  let best = Math.max(Math.abs(rampSinusoid(A, B, C, D, w, 0)), Math.abs(rampSinusoid(A, B, C, D, w, tau)));
  const R = w * Math.hypot(A, B);
  if (!(R > 0) || Math.abs(D) >= R) return best;
  const phi = Math.atan2(A, B);
  const g = Math.acos(-D / R);
  const period = (2 * Math.PI) / w;
  for (let branch = 0; branch < 2; branch++) {
    let t = (branch === 0 ? g - phi : -g - phi) / w;
    t -= Math.floor(t / period) * period;
    for (let n = 0; t <= tau && n < 100000; n++) {
      best = Math.max(best, Math.abs(rampSinusoid(A, B, C, D, w, t)));
      t += period;
    }
  }
  return best;
}

/** ∫_0^τ (A cos wt + B sin wt + C + D t)² dt in closed form. */
export function rampSinusoidSquareIntegral(A: number, B: number, C: number, D: number, w: number, tau: number): number {
  const c = Math.cos(w * tau);
  const s = Math.sin(w * tau);
  const osc = squareIntegral(A, B, w * tau) / w;
  const lin = C * C * tau + C * D * tau * tau + (D * D * tau * tau * tau) / 3;
  // 2 ∫ (C + D t)(A cos wt + B sin wt) dt
  const intCos = s / w;
  const intSin = (1 - c) / w;
  const intTCos = (tau * s) / w + (c - 1) / (w * w);
  const intTSin = (-tau * c) / w + s / (w * w);
  const cross = 2 * (C * (A * intCos + B * intSin) + D * (A * intTCos + B * intTSin));
  return osc + lin + cross;
}
