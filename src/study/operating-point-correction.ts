/**
 * The surrogate correction of the operating point: the iteration runs on a cheap closed-form
 * surrogate of the coil state corrected to the exact model (resistances by factors, inductances
 * by offsets); the exact model may be one supplied from outside (the field tier). What each
 * solved point ended with is kept for its continuation and its impedance sweep.
 *
 * @packageDocumentation
 */
import type { ValidityNote } from "../core/index.js";
import type { CoilProperties, CoilState, OperatingPointStart } from "./operating-point-types.js";

/**
 * Relative agreement at which the surrogate's correction is taken as converged to the exact
 * model (resistances against the tank resistance, inductance a tenth of it against the
 * inductance): 1e-6, three orders below the exact model's own accuracy.
 */
export const AGREEMENT = 1e-6;

/** The correction of the surrogate to the exact model: resistances by factors, inductances by offsets. */
export interface Correction {
  readonly copper: number;
  readonly part: number;
  readonly L: number;
  readonly emptyL: number;
}

export function correctionOf(exact: CoilState, cheap: CoilState): Correction {
  return { copper: exact.copper / cheap.copper, part: cheap.part > 0 ? exact.part / cheap.part : 1, L: exact.L - cheap.L, emptyL: exact.emptyL - cheap.emptyL };
}

export function corrected(cheap: CoilState, c: Correction): CoilState {
  return { copper: cheap.copper * c.copper, part: cheap.part * c.part, L: cheap.L + c.L, emptyL: cheap.emptyL + c.emptyL };
}

/**
 * An exact model of the coil's state supplied from outside this file (the study's field model,
 * tier `"field"`): the state at a frequency, part resistivity and permeability, given the
 * surrogate's state there and the part temperature.
 */
export interface OutsideCoilModel {
  state(frequency: number, resistivity: number, relativePermeability: number, withPart: boolean, partTemperature: number, cheap: CoilState): CoilState;
  /** Validity notes of the model (replacing the closed forms' and the coil-impedance model's). */
  readonly notes: readonly ValidityNote[];
}

const outsideModels = new WeakMap<CoilProperties, OutsideCoilModel>();

/** Makes the operating points solved with `props` use `model` as their exact coil model. */
export function useOutsideCoilModel(props: CoilProperties, model: OutsideCoilModel): void {
  outsideModels.set(props, model);
}

/** The exact coil model supplied from outside for operating points solved with `props`, if any. */
export function outsideCoilModel(props: CoilProperties): OutsideCoilModel | undefined {
  return outsideModels.get(props);
}

/** The surrogate correction each solved point ended with: a continued point starts from its neighbour's. */
export const corrections = new WeakMap<OperatingPointStart, { withPart: boolean; correction: Correction }>();
