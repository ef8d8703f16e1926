/**
 * Sullivan's one-dimensional model of a litz-wire winding and the loss-minimising strand
 * count that follows from it.
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { MU_0 } from "../units/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const OPTIMAL_FIELDS: readonly string[] = Object.freeze(["strandDiameter", "turns", "windowBreadth", "frequency", "resistivity", "fieldFactor", "maxStrands"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LITZ_WINDING_FIELDS: readonly string[] = Object.freeze(["strands", "strandDiameter", "turns", "windowBreadth", "frequency", "resistivity", "fieldFactor"]);

/** Options of {@link litzWindingAcRatio}. @category Conductors */
export interface LitzWindingAcRatioOptions {
  /** Number of strands n in one litz conductor, an integer ≥ 1. */
  readonly strands: number;
  /** Diameter of the bare copper of one strand $d_s$ [m], finite and > 0. */
  readonly strandDiameter: number;
  /** Number of turns N in the winding portion (zero field to maximum field), an integer ≥ 1. */
  readonly turns: number;
  /** Breadth b of the winding window (along the field lines) [m], finite and > 0. */
  readonly windowBreadth: number;
  /** Frequency of the sinusoidal current [Hz], finite and > 0. */
  readonly frequency: number;
  /** Resistivity of the strand metal [Ω·m], finite and > 0. */
  readonly resistivity: number;
  /**
   * Field-shape factor k [-] of Sullivan's model, finite and > 0 (default 1: one winding
   * portion whose field rises linearly from zero to NI/b across the winding build). For a
   * trapezoidal field from $B_\mathrm{min}$ to $B_\mathrm{max}$ the mean square gives
   * $k = 1 + \gamma + \gamma^2$, $\gamma = B_\mathrm{min}/B_\mathrm{max}$.
   */
  readonly fieldFactor?: number;
}

/** Coefficient K of Fr = 1 + K n² d⁶, shared with {@link optimalLitzStrandCount}. */
function sullivanCoefficient(turns: number, breadth: number, frequency: number, resistivity: number, fieldFactor: number): number {
  const omega = 2 * Math.PI * frequency;
  const a = (Math.PI * omega * MU_0 * turns) / (resistivity * breadth);
  return (a * a * fieldFactor) / 768;
}

/**
 * AC-to-DC resistance ratio of a litz-wire winding in Sullivan's 1-D model: every strand
 * sits in the winding portion's field, which rises linearly from 0 to $NI/b$ across the
 * build, and loses eddy power in the low-frequency (d_s ≪ δ) limit:
 *
 * $$
 * F_R = 1 + \frac{\pi^2 \omega^2 \mu_0^2 N^2 n^2 d_s^6\, k}{768\, \rho^2 b^2}
 * $$
 *
 * (equivalently $1 + \pi^2 N^2 n^2 d_s^6 k / (192\, \delta^4 b^2)$). This is the mean-square
 * field $(NI/b)^2/3$ times the transverse-field eddy loss $\pi\sigma\omega^2 B^2 d_s^4/128$ per
 * strand over the DC loss; ideal twisting (every strand carries I/n, no bundle-level eddy
 * currents) and the strand-level skin effect (of order (d_s/δ)⁴/768, a small fraction of the
 * proximity term in any multi-strand winding) are part of the model's assumptions. For the
 * exact strand functions and the bundle-internal field use {@link litzAcRatio}.
 *
 * Hard domain (throws {@link InputError}): integers ≥ 1 for strands and turns, all other
 * inputs finite and > 0. Validity: d_s ≲ δ (against the exact round-wire function the
 * low-frequency proximity term is 0.7 % high at d_s = δ, 3.6 % at 1.5 δ and 11 % at 2 δ), a
 * one-dimensional window field, well-constructed litz.
 *
 * Accuracy: the closed form is evaluated to rounding (tests: 1e-14 relative); it equals the
 * low-frequency limit of {@link litzAcRatio} with a winding field to 1e-6 at d_s = 0.01 δ.
 *
 * @param options - {@link LitzWindingAcRatioOptions}
 * @returns $R_\mathrm{ac}/R_\mathrm{dc}$ of the winding [-], ≥ 1
 * @throws {@link InputError} on bad input
 * @see C. R. Sullivan, "Optimal choice for number of strands in a litz-wire transformer winding", IEEE Trans. Power Electron. 14(2), 283–291 (1999), §II and appendix (the Fr expression from the low-frequency loss of a cylinder in a uniform field and a trapezoidal field distribution; web version at dartmouth.edu/~sullivan/litzwire).
 * @example
 * ```ts
 * import { litzWindingAcRatio } from "fluxwright";
 * // 20 turns of 100 × 0.1 mm litz in a 20 mm window breadth at 100 kHz
 * const options = { strands: 100, strandDiameter: 0.1e-3, turns: 20, windowBreadth: 20e-3,
 *   frequency: 100e3, resistivity: 1.7241e-8 };
 * console.log(litzWindingAcRatio(options)); // ≈ 1.2695
 * ```
 * @category Conductors
 */
export function litzWindingAcRatio(options: LitzWindingAcRatioOptions): number {
  const where = "litzWindingAcRatio";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, LITZ_WINDING_FIELDS);
  const strands = requireInteger(where, "strands", options.strands, 1);
  const d = requirePositive(where, "strandDiameter", options.strandDiameter, "m");
  const turns = requireInteger(where, "turns", options.turns, 1);
  const breadth = requirePositive(where, "windowBreadth", options.windowBreadth, "m");
  const frequency = requirePositive(where, "frequency", options.frequency, "Hz");
  const resistivity = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const k = options.fieldFactor === undefined ? 1 : requirePositive(where, "fieldFactor", options.fieldFactor, "");
  const d3 = d * d * d;
  return 1 + sullivanCoefficient(turns, breadth, frequency, resistivity, k) * strands * strands * d3 * d3;
}

/** Densest packing of equal circles (hexagonal), π/(2√3): the most copper a bundle's square holds. */
const HEX_PACKING = Math.PI / (2 * Math.sqrt(3));

/** Options of {@link optimalLitzStrandCount}. @category Conductors */
export interface OptimalLitzStrandCountOptions {
  /** Diameter of the bare copper of one strand $d_s$ [m], finite and > 0 (the finest strand you accept). */
  readonly strandDiameter: number;
  /** Number of turns N in the winding portion, an integer ≥ 1. */
  readonly turns: number;
  /** Breadth b of the winding window [m], finite and > 0. */
  readonly windowBreadth: number;
  /** Frequency of the sinusoidal current [Hz], finite and > 0. */
  readonly frequency: number;
  /** Resistivity of the strand metal [Ω·m], finite and > 0. */
  readonly resistivity: number;
  /** Field-shape factor k, as in {@link litzWindingAcRatio} (default 1). */
  readonly fieldFactor?: number;
  /** Most strands that fit the window (an integer ≥ 1); default: no limit. */
  readonly maxStrands?: number;
}

/**
 * Strand count that minimises the winding's copper loss for a given strand diameter, after
 * Sullivan's 1-D model. With the strand size fixed, the winding loss is proportional to
 * $R_\mathrm{dc} F_R \propto (1 + K n^2 d_s^6)/n$ (K from {@link litzWindingAcRatio}), which is
 * least where the proximity term equals 1, i.e. where $F_R = 2$:
 *
 * $$
 * n_\mathrm{opt} = \frac{1}{d_s^3 \sqrt{K}} = \frac{\sqrt{768}\, \rho\, b}{\pi \omega \mu_0 N d_s^3 \sqrt{k}}
 * $$
 *
 * The result is the better of the two neighbouring integers (at least 1), capped at
 * `maxStrands` when more would not fit the window (then the cap is the optimum, since the
 * loss falls monotonically below $n_\mathrm{opt}$). It is always capped at the most strands a
 * bundle no wider than the window can hold, $\lfloor \tfrac{\pi}{2\sqrt3}(b/d_s)^2 \rfloor$
 * (hexagonal packing): at low frequency $n_\mathrm{opt}$ grows without bound (7.6·10⁷ strands
 * of 0.1 mm at 50 Hz), which no window holds. The result is an exactly representable integer.
 *
 * Hard domain (throws {@link InputError}): as {@link litzWindingAcRatio}; maxStrands an
 * integer ≥ 1. Validity: that of {@link litzWindingAcRatio} (d_s < δ), and a winding whose
 * window is not full at the optimum. When the window limits the bundle, Sullivan's fuller
 * analysis (strand insulation build against strand size) picks a finer strand instead.
 *
 * Accuracy: exact minimiser of the model over the integers (tests: exhaustive check).
 *
 * @param options - {@link OptimalLitzStrandCountOptions}
 * @returns the loss-minimising strand count (an integer ≥ 1)
 * @throws {@link InputError} on bad input
 * @see C. R. Sullivan, IEEE Trans. Power Electron. 14(2), 283–291 (1999), §III–V (loss against strand number; designs constrained by strand size).
 * @example
 * ```ts
 * import { optimalLitzStrandCount } from "fluxwright";
 * const options = { strandDiameter: 0.1e-3, turns: 20, windowBreadth: 20e-3,
 *   frequency: 100e3, resistivity: 1.7241e-8 };
 * console.log(optimalLitzStrandCount(options)); // 193
 * ```
 * @category Conductors
 */
export function optimalLitzStrandCount(options: OptimalLitzStrandCountOptions): number {
  const where = "optimalLitzStrandCount";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, OPTIMAL_FIELDS);
  const d = requirePositive(where, "strandDiameter", options.strandDiameter, "m");
  const turns = requireInteger(where, "turns", options.turns, 1);
  const breadth = requirePositive(where, "windowBreadth", options.windowBreadth, "m");
  const frequency = requirePositive(where, "frequency", options.frequency, "Hz");
  const resistivity = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const k = options.fieldFactor === undefined ? 1 : requirePositive(where, "fieldFactor", options.fieldFactor, "");
  const userCap = options.maxStrands === undefined ? Infinity : requireInteger(where, "maxStrands", options.maxStrands, 1);
  // a turn is no wider than the window: hexagonally packed strands of diameter d fill at most
  // π/(2√3) of the bundle's square, so at most floor(π/(2√3) (b/d)²) strands fit the breadth
  const fit = Math.floor(HEX_PACKING * (breadth / d) * (breadth / d));
  if (!(fit >= 1)) throw new InputError(where, "strandDiameter", d, "m", `at most ${(breadth * Math.sqrt(HEX_PACKING)).toPrecision(4)} (windowBreadth × √(π/(2√3))), so that one strand fits the window`);
  if (fit > Number.MAX_SAFE_INTEGER && userCap === Infinity) {
    throw new InputError(where, "windowBreadth", breadth, "m", `at most ${(d * Math.sqrt(Number.MAX_SAFE_INTEGER / HEX_PACKING)).toPrecision(3)} for this strand diameter (otherwise the count is not exactly representable; give maxStrands)`);
  }
  const cap = Math.min(userCap, fit);
  // continuous optimum 1/(d³ √K), in logarithms so that neither d⁶ underflows nor the count overflows
  const logContinuous = -3 * Math.log(d) - 0.5 * Math.log(sullivanCoefficient(turns, breadth, frequency, resistivity, k));
  if (logContinuous >= Math.log(cap)) return cap;
  const continuous = Math.exp(logContinuous);
  const d3 = d * d * d;
  const c = sullivanCoefficient(turns, breadth, frequency, resistivity, k) * d3 * d3; // Fr = 1 + c n²
  const lo = Math.max(1, Math.floor(continuous));
  const hi = Math.min(cap, lo + 1);
  const loss = (n: number): number => (1 + c * n * n) / n;
  return loss(hi) < loss(lo) ? hi : lo;
}
