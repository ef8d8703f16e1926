/**
 * Frequency splitting (bifurcation of the zero-phase frequencies) of LCC-compensated links.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireNonNegative, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import { polynomialCombination, polynomialProduct, polynomialRealRoots, polynomialRootBound, polynomialTrim } from "../special/internal.js";

/**
 * Options of {@link lccSplitting}.
 *
 * @category Inductive links
 */
export interface LccSplittingOptions {
  /** `"lcc-series"` (LCC primary, series secondary) or `"double-lcc"` (LCC on both sides). */
  readonly compensation: "lcc-series" | "double-lcc";
  /** Primary coil inductance L₁ [H], > 0. */
  readonly primaryInductance: number;
  /** Secondary coil inductance L₂ [H], > 0. */
  readonly secondaryInductance: number;
  /** Mutual inductance M [H], 0 < M < √(L₁L₂). */
  readonly mutualInductance: number;
  /** Primary filter inductor L_f1 [H], 0 < L_f1 < L₁. */
  readonly primaryFilterInductance: number;
  /** Secondary filter inductor L_f2 [H], 0 < L_f2 < L₂; required for "double-lcc", absent otherwise. */
  readonly secondaryFilterInductance?: number;
  /** Primary coil resistance R₁ [Ω], ≥ 0. */
  readonly primaryResistance: number;
  /** Secondary coil resistance R₂ [Ω], ≥ 0. */
  readonly secondaryResistance: number;
  /** Load resistance R_L [Ω], > 0. */
  readonly loadResistance: number;
  /** Frequency every capacitor is tuned to, f₀ [Hz], > 0. */
  readonly resonantFrequency: number;
}

/**
 * The result of {@link lccSplitting}.
 *
 * @category Inductive links
 */
export interface LccSplitting {
  /** Coupling coefficient k = M/√(L₁L₂). */
  readonly couplingCoefficient: number;
  /**
   * The smallest coupling at which the input phase gains zero crossings beyond those of the
   * weakly coupled link (a pair is born at a double root); 1 when none is born below k = 1.
   */
  readonly criticalCoupling: number;
  /** True when k > criticalCoupling. */
  readonly split: boolean;
  /** The number of zero-phase frequencies as k → 0 (3 for the default tuning: f₀ and the two resonances of the primary network). */
  readonly weakCouplingCount: number;
  /** All frequencies where the input impedance is real [Hz], ascending (f₀ among them). */
  readonly zeroPhaseFrequencies: readonly number[];
}

const KEYS = [
  "compensation", "primaryInductance", "secondaryInductance", "mutualInductance", "primaryFilterInductance",
  "secondaryFilterInductance", "primaryResistance", "secondaryResistance", "loadResistance", "resonantFrequency",
] as const;

/** A rational function n(s)/d(s), ascending real coefficients, s = jω/ω₀. */
interface Rational {
  n: number[];
  d: number[];
}

function sum(a: Rational, b: Rational): Rational {
  return { n: polynomialCombination(1, polynomialProduct(a.n, b.d), 1, polynomialProduct(b.n, a.d)), d: polynomialProduct(a.d, b.d) };
}

function parallel(a: Rational, b: Rational): Rational {
  return { n: polynomialProduct(a.n, b.n), d: polynomialCombination(1, polynomialProduct(a.n, b.d), 1, polynomialProduct(b.n, a.d)) };
}

/** R + ℓ s + X/s as one rational (reactances at ω₀ in Ω). */
function seriesBranch(r: number, l: number, x: number): Rational {
  return { n: [x, r, l], d: [0, 1] };
}

/**
 * The numerator P(x), x = (ω/ω₀)², of Im Z_in(jω)·|D(jω)|²/ω for the default-tuned network
 * (its positive roots are the zero-phase frequencies).
 */
function phasePolynomial(
  lcc2: boolean, l1: number, l2: number, m: number, lf1: number, lf2: number, r1: number, r2: number, rl: number,
): number[] {
  // reactances at ω₀ (the ω₀ factor cancels: pass ℓ = L·ω₀ as L·1 with s normalised is the same up to scale)
  let z2: Rational;
  if (lcc2) {
    z2 = sum(seriesBranch(r2, l2, l2 - lf2), parallel({ n: [lf2], d: [0, 1] }, { n: [rl, lf2], d: [1] }));
  } else {
    z2 = seriesBranch(r2 + rl, l2, l2);
  }
  // reflected −(s m)²/Z₂
  const reflected: Rational = { n: polynomialProduct([0, 0, -m * m], z2.d), d: z2.n };
  const zb = sum(seriesBranch(r1, l1, l1 - lf1), reflected);
  const zin = sum({ n: [0, lf1], d: [1] }, parallel({ n: [lf1], d: [0, 1] }, zb));
  // N(jw) = Ne(x) + j w No(x), x = w², with s^(2p) → (−x)^p, s^(2p+1) → j w (−x)^p
  const split = (p: number[]): [number[], number[]] => {
    const even: number[] = [];
    const odd: number[] = [];
    for (let i = 0; i < p.length; i++) {
      const sign = Math.floor(i / 2) % 2 === 0 ? 1 : -1;
      if (i % 2 === 0) even[i / 2] = sign * (p[i] ?? 0);
      else odd[(i - 1) / 2] = sign * (p[i] ?? 0);
    }
    return [even, odd];
  };
  const [ne, no] = split(zin.n);
  const [de, dOdd] = split(zin.d);
  return polynomialCombination(1, polynomialProduct(no, de), -1, polynomialProduct(ne, dOdd));
}

/** Positive roots x of P (x = (f/f₀)²), trailing round-off coefficients and factors of x removed. */
function positiveRoots(p: number[]): number[] {
  let q = polynomialTrim(p, 1e-14);
  let lead = 0;
  let big = 0;
  for (const c of q) big = Math.max(big, Math.abs(c));
  while (lead < q.length - 1 && Math.abs(q[lead] ?? 0) <= 1e-14 * big) lead++;
  q = q.slice(lead);
  return polynomialRealRoots(q, 0, polynomialRootBound(q));
}

/**
 * Frequency splitting of an LCC-compensated link (`"lcc-series"` or `"double-lcc"`, every
 * capacitor tuned to $f_0$ as {@link inductiveLink} tunes them: $C_{f} = 1/(\omega_0^2L_f)$,
 * $C = 1/(\omega_0^2(L - L_f))$, a series secondary $C_2 = 1/(\omega_0^2L_2)$). With this tuning
 * the input impedance is real at $f_0$ for every coupling; the primary LCC network adds two
 * more zero-phase frequencies of its own (its series resonances, below and above $f_0$), so
 * a weakly coupled link has three. As the coupling rises a new pair of zero-phase frequencies
 * is born where the input reactance touches zero (a double root) — the bifurcation that makes
 * the input phase, and with it a phase-locked or zero-phase-tracking drive, jump between
 * branches.
 *
 * Method: the input impedance is a rational function of $s = j\omega/\omega_0$ with real
 * coefficients, $Z_\mathrm{in} = N(s)/D(s)$, built exactly from the network
 * ($Z_\mathrm{in} = j\omega L_{f1} + \frac{1}{j\omega C_{f1}} \parallel \left(R_1 + j\omega L_1 + \frac{1}{j\omega C_1} + \frac{\omega^2M^2}{Z_2}\right)$);
 * with $N = N_e(x) + j\omega N_o(x)$, $x = (\omega/\omega_0)^2$, the zero-phase frequencies are
 * the positive roots of the polynomial
 * $$ P(x) = N_o(x)D_e(x) - N_e(x)D_o(x) $$
 * (degree 5 for LCC–series, 8 for double LCC), all found by derivative-root isolation and
 * Brent's method. The critical coupling is the smallest $k$ at which the number of positive
 * roots exceeds its weak-coupling value: found by a scan of 400 couplings over (0, 1) and
 * bisection on the root count to the last bit.
 *
 * @param options - {@link LccSplittingOptions} (H, Ω, Hz)
 * @returns the {@link LccSplitting}
 * @throws {@link InputError} for a non-finite or out-of-range value, M ≥ √(L₁L₂), a filter
 *   inductance not below its coil's, a secondary filter inductance given for "lcc-series" or
 *   missing for "double-lcc", or an unknown key
 * @remarks Exact to rounding (roots of the exact polynomial). Checked against an independent
 * mpmath computation (fixture test/fixtures/links/lcc-splitting.json: zero-phase frequencies by
 * a dense scan of the directly evaluated input reactance at 30 digits and root refinement; the
 * critical coupling by solving for the tangency Im Z = ∂Im Z/∂ω = 0): ≤ 1e-9 relative for the
 * frequencies and the critical coupling. A birth and death of a pair between two scanned
 * couplings (closer than 1/400) would be missed by the scan. Validity: ideal lumped
 * components, the default tuning, a sinusoidal source.
 * @see S. Li, W. Li, J. Deng, T. D. Nguyen, C. C. Mi, "A double-sided LCC compensation network
 *   and its tuning method for wireless power transfer", IEEE Trans. Veh. Technol. 64(6),
 *   2261–2273 (2015) (the tuning, input impedance real at f₀; from memory); C.-S. Wang,
 *   G. A. Covic, O. H. Stielau, IEEE Trans. Ind. Electron. 51(1), 148–157 (2004) (bifurcation of
 *   the zero-phase frequencies; from memory).
 * @example
 * ```ts
 * import { lccSplitting } from "fluxwright";
 * const s = lccSplitting({
 *   compensation: "lcc-series", primaryInductance: 60e-6, secondaryInductance: 40e-6,
 *   mutualInductance: 0.3 * Math.sqrt(60e-6 * 40e-6), primaryFilterInductance: 10e-6,
 *   primaryResistance: 0.05, secondaryResistance: 0.05, loadResistance: 5, resonantFrequency: 100e3,
 * });
 * console.log(s.split); // true
 * console.log(s.criticalCoupling.toFixed(4)); // 0.1819
 * console.log(s.zeroPhaseFrequencies.map((f) => Math.round(f))); // [ 74985, 89937, 100000, 120681, 123258 ]
 * ```
 * @category Inductive links
 */
export function lccSplitting(options: LccSplittingOptions): LccSplitting {
  const where = "lccSplitting";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, KEYS);
  const compensation = requireOneOf(where, "compensation", options.compensation, ["lcc-series", "double-lcc"] as const);
  const l1 = requirePositive(where, "primaryInductance", options.primaryInductance, "H");
  const l2 = requirePositive(where, "secondaryInductance", options.secondaryInductance, "H");
  const m = requirePositive(where, "mutualInductance", options.mutualInductance, "H");
  if (!(m < Math.sqrt(l1 * l2))) throw new InputError(where, "mutualInductance", m, "H", `less than √(L₁L₂) = ${Math.sqrt(l1 * l2)}`);
  const lf1 = requirePositive(where, "primaryFilterInductance", options.primaryFilterInductance, "H");
  if (!(lf1 < l1)) throw new InputError(where, "primaryFilterInductance", lf1, "H", `less than primaryInductance (${l1})`);
  const lcc2 = compensation === "double-lcc";
  let lf2 = 0;
  if (lcc2) {
    lf2 = requirePositive(where, "secondaryFilterInductance", options.secondaryFilterInductance, "H");
    if (!(lf2 < l2)) throw new InputError(where, "secondaryFilterInductance", lf2, "H", `less than secondaryInductance (${l2})`);
  } else if (options.secondaryFilterInductance !== undefined) {
    throw new InputError(where, "secondaryFilterInductance", options.secondaryFilterInductance, "H", "absent (only double-LCC compensation has a secondary filter inductor)");
  }
  const r1 = requireNonNegative(where, "primaryResistance", options.primaryResistance, "Ω");
  const r2 = requireNonNegative(where, "secondaryResistance", options.secondaryResistance, "Ω");
  const rl = requirePositive(where, "loadResistance", options.loadResistance, "Ω");
  const f0 = requirePositive(where, "resonantFrequency", options.resonantFrequency, "Hz");

  // reactances at ω₀ [Ω]; the polynomial is in x = (ω/ω₀)²
  const w0 = 2 * Math.PI * f0;
  const k = m / Math.sqrt(l1 * l2);
  const mutualAt = (kk: number): number => kk * w0 * Math.sqrt(l1 * l2);
  const rootsAt = (kk: number): number[] => positiveRoots(phasePolynomial(lcc2, w0 * l1, w0 * l2, mutualAt(kk), w0 * lf1, w0 * lf2, r1, r2, rl));
  const weakCouplingCount = rootsAt(1e-6).length;
  let criticalCoupling = 1;
  const steps = 400;
  let previous = 1e-6;
  for (let i = 1; i < steps; i++) {
    const kk = i / steps;
    if (rootsAt(kk).length > weakCouplingCount) {
      let lo = previous;
      let hi = kk;
      for (let it = 0; it < 200 && hi - lo > 2 * Number.EPSILON * hi; it++) {
        const mid = 0.5 * (lo + hi);
        if (rootsAt(mid).length > weakCouplingCount) hi = mid;
        else lo = mid;
      }
      criticalCoupling = 0.5 * (lo + hi);
      break;
    }
    previous = kk;
  }
  const zeroPhaseFrequencies = rootsAt(k).map((x) => f0 * Math.sqrt(x));
  return { couplingCoefficient: k, criticalCoupling, split: k > criticalCoupling, weakCouplingCount, zeroPhaseFrequencies };
}
