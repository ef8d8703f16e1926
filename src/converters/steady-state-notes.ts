/**
 * The notes every exact converter operating point shares: the error when no periodic steady
 * state is found, the hard-switching caution, and the validity note outside the domain checked
 * against the time-domain simulation. Internal.
 *
 * @packageDocumentation
 */
import { DEFER_TO_CODES, InputError, type Caution, type ValidityNote } from "../core/index.js";

/**
 * The error thrown when the solver finds no consistent periodic solution.
 *
 * @param where - the public function
 * @param switchingFrequency - f_s [Hz]
 * @param point - the normalised point, e.g. "f_n = 1.2, Q = 0.5"
 * @param domain - the tested domain, e.g. "0.6 ≤ f_n ≤ 1.6, 0.2 ≤ Q ≤ 2.5"
 */
export function noSteadyStateError(where: string, switchingFrequency: number, point: string, domain: string): InputError {
  return new InputError(where, "switchingFrequency", switchingFrequency, "Hz", `a frequency where the steady state can be solved (${point} gave no consistent periodic solution; the tested domain is ${domain})`);
}

/**
 * The caution for switches that turn on hard.
 *
 * @param turnOffCurrent - the current at turn-off [A] (≤ 0, or too small to swing the switch capacitances)
 * @param circumstance - text following the current, e.g. " (capacitive operation)"
 * @param remedy - what raises the turn-off current, a sentence
 */
export function hardSwitchingCaution(turnOffCurrent: number, circumstance: string, remedy: string): Caution {
  return {
    code: "hard-switching",
    severity: "warning",
    message: `The switches turn on hard: the current at turn-off is ${turnOffCurrent.toPrecision(3)} A${circumstance}. Hard switching heats the switches and, with reverse recovery of their body diodes, can destroy them. ${remedy} ${DEFER_TO_CODES}`,
    value: turnOffCurrent,
    limit: 0,
    unit: "A",
    source: "common practice (resonant converters are run with inductive current at turn-off)",
  };
}

/**
 * The validity note of a point outside the domain checked against the time-domain simulation.
 *
 * @param domain - the tested domain, e.g. "0.6 ≤ f_n ≤ 1.6, 0.2 ≤ Q ≤ 2.5"
 * @param boundaryResidual - the residual to which the boundary conditions are met, e.g. "1e-10"
 */
export function outsideTestedDomainNote(domain: string, boundaryResidual: string): ValidityNote {
  return {
    code: "outside-tested-domain",
    message: `The point lies outside the domain checked against the time-domain simulation (${domain}): the solution meets the periodic boundary conditions to ${boundaryResidual}, but is not independently verified there.`,
  };
}
