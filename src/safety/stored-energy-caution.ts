/**
 * The stored-energy caution: a charged tank or bus capacitor at a hazardous energy level, or
 * above the discharge limit for accessible parts.
 *
 * @packageDocumentation
 */
import { DEFER_TO_CODES, requireFinite, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import type { Caution } from "../core/index.js";
import { qty } from "./caution-text.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const STORED_ENERGY_FIELDS: readonly string[] = Object.freeze(["capacitance", "voltagePeak"]);

/**
 * Options of {@link storedEnergyCaution}.
 *
 * @category Cautions
 */
export interface StoredEnergyCautionOptions {
  /** Capacitance [F], > 0. */
  readonly capacitance: number;
  /** Peak voltage across it [V] (magnitude used). */
  readonly voltagePeak: number;
}

/**
 * Energy above which a charged capacitor is at a hazardous energy level [J]: IEC 60950-1:2005,
 * §2.1.1.5 c) 2) ("exceeds 20 J" at a voltage of 2 V or more).
 */
const ENERGY_HAZARD_LEVEL = 20;
/** Voltage from which the 20 J level applies [V] (IEC 60950-1:2005, §2.1.1.5 c) 2)). */
const ENERGY_HAZARD_MIN_VOLTAGE = 2;
/** Where the 20 J rule comes from (clause text as quoted in product-safety discussions of the standard). */
const ENERGY_HAZARD_SOURCE = "IEC 60950-1:2005, §2.1.1.5 c) 2): a capacitor is at a hazardous energy level when its voltage is 2 V or more and ½CU² exceeds 20 J";
/** Discharge energy limit for accessible parts [J] (IEC 60335-1 §8.1.4). */
const DISCHARGE_ENERGY_LIMIT = 0.35;
/** Peak voltage below which a discharge is not considered a shock hazard [V] (IEC 60335-1 §8.1.4). */
const SHOCK_VOLTAGE_PEAK = 42.4;

/**
 * A caution for the energy stored in a capacitor (or capacitor bank), $E = \tfrac12 C \hat V^2$:
 * - `"stored-energy-hazard"`, `"danger"`: $E > 20$ J at $\hat V \ge 2$ V, an energy hazard
 *   even at low voltage (arcs, burns, welded tools) — the hazardous energy level of
 *   IEC 60950-1:2005 §2.1.1.5 c) 2);
 * - `"stored-energy-shock"`, `"warning"`: $E > 0.35$ J with a peak voltage above 42.4 V, the
 *   discharge-energy limit that IEC 60335-1 §8.1.4 sets for accessible parts (there for peak
 *   voltages above 15 kV; used here as a conservative screen at any shock-capable voltage);
 * - `null` otherwise.
 *
 * Hard domain (throws {@link InputError}): capacitance ≤ 0 or non-finite; non-finite voltage.
 *
 * @param options - capacitance and peak voltage
 * @returns the caution, or `null`
 * @throws {@link InputError} on bad input
 * @see IEC 60335-1:2010, §8.1.4 (45 µC / 350 mJ discharge limits); IEC 60950-1:2005,
 *   §2.1.1.5 c) 2) (hazardous energy level: more than 20 J at 2 V or more).
 * @example
 * ```ts
 * import { storedEnergyCaution } from "fluxwright";
 * console.log(storedEnergyCaution({ capacitance: 10e-6, voltagePeak: 400 })?.severity); // warning
 * ```
 * @category Cautions
 */
export function storedEnergyCaution(options: StoredEnergyCautionOptions): Caution | null {
  const where = "storedEnergyCaution";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, STORED_ENERGY_FIELDS);
  const c = requirePositive(where, "capacitance", options.capacitance, "F");
  const v = Math.abs(requireFinite(where, "voltagePeak", options.voltagePeak, "V"));
  const energy = 0.5 * c * v * v;
  if (energy > ENERGY_HAZARD_LEVEL && v >= ENERGY_HAZARD_MIN_VOLTAGE) {
    return {
      code: "stored-energy-hazard",
      severity: "danger",
      message: `The capacitors store ${qty(energy, "J")} at ${qty(v, "V")} peak, above the ${ENERGY_HAZARD_LEVEL} J energy-hazard level: a short circuit can arc, burn and weld, and the charge can remain after switch-off. Fit a bleeder resistor and verify discharge before work. ${DEFER_TO_CODES}`,
      value: energy,
      limit: ENERGY_HAZARD_LEVEL,
      unit: "J",
      source: ENERGY_HAZARD_SOURCE,
    };
  }
  if (energy > DISCHARGE_ENERGY_LIMIT && v > SHOCK_VOLTAGE_PEAK) {
    return {
      code: "stored-energy-shock",
      severity: "warning",
      message: `The capacitors store ${qty(energy, "J")} at ${qty(v, "V")} peak, more than the ${DISCHARGE_ENERGY_LIMIT * 1000} mJ allowed to discharge through a person from an accessible part: the charge can give a painful or harmful shock after switch-off. Fit a bleeder resistor. ${DEFER_TO_CODES}`,
      value: energy,
      limit: DISCHARGE_ENERGY_LIMIT,
      unit: "J",
      source: "IEC 60335-1:2010, §8.1.4 (discharge energy 350 mJ, charge 45 µC)",
    };
  }
  return null;
}
