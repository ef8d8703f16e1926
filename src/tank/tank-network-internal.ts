/**
 * Internal helper: the network of a series or parallel tank from validated values.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import type { TankCapacitor, TankInductor, TankNetwork } from "./network-types.js";

/**
 * Builds the two-terminal network of a series or parallel tank from already-validated values,
 * without re-validating (internal: keeps seriesTank/parallelTank cheap).
 */
export function tankNetworkUnchecked(
  kind: "series" | "parallel",
  inductance: number,
  coilResistance: number,
  capacitance: number,
  parallelResistance: number | null,
): TankNetwork {
  const coil: TankInductor = { kind: "inductor", inductance, resistance: coilResistance };
  const capacitor: TankCapacitor = { kind: "capacitor", capacitance, resistance: 0 };
  if (kind === "series") return { kind: "series", elements: [coil, capacitor] };
  const elements: TankNetwork[] = [capacitor, coil];
  if (parallelResistance !== null) elements.push({ kind: "resistor", resistance: parallelResistance });
  return { kind: "parallel", elements };
}


/**
 * Returns a tank summary whose numbers are all finite, or throws an {@link InputError} saying
 * that the inputs put a result outside the double range (a frequency, impedance or Q factor
 * above about 1.8e308): scaled formulas give every representable result, so only an
 * unrepresentable one is refused.
 */
export function requireRepresentable<T extends object>(where: string, result: T): T {
  for (const [key, value] of Object.entries(result)) {
    if (typeof value === "number" && !Number.isFinite(value)) {
      throw new InputError(where, "options", `${key} = ${value}`, "", "values whose results lie within the double-precision range");
    }
  }
  return result;
}
