/**
 * Branded number types: one nominal brand per physical quantity, zero cost at run time.
 *
 * A branded value is a plain `number` to JavaScript; TypeScript keeps a `Metres` from being
 * passed where `Henries` is expected. Library functions accept plain numbers, so JavaScript
 * callers and quick scripts need no ceremony; apps that want the protection brand their values
 * with the constructors below (`metres(0.01)`), which compile to nothing but an identity call.
 *
 * @packageDocumentation
 */

/**
 * A number tagged with a unit symbol at the type level only.
 * @typeParam U - the unit symbol, e.g. `"H"`
 * @category Unit types
 */
export type Quantity<U extends string> = number & UnitTag<U>;

/**
 * The type-level tag carried by a {@link Quantity}; it never exists at run time.
 * @typeParam U - the unit symbol
 * @category Unit types
 */
export interface UnitTag<U extends string> {
  /** The unit symbol (type level only). */
  readonly unit: U;
}

/** Length [m]. @category Unit types */
export type Metres = Quantity<"m">;
/** Area [m²]. @category Unit types */
export type SquareMetres = Quantity<"m²">;
/** Volume [m³]. @category Unit types */
export type CubicMetres = Quantity<"m³">;
/** Inductance [H]. @category Unit types */
export type Henries = Quantity<"H">;
/** Capacitance [F]. @category Unit types */
export type Farads = Quantity<"F">;
/** Resistance, reactance or impedance magnitude [Ω]. @category Unit types */
export type Ohms = Quantity<"Ω">;
/** Resistivity [Ω·m]. @category Unit types */
export type OhmMetres = Quantity<"Ω·m">;
/** Frequency [Hz]. @category Unit types */
export type Hertz = Quantity<"Hz">;
/** Angular frequency [rad/s]. @category Unit types */
export type RadiansPerSecond = Quantity<"rad/s">;
/** Magnetic flux density [T]. @category Unit types */
export type Teslas = Quantity<"T">;
/** Magnetic field strength [A/m]. @category Unit types */
export type AmperesPerMetre = Quantity<"A/m">;
/** Current [A]. @category Unit types */
export type Amperes = Quantity<"A">;
/** Voltage [V]. @category Unit types */
export type Volts = Quantity<"V">;
/** Power [W]. @category Unit types */
export type Watts = Quantity<"W">;
/** Energy [J]. @category Unit types */
export type Joules = Quantity<"J">;
/** Thermodynamic temperature [K]. @category Unit types */
export type Kelvins = Quantity<"K">;
/** Time [s]. @category Unit types */
export type Seconds = Quantity<"s">;
/** Mass [kg]. @category Unit types */
export type Kilograms = Quantity<"kg">;
/** Power density [W/m³] (core loss). @category Unit types */
export type WattsPerCubicMetre = Quantity<"W/m³">;

/**
 * Brands a number as a length in metres (no run-time cost).
 * @param value - length [m]
 * @returns the same number, typed {@link Metres}
 * @example
 * ```ts
 * import { metres } from "fluxwright";
 * console.log(metres(0.025)); // 0.025
 * ```
 * @category Unit types
 */
export const metres = (value: number): Metres => value as Metres;
/**
 * Brands a number as an inductance in henries.
 * @param value - inductance [H]
 * @returns the same number, typed {@link Henries}
 * @example
 * ```ts
 * import { henries } from "fluxwright";
 * console.log(henries(2.2e-6)); // 0.0000022
 * ```
 * @category Unit types
 */
export const henries = (value: number): Henries => value as Henries;
/**
 * Brands a number as a capacitance in farads.
 * @param value - capacitance [F]
 * @returns the same number, typed {@link Farads}
 * @example
 * ```ts
 * import { farads } from "fluxwright";
 * console.log(farads(4.7e-6)); // 0.0000047
 * ```
 * @category Unit types
 */
export const farads = (value: number): Farads => value as Farads;
/**
 * Brands a number as a resistance in ohms.
 * @param value - resistance [Ω]
 * @returns the same number, typed {@link Ohms}
 * @example
 * ```ts
 * import { ohms } from "fluxwright";
 * console.log(ohms(0.022)); // 0.022
 * ```
 * @category Unit types
 */
export const ohms = (value: number): Ohms => value as Ohms;
/**
 * Brands a number as a resistivity in ohm-metres.
 * @param value - resistivity [Ω·m]
 * @returns the same number, typed {@link OhmMetres}
 * @example
 * ```ts
 * import { ohmMetres } from "fluxwright";
 * console.log(ohmMetres(1.7241e-8)); // 1.7241e-8
 * ```
 * @category Unit types
 */
export const ohmMetres = (value: number): OhmMetres => value as OhmMetres;
/**
 * Brands a number as a frequency in hertz.
 * @param value - frequency [Hz]
 * @returns the same number, typed {@link Hertz}
 * @example
 * ```ts
 * import { hertz } from "fluxwright";
 * console.log(hertz(25e3)); // 25000
 * ```
 * @category Unit types
 */
export const hertz = (value: number): Hertz => value as Hertz;
/**
 * Brands a number as a flux density in teslas.
 * @param value - flux density [T]
 * @returns the same number, typed {@link Teslas}
 * @example
 * ```ts
 * import { teslas } from "fluxwright";
 * console.log(teslas(0.2)); // 0.2
 * ```
 * @category Unit types
 */
export const teslas = (value: number): Teslas => value as Teslas;
/**
 * Brands a number as a field strength in amperes per metre.
 * @param value - field strength [A/m]
 * @returns the same number, typed {@link AmperesPerMetre}
 * @example
 * ```ts
 * import { amperesPerMetre } from "fluxwright";
 * console.log(amperesPerMetre(8000)); // 8000
 * ```
 * @category Unit types
 */
export const amperesPerMetre = (value: number): AmperesPerMetre => value as AmperesPerMetre;
/**
 * Brands a number as a current in amperes.
 * @param value - current [A]
 * @returns the same number, typed {@link Amperes}
 * @example
 * ```ts
 * import { amperes } from "fluxwright";
 * console.log(amperes(40)); // 40
 * ```
 * @category Unit types
 */
export const amperes = (value: number): Amperes => value as Amperes;
/**
 * Brands a number as a voltage in volts.
 * @param value - voltage [V]
 * @returns the same number, typed {@link Volts}
 * @example
 * ```ts
 * import { volts } from "fluxwright";
 * console.log(volts(24)); // 24
 * ```
 * @category Unit types
 */
export const volts = (value: number): Volts => value as Volts;
/**
 * Brands a number as a power in watts.
 * @param value - power [W]
 * @returns the same number, typed {@link Watts}
 * @example
 * ```ts
 * import { watts } from "fluxwright";
 * console.log(watts(1500)); // 1500
 * ```
 * @category Unit types
 */
export const watts = (value: number): Watts => value as Watts;
/**
 * Brands a number as an energy in joules.
 * @param value - energy [J]
 * @returns the same number, typed {@link Joules}
 * @example
 * ```ts
 * import { joules } from "fluxwright";
 * console.log(joules(3.6e6)); // 3600000
 * ```
 * @category Unit types
 */
export const joules = (value: number): Joules => value as Joules;
/**
 * Brands a number as a temperature in kelvin (see {@link celsius} to convert from °C).
 * @param value - temperature [K]
 * @returns the same number, typed {@link Kelvins}
 * @example
 * ```ts
 * import { kelvins } from "fluxwright";
 * console.log(kelvins(300)); // 300
 * ```
 * @category Unit types
 */
export const kelvins = (value: number): Kelvins => value as Kelvins;
/**
 * Brands a number as a time in seconds.
 * @param value - time [s]
 * @returns the same number, typed {@link Seconds}
 * @example
 * ```ts
 * import { seconds } from "fluxwright";
 * console.log(seconds(45)); // 45
 * ```
 * @category Unit types
 */
export const seconds = (value: number): Seconds => value as Seconds;
/**
 * Brands a number as a mass in kilograms.
 * @param value - mass [kg]
 * @returns the same number, typed {@link Kilograms}
 * @example
 * ```ts
 * import { kilograms } from "fluxwright";
 * console.log(kilograms(0.85)); // 0.85
 * ```
 * @category Unit types
 */
export const kilograms = (value: number): Kilograms => value as Kilograms;
