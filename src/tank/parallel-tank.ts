/**
 * The parallel tank: a coil (inductance with series resistance) in parallel with a capacitor and,
 * optionally, a parallel resistance. The three resonance definitions are kept apart.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import type { TankNetwork } from "./network-types.js";
import { requireRepresentable, tankNetworkUnchecked } from "./tank-network-internal.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const PARALLEL_TANK_FIELDS: readonly string[] = Object.freeze(["inductance", "capacitance", "coilResistance", "parallelResistance"]);

/**
 * Options of {@link parallelTank}.
 *
 * @category Tanks
 */
export interface ParallelTankOptions {
  /** Inductance of the coil [H], > 0. */
  readonly inductance: number;
  /** Capacitance across the coil [F], > 0. */
  readonly capacitance: number;
  /**
   * Series resistance of the coil branch (copper plus reflected workpiece resistance) [Ω], ≥ 0;
   * it may be 0 only when `parallelResistance` is given.
   */
  readonly coilResistance: number;
  /** Optional resistance in parallel with the whole tank (a load or loss resistor) [Ω], > 0. */
  readonly parallelResistance?: number;
}

/**
 * Resonance figures of a parallel tank, as returned by {@link parallelTank}. The three
 * resonance definitions differ once the coil has resistance: for a coil with series resistance
 * only, $f_\varphi \le f_m \le f_0$ (zero phase ≤ maximum impedance ≤ undamped).
 *
 * @category Tanks
 */
export interface ParallelTank {
  /** Discriminator: `"parallel-tank"`. */
  readonly kind: "parallel-tank";
  /** Inductance [H]. */
  readonly inductance: number;
  /** Capacitance [F]. */
  readonly capacitance: number;
  /** Coil series resistance [Ω]. */
  readonly coilResistance: number;
  /** Parallel resistance [Ω], or `null` when none was given. */
  readonly parallelResistance: number | null;
  /** Undamped frequency $f_0 = 1/(2\pi\sqrt{LC})$ [Hz]. */
  readonly undampedFrequency: number;
  /**
   * Zero-phase (unity power factor) frequency $f_\varphi = f_0\sqrt{1 - R^2C/L}$ [Hz], where the
   * tank impedance is real; `null` when $R \ge \sqrt{L/C}$ (coil Q ≤ 1): the tank is then inductive
   * at every frequency and has no zero-phase resonance. A parallel resistance does not move it.
   */
  readonly zeroPhaseFrequency: number | null;
  /**
   * Frequency of maximum impedance magnitude
   * $f_m = f_0\sqrt{\sqrt{1 + 2a + 2R/R_p} - a}$ with $a = R^2C/L$ [Hz]; `null` when the
   * radicand is ≤ 0 (the impedance then falls monotonically from its DC value: no peak).
   */
  readonly maxImpedanceFrequency: number | null;
  /** The impedance magnitude at `maxImpedanceFrequency` [Ω], or `null` when there is no peak. */
  readonly maxImpedance: number | null;
  /**
   * Dynamic resistance: the (real) tank impedance at the zero-phase frequency,
   * $R_d = L/(RC)$ without parallel resistance, $R_d = (L/(RC)) \parallel R_p$ with it [Ω].
   * Defined by this formula even when no zero-phase frequency exists.
   */
  readonly dynamicResistance: number;
  /** Characteristic impedance $Z_0 = \sqrt{L/C}$ [Ω]. */
  readonly characteristicImpedance: number;
  /** Quality factor of the coil alone at $f_0$, $Q_L = \omega_0 L / R$; `null` for a lossless coil (R = 0). */
  readonly coilQualityFactor: number | null;
  /**
   * Loaded quality factor of the tank at $f_0$: $1/Q = R/Z_0 + Z_0/R_p$ (equals $Z_0/R$ without
   * parallel resistance and $R_p/Z_0$ for a lossless coil).
   */
  readonly qualityFactor: number;
  /** Whether a zero-phase resonance exists (`zeroPhaseFrequency !== null`). */
  readonly resonant: boolean;
  /** The same tank as a composable network, for {@link tankImpedance}. */
  readonly network: TankNetwork;
}

/**
 * Resonance figures of a parallel tank — a coil $L$ with series resistance $R$, in parallel with
 * $C$ and optionally a resistance $R_p$ — with the undamped, zero-phase and maximum-impedance
 * frequencies named and kept apart.
 *
 * With $x = \omega^2 LC$, $a = R^2C/L$ and $g = \sqrt{L/C}/R_p$, the admittance normalised by
 * $Z_0 = \sqrt{L/C}$ is $y = g + \sqrt{a}/(a+x) + j\sqrt{x}\,(1 - 1/(a+x))$, so
 *
 * $$
 * x_\varphi = 1 - a, \qquad x_m = \sqrt{1 + 2a + 2\sqrt{a}\,g} - a, \qquad R_d = \frac{L}{RC} \parallel R_p
 * $$
 *
 * ($x_m$ is the positive root of $d|y|^2/dx = 0$, which reduces to $u^2 = 1 + 2a + 2\sqrt a g$
 * with $u = a + x$.)
 *
 * @param options - `inductance` [H] > 0, `capacitance` [F] > 0, `coilResistance` [Ω] ≥ 0,
 * optional `parallelResistance` [Ω] > 0
 * @returns the {@link ParallelTank} figures (Hz, Ω); frequencies that do not exist are `null`
 * ("no resonance"), never NaN
 * @throws {@link InputError} when inductance or capacitance is not > 0, coilResistance is
 * negative or non-finite, parallelResistance is given and not > 0, or coilResistance is 0
 * without a parallelResistance (an infinite dynamic resistance).
 * Validity: lumped, linear, frequency-independent components (a real coil's resistance rises with
 * frequency; evaluate it at the operating frequency).
 * Accuracy: closed forms, exact to rounding (≤ 1e-12 relative in the tests, and within 1e-9 of a
 * brute-force impedance scan for $f_m$).
 * @see C. K. Alexander and M. N. O. Sadiku, Fundamentals of Electric Circuits, 5th ed.,
 * McGraw-Hill 2013, §14.6 "Parallel resonance" and Example 14.9 (coil with series resistance).
 * @example
 * ```ts
 * import { parallelTank } from "fluxwright";
 * const tank = parallelTank({ inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 });
 * console.log(tank.undampedFrequency); // ≈ 112539.5
 * console.log(tank.zeroPhaseFrequency); // ≈ 112528.3
 * console.log(tank.dynamicResistance); // ≈ 50
 * ```
 * @category Tanks
 */
export function parallelTank(options: ParallelTankOptions): ParallelTank {
  const where = "parallelTank";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, PARALLEL_TANK_FIELDS);
  const inductance = requirePositive(where, "inductance", options.inductance, "H");
  const capacitance = requirePositive(where, "capacitance", options.capacitance, "F");
  const coilResistance = requireNonNegative(where, "coilResistance", options.coilResistance, "Ω");
  const parallelResistance =
    options.parallelResistance === undefined
      ? null
      : requirePositive(where, "parallelResistance", options.parallelResistance, "Ω");
  if (coilResistance === 0 && parallelResistance === null) {
    throw new InputError(where, "coilResistance", coilResistance, "Ω", "a finite number > 0 when parallelResistance is not given");
  }
  const twoPi = 2 * Math.PI;
  // square roots taken separately: L·C and L/C may leave the double range when ω0 and Z0 do not
  const rootL = Math.sqrt(inductance);
  const rootC = Math.sqrt(capacitance);
  const omega0 = 1 / rootL / rootC;
  const f0 = omega0 / twoPi;
  const z0 = rootL / rootC;
  const r = coilResistance / z0; // √a
  const a = r * r;
  const g = parallelResistance === null ? 0 : z0 / parallelResistance;
  const xPhase = 1 - a;
  const xMax = Math.sqrt(1 + 2 * a + 2 * r * g) - a;
  // |Z| at x: 1/|y| · Z0 with y as in the summary.
  let maxImpedance: number | null = null;
  if (xMax > 0) {
    const u = a + xMax;
    const re = g + r / u;
    const im = Math.sqrt(xMax) * (1 - 1 / u);
    maxImpedance = z0 / Math.hypot(re, im);
  }
  const coilDynamic = coilResistance === 0 ? Infinity : z0 * (z0 / coilResistance); // L/(RC) = Z0²/R
  const dynamicResistance =
    parallelResistance === null
      ? coilDynamic
      : coilDynamic === Infinity
        ? parallelResistance
        : (coilDynamic * parallelResistance) / (coilDynamic + parallelResistance);
  return requireRepresentable(where, {
    kind: "parallel-tank",
    inductance,
    capacitance,
    coilResistance,
    parallelResistance,
    undampedFrequency: f0,
    zeroPhaseFrequency: xPhase > 0 ? f0 * Math.sqrt(xPhase) : null,
    maxImpedanceFrequency: xMax > 0 ? f0 * Math.sqrt(xMax) : null,
    maxImpedance,
    dynamicResistance,
    characteristicImpedance: z0,
    coilQualityFactor: coilResistance === 0 ? null : z0 / coilResistance,
    qualityFactor: 1 / (r + g),
    resonant: xPhase > 0,
    network: tankNetworkUnchecked("parallel", inductance, coilResistance, capacitance, parallelResistance),
  });
}
