/**
 * Reading the options of {@link inductiveLink}: the known keys, the compensation code and the
 * validating path that names each bad input. Internal.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireNonNegative, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import type { InductiveLink, InductiveLinkOptions } from "./inductive-link-types.js";
import { setLinkArguments, solveLink } from "./inductive-link-solve.js";

const KEYS = [
  "primaryInductance", "secondaryInductance", "mutualInductance", "primaryResistance", "secondaryResistance",
  "frequency", "compensation", "loadResistance", "sourceVoltage", "primaryCapacitance", "secondaryCapacitance",
  "primaryFilterInductance", "secondaryFilterInductance",
] as const;
const COMPENSATIONS = ["series-series", "series-parallel", "parallel-series", "parallel-parallel", "lcc-series", "double-lcc"] as const;

/** True when every enumerable key is a known one (comparisons with constant names: cheaper than a list lookup). */
export function linkFieldsKnown(options: object): boolean {
  for (const key in options) {
    if (
      key !== "primaryInductance" && key !== "secondaryInductance" && key !== "mutualInductance" &&
      key !== "primaryResistance" && key !== "secondaryResistance" && key !== "frequency" &&
      key !== "compensation" && key !== "loadResistance" && key !== "sourceVoltage" &&
      key !== "primaryCapacitance" && key !== "secondaryCapacitance" &&
      key !== "primaryFilterInductance" && key !== "secondaryFilterInductance"
    ) return false;
  }
  return true;
}

/** Compensation code: bit 0 primary parallel, bit 1 secondary parallel, bit 2 primary LCC, bit 3 secondary LCC; -1 unknown. */
export function compensationCode(c: unknown): number {
  switch (c) {
    case "series-series": return 0;
    case "parallel-series": return 1;
    case "series-parallel": return 2;
    case "parallel-parallel": return 3;
    case "lcc-series": return 4;
    case "double-lcc": return 12;
    default: return -1;
  }
}


/** The validating path of {@link inductiveLink}: each check throws {@link InputError} with its own message. */
export function inductiveLinkChecked(options: InductiveLinkOptions): InductiveLink {
  const where = "inductiveLink";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, KEYS);
  const l1 = requirePositive(where, "primaryInductance", options.primaryInductance, "H");
  const l2 = requirePositive(where, "secondaryInductance", options.secondaryInductance, "H");
  const m = requirePositive(where, "mutualInductance", options.mutualInductance, "H");
  const root = Math.sqrt(l1 * l2);
  if (!(m < root)) throw new InputError(where, "mutualInductance", m, "H", `less than √(L₁L₂) = ${root}`);
  const r1 = requireNonNegative(where, "primaryResistance", options.primaryResistance, "Ω");
  const r2 = requireNonNegative(where, "secondaryResistance", options.secondaryResistance, "Ω");
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const code = compensationCode(requireOneOf(where, "compensation", options.compensation, COMPENSATIONS));
  const rl = requirePositive(where, "loadResistance", options.loadResistance, "Ω");
  const v = requirePositive(where, "sourceVoltage", options.sourceVoltage, "V");
  const c1Option = options.primaryCapacitance;
  const c2Option = options.secondaryCapacitance;
  const givenC1 = c1Option === undefined ? 0 : requirePositive(where, "primaryCapacitance", c1Option, "F");
  const givenC2 = c2Option === undefined ? 0 : requirePositive(where, "secondaryCapacitance", c2Option, "F");
  const primaryLcc = (code & 4) !== 0;
  const secondaryLcc = (code & 8) !== 0;
  let lf1 = 0;
  let lf2 = 0;
  if (primaryLcc) {
    lf1 = requirePositive(where, "primaryFilterInductance", options.primaryFilterInductance, "H");
    if (givenC1 === 0 && !(lf1 < l1)) throw new InputError(where, "primaryFilterInductance", lf1, "H", `less than primaryInductance (${l1}) for the default series capacitor`);
  } else if (options.primaryFilterInductance !== undefined) {
    throw new InputError(where, "primaryFilterInductance", options.primaryFilterInductance, "H", "absent (only LCC compensation has a filter inductor)");
  }
  if (secondaryLcc) {
    lf2 = requirePositive(where, "secondaryFilterInductance", options.secondaryFilterInductance, "H");
    if (givenC2 === 0 && !(lf2 < l2)) throw new InputError(where, "secondaryFilterInductance", lf2, "H", `less than secondaryInductance (${l2}) for the default series capacitor`);
  } else if (options.secondaryFilterInductance !== undefined) {
    throw new InputError(where, "secondaryFilterInductance", options.secondaryFilterInductance, "H", "absent (only double-LCC compensation has a secondary filter inductor)");
  }
  setLinkArguments(l1, l2, m, r1, r2, f, rl, v, givenC1, givenC2, lf1, lf2, root);
  return requireFiniteResults(solveLink(code), options);
}

/**
 * The link, when every number in it is finite; else an {@link InputError}: inputs near the ends
 * of the double range (a frequency of 1e-300 Hz, a source of 1e300 V) can make a current,
 * power or capacitor overflow, or a power ratio 0/0, and are refused rather than answered with
 * Infinity or NaN.
 */
function requireFiniteResults(link: InductiveLink, options: InductiveLinkOptions): InductiveLink {
  let sum = link.efficiency + link.outputPower + link.inputPower + link.inputImpedance.re + Math.abs(link.inputImpedance.im) + link.inputCurrentRms;
  sum += link.primaryCurrentRms + link.secondaryCurrentRms + link.loadVoltageRms + link.couplingCoefficient;
  for (const c of link.capacitors) sum += c.capacitance + c.voltageRms + c.currentRms;
  if (!(sum < Infinity)) {
    throw new InputError("inductiveLink", "options", options, "", "values for which every result (currents, powers, input impedance, capacitors) lies within the double-precision range");
  }
  return link;
}
