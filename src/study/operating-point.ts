/**
 * One operating point of a heater: the coil, the part's coupling at its temperature, the tank
 * and inverter solved together (frequency and field-dependent permeability iterated to a fixed
 * point), the supply, and where every watt goes. Pure composition of the physics modules.
 *
 * The pieces live beside this file, each named for its step: `operating-point-types.ts` (what
 * a point reports), `-coil.ts` (the coil's own properties and leads), `-coupling.ts` (the part's
 * closed-form coupling), `-cells.ts` (the coil-impedance tier), `-correction.ts` (the
 * surrogate's correction to the exact model), `-evaluation.ts` (one trial frequency and field),
 * `-inverter.ts` (inverter and source), `-iteration.ts` (the fixed point), `-result.ts` (notes
 * and the assembled point), `-accuracy.ts` (the measured errors the notes quote).
 *
 * @packageDocumentation
 */
import { cellState } from "./operating-point-cells.js";
import { closedFormWindingResistance, coilProperties, leadSeriesImpedance } from "./operating-point-coil.js";
import { couplingModel } from "./operating-point-coupling.js";
import { corrected, corrections } from "./operating-point-correction.js";
import { PointEvaluator } from "./operating-point-evaluation.js";
import { solveInverter } from "./operating-point-inverter.js";
import { solveFixedPoint, startingIterate } from "./operating-point-iteration.js";
import { assembleOperatingPoint, operatingPointValidity } from "./operating-point-result.js";
import type { CoilImpedanceTier, CoilProperties, CoilState, HeaterOperatingPoint, OperatingPointStart } from "./operating-point-types.js";
import type { ResolvedHeaterDescription } from "./read-description.js";

export type { CoilImpedanceTier, CoilProperties, CoilState, HeaterLosses, HeaterOperatingPoint, OperatingPointStart } from "./operating-point-types.js";
export {
  CLOSED_FORM_COIL_INDUCTANCE_ERROR,
  CLOSED_FORM_FIELD_REFERENCE_TOLERANCE,
  COIL_INDUCTANCE_ERROR,
  FIELD_REFERENCE_TOLERANCE,
  SHORT_PART_ERROR,
  SHORT_PART_ERROR_NOTE,
  STUDY_COIL_REFINEMENT,
  STUDY_FIELD_REFERENCE_TOLERANCE,
} from "./operating-point-accuracy.js";
export { coilProperties, leadSeriesImpedance } from "./operating-point-coil.js";
export { solenoidCurrentLayer } from "./operating-point-coupling.js";
export { useOutsideCoilModel } from "./operating-point-correction.js";
export type { OutsideCoilModel } from "./operating-point-correction.js";
export { NoOscillationError } from "./operating-point-iteration.js";

/**
 * Solves one operating point of the heater at a part temperature: frequency and the part's
 * field-dependent permeability to a fixed point, the tank, the inverter and the source.
 *
 * The iteration starts from `start` (a neighbouring temperature's solution: continuation) or,
 * without one, from the empty coil's resonance and the field its current produces at the part
 * surface; it is accelerated (Anderson, depth 1) and damped back towards the last iterate the
 * inverter could run at. When that fails, a bracketing search over the surface field (each
 * field with its own frequency fixed point) finds the self-consistent field; if the inverter can
 * run at no field strength, the design's limit is thrown: {@link NoOscillationError} when the
 * current-fed tank cannot oscillate for any permeability the part can take, else the
 * inverter's own {@link InputError} (e.g. a target power the source cannot deliver).
 *
 * @param d - resolved description
 * @param partTemperature - part temperature [K]
 * @param withPart - `false` for the empty coil
 * @param props - the coil's own properties (from {@link coilProperties})
 * @param start - where to start the iteration (a neighbouring solution), or `null`
 */
export function heaterOperatingPoint(
  d: ResolvedHeaterDescription,
  partTemperature: number,
  withPart: boolean,
  props: CoilProperties = coilProperties(d),
  start: OperatingPointStart | null = null,
): HeaterOperatingPoint {
  const ev = new PointEvaluator(d, props, partTemperature, withPart, start);
  const { f0, h0, emptyField } = startingIterate(ev, start);
  const { e, iterations, converged } = solveFixedPoint(ev, f0, h0, emptyField);
  const s = solveInverter(d, ev.fixedFrequency, e.L, e.tankResistance, true);
  const point = assembleOperatingPoint(ev, e, s, iterations, operatingPointValidity(ev, e, s, converged));
  const finalCorrection = withPart ? ev.correction : ev.emptyCorrection;
  if (finalCorrection !== null) corrections.set(point, { withPart, correction: finalCorrection });
  return point;
}

/**
 * The coil branch's inductance and resistance (coil with the part, and the leads in series) at
 * any frequency, with the part's permeability held at the operating point's value: for
 * impedance sweeps. The closed-form surrogate carries the operating point's correction to the
 * exact model (resistances by factors, inductances by offsets), so the sweep is exact at the
 * operating frequency and follows the closed form's trend away from it.
 */
export function coilImpedanceAt(
  d: ResolvedHeaterDescription,
  props: CoilProperties,
  point: HeaterOperatingPoint,
  frequency: number,
): { inductance: number; resistance: number } {
  const copper = closedFormWindingResistance(d, props, frequency, null);
  let cheap: CoilState = { copper, part: 0, L: props.inductance, emptyL: props.inductance };
  if (point.withPart) {
    const c = couplingModel(d, props).surrogate(frequency, point.partResistivity, point.partRelativePermeability);
    cheap = { copper, part: c.reflectedResistance, L: props.inductance + c.inductanceChange, emptyL: props.inductance };
  }
  const stored = corrections.get(point);
  const st = stored !== undefined ? corrected(cheap, stored.correction) : cheap;
  const lead = leadSeriesImpedance(d, props, frequency);
  return { inductance: st.L + lead.inductance, resistance: st.copper + st.part + lead.resistance };
}

/**
 * The study's coil and part at a given frequency, resistivity and relative permeability (the
 * exact model of the tier the operating point reports): the part's loss resistance at 1 A,
 * ΔL, the loaded and empty inductance, the loaded winding's copper resistance, and the surface
 * field per ampere: for checks against field solutions at fixed material properties.
 *
 * @internal
 */
export function studyPartCoupling(
  d: ResolvedHeaterDescription,
  frequency: number,
  resistivity: number,
  relativePermeability: number,
  impedanceTier: CoilImpedanceTier = "cells",
): { reflectedResistance: number; inductanceChange: number; inductance: number; emptyInductance: number; copperResistance: number; fieldPerAmpere: number } {
  const props = coilProperties(d, impedanceTier);
  const model = couplingModel(d, props);
  const z = impedanceTier === "cells" ? cellState(d, props, frequency, resistivity, relativePermeability, true) : null;
  if (z !== null) {
    return { reflectedResistance: z.part, inductanceChange: z.L - z.emptyL, inductance: z.L, emptyInductance: z.emptyL, copperResistance: z.copper, fieldPerAmpere: model.fieldPerAmpere };
  }
  const c = model.coupling(frequency, resistivity, relativePermeability);
  return {
    reflectedResistance: c.reflectedResistance,
    inductanceChange: c.inductanceChange,
    inductance: props.inductance + c.inductanceChange,
    emptyInductance: props.inductance,
    copperResistance: closedFormWindingResistance(d, props, frequency, null),
    fieldPerAmpere: model.fieldPerAmpere,
  };
}
