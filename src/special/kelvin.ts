/**
 * Kelvin functions ber, bei, ker, kei of order zero and their first derivatives.
 *
 * Size: one tight family — a shared evaluator (series, mid-range and asymptotic regions) and
 * ten thin public entries, each with its own TSDoc and example, which is most of the length.
 *
 * @packageDocumentation
 */
import { besselIKScaled } from "./bessel-core.js";
import { KELVIN_NODES, KELVIN_NODE_COUNT, KELVIN_NODE_FIRST, KELVIN_NODE_STEP } from "./kelvin-nodes.js";

/**
 * The eight Kelvin functions of order zero at one argument x: the values and first
 * derivatives of ber, bei, ker and kei.
 *
 * @category Kelvin functions
 */
export interface KelvinFunctions {
  /** ber x (or e^{−x/√2}·ber x in the scaled form). */
  ber: number;
  /** bei x (or e^{−x/√2}·bei x in the scaled form). */
  bei: number;
  /** ker x (or e^{+x/√2}·ker x in the scaled form). */
  ker: number;
  /** kei x (or e^{+x/√2}·kei x in the scaled form). */
  kei: number;
  /** ber′ x = d ber/dx (or e^{−x/√2}·ber′ x in the scaled form). */
  berPrime: number;
  /** bei′ x = d bei/dx (or e^{−x/√2}·bei′ x in the scaled form). */
  beiPrime: number;
  /** ker′ x = d ker/dx (or e^{+x/√2}·ker′ x in the scaled form). */
  kerPrime: number;
  /** kei′ x = d kei/dx (or e^{+x/√2}·kei′ x in the scaled form). */
  keiPrime: number;
}

const SQRT1_2_HI = 0.7071067811865476;
/** 1/√2 − SQRT1_2_HI, from mpmath. */
const SQRT1_2_LO = -4.833646656726457e-17;
/** Veltkamp splitter 2^27 + 1. */
const SPLIT = 134217729;

/** The node-table (Taylor) method covers MID_LOW < x < MID_HIGH. */
const MID_LOW = 1.5;
const MID_HIGH = 19;

/**
 * Mid range 1.5 < x < 19, where neither the power series nor the asymptotic expansion
 * reaches double precision: Taylor expansion about the nearest node x_j of a table of exact
 * values (|x − x_j| ≤ 0.25), with the coefficients generated from the Kelvin equation
 * x W″ + W′ − i x W = 0 (W = ber + i·bei or ker + i·kei, DLMF 10.61.4 with ν = 0):
 * c_{n+2} = [i(x_j c_n + c_{n−1}) − (n+1)² c_{n+1}] / (x_j (n+1)(n+2)).
 * Real arithmetic along the real axis; x − x_j is exact, so no phase error enters.
 */
function kelvinMidRange(x: number, scaled: boolean): KelvinFunctions {
  let j = Math.round((x - KELVIN_NODE_FIRST) / KELVIN_NODE_STEP);
  if (j < 0) j = 0;
  else if (j > KELVIN_NODE_COUNT - 1) j = KELVIN_NODE_COUNT - 1;
  const xj = KELVIN_NODE_FIRST + j * KELVIN_NODE_STEP;
  const s = x - xj;
  const o = 8 * j;
  // I-type (ber + i bei) and K-type (ker + i kei) series, advanced together.
  let ia0r = KELVIN_NODES[o]!; // c_{n}
  let ia0i = KELVIN_NODES[o + 1]!;
  let ia1r = KELVIN_NODES[o + 2]!; // c_{n+1}
  let ia1i = KELVIN_NODES[o + 3]!;
  let ka0r = KELVIN_NODES[o + 4]!;
  let ka0i = KELVIN_NODES[o + 5]!;
  let ka1r = KELVIN_NODES[o + 6]!;
  let ka1i = KELVIN_NODES[o + 7]!;
  let imr = 0; // c_{n−1}
  let imi = 0;
  let kmr = 0;
  let kmi = 0;
  // value = Σ c_n s^n, derivative = Σ n c_n s^{n−1}
  let ivr = ia0r + ia1r * s;
  let ivi = ia0i + ia1i * s;
  let idr = ia1r;
  let idi = ia1i;
  let kvr = ka0r + ka1r * s;
  let kvi = ka0i + ka1i * s;
  let kdr = ka1r;
  let kdi = ka1i;
  const scaleI = Math.abs(ia0r) + Math.abs(ia0i) + Math.abs(ia1r) + Math.abs(ia1i);
  const scaleK = Math.abs(ka0r) + Math.abs(ka0i) + Math.abs(ka1r) + Math.abs(ka1i);
  const invXj = 1 / xj;
  let sp = s; // s^{n+1}
  for (let n = 0; n < 60; n++) {
    const f = invXj / ((n + 1) * (n + 2));
    const n1sq = (n + 1) * (n + 1);
    // c_{n+2} = [i(x_j c_n + c_{n−1}) − (n+1)² c_{n+1}] / (x_j (n+1)(n+2))
    const ipr = xj * ia0r + imr;
    const ipi = xj * ia0i + imi;
    const inr = (-ipi - n1sq * ia1r) * f;
    const ini = (ipr - n1sq * ia1i) * f;
    const kpr = xj * ka0r + kmr;
    const kpi = xj * ka0i + kmi;
    const knr = (-kpi - n1sq * ka1r) * f;
    const kni = (kpr - n1sq * ka1i) * f;
    imr = ia0r;
    imi = ia0i;
    ia0r = ia1r;
    ia0i = ia1i;
    ia1r = inr;
    ia1i = ini;
    kmr = ka0r;
    kmi = ka0i;
    ka0r = ka1r;
    ka0i = ka1i;
    ka1r = knr;
    ka1i = kni;
    // derivative term (n+2) c_{n+2} s^{n+1}, value term c_{n+2} s^{n+2}
    const m = n + 2;
    idr += m * inr * sp;
    idi += m * ini * sp;
    kdr += m * knr * sp;
    kdi += m * kni * sp;
    sp *= s;
    const tir = inr * sp;
    const tii = ini * sp;
    const tkr = knr * sp;
    const tki = kni * sp;
    ivr += tir;
    ivi += tii;
    kvr += tkr;
    kvi += tki;
    if (
      m * (Math.abs(inr) + Math.abs(ini)) * Math.abs(sp) < 1e-17 * scaleI &&
      m * (Math.abs(knr) + Math.abs(kni)) * Math.abs(sp) < 1e-17 * scaleK
    ) {
      break;
    }
  }
  // The node values carry e^{∓x_j/√2}; convert to the scaling at x (or remove it).
  let fi: number;
  let fk: number;
  if (scaled) {
    fi = Math.exp(-s * SQRT1_2_HI);
    fk = 1 / fi;
  } else {
    fk = Math.exp(-xj * SQRT1_2_HI);
    fi = 1 / fk;
  }
  return {
    ber: fi * ivr,
    bei: fi * ivi,
    ker: fk * kvr,
    kei: fk * kvi,
    berPrime: fi * idr,
    beiPrime: fi * idi,
    kerPrime: fk * kdr,
    keiPrime: fk * kdi,
  };
}

/**
 * Evaluates all eight functions. With z = x·e^{iπ/4} = (x/√2)(1 + i):
 * ber + i·bei = I₀(z), ker + i·kei = K₀(z), ber′ + i·bei′ = e^{iπ/4} I₁(z),
 * ker′ + i·kei′ = −e^{iπ/4} K₁(z). x/√2 is formed in double-double (a + lo); the Bessel
 * engine runs at the exactly representable z₀ = a(1 + i) and a first-order Taylor step
 * carries the result to z₀ + lo(1 + i), so the phase x/√2 is exact to ~1e-32 even at
 * x = 1000, where a one-ulp phase error alone would cost 1e-13.
 */
function kelvinEvaluate(x: number, scaled: boolean): KelvinFunctions {
  if (x === 0) {
    return {
      ber: 1,
      bei: 0,
      ker: Infinity,
      kei: -Math.PI / 4,
      berPrime: 0,
      beiPrime: 0,
      kerPrime: -Infinity,
      keiPrime: 0,
    };
  }
  if (!(x > 0)) {
    return { ber: NaN, bei: NaN, ker: NaN, kei: NaN, berPrime: NaN, beiPrime: NaN, kerPrime: NaN, keiPrime: NaN };
  }
  if (x > MID_LOW && x < MID_HIGH) return kelvinMidRange(x, scaled);
  // a + lo = x/√2 exactly to ~2^-106 relative (Dekker two-product of x and SQRT1_2_HI).
  const a = x * SQRT1_2_HI;
  let lo: number;
  if (x < 1e150) {
    const cx = SPLIT * x;
    const xh = cx - (cx - x);
    const xl = x - xh;
    const cs = SPLIT * SQRT1_2_HI;
    const sh = cs - (cs - SQRT1_2_HI);
    const sl = SQRT1_2_HI - sh;
    lo = xh * sh - a + xh * sl + xl * sh + xl * sl + x * SQRT1_2_LO;
  } else {
    lo = x * SQRT1_2_LO;
  }
  // Below a = 1 the rounding of x/√2 moves the result by < 2e-16 relative: no correction.
  if (a < 1) lo = 0;
  const o = besselIKScaled(a, a, true);
  // Carry the result from z₀ to z = z₀ + δ, δ = lo(1 + i): I-type functions gain the factor
  // e^{δ}, K-type ones e^{−δ}, up to a relative O(δ/z) ≲ 1e-16 (their exponential behaviour;
  // DLMF 10.40). The moduli e^{±lo} cancel in the scaled forms, leaving rotations by ±lo.
  const cl = lo === 0 ? 1 : Math.cos(lo);
  const sl = lo === 0 ? 0 : Math.sin(lo);
  let i0r = o.i0r;
  let i0i = o.i0i;
  let i1r = o.i1r;
  let i1i = o.i1i;
  // K at z0, e^{a}-scaled: e^{−ia}·(e^{z0}K)
  const c = Math.cos(a);
  const s = Math.sin(a);
  let k0r = c * o.k0r + s * o.k0i;
  let k0i = c * o.k0i - s * o.k0r;
  let k1r = c * o.k1r + s * o.k1i;
  let k1i = c * o.k1i - s * o.k1r;
  if (lo !== 0) {
    let t = cl * i0r - sl * i0i;
    i0i = cl * i0i + sl * i0r;
    i0r = t;
    t = cl * i1r - sl * i1i;
    i1i = cl * i1i + sl * i1r;
    i1r = t;
    t = cl * k0r + sl * k0i;
    k0i = cl * k0i - sl * k0r;
    k0r = t;
    t = cl * k1r + sl * k1i;
    k1i = cl * k1i - sl * k1r;
    k1r = t;
  }
  // Scale factors: the scaled forms are complete; the plain ones restore e^{±(a + lo)}.
  let fi = 1;
  let fk = 1;
  if (!scaled) {
    if (a > 710) {
      // beyond overflow of e^{x/√2}: ber-type ±∞, ker-type 0 (use the scaled forms there)
      fi = Infinity;
      fk = 0;
    } else {
      const ea = Math.exp(a) * Math.exp(lo);
      fi = ea;
      fk = Number.isFinite(ea) ? 1 / ea : Math.exp(-a) * Math.exp(-lo);
    }
  }
  // e^{iπ/4} = (1 + i)/√2
  return {
    ber: fi * i0r,
    bei: fi * i0i,
    ker: fk * k0r,
    kei: fk * k0i,
    berPrime: fi * SQRT1_2_HI * (i1r - i1i),
    beiPrime: fi * SQRT1_2_HI * (i1r + i1i),
    kerPrime: -fk * SQRT1_2_HI * (k1r - k1i),
    keiPrime: -fk * SQRT1_2_HI * (k1r + k1i),
  };
}

/**
 * All eight Kelvin functions of order zero at once: ber, bei, ker, kei and their first
 * derivatives, as needed together by skin- and proximity-effect formulas for round wires.
 *
 * $$
 * \mathrm{ber}\,x + i\,\mathrm{bei}\,x = I_0\!\left(x e^{i\pi/4}\right), \qquad
 * \mathrm{ker}\,x + i\,\mathrm{kei}\,x = K_0\!\left(x e^{i\pi/4}\right)
 * $$
 * $$
 * \mathrm{ber}'x + i\,\mathrm{bei}'x = e^{i\pi/4} I_1\!\left(x e^{i\pi/4}\right), \qquad
 * \mathrm{ker}'x + i\,\mathrm{kei}'x = -e^{i\pi/4} K_1\!\left(x e^{i\pi/4}\right)
 * $$
 *
 * Method: power series for x ≤ 1.5; on 1.5 < x < 19, where neither the series nor the
 * asymptotic expansion reaches double precision, a Taylor expansion about the nearest of 35
 * tabulated nodes (|x − x_j| ≤ 0.25; node values from mpmath, coefficients from the Kelvin
 * differential equation); Hankel asymptotic expansions with both exponentials for x ≥ 19,
 * with the phase x/√2 in double-double.
 *
 * Domain: x ≥ 0 (NaN for negative or NaN x). At x = 0: ber = 1, bei = 0, ker = +∞,
 * kei = −π/4, ker′ = −∞, others 0. ber, bei and their derivatives overflow to ±∞ beyond
 * x ≈ 1003 and ker, kei underflow towards 0 (subnormal from x ≈ 1000): use
 * {@link kelvinFunctionsScaled} there.
 *
 * Accuracy on 0 < x ≤ 1000, vs mpmath (fixture test/fixtures/special/kelvin.json, log sweep
 * plus dense grids across x = 1.5 and x = 19): error ≤ 5e-15 relative to the modulus of the
 * pair, i.e. |Δber| ≤ 5e-15·|ber + i·bei| (and likewise for bei, for ker/kei and for each
 * derivative pair). Away from their zeros this is the relative error of each function;
 * near a zero it is an absolute error on the envelope.
 *
 * @param x - argument x ≥ 0 [dimensionless]; for a round wire x = √2·r/δ
 * @returns {@link KelvinFunctions} (all dimensionless)
 * @see F. W. J. Olver et al., NIST Digital Library of Mathematical Functions, §10.61 (definitions), 10.40 (asymptotics)
 * @see I. J. Thompson & A. R. Barnett, "Modified Bessel functions I_ν(z) and K_ν(z) of real order and complex argument", Comput. Phys. Commun. 47:245–257 (1987)
 * @example
 * ```ts
 * import { kelvinFunctions } from "fluxwright";
 * const k = kelvinFunctions(1);
 * console.log(k.ber); // ≈ 0.98438178
 * console.log(k.bei); // ≈ 0.24956604
 * ```
 * @category Kelvin functions
 */
export function kelvinFunctions(x: number): KelvinFunctions {
  return kelvinEvaluate(x, false);
}

/**
 * The eight Kelvin functions in exponentially scaled form, finite for every x > 0
 * (tested to x = 1e6): ber, bei, ber′, bei′ multiplied by $e^{-x/\sqrt2}$, and ker, kei,
 * ker′, kei′ multiplied by $e^{+x/\sqrt2}$.
 *
 * $$
 * \widetilde{\mathrm{ber}}\,x = e^{-x/\sqrt2}\,\mathrm{ber}\,x, \qquad
 * \widetilde{\mathrm{ker}}\,x = e^{x/\sqrt2}\,\mathrm{ker}\,x, \ \dots
 * $$
 *
 * Ratios such as ber′/ber or (ber·bei′ − bei·ber′)/(ber′² + bei′²) of the skin-effect
 * formulas can be formed from the scaled values directly.
 *
 * Domain: x ≥ 0, as {@link kelvinFunctions}. Accuracy: ≤ 5e-15 relative to the modulus of
 * each pair vs mpmath on 0 < x ≤ 1e4 (fixture test/fixtures/special/kelvin.json).
 *
 * @param x - argument x ≥ 0 [dimensionless]
 * @returns {@link KelvinFunctions} holding the scaled values
 * @see NIST DLMF §10.61, §10.67 (asymptotic forms showing the e^{±x/√2} growth)
 * @example
 * ```ts
 * import { kelvinFunctionsScaled } from "fluxwright";
 * const k = kelvinFunctionsScaled(5000);
 * console.log(Number.isFinite(k.ber) && Number.isFinite(k.ker)); // true
 * ```
 * @category Kelvin functions
 */
export function kelvinFunctionsScaled(x: number): KelvinFunctions {
  return kelvinEvaluate(x, true);
}

/**
 * Kelvin function ber x, the real part of $I_0(x e^{i\pi/4}) = J_0(x e^{3i\pi/4})$.
 *
 * $$
 * \mathrm{ber}\,x = \sum_{k=0}^\infty \frac{(-1)^k (x/2)^{4k}}{((2k)!)^2}
 * $$
 *
 * Domain x ≥ 0 (NaN otherwise); finite up to x ≈ 1003. Accuracy ≤ 5e-15 relative to
 * |ber + i·bei| vs mpmath on 0 ≤ x ≤ 1000. Calls {@link kelvinFunctions}; use that when more
 * than one function is needed.
 *
 * @param x - argument x ≥ 0 [dimensionless]
 * @returns ber x [dimensionless]
 * @see NIST DLMF 10.61.1, 10.65.1; A&S 9.9.10
 * @example
 * ```ts
 * import { kelvinBer } from "fluxwright";
 * console.log(kelvinBer(2)); // ≈ 0.7517341827
 * ```
 * @category Kelvin functions
 */
export function kelvinBer(x: number): number {
  return kelvinEvaluate(x, false).ber;
}

/**
 * Kelvin function bei x, the imaginary part of $I_0(x e^{i\pi/4})$.
 *
 * $$
 * \mathrm{bei}\,x = \sum_{k=0}^\infty \frac{(-1)^k (x/2)^{4k+2}}{((2k+1)!)^2}
 * $$
 *
 * Domain x ≥ 0; accuracy ≤ 5e-15 relative to |ber + i·bei| vs mpmath on 0 ≤ x ≤ 1000.
 *
 * @param x - argument x ≥ 0 [dimensionless]
 * @returns bei x [dimensionless]
 * @see NIST DLMF 10.61.1, 10.65.1; A&S 9.9.10
 * @example
 * ```ts
 * import { kelvinBei } from "fluxwright";
 * console.log(kelvinBei(2)); // ≈ 0.9722916273
 * ```
 * @category Kelvin functions
 */
export function kelvinBei(x: number): number {
  return kelvinEvaluate(x, false).bei;
}

/**
 * Kelvin function ker x, the real part of $K_0(x e^{i\pi/4})$.
 *
 * $$
 * \mathrm{ker}\,x + i\,\mathrm{kei}\,x = K_0\!\left(x e^{i\pi/4}\right)
 * $$
 *
 * Domain x ≥ 0, ker 0 = +∞. Accuracy ≤ 5e-15 relative to |ker + i·kei| vs mpmath on
 * 0 < x ≤ 1000 (beyond x ≈ 1000 the value is subnormal; use {@link kelvinFunctionsScaled}).
 *
 * @param x - argument x ≥ 0 [dimensionless]
 * @returns ker x [dimensionless]
 * @see NIST DLMF 10.61.2; A&S 9.9.12
 * @example
 * ```ts
 * import { kelvinKer } from "fluxwright";
 * console.log(kelvinKer(1)); // ≈ 0.2867062087
 * ```
 * @category Kelvin functions
 */
export function kelvinKer(x: number): number {
  return kelvinEvaluate(x, false).ker;
}

/**
 * Kelvin function kei x, the imaginary part of $K_0(x e^{i\pi/4})$.
 *
 * $$
 * \mathrm{ker}\,x + i\,\mathrm{kei}\,x = K_0\!\left(x e^{i\pi/4}\right)
 * $$
 *
 * Domain x ≥ 0, kei 0 = −π/4. Accuracy ≤ 5e-15 relative to |ker + i·kei| vs mpmath on
 * 0 < x ≤ 1000.
 *
 * @param x - argument x ≥ 0 [dimensionless]
 * @returns kei x [dimensionless]
 * @see NIST DLMF 10.61.2; A&S 9.9.12
 * @example
 * ```ts
 * import { kelvinKei } from "fluxwright";
 * console.log(kelvinKei(1)); // ≈ -0.4949946365
 * ```
 * @category Kelvin functions
 */
export function kelvinKei(x: number): number {
  return kelvinEvaluate(x, false).kei;
}

/**
 * Derivative ber′ x = d(ber x)/dx, the real part of $e^{i\pi/4} I_1(x e^{i\pi/4})$.
 *
 * $$
 * \mathrm{ber}'x + i\,\mathrm{bei}'x = e^{i\pi/4} I_1\!\left(x e^{i\pi/4}\right)
 * $$
 *
 * Domain x ≥ 0; accuracy ≤ 5e-15 relative to |ber′ + i·bei′| vs mpmath on 0 ≤ x ≤ 1000.
 *
 * @param x - argument x ≥ 0 [dimensionless]
 * @returns ber′ x [dimensionless]
 * @see NIST DLMF 10.61, 10.63; A&S 9.9.14
 * @example
 * ```ts
 * import { kelvinBerPrime } from "fluxwright";
 * console.log(kelvinBerPrime(1)); // ≈ -0.0624457522
 * ```
 * @category Kelvin functions
 */
export function kelvinBerPrime(x: number): number {
  return kelvinEvaluate(x, false).berPrime;
}

/**
 * Derivative bei′ x = d(bei x)/dx, the imaginary part of $e^{i\pi/4} I_1(x e^{i\pi/4})$.
 *
 * $$
 * \mathrm{ber}'x + i\,\mathrm{bei}'x = e^{i\pi/4} I_1\!\left(x e^{i\pi/4}\right)
 * $$
 *
 * Domain x ≥ 0; accuracy ≤ 5e-15 relative to |ber′ + i·bei′| vs mpmath on 0 ≤ x ≤ 1000.
 *
 * @param x - argument x ≥ 0 [dimensionless]
 * @returns bei′ x [dimensionless]
 * @see NIST DLMF 10.61, 10.63; A&S 9.9.14
 * @example
 * ```ts
 * import { kelvinBeiPrime } from "fluxwright";
 * console.log(kelvinBeiPrime(1)); // ≈ 0.4973965115
 * ```
 * @category Kelvin functions
 */
export function kelvinBeiPrime(x: number): number {
  return kelvinEvaluate(x, false).beiPrime;
}

/**
 * Derivative ker′ x = d(ker x)/dx, the real part of $-e^{i\pi/4} K_1(x e^{i\pi/4})$.
 *
 * $$
 * \mathrm{ker}'x + i\,\mathrm{kei}'x = -e^{i\pi/4} K_1\!\left(x e^{i\pi/4}\right)
 * $$
 *
 * Domain x ≥ 0, ker′ 0 = −∞; accuracy ≤ 5e-15 relative to |ker′ + i·kei′| vs mpmath on
 * 0 < x ≤ 1000.
 *
 * @param x - argument x ≥ 0 [dimensionless]
 * @returns ker′ x [dimensionless]
 * @see NIST DLMF 10.61, 10.63; A&S 9.9.14
 * @example
 * ```ts
 * import { kelvinKerPrime } from "fluxwright";
 * console.log(kelvinKerPrime(1)); // ≈ -0.6946038911
 * ```
 * @category Kelvin functions
 */
export function kelvinKerPrime(x: number): number {
  return kelvinEvaluate(x, false).kerPrime;
}

/**
 * Derivative kei′ x = d(kei x)/dx, the imaginary part of $-e^{i\pi/4} K_1(x e^{i\pi/4})$.
 *
 * $$
 * \mathrm{ker}'x + i\,\mathrm{kei}'x = -e^{i\pi/4} K_1\!\left(x e^{i\pi/4}\right)
 * $$
 *
 * Domain x ≥ 0, kei′ 0 = 0; accuracy ≤ 5e-15 relative to |ker′ + i·kei′| vs mpmath on
 * 0 < x ≤ 1000.
 *
 * @param x - argument x ≥ 0 [dimensionless]
 * @returns kei′ x [dimensionless]
 * @see NIST DLMF 10.61, 10.63; A&S 9.9.14
 * @example
 * ```ts
 * import { kelvinKeiPrime } from "fluxwright";
 * console.log(kelvinKeiPrime(1)); // ≈ 0.3523699133
 * ```
 * @category Kelvin functions
 */
export function kelvinKeiPrime(x: number): number {
  return kelvinEvaluate(x, false).keiPrime;
}
