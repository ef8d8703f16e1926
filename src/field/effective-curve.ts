/**
 * Effective (time-harmonic) magnetisation curve of a saturating material for the field solver:
 * the fundamental of the flux density when the field strength is sinusoidal. Internal to
 * `fluxwright/field`.
 *
 * @packageDocumentation
 */
import { MU_0 } from "../units/index.js";
import { gaussLegendreRule } from "../special/internal.js";

/** One point of a B–H curve: field strength [A/m] and flux density [T]. */
export interface CurvePoint {
  readonly fieldStrength: number;
  readonly fluxDensity: number;
}

/** 24-point Gauss–Legendre rule mapped to [0, 1] (nodes GL_X, weights GL_W summing to 1). */
const GL_N = 24;
const GL_RULE = gaussLegendreRule(GL_N);
const GL_X = GL_RULE.nodes.map((x) => 0.5 * (1 + x));
const GL_W = GL_RULE.weights.map((w) => 0.5 * w);

/**
 * The static curve B(H) for H ≥ 0: piecewise linear through (0, 0) and the given points,
 * continued beyond the last point with slope μ0 (full saturation).
 */
export function staticFluxDensity(h: Float64Array, b: Float64Array, H: number): number {
  const n = h.length;
  if (H >= h[n - 1]!) return b[n - 1]! + MU_0 * (H - h[n - 1]!);
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (h[mid]! <= H) lo = mid;
    else hi = mid;
  }
  return b[lo]! + ((b[hi]! - b[lo]!) * (H - h[lo]!)) / (h[hi]! - h[lo]!);
}

/**
 * Fundamental amplitude of B(t) when $H(t) = \hat H\sin\omega t$:
 * $\hat B_1 = \frac{4}{\pi}\int_0^{\pi/2} B(\hat H\sin\theta)\sin\theta\,d\theta$, integrated
 * piece by piece between the kinks of the piecewise-linear curve (exact to round-off for each
 * linear piece up to the quadrature error of the sine factor, 24-point Gauss–Legendre).
 */
export function fundamentalFluxDensity(h: Float64Array, b: Float64Array, Hpeak: number): number {
  if (!(Hpeak > 0)) return 0;
  // kinks at θ_k = asin(h_k / Ĥ)
  const breaks: number[] = [0];
  for (let k = 0; k < h.length; k++) {
    if (h[k]! > 0 && h[k]! < Hpeak) breaks.push(Math.asin(h[k]! / Hpeak));
  }
  breaks.push(Math.PI / 2);
  let sum = 0;
  for (let k = 0; k + 1 < breaks.length; k++) {
    const a = breaks[k]!;
    const w = breaks[k + 1]! - a;
    if (!(w > 0)) continue;
    for (let q = 0; q < GL_N; q++) {
      const th = a + w * GL_X[q]!;
      const s = Math.sin(th);
      sum += w * GL_W[q]! * staticFluxDensity(h, b, Hpeak * s) * s;
    }
  }
  return (4 / Math.PI) * sum;
}

/**
 * Tabulated effective curve of one material: the fundamental flux-density amplitude
 * $\hat B_1(\hat H)$ on a log-spaced grid, and its inverse as a relative reluctivity
 * $\nu_r(\hat B) = \mu_0\hat H/\hat B$ for the fixed-point iteration.
 */
export interface EffectiveCurve {
  /** Relative reluctivity $\mu_0\hat H/\hat B_1$ at fundamental flux-density amplitude bPeak [T]. */
  relativeReluctivity(bPeak: number): number;
  /** Relative reluctivity $\mu_0\hat H/\hat B_1(\hat H)$ at peak field strength hPeak [A/m]. */
  reluctivityAtField(hPeak: number): number;
  /** Largest effective relative permeability of the curve (the unsaturated value). */
  readonly maxRelativePermeability: number;
}

/** Grid points per decade of the tabulated effective curve. */
const PER_DECADE = 40;

/** Builds the effective curve of a monotone B–H curve (validated by the caller, H and B > 0 increasing). */
export function effectiveCurve(points: readonly CurvePoint[]): EffectiveCurve {
  const h = Float64Array.from([0, ...points.map((p) => p.fieldStrength)]);
  const b = Float64Array.from([0, ...points.map((p) => p.fluxDensity)]);
  const hFirst = h[1]!;
  const hLast = h[h.length - 1]!;
  const lo = Math.log10(hFirst) - 3;
  const hi = Math.log10(hLast) + 3;
  const count = Math.ceil((hi - lo) * PER_DECADE) + 1;
  const logH = new Float64Array(count);
  const logB = new Float64Array(count);
  let maxMu = 0;
  for (let k = 0; k < count; k++) {
    const H = Math.pow(10, lo + ((hi - lo) * k) / (count - 1));
    const B = fundamentalFluxDensity(h, b, H);
    logH[k] = Math.log(H);
    logB[k] = Math.log(B);
    maxMu = Math.max(maxMu, B / (MU_0 * H));
  }
  const initialNu = (MU_0 * hFirst) / b[1]!;
  return {
    maxRelativePermeability: maxMu,
    reluctivityAtField(hPeak: number): number {
      if (!(hPeak > 0)) return initialNu;
      const x = Math.log(hPeak);
      if (x <= logH[0]!) return initialNu;
      if (x >= logH[count - 1]!) {
        const B = Math.exp(logB[count - 1]!) + MU_0 * (hPeak - Math.exp(logH[count - 1]!));
        return (MU_0 * hPeak) / B;
      }
      const k = Math.min(count - 2, Math.floor(((x - logH[0]!) / (logH[count - 1]! - logH[0]!)) * (count - 1)));
      const t = (x - logH[k]!) / (logH[k + 1]! - logH[k]!);
      const B = Math.exp(logB[k]! + t * (logB[k + 1]! - logB[k]!));
      return (MU_0 * hPeak) / B;
    },
    relativeReluctivity(bPeak: number): number {
      if (!(bPeak > 0)) return initialNu;
      const y = Math.log(bPeak);
      if (y <= logB[0]!) return initialNu;
      if (y >= logB[count - 1]!) {
        // beyond the table: B₁ ≈ (4/π)B_last-ish + μ0 Ĥ, the curve is a straight line of slope μ0
        const Hx = Math.exp(logH[count - 1]!) + (bPeak - Math.exp(logB[count - 1]!)) / MU_0;
        return (MU_0 * Hx) / bPeak;
      }
      let a = 0;
      let c = count - 1;
      while (c - a > 1) {
        const m = (a + c) >> 1;
        if (logB[m]! <= y) a = m;
        else c = m;
      }
      const t = (y - logB[a]!) / (logB[c]! - logB[a]!);
      const H = Math.exp(logH[a]! + t * (logH[c]! - logH[a]!));
      return (MU_0 * H) / bPeak;
    },
  };
}
