/**
 * Internal helper: the network of a series or parallel tank from validated values.
 *
 * @packageDocumentation
 */
import type { TankCapacitor, TankInductor, TankNetwork } from "./network.js";

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

