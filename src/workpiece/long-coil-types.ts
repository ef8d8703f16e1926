/**
 * The input and result types of {@link barInLongCoil} and {@link tubeInLongCoil} (re-exported from
 * long-coil.ts).
 *
 * @packageDocumentation
 */
import type { ValidityNote } from "../core/index.js";

/**
 * A long solenoid coil around the part (the long-coil idealisation: uniform axial field
 * $H_0 = NI/\ell$ inside, end effects ignored).
 *
 * @category Workpiece
 */
export interface LongCoil {
  /** Inner radius of the winding (the coil bore) [m], > 0 and ≥ the part's radius. */
  readonly innerRadius: number;
  /** Axial length of the winding [m], > 0. */
  readonly length: number;
  /** Number of turns, an integer ≥ 1. */
  readonly turns: number;
}

/**
 * A solid round bar, coaxial with the coil and at least as long.
 *
 * @category Workpiece
 */
export interface RoundBar {
  /** Bar radius [m], > 0. */
  readonly radius: number;
  /** Resistivity [Ω·m], > 0. */
  readonly resistivity: number;
  /** Relative permeability [-], ≥ 1 (constant). */
  readonly relativePermeability: number;
}

/**
 * A hollow round tube, coaxial with the coil and at least as long.
 *
 * @category Workpiece
 */
export interface RoundTube {
  /** Outer radius [m], > innerRadius. */
  readonly outerRadius: number;
  /** Inner (bore) radius [m], ≥ 0 (0 is a solid bar). */
  readonly innerRadius: number;
  /** Resistivity [Ω·m], > 0. */
  readonly resistivity: number;
  /** Relative permeability [-], ≥ 1 (constant). */
  readonly relativePermeability: number;
}

/**
 * Options of {@link barInLongCoil}.
 *
 * @category Workpiece
 */
export interface BarInLongCoilOptions {
  /** The coil, see {@link LongCoil}. */
  readonly coil: LongCoil;
  /** The bar, see {@link RoundBar}. */
  readonly bar: RoundBar;
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** Resistance of the coil winding at this frequency [Ω], ≥ 0; when given, `efficiency` is returned. */
  readonly coilResistance?: number;
}

/**
 * Options of {@link tubeInLongCoil}.
 *
 * @category Workpiece
 */
export interface TubeInLongCoilOptions {
  /** The coil, see {@link LongCoil}. */
  readonly coil: LongCoil;
  /** The tube, see {@link RoundTube}. */
  readonly tube: RoundTube;
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** Resistance of the coil winding at this frequency [Ω], ≥ 0; when given, `efficiency` is returned. */
  readonly coilResistance?: number;
}

/**
 * Result of {@link barInLongCoil} and {@link tubeInLongCoil}: what the coil terminals see.
 *
 * @category Workpiece
 */
export interface LongCoilCouplingResult {
  /** Resistance reflected into the coil by the part's eddy currents [Ω], ≥ 0. */
  readonly reflectedResistance: number;
  /** Change of the coil's reactance caused by the part [Ω]. */
  readonly reactanceChange: number;
  /** Change of the coil's inductance relative to the empty coil [H] (negative when shielding wins). */
  readonly inductanceChange: number;
  /** Inductance of the empty coil in the same idealisation, $\mu_0\pi r_c^2N^2/\ell$ [H]. */
  readonly emptyCoilInductance: number;
  /** Power into the part per square ampere of RMS coil current [W/A²] (numerically the reflected resistance). */
  readonly powerPerAmpereSquared: number;
  /** Electrical efficiency $R_r/(R_r + R_c)$ [-], in [0, 1]; present only when `coilResistance` was given. */
  readonly efficiency?: number;
  /** Skin depth in the part [m]. */
  readonly skinDepth: number;
  /** Outer radius of the part over skin depth [-], the abscissa of {@link bakerFunctions}. */
  readonly ratio: number;
  /** Active-power function (Baker's P for a bar) [-]. */
  readonly p: number;
  /** Reactive-power function (Baker's Q for a bar) [-]. */
  readonly q: number;
  /** Where the long-coil idealisation may not hold (e.g. code `"short-coil"`). */
  readonly validity: readonly ValidityNote[];
}
