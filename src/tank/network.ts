/**
 * Composable two-terminal networks (resistor, inductor with series resistance, capacitor with
 * ESR, series and parallel combinations) and their impedance at a frequency or over a sweep.
 *
 * @packageDocumentation
 */
import { InputError, MAX_ARRAY_LENGTH, requireArrayLike, requireKnownKeys, requireNonNegative, requirePositive } from "../core/index.js";
import type { Complex } from "../special/index.js";

/**
 * A resistor, built by {@link resistorElement}.
 *
 * @category Networks
 */
export interface TankResistor {
  /** Discriminator: `"resistor"`. */
  readonly kind: "resistor";
  /** Resistance [Ω], ≥ 0. */
  readonly resistance: number;
}

/**
 * An inductor with series resistance (a coil), built by {@link inductorElement}.
 *
 * @category Networks
 */
export interface TankInductor {
  /** Discriminator: `"inductor"`. */
  readonly kind: "inductor";
  /** Inductance [H], > 0. */
  readonly inductance: number;
  /** Series resistance [Ω], ≥ 0. */
  readonly resistance: number;
}

/**
 * A capacitor with equivalent series resistance, built by {@link capacitorElement}.
 *
 * @category Networks
 */
export interface TankCapacitor {
  /** Discriminator: `"capacitor"`. */
  readonly kind: "capacitor";
  /** Capacitance [F], > 0. */
  readonly capacitance: number;
  /** Equivalent series resistance [Ω], ≥ 0. */
  readonly resistance: number;
}

/**
 * Networks connected in series (impedances add), built by {@link seriesNetwork}.
 *
 * @category Networks
 */
export interface TankSeriesConnection {
  /** Discriminator: `"series"`. */
  readonly kind: "series";
  /** The parts, at least one. */
  readonly elements: readonly TankNetwork[];
}

/**
 * Networks connected in parallel (admittances add), built by {@link parallelNetwork}.
 *
 * @category Networks
 */
export interface TankParallelConnection {
  /** Discriminator: `"parallel"`. */
  readonly kind: "parallel";
  /** The parts, at least one. */
  readonly elements: readonly TankNetwork[];
}

/**
 * A two-terminal linear network of lumped parts: the input of {@link tankImpedance}.
 *
 * @category Networks
 */
export type TankNetwork = TankResistor | TankInductor | TankCapacitor | TankSeriesConnection | TankParallelConnection;

/**
 * Anything {@link tankImpedance} accepts: a network, or a result of {@link seriesTank} /
 * {@link parallelTank} (which carry their `network`).
 *
 * @category Networks
 */
export type TankLike = TankNetwork | TankWithNetwork;

/**
 * A tank result that carries its network (what {@link seriesTank} and {@link parallelTank} return).
 *
 * @category Networks
 */
export interface TankWithNetwork {
  /** `"series-tank"` or `"parallel-tank"`. */
  readonly kind: "series-tank" | "parallel-tank";
  /** The tank as a two-terminal network. */
  readonly network: TankNetwork;
}

/**
 * Result of {@link tankImpedanceSweep}: real and imaginary parts of the impedance, one entry per
 * frequency.
 *
 * @category Networks
 */
export interface TankImpedanceSweep {
  /** Resistance (real part) [Ω]. */
  readonly re: Float64Array;
  /** Reactance (imaginary part) [Ω]; > 0 inductive. */
  readonly im: Float64Array;
}

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

const MAX_DEPTH = 64;

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LCL_FIELDS: readonly string[] = Object.freeze(["seriesInductance", "seriesResistance", "inductance", "capacitance", "coilResistance"]);
const LCC_FIELDS: readonly string[] = Object.freeze(["seriesInductance", "seriesResistance", "seriesCapacitance", "parallelCapacitance", "load"]);
const RESISTOR_FIELDS: readonly string[] = Object.freeze(["kind", "resistance"]);
const INDUCTOR_FIELDS: readonly string[] = Object.freeze(["kind", "inductance", "resistance"]);
const CAPACITOR_FIELDS: readonly string[] = Object.freeze(["kind", "capacitance", "resistance"]);
const CONNECTION_FIELDS: readonly string[] = Object.freeze(["kind", "elements"]);

/** Scratch pair for the impedance kernel; evaluation is synchronous, so one buffer suffices. */
const SCRATCH = new Float64Array(2);

/** Checks a network's structure and values; throws InputError naming the path of the bad part. */
function validateNetwork(where: string, path: string, net: unknown, depth: number): void {
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

function resolveNetwork(where: string, value: unknown): TankNetwork {
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

/**
 * Impedance of a validated network at angular frequency `omega`, written into out[0] (real) and
 * out[1] (imaginary). An open circuit is signalled as out[0] = Infinity. Allocates nothing.
 */
function impedanceInto(net: TankNetwork, omega: number, out: Float64Array): void {
  switch (net.kind) {
    case "resistor":
      out[0] = net.resistance;
      out[1] = 0;
      return;
    case "inductor":
      out[0] = net.resistance;
      out[1] = omega * net.inductance;
      return;
    case "capacitor":
      out[0] = net.resistance;
      out[1] = -1 / (omega * net.capacitance);
      return;
    case "series": {
      let re = 0;
      let im = 0;
      for (const part of net.elements) {
        impedanceInto(part, omega, out);
        if (out[0] === Infinity) return;
        re += out[0] as number;
        im += out[1] as number;
      }
      out[0] = re;
      out[1] = im;
      return;
    }
    case "parallel": {
      let gRe = 0;
      let bIm = 0;
      for (const part of net.elements) {
        impedanceInto(part, omega, out);
        const zr = out[0] as number;
        const zi = out[1] as number;
        if (zr === Infinity) continue; // an open branch adds no admittance
        const m2 = zr * zr + zi * zi;
        if (m2 === 0) {
          out[0] = 0; // a short-circuited branch shorts the whole connection
          out[1] = 0;
          return;
        }
        gRe += zr / m2;
        bIm -= zi / m2;
      }
      const y2 = gRe * gRe + bIm * bIm;
      if (y2 === 0) {
        out[0] = Infinity;
        out[1] = 0;
        return;
      }
      out[0] = gRe / y2;
      out[1] = -bIm / y2;
      return;
    }
  }
}

/**
 * Complex impedance of a two-terminal network at a frequency:
 * $Z_R = R$, $Z_L = R + j\omega L$, $Z_C = R_\mathrm{ESR} - j/(\omega C)$, series impedances add,
 * parallel admittances add, $\omega = 2\pi f$.
 *
 * @param network - a {@link TankNetwork}, or the result of {@link seriesTank} / {@link parallelTank}
 * @param frequency - frequency [Hz], > 0
 * @returns the impedance `{ re, im }` [Ω] (the {@link Complex} shape); `im > 0` is inductive
 * @throws {@link InputError} when frequency is not > 0, the network is malformed, or the network
 * is an open circuit at that frequency (a lossless parallel LC exactly at its resonance).
 * Validity: lumped linear parts with frequency-independent values.
 * Accuracy: exact complex arithmetic, ≤ 1e-12 relative vs closed forms in the tests.
 * @see C. K. Alexander and M. N. O. Sadiku, Fundamentals of Electric Circuits, 5th ed.,
 * McGraw-Hill 2013, §9.6–9.7 (impedance and admittance combinations).
 * @example
 * ```ts
 * import { seriesTank, tankImpedance } from "fluxwright";
 * const tank = seriesTank({ inductance: 100e-6, capacitance: 1e-6, resistance: 0.5 });
 * const z = tankImpedance(tank, tank.undampedFrequency);
 * console.log(z.re); // ≈ 0.5
 * console.log(Math.abs(z.im) < 1e-9); // true
 * ```
 * @category Networks
 */
export function tankImpedance(network: TankLike, frequency: number): Complex {
  const where = "tankImpedance";
  const net = resolveNetwork(where, network);
  const f = requirePositive(where, "frequency", frequency, "Hz");
  const out = SCRATCH;
  impedanceInto(net, 2 * Math.PI * f, out);
  const re = out[0] as number;
  const im = out[1] as number;
  if (!Number.isFinite(re) || !Number.isFinite(im)) {
    throw new InputError(where, "frequency", frequency, "Hz", "a frequency at which the network's impedance is finite (not at a lossless parallel resonance)");
  }
  return { re, im };
}

/**
 * The impedance of a network over many frequencies, as two `Float64Array`s.
 *
 * @param network - a {@link TankNetwork}, or the result of {@link seriesTank} / {@link parallelTank}
 * @param frequencies - frequencies [Hz], each > 0
 * @returns `{ re, im }`, arrays of the same length as `frequencies` [Ω]
 * @throws {@link InputError} as {@link tankImpedance}, naming the index of a bad frequency
 * Accuracy: identical to {@link tankImpedance} at each point.
 * @see {@link tankImpedance}
 * @example
 * ```ts
 * import { logSpacedFrequencies, parallelTank, tankImpedanceSweep } from "fluxwright";
 * const tank = parallelTank({ inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 });
 * const z = tankImpedanceSweep(tank, logSpacedFrequencies(1e4, 1e6, 201));
 * console.log(z.re.length); // 201
 * ```
 * @category Networks
 */
export function tankImpedanceSweep(
  network: TankLike,
  frequencies: ArrayLike<number>,
): TankImpedanceSweep {
  const where = "tankImpedanceSweep";
  const net = resolveNetwork(where, network);
  const n = requireArrayLike(where, "frequencies", frequencies, "Hz").length;
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  const out = new Float64Array(2);
  for (let k = 0; k < n; k++) {
    const f = frequencies[k];
    if (typeof f !== "number" || !(f > 0) || f === Infinity) {
      throw new InputError(where, `frequencies[${k}]`, f, "Hz", "a finite number > 0");
    }
    impedanceInto(net, 2 * Math.PI * f, out);
    const zr = out[0] as number;
    const zi = out[1] as number;
    if (!Number.isFinite(zr) || !Number.isFinite(zi)) {
      throw new InputError(where, `frequencies[${k}]`, f, "Hz", "a frequency at which the network's impedance is finite");
    }
    re[k] = zr;
    im[k] = zi;
  }
  return { re, im };
}

/**
 * Log-spaced frequencies from `start` to `stop` inclusive, for sweeps and plots:
 * $f_k = f_\mathrm{start}(f_\mathrm{stop}/f_\mathrm{start})^{k/(n-1)}$.
 *
 * @param start - first frequency [Hz], > 0
 * @param stop - last frequency [Hz], > 0
 * @param count - number of points, integer from 2 to 10⁷ (cost and memory linear in it: 8 bytes a point)
 * @returns the frequencies [Hz]
 * @throws {@link InputError} when start or stop is not > 0 or count is not an integer ≥ 2
 * @example
 * ```ts
 * import { logSpacedFrequencies } from "fluxwright";
 * console.log(Array.from(logSpacedFrequencies(10, 1000, 3))); // [ 10, 100, 1000 ]
 * ```
 * @category Networks
 */
export function logSpacedFrequencies(start: number, stop: number, count: number): Float64Array {
  const where = "logSpacedFrequencies";
  const a = requirePositive(where, "start", start, "Hz");
  const b = requirePositive(where, "stop", stop, "Hz");
  if (typeof count !== "number" || !Number.isInteger(count) || count < 2 || count > MAX_ARRAY_LENGTH) {
    throw new InputError(where, "count", count, "", `an integer between 2 and ${MAX_ARRAY_LENGTH}`);
  }
  const out = new Float64Array(count);
  const ratio = b / a;
  for (let k = 0; k < count; k++) out[k] = a * Math.pow(ratio, k / (count - 1));
  out[0] = a;
  out[count - 1] = b;
  return out;
}
