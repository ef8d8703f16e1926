/**
 * The field through the concentric shells of {@link layeredCylinderInLongCoil}: the start at the
 * axis, bore or first shell the field reaches, the transfer matrix across each shell, and the
 * scaling of field ratios and shell powers to the surface.
 *
 * @packageDocumentation
 */
import { besselI0ComplexScaled, besselI1OverI0Complex, besselIKComplexScaled } from "../special/index.js";
import type { Complex } from "../special/index.js";
import { MU_0 } from "../units/index.js";

/**
 * Attenuation (in nepers of field amplitude, Σ Δr/δ) beyond which the shells inside are left out:
 * their influence on the surface impedance is below e^{-2·DEEP} ≈ 2e-22 relative.
 */
const DEEP = 25;

/**
 * The field through the shells (checked input): writes |H(r_b)|/|H(R)| at each boundary into
 * `ratios` (n + 1 values), the inward power flux difference across each shell per unit length
 * per (A/m)² of surface field into `powers` (n values), and returns Z_s = ρH'/H at the surface.
 */
export function layeredField(
  omega: number,
  inner: number,
  radii: ArrayLike<number>,
  rho: ArrayLike<number>,
  mur: ArrayLike<number>,
  ratios: Float64Array,
  powers: Float64Array,
): Complex {
  const n = radii.length;
  // Shells deeper than DEEP skin depths below the surface are left out: the field starts in
  // shell `first` as in a solid of that shell's material.
  const first = firstShellInReach(omega, inner, radii, rho, mur);
  // State at the current boundary, normalised so that |H| = 1: H = (hr, hi), G = ρH' = (gr, gi);
  // ratios[] first hold log-amplitudes, powers[] the inward flux 2πr Re(G H*) at each shell's
  // outer boundary.
  const start = startState(omega, inner, radii, rho, mur, first, ratios, powers, state);
  let hr = 1;
  let hi = 0;
  let gr = state[0]!;
  let gi = state[1]!;
  const startFlux = state[2]!; // inward power flux at the start boundary (0: bore or axis)
  let logAmp = 0;
  let cachedDelta = NaN;
  let cachedRadius = NaN;
  let cached = besselIKComplexScaled({ re: 1, im: 1 });
  for (let s = start; s < n; s++) {
    const r1 = s === 0 ? inner : radii[s - 1]!;
    const r2 = radii[s]!;
    const delta = Math.sqrt((2 * rho[s]!) / (omega * MU_0 * mur[s]!));
    const u1 = r1 / delta;
    const u2 = r2 / delta;
    // the functions at the inner radius were computed for the shell below when its δ is the same
    const a = delta === cachedDelta && r1 === cachedRadius ? cached : besselIKComplexScaled({ re: u1, im: u1 });
    const b = besselIKComplexScaled({ re: u2, im: u2 });
    cached = b;
    cachedDelta = delta;
    cachedRadius = r2;
    // e1 = e^{−i Im z1}, e2 = e^{−i Im z2} / g², g = e^{u2 − u1}
    const e1r = Math.cos(u1);
    const e1i = -Math.sin(u1);
    const g2 = Math.exp(-2 * (u2 - u1));
    const e2r = Math.cos(u2) * g2;
    const e2i = -Math.sin(u2) * g2;
    const m11r0 = mul3r(a.k1r, a.k1i, b.i0r, b.i0i, e1r, e1i) + mul3r(a.i1r, a.i1i, b.k0r, b.k0i, e2r, e2i);
    const m11i0 = mul3i(a.k1r, a.k1i, b.i0r, b.i0i, e1r, e1i) + mul3i(a.i1r, a.i1i, b.k0r, b.k0i, e2r, e2i);
    const m12r0 = mul3r(a.k0r, a.k0i, b.i0r, b.i0i, e1r, e1i) - mul3r(a.i0r, a.i0i, b.k0r, b.k0i, e2r, e2i);
    const m12i0 = mul3i(a.k0r, a.k0i, b.i0r, b.i0i, e1r, e1i) - mul3i(a.i0r, a.i0i, b.k0r, b.k0i, e2r, e2i);
    const m21r0 = mul3r(a.k1r, a.k1i, b.i1r, b.i1i, e1r, e1i) - mul3r(a.i1r, a.i1i, b.k1r, b.k1i, e2r, e2i);
    const m21i0 = mul3i(a.k1r, a.k1i, b.i1r, b.i1i, e1r, e1i) - mul3i(a.i1r, a.i1i, b.k1r, b.k1i, e2r, e2i);
    const m22r0 = mul3r(a.k0r, a.k0i, b.i1r, b.i1i, e1r, e1i) + mul3r(a.i0r, a.i0i, b.k1r, b.k1i, e2r, e2i);
    const m22i0 = mul3i(a.k0r, a.k0i, b.i1r, b.i1i, e1r, e1i) + mul3i(a.i0r, a.i0i, b.k1r, b.k1i, e2r, e2i);
    // multiply by z1 = u1(1 + j)
    const m11r = u1 * (m11r0 - m11i0);
    const m11i = u1 * (m11r0 + m11i0);
    const m12r = u1 * (m12r0 - m12i0);
    const m12i = u1 * (m12r0 + m12i0);
    const m21r = u1 * (m21r0 - m21i0);
    const m21i = u1 * (m21r0 + m21i0);
    const m22r = u1 * (m22r0 - m22i0);
    const m22i = u1 * (m22r0 + m22i0);
    // w = H'/k = G/(ρk), ρk = (ρ/δ)(1 + j): G/(1 + j) = G (1 − j)/2
    const rs = rho[s]! / delta;
    const wr = (0.5 * (gr + gi)) / rs;
    const wi = (0.5 * (gi - gr)) / rs;
    const h2r = m11r * hr - m11i * hi + m12r * wr - m12i * wi;
    const h2i = m11r * hi + m11i * hr + m12r * wi + m12i * wr;
    const w2r = m21r * hr - m21i * hi + m22r * wr - m22i * wi;
    const w2i = m21r * hi + m21i * hr + m22r * wi + m22i * wr;
    // G = ρk w
    const g2r = rs * (w2r - w2i);
    const g2i = rs * (w2r + w2i);
    const amp = Math.hypot(h2r, h2i);
    hr = h2r / amp;
    hi = h2i / amp;
    gr = g2r / amp;
    gi = g2i / amp;
    logAmp += u2 - u1 + Math.log(amp);
    ratios[s + 1] = logAmp;
    powers[s] = 2 * Math.PI * r2 * (gr * hr + gi * hi); // Re(G H*)
  }
  scaleToSurface(logAmp, first, startFlux, ratios, powers);
  // Z_s = G/H at the surface (|H| = 1)
  return { re: gr * hr + gi * hi, im: gi * hr - gr * hi };
}


/**
 * The first shell the field reaches: shells more than DEEP skin depths below the surface are
 * left out (0 when the field reaches the axis or the bore).
 */
function firstShellInReach(omega: number, inner: number, radii: ArrayLike<number>, rho: ArrayLike<number>, mur: ArrayLike<number>): number {
  const n = radii.length;
  let attenuation = 0;
  for (let s = n - 1; s >= 0; s--) {
    const delta = Math.sqrt((2 * rho[s]!) / (omega * MU_0 * mur[s]!));
    attenuation += (radii[s]! - (s === 0 ? inner : radii[s - 1]!)) / delta;
    if (attenuation > DEEP && s > 0) return s;
  }
  return 0;
}

/** Start state of {@link layeredField}: ρH' (re, im) with |H| = 1, and the inward flux there. */
const state = new Float64Array(3);

/**
 * The field where the transfer through the shells starts, with H = 1: at the bore (uniform
 * field inside), at the axis (I₀ alone in shell 0, evaluated at its outer radius), or at the
 * inner radius of shell `first` as in a solid of its material (the shells inside left out).
 * Writes ρH' into out[0], out[1] and the inward power flux there into out[2], fills the ratios
 * and powers that the start fixes, and returns the first shell to cross.
 */
function startState(
  omega: number,
  inner: number,
  radii: ArrayLike<number>,
  rho: ArrayLike<number>,
  mur: ArrayLike<number>,
  first: number,
  ratios: Float64Array,
  powers: Float64Array,
  out: Float64Array,
): number {
  if (first === 0 && inner > 0) {
    out[0] = 0;
    out[1] = 0.5 * omega * MU_0 * inner;
    out[2] = 0;
    ratios[0] = 0;
    return 0;
  }
  // solid start: H = I0(kr), ρH' = ρk I1(kr) in shell `first`, at its outer radius (axis start,
  // first = 0) or at its inner radius (deep start, the shells inside left out)
  const delta = Math.sqrt((2 * rho[first]!) / (omega * MU_0 * mur[first]!));
  const at = first === 0 ? radii[0]! : radii[first - 1]!;
  const u = at / delta;
  const ratio = besselI1OverI0Complex({ re: u, im: u });
  const rk = rho[first]! / delta; // ρk = (ρ/δ)(1 + j)
  const gr = rk * (ratio.re - ratio.im);
  out[0] = gr;
  out[1] = rk * (ratio.re + ratio.im);
  if (first === 0) {
    const i0 = besselI0ComplexScaled({ re: u, im: u });
    // |I0(z)| = |Ĩ0| e^u: the axis field relative to the boundary is 1/|I0|
    ratios[0] = -(Math.log(Math.hypot(i0.re, i0.im)) + u);
    ratios[1] = 0;
    powers[0] = 2 * Math.PI * radii[0]! * gr; // Re(G H*) with H = 1
    out[2] = 0;
    return 1;
  }
  for (let b = 0; b < first; b++) ratios[b] = -Infinity;
  for (let s = 0; s < first - 1; s++) powers[s] = 0;
  ratios[first] = 0;
  const startFlux = 2 * Math.PI * at * gr;
  powers[first - 1] = startFlux; // the (negligible) power flowing further in
  out[2] = startFlux;
  return first;
}

/**
 * Turns the log-amplitudes in `ratios` into amplitude ratios to the surface (log-amplitude
 * `top`) and the boundary fluxes in `powers` into the power absorbed by each shell, per (A/m)²
 * of surface field.
 */
function scaleToSurface(top: number, first: number, startFlux: number, ratios: Float64Array, powers: Float64Array): void {
  const n = powers.length;
  for (let b = 0; b <= n; b++) ratios[b] = Math.exp(ratios[b]! - top);
  let previousFlux = 0;
  for (let s = 0; s < n; s++) {
    const a = ratios[s + 1]!;
    const flux = s + 1 < first ? 0 : s + 1 === first ? startFlux * ratios[first]! * ratios[first]! : powers[s]! * a * a;
    powers[s] = flux - previousFlux;
    previousFlux = flux;
  }
}

/** Re(a·b·e) for complex a = (ar, ai), b = (br, bi), e = (er, ei). */
function mul3r(ar: number, ai: number, br: number, bi: number, er: number, ei: number): number {
  const pr = ar * br - ai * bi;
  const pi = ar * bi + ai * br;
  return pr * er - pi * ei;
}

/** Im(a·b·e) for complex a = (ar, ai), b = (br, bi), e = (er, ei). */
function mul3i(ar: number, ai: number, br: number, bi: number, er: number, ei: number): number {
  const pr = ar * br - ai * bi;
  const pi = ar * bi + ai * br;
  return pr * ei + pi * er;
}
