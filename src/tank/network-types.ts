/**
 * Types of the composable two-terminal networks: parts, connections and sweep results.
 *
 * @packageDocumentation
 */
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
