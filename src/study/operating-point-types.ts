/**
 * The types of the heater's operating point: what one solved point reports (power by place and
 * every electrical figure), the coil's fixed properties, the coil state the iteration works on,
 * and where a continued solve starts from.
 *
 * @packageDocumentation
 */
import type { Caution, ValidityNote } from "../core/index.js";

/**
 * Power by place at one operating point [W]. The places add up to the supply's input power
 * ({@link HeaterOperatingPoint.inputPower}) to rounding (tested to 1e-9 relative).
 *
 * @category Heater study
 */
export interface HeaterLosses {
  /** In the source's internal resistance [W]. */
  readonly supply: number;
  /** Conduction loss of the inverter switches (estimate from on-resistance) [W]. */
  readonly switches: number;
  /** In the coil conductor and its leads [W]. */
  readonly coil: number;
  /** Dielectric loss of the capacitor bank (from its dissipation factor) [W]. */
  readonly capacitors: number;
  /** Core loss of the flux concentrator [W] (0 without one). */
  readonly core: number;
  /** Into the part: the useful heat [W]. */
  readonly part: number;
}

/**
 * Everything about one operating point of the heater, at one part temperature. Each number
 * comes from a named module function; the inputs it was called with are here too, so every
 * number can be reproduced by calling the module directly.
 *
 * @category Heater study
 */
export interface HeaterOperatingPoint {
  /** Whether the part was present (`false`: the empty coil). */
  readonly withPart: boolean;
  /** Part temperature [K]. */
  readonly partTemperature: number;
  /** Operating (switching) frequency [Hz]. */
  readonly frequency: number;
  /** Inductance of the empty coil [H] (`solenoidInductance` or `spiralCoilInductance`). */
  readonly coilInductance: number;
  /** Inductance change caused by the part [H] (workpiece module; 0 without the part). */
  readonly inductanceChange: number;
  /** Inductance seen at the coil terminals: `coilInductance + inductanceChange` [H] (leads excluded). */
  readonly inductance: number;
  /**
   * Series inductance of the leads [H] (`leadImpedance`; 0 when the study file gives no lead
   * cross-section). The tank resonates with `inductance + leadInductance`.
   */
  readonly leadInductance: number;
  /** The leads' share of `coilResistance` [Ω] (their loss is `leadResistance × coilCurrentRms²`). */
  readonly leadResistance: number;
  /** AC resistance of the coil conductor and leads at the operating frequency [Ω]. */
  readonly coilResistance: number;
  /** Resistance the part reflects into the coil [Ω] (workpiece module). */
  readonly reflectedResistance: number;
  /** Capacitor dielectric loss as an equivalent series resistance in the coil branch [Ω]. */
  readonly capacitorResistance: number;
  /** Concentrator core loss as an equivalent series resistance [Ω]. */
  readonly coreResistance: number;
  /** Switch conduction as a series resistance in the tank (series inverter only, else 0) [Ω]. */
  readonly switchResistance: number;
  /** Total series resistance given to the tank/inverter model [Ω]. */
  readonly tankResistance: number;
  /** Relative permeability of the part used for the coupling (1 without the part). */
  readonly partRelativePermeability: number;
  /** Resistivity of the part at its temperature [Ω·m] (`resistivityAt`). */
  readonly partResistivity: number;
  /** Skin depth in the part [m] (from the coupling result; `null` without the part). */
  readonly partSkinDepth: number | null;
  /** Peak tangential field at the part surface used for the permeability [A/m]: the empty coil's field there at the coil current (finite coil, Biot–Savart). */
  readonly surfaceFieldStrengthPeak: number;
  /** DC voltage at the inverter input, after source and (current-fed) switch drops [V]. */
  readonly inverterInputVoltage: number;
  /** DC current drawn from the supply [A]. */
  readonly supplyCurrent: number;
  /** Supply terminal voltage under load [V]. */
  readonly supplyTerminalVoltage: number;
  /** Peak voltage across the coil branch, coil and leads together (for the parallel tank also the capacitor bank's) [V]. */
  readonly tankVoltagePeak: number;
  /** RMS voltage at the coil's terminals [V]: with lead inductance, the tank voltage less the leads' share (phasor difference). */
  readonly coilVoltageRms: number;
  /** RMS voltage across the leads, both together [V] (`coilCurrentRms × |R_lead + jωL_lead|`). */
  readonly leadVoltageRms: number;
  /** RMS coil current [A]. */
  readonly coilCurrentRms: number;
  /** RMS capacitor-bank voltage [V]. */
  readonly capacitorVoltageRms: number;
  /** RMS capacitor-bank current [A]. */
  readonly capacitorCurrentRms: number;
  /** Reactive power the capacitor bank handles (first harmonic, `tankStresses`) [var]. */
  readonly capacitorReactivePower: number;
  /** Peak energy stored in coil and capacitor (`tankStresses`) [J]. */
  readonly storedEnergyPeak: number;
  /** Peak voltage across an off switch [V]. */
  readonly switchVoltagePeak: number;
  /** Peak current through a switch [A]. */
  readonly switchCurrentPeak: number;
  /** RMS current through one switch [A]. */
  readonly switchCurrentRms: number;
  /** Coil quality factor ωL/R at the operating point. */
  readonly qualityFactor: number;
  /** Power drawn from the source (open-circuit voltage × current) [W]. */
  readonly inputPower: number;
  /** Power by place [W]. */
  readonly losses: HeaterLosses;
  /** Part power over input power. */
  readonly efficiency: number;
  /** Coil (electrical) efficiency R_reflected/(R_reflected + R_coil) (`coilEfficiency`). */
  readonly coilEfficiency: number;
  /** Series inverter: whether it switches at zero voltage (inductive side); `null` for the current-fed inverter. */
  readonly zeroVoltageSwitching: boolean | null;
  /** Iterations the fixed point took. */
  readonly iterations: number;
  /** Hazards the tank and inverter models flagged. */
  readonly cautions: readonly Caution[];
  /** Approximations used at this point. */
  readonly validity: readonly ValidityNote[];
}

/**
 * The empty coil's fixed properties (independent of frequency and part).
 *
 * @category Heater study
 */
export interface CoilProperties {
  /**
   * Inductance of the empty coil from the closed form [H] (`solenoidInductance`, Rosa's
   * uniform-current corrections, or `spiralCoilInductance`): the starting estimate; with the
   * `"cells"` tier the operating point reports the coil-impedance model's value at its frequency.
   */
  readonly inductance: number;
  /**
   * How the operating point computes the coil's own impedance and the part's coupling:
   * `"cells"` (default) the coil-impedance model with skin and proximity effect
   * (`prepareWorkCoil`, reduced fast path) for the empty and the loaded coil; `"closed-form"`
   * Rosa's inductance, the current-sheet resistance and the closed-form coupling (the
   * optimiser's screening tier; errors in `CLOSED_FORM_FIELD_REFERENCE_TOLERANCE`).
   */
  readonly impedanceTier: CoilImpedanceTier;
  /** Conductor length in the coil (turns only) [m]. */
  readonly windingLength: number;
  /** Conductor length including the leads [m] (bus-bar leads excluded: they are bars of their own). */
  readonly conductorLength: number;
  /** Resistivity of the conductor at its working temperature [Ω·m]. */
  readonly resistivity: number;
  /** DC resistance of conductor and leads (bus bars included) [Ω]. */
  readonly dcResistance: number;
  /** Outer diameter of the conductor [m]. */
  readonly conductorDiameter: number;
}

/**
 * How the study computes the coil's impedance: `"cells"` (the coil-impedance model, default) or
 * `"closed-form"` (the screening tier). See {@link CoilProperties.impedanceTier}.
 *
 * @category Heater study
 */
export type CoilImpedanceTier = "cells" | "closed-form" | "field";

/** The coil's state at one frequency and permeability: winding copper and part resistance [Ω], terminal and empty-coil inductance [H] (leads excluded). */
export interface CoilState {
  readonly copper: number;
  readonly part: number;
  readonly L: number;
  readonly emptyL: number;
}

/** A point to start the operating-point iteration from (a neighbouring temperature's solution). */
export interface OperatingPointStart {
  /** Operating frequency [Hz]. */
  readonly frequency: number;
  /** Peak surface field [A/m]. */
  readonly surfaceFieldStrengthPeak: number;
}
