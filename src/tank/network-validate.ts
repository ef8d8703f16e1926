/**
 * Structural and value checks of a network (shared by the builders and the evaluation).
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireNonNegative, requirePositive } from "../core/index.js";
import type { TankNetwork } from "./network-types.js";

const MAX_DEPTH = 64;

/** Accepted fields (misspelt ones are rejected, not ignored). */
const RESISTOR_FIELDS: readonly string[] = Object.freeze(["kind", "resistance"]);
const INDUCTOR_FIELDS: readonly string[] = Object.freeze(["kind", "inductance", "resistance"]);
const CAPACITOR_FIELDS: readonly string[] = Object.freeze(["kind", "capacitance", "resistance"]);
const CONNECTION_FIELDS: readonly string[] = Object.freeze(["kind", "elements"]);

/** Checks a network's structure and values; throws InputError naming the path of the bad part. */
export function validateNetwork(where: string, path: string, net: unknown, depth: number): void {
  if (depth > MAX_DEPTH) throw new InputError(where, path, net, "", `a network nested at most ${MAX_DEPTH} deep`);
  if (typeof net !== "object" || net === null) throw new InputError(where, path, net, "", "a tank network");
  const n = net as Partial<Record<string, unknown>>;
  switch (n.kind) {
    case "resistor":
      requireKnownKeys(where, path, n, RESISTOR_FIELDS);
      requireNonNegative(where, `${path}.resistance`, n.resistance, "Ω");
      return;
    case "inductor":
      requireKnownKeys(where, path, n, INDUCTOR_FIELDS);
      requirePositive(where, `${path}.inductance`, n.inductance, "H");
      requireNonNegative(where, `${path}.resistance`, n.resistance, "Ω");
      return;
    case "capacitor":
      requireKnownKeys(where, path, n, CAPACITOR_FIELDS);
      requirePositive(where, `${path}.capacitance`, n.capacitance, "F");
      requireNonNegative(where, `${path}.resistance`, n.resistance, "Ω");
      return;
    case "series":
    case "parallel": {
      requireKnownKeys(where, path, n, CONNECTION_FIELDS);
      const elements = n.elements;
      if (!Array.isArray(elements) || elements.length === 0) {
        throw new InputError(where, `${path}.elements`, elements, "", "a non-empty array of networks");
      }
      for (let k = 0; k < elements.length; k++) validateNetwork(where, `${path}.elements[${k}]`, elements[k], depth + 1);
      return;
    }
    default:
      throw new InputError(where, path, net, "", "a tank network (resistor, inductor, capacitor, series or parallel)");
  }
}

export function resolveNetwork(where: string, value: unknown): TankNetwork {
  if (typeof value === "object" && value !== null) {
    const kind = (value as { kind?: unknown }).kind;
    if (kind === "series-tank" || kind === "parallel-tank") {
      const inner = (value as { network?: unknown }).network;
      validateNetwork(where, "network.network", inner, 0);
      return inner as TankNetwork;
    }
  }
  validateNetwork(where, "network", value, 0);
  return value as TankNetwork;
}
