/**
 * Builders of two-terminal networks: resistor, inductor with series resistance, capacitor with
 * ESR, series and parallel connections, and the LCL and LCC tanks.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireNonNegative, requirePositive } from "../core/index.js";
import type { TankCapacitor, TankInductor, TankNetwork, TankParallelConnection, TankResistor, TankSeriesConnection } from "./network-types.js";
import { validateNetwork } from "./network-validate.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LCL_FIELDS: readonly string[] = Object.freeze(["seriesInductance", "seriesResistance", "inductance", "capacitance", "coilResistance"]);
const LCC_FIELDS: readonly string[] = Object.freeze(["seriesInductance", "seriesResistance", "seriesCapacitance", "parallelCapacitance", "load"]);

/**
 * A resistor as a network part.
 *
 * @param resistance - resistance [Ω], ≥ 0 (0 is a short circuit)
 * @returns the part
 * @throws {@link InputError} when resistance is negative or not finite
 * @example
 * ```ts
 * import { resistorElement, tankImpedance } from "fluxwright";
 * console.log(tankImpedance(resistorElement(8), 1000).re); // 8
 * ```
 * @category Networks
 */
export function resistorElement(resistance: number): TankResistor {
  return { kind: "resistor", resistance: requireNonNegative("resistorElement", "resistance", resistance, "Ω") };
}

/**
 * An inductor with series resistance (a coil) as a network part: $Z = R + j\omega L$.
 *
 * @param inductance - inductance [H], > 0
 * @param seriesResistance - series resistance [Ω], ≥ 0 (default 0)
 * @returns the part
 * @throws {@link InputError} when inductance is not > 0 or seriesResistance is negative / not finite
 * @example
 * ```ts
 * import { inductorElement, tankImpedance } from "fluxwright";
 * console.log(tankImpedance(inductorElement(1e-3, 2), 1000).im); // ≈ 6.2832
 * ```
 * @category Networks
 */
export function inductorElement(inductance: number, seriesResistance = 0): TankInductor {
  return {
    kind: "inductor",
    inductance: requirePositive("inductorElement", "inductance", inductance, "H"),
    resistance: requireNonNegative("inductorElement", "seriesResistance", seriesResistance, "Ω"),
  };
}

/**
 * A capacitor with equivalent series resistance as a network part: $Z = R_\mathrm{ESR} - j/(\omega C)$.
 *
 * @param capacitance - capacitance [F], > 0
 * @param seriesResistance - equivalent series resistance [Ω], ≥ 0 (default 0)
 * @returns the part
 * @throws {@link InputError} when capacitance is not > 0 or seriesResistance is negative / not finite
 * @example
 * ```ts
 * import { capacitorElement, tankImpedance } from "fluxwright";
 * console.log(tankImpedance(capacitorElement(1e-6), 1000).im); // ≈ -159.15
 * ```
 * @category Networks
 */
export function capacitorElement(capacitance: number, seriesResistance = 0): TankCapacitor {
  return {
    kind: "capacitor",
    capacitance: requirePositive("capacitorElement", "capacitance", capacitance, "F"),
    resistance: requireNonNegative("capacitorElement", "seriesResistance", seriesResistance, "Ω"),
  };
}

/**
 * Connects networks in series: $Z = \sum_k Z_k$.
 *
 * @param elements - one or more networks
 * @returns the series connection
 * @throws {@link InputError} when no element is given or an element is not a network
 * @example
 * ```ts
 * import { seriesNetwork, resistorElement, tankImpedance } from "fluxwright";
 * console.log(tankImpedance(seriesNetwork(resistorElement(1), resistorElement(2)), 50).re); // 3
 * ```
 * @category Networks
 */
export function seriesNetwork(...elements: TankNetwork[]): TankSeriesConnection {
  checkParts("seriesNetwork", elements);
  return { kind: "series", elements };
}

/**
 * Connects networks in parallel: $1/Z = \sum_k 1/Z_k$.
 *
 * @param elements - one or more networks
 * @returns the parallel connection
 * @throws {@link InputError} when no element is given or an element is not a network
 * @example
 * ```ts
 * import { parallelNetwork, resistorElement, tankImpedance } from "fluxwright";
 * console.log(tankImpedance(parallelNetwork(resistorElement(6), resistorElement(3)), 50).re); // 2
 * ```
 * @category Networks
 */
export function parallelNetwork(...elements: TankNetwork[]): TankParallelConnection {
  checkParts("parallelNetwork", elements);
  return { kind: "parallel", elements };
}

function checkParts(where: string, elements: readonly TankNetwork[]): void {
  if (elements.length === 0) throw new InputError(where, "elements", elements, "", "one or more networks");
  for (let k = 0; k < elements.length; k++) validateNetwork(where, `elements[${k}]`, elements[k], 0);
}

/**
 * Options of {@link lclNetwork}.
 *
 * @category Networks
 */
export interface LclNetworkOptions {
  /** Series (feed) inductance between the inverter and the tank [H], > 0. */
  readonly seriesInductance: number;
  /** Series resistance of the feed inductor [Ω], ≥ 0 (default 0). */
  readonly seriesResistance?: number;
  /** Work-coil inductance [H], > 0. */
  readonly inductance: number;
  /** Tank capacitance across the work coil [F], > 0. */
  readonly capacitance: number;
  /** Work-coil series resistance [Ω], ≥ 0. */
  readonly coilResistance: number;
}

/**
 * The LCL network used to drive a parallel tank from a voltage-fed inverter: a series inductor
 * $L_s$ feeding a capacitor $C$ in parallel with the work coil ($L$ with resistance $R$):
 *
 * $$
 * Z = R_s + j\omega L_s + \left(j\omega C + \frac{1}{R + j\omega L}\right)^{-1}
 * $$
 *
 * Built from {@link seriesNetwork}, {@link parallelNetwork}, {@link inductorElement} and
 * {@link capacitorElement}; pass the result to {@link tankImpedance}.
 *
 * @param options - see {@link LclNetworkOptions}
 * @returns the network
 * @throws {@link InputError} when a value is out of its domain (see the options)
 * Validity and accuracy: as {@link tankImpedance} (exact for lumped parts).
 * @see H. Fujita, H. Akagi, "A 2-MHz 2-kW voltage-source inverter for low-temperature plasma
 * generators: implementation of fast switching with a third-order resonant circuit", IEEE Trans.
 * Industry Applications 35(1), 1999 (LCL third-order resonant circuit).
 * @example
 * ```ts
 * import { lclNetwork, tankImpedance } from "fluxwright";
 * const net = lclNetwork({ seriesInductance: 10e-6, inductance: 10e-6, capacitance: 1e-6, coilResistance: 0.05 });
 * console.log(tankImpedance(net, 50e3).re > 0); // true
 * ```
 * @category Networks
 */
export function lclNetwork(options: LclNetworkOptions): TankSeriesConnection {
  const where = "lclNetwork";
  if (typeof options !== "object" || options === null) throw new InputError(where, "options", options, "", "an object");
  requireKnownKeys(where, "", options, LCL_FIELDS);
  const ls = requirePositive(where, "seriesInductance", options.seriesInductance, "H");
  const rs = options.seriesResistance === undefined ? 0 : requireNonNegative(where, "seriesResistance", options.seriesResistance, "Ω");
  const l = requirePositive(where, "inductance", options.inductance, "H");
  const c = requirePositive(where, "capacitance", options.capacitance, "F");
  const r = requireNonNegative(where, "coilResistance", options.coilResistance, "Ω");
  return seriesNetwork(inductorElement(ls, rs), parallelNetwork(capacitorElement(c), inductorElement(l, r)));
}

/**
 * Options of {@link lccNetwork}.
 *
 * @category Networks
 */
export interface LccNetworkOptions {
  /** Series inductance [H], > 0. */
  readonly seriesInductance: number;
  /** Series resistance of the series inductor [Ω], ≥ 0 (default 0). */
  readonly seriesResistance?: number;
  /** Series capacitance [F], > 0. */
  readonly seriesCapacitance: number;
  /** Parallel capacitance across the load [F], > 0. */
  readonly parallelCapacitance: number;
  /**
   * The load across the parallel capacitor: e.g. `resistorElement(R)` for the classic
   * series-parallel converter, or `inductorElement(L, R)` for a work coil.
   */
  readonly load: TankNetwork;
}

/**
 * The series-parallel (LCC) network: series inductor $L_s$ and series capacitor $C_s$ feeding a
 * parallel capacitor $C_p$ across a load $Z_\ell$:
 *
 * $$
 * Z = R_s + j\omega L_s + \frac{1}{j\omega C_s} + \left(j\omega C_p + \frac{1}{Z_\ell}\right)^{-1}
 * $$
 *
 * @param options - see {@link LccNetworkOptions}
 * @returns the network
 * @throws {@link InputError} when a value is out of its domain or `load` is not a network
 * Validity and accuracy: as {@link tankImpedance} (exact for lumped parts).
 * @see R. L. Steigerwald, "A comparison of half-bridge resonant converter topologies", IEEE Trans.
 * Power Electronics 3(2), 1988 (series-parallel resonant converter).
 * @example
 * ```ts
 * import { lccNetwork, resistorElement, tankImpedance } from "fluxwright";
 * const net = lccNetwork({ seriesInductance: 100e-6, seriesCapacitance: 100e-9, parallelCapacitance: 100e-9, load: resistorElement(50) });
 * console.log(tankImpedance(net, 60e3).re > 0); // true
 * ```
 * @category Networks
 */
export function lccNetwork(options: LccNetworkOptions): TankSeriesConnection {
  const where = "lccNetwork";
  if (typeof options !== "object" || options === null) throw new InputError(where, "options", options, "", "an object");
  requireKnownKeys(where, "", options, LCC_FIELDS);
  const ls = requirePositive(where, "seriesInductance", options.seriesInductance, "H");
  const rs = options.seriesResistance === undefined ? 0 : requireNonNegative(where, "seriesResistance", options.seriesResistance, "Ω");
  const cs = requirePositive(where, "seriesCapacitance", options.seriesCapacitance, "F");
  const cp = requirePositive(where, "parallelCapacitance", options.parallelCapacitance, "F");
  validateNetwork(where, "load", options.load, 0);
  return seriesNetwork(inductorElement(ls, rs), capacitorElement(cs), parallelNetwork(capacitorElement(cp), options.load));
}
