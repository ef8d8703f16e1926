/**
 * The input and result types of {@link coilOverPlate} and {@link coilOverPlateTruncatedRegion}
 * (re-exported from coil-over-plate.ts).
 *
 * @packageDocumentation
 */
import type { ValidityNote } from "../core/index.js";
import type { Complex } from "../special/index.js";

/**
 * One conducting layer of a plate or layered half-space (top layer first).
 *
 * @category Workpiece
 */
export interface PlateLayer {
  /** Layer thickness [m], > 0; `Infinity` for a half-space (only the last layer may be). */
  readonly thickness: number;
  /** Resistivity [Ω·m], > 0 (a large value for a non-conducting magnetic layer). */
  readonly resistivity: number;
  /** Relative permeability [-], ≥ 1, constant (linear material). */
  readonly relativePermeability: number;
}

/**
 * A coaxial coil of rectangular winding cross-section (a pancake or short multilayer coil)
 * above a plate, with uniform current density over the winding cross-section.
 *
 * @category Workpiece
 */
export interface CoilAbovePlate {
  /** Inner radius of the winding [m], ≥ 0 and < outerRadius. */
  readonly innerRadius: number;
  /** Outer radius of the winding [m], > innerRadius. */
  readonly outerRadius: number;
  /** Gap from the plate surface to the bottom of the winding [m], ≥ 0. */
  readonly liftOff: number;
  /** Axial length of the winding (its extent along the axis) [m], > 0. */
  readonly length: number;
  /** Number of turns, an integer ≥ 1. */
  readonly turns: number;
}

/**
 * A {@link CoilAbovePlate} given with its former field name `height` for the axial length.
 *
 * @deprecated Give `length` instead of `height`; accepted until 1.0.
 * @category Workpiece
 */
export type CoilAbovePlateWithHeight = Omit<CoilAbovePlate, "length"> & {
  /**
   * Axial length of the winding [m], > 0.
   *
   * @deprecated Use `length`.
   */
  readonly height: number;
};

/**
 * Options of {@link coilOverPlate}.
 *
 * @category Workpiece
 */
export interface CoilOverPlateOptions {
  /** The coil, see {@link CoilAbovePlate}. */
  // eslint-disable-next-line @typescript-eslint/no-deprecated -- the former field name is accepted until 1.0
  readonly coil: CoilAbovePlate | CoilAbovePlateWithHeight;
  /**
   * The conductor below the coil: one {@link PlateLayer} (a plate, or a half-space with
   * `thickness: Infinity`), or an array of layers from the top down (a coated part; air below
   * the last layer unless its thickness is `Infinity`).
   */
  readonly plate: PlateLayer | readonly PlateLayer[];
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
}

/**
 * Result of {@link coilOverPlate}: the impedance at the coil terminals (winding resistance
 * not included) and its change caused by the plate.
 *
 * @category Workpiece
 */
export interface CoilOverPlateResult {
  /** Resistance added by the plate, the reflected resistance $\Delta R$ [Ω], ≥ 0. */
  readonly reflectedResistance: number;
  /**
   * The same value as {@link CoilOverPlateResult.reflectedResistance} [Ω].
   *
   * @deprecated Use `reflectedResistance`; this field goes at 1.0.
   */
  readonly resistanceChange: number;
  /** Reactance change $\Delta X$ [Ω] (negative when eddy currents shield, positive when magnetisation wins). */
  readonly reactanceChange: number;
  /** Inductance change $\Delta L = \Delta X/\omega$ [H]. */
  readonly inductanceChange: number;
  /** Inductance of the same coil in air, without the plate [H] (Dodd & Deeds' air-core integral). */
  readonly emptyCoilInductance: number;
  /**
   * The same value as {@link CoilOverPlateResult.emptyCoilInductance} [H].
   *
   * @deprecated Use `emptyCoilInductance`; this field goes at 1.0.
   */
  readonly airCoreInductance: number;
  /** Inductance with the plate, $L_0 + \Delta L$ [H]. */
  readonly inductance: number;
  /** Terminal impedance without winding resistance, $\Delta R + j\omega(L_0 + \Delta L)$ [Ω]. */
  readonly impedance: Complex;
  /** Skin depth of the top layer [m]. */
  readonly skinDepth: number;
  /** Where the model's assumptions may not hold. */
  readonly validity: readonly ValidityNote[];
}
