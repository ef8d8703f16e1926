/**
 * One operating point of a heater: the coil, the part's coupling at its temperature, the tank
 * and inverter solved together (frequency and field-dependent permeability iterated to a fixed
 * point), the supply, and where every watt goes. Pure composition of the physics modules.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import {
  leadImpedance,
  litzAcRatio,
  litzDcResistance,
  roundWireAcRatio,
  skinDepth,
  tubeAcResistance,
  wireDcResistance,
  workCoilResistanceCurrentSheet,
} from "../conductors/index.js";
import { sinusoidalPeakFluxDensity, steinmetzLoss } from "../coreloss/index.js";
import { solenoidInductance, spiralCoilInductance } from "../inductance/index.js";
import { relativePermeabilityAt, resistivityAt } from "../materials/index.js";
import { fieldNearCoil } from "../safety/index.js";
import type { SolenoidGeometry } from "../inductance/index.js";
import { integrateAdaptive } from "../special/index.js";
import { andersonStep } from "../special/internal.js";
import {
  capacitorSeriesResistance,
  currentFedParallelInverterWithSource,
  parallelTank,
  seriesInverterWithSource,
  seriesTank,
  tankStresses,
} from "../tank/index.js";
import { currentFedWithSourceFigures } from "../tank/current-fed-figures.js";
import { MU_0 } from "../units/index.js";
import { coilEfficiency, coilOverPlate, prepareEncirclingCoilOverRod, prepareWorkCoil, tubeInLongCoil } from "../workpiece/index.js";
import { nonMagneticWeight, prepareShortPartFactor, shortPartSection, shortPartTier } from "../workpiece/work-coil-short-part.js";
import type { PreparedWorkCoil, ReducedWorkCoil, WorkCoilConductor, WorkCoilPart, WorkCoilPancake, WorkCoilSolenoid } from "../workpiece/index.js";
import { conductorOuterDiameter } from "./read-description.js";
import type { ResolvedConductor, ResolvedHeaterDescription, ResolvedSolenoidCoil } from "./read-description.js";

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

/** Copper area of a resolved conductor as a round-wire equivalent diameter, for DC resistance. */
function conductorDcResistance(conductor: ResolvedConductor, resistivity: number, length: number): number {
  switch (conductor.kind) {
    case "solid":
      return wireDcResistance({ resistivity, length, diameter: conductor.diameter });
    case "litz":
      return litzDcResistance({ construction: { strands: conductor.strands, strandDiameter: conductor.strandDiameter }, resistivity, length });
    case "tube": {
      // tube copper area as the difference of two round wires: 1/R = 1/R_outer − 1/R_bore
      const outer = wireDcResistance({ resistivity, length, diameter: conductor.outerDiameter });
      const bore = wireDcResistance({ resistivity, length, diameter: conductor.outerDiameter - 2 * conductor.wallThickness });
      return 1 / (1 / outer - 1 / bore);
    }
  }
}

/**
 * How the study computes the coil's impedance: `"cells"` (the coil-impedance model, default) or
 * `"closed-form"` (the screening tier). See {@link CoilProperties.impedanceTier}.
 *
 * @category Heater study
 */
export type CoilImpedanceTier = "cells" | "closed-form" | "field";

/** The coil's own properties: inductance (inductance module), conductor length and DC resistance, and the impedance tier. */
export function coilProperties(d: ResolvedHeaterDescription, impedanceTier: CoilImpedanceTier = "cells"): CoilProperties {
  const coil = d.coil;
  const conductorDiameter = conductorOuterDiameter(coil.conductor);
  const resistivity = resistivityAt(coil.conductor.material, coil.temperature);
  let inductance: number;
  let windingLength: number;
  if (coil.shape === "solenoid") {
    inductance = solenoidInductance({ radius: coil.radius, length: coil.length, turns: coil.turns, wireDiameter: conductorDiameter });
    windingLength = coil.turns * 2 * Math.PI * coil.radius;
  } else {
    inductance = spiralCoilInductance({ innerRadius: coil.innerRadius, outerRadius: coil.outerRadius, turns: coil.turns, wireDiameter: conductorDiameter });
    windingLength = coil.turns * Math.PI * (coil.innerRadius + coil.outerRadius);
  }
  const leads = coil.leads;
  if (leads !== null && leads.shape === "flat-pair") {
    // bus-bar leads are conductors of their own: the coil's conductor ends at the winding
    const barDc = (resistivityAt(leads.material, coil.temperature) * coil.leadLength) / (leads.width * leads.thickness);
    const dcResistance = conductorDcResistance(coil.conductor, resistivity, windingLength) + barDc;
    return { inductance, impedanceTier, windingLength, conductorLength: windingLength, resistivity, dcResistance, conductorDiameter };
  }
  const conductorLength = windingLength + coil.leadLength;
  return { inductance, impedanceTier, windingLength, conductorLength, resistivity, dcResistance: conductorDcResistance(coil.conductor, resistivity, conductorLength), conductorDiameter };
}

/** Conductor resistance per metre, isolated (skin effect only) [Ω/m]. */
function isolatedResistancePerMetre(d: ResolvedHeaterDescription, rho: number, frequency: number): number {
  const c = d.coil.conductor;
  switch (c.kind) {
    case "solid":
      return wireDcResistance({ resistivity: rho, length: 1, diameter: c.diameter }) * roundWireAcRatio({ diameter: c.diameter, frequency, resistivity: rho });
    case "tube":
      return tubeAcResistance({ outerDiameter: c.outerDiameter, wallThickness: c.wallThickness, frequency, resistivity: rho });
    case "litz": {
      const construction = { strands: c.strands, strandDiameter: c.strandDiameter };
      return litzDcResistance({ construction, resistivity: rho, length: 1 }) * litzAcRatio({ construction, frequency, resistivity: rho });
    }
  }
}

/** AC resistance of the leads at a frequency [Ω] (isolated conductor of the lead length). */
function leadResistance(d: ResolvedHeaterDescription, props: CoilProperties, frequency: number): number {
  return d.coil.leadLength > 0 ? isolatedResistancePerMetre(d, props.resistivity, frequency) * d.coil.leadLength : 0;
}

/**
 * The leads' series resistance [Ω] and inductance [H] at a frequency. Without a cross-section:
 * the isolated conductor's resistance and no inductance (as before leads had a geometry). With
 * one: `leadImpedance` for a run of half the lead length (a round pair of the coil's conductor,
 * or the bus bars); a litz pair carries a uniform current over its bundle, so its inductance is
 * the exact uniform-current value (μ0ℓ/π)(ln(D/a) + 1/4) and its resistance the litz model's.
 */
export function leadSeriesImpedance(d: ResolvedHeaterDescription, props: CoilProperties, frequency: number): { resistance: number; inductance: number } {
  const leads = d.coil.leads;
  if (leads === null || !(d.coil.leadLength > 0)) return { resistance: leadResistance(d, props, frequency), inductance: 0 };
  const run = d.coil.leadLength / 2;
  const c = d.coil.conductor;
  if (leads.shape === "round-pair") {
    if (c.kind === "litz") {
      const inductance = (MU_0 * run / Math.PI) * (Math.log(leads.spacing / (c.outerDiameter / 2)) + 0.25);
      return { resistance: leadResistance(d, props, frequency), inductance };
    }
    const lead = c.kind === "tube"
      ? { shape: "round-pair" as const, diameter: c.outerDiameter, wallThickness: c.wallThickness, spacing: leads.spacing }
      : { shape: "round-pair" as const, diameter: c.diameter, spacing: leads.spacing };
    const z = leadImpedance({ lead, length: run, frequency, resistivity: props.resistivity });
    return { resistance: z.resistance, inductance: z.inductance };
  }
  const z = leadImpedance({
    lead: { shape: "flat-pair", width: leads.width, thickness: leads.thickness, gap: leads.gap },
    length: run,
    frequency,
    resistivity: resistivityAt(leads.material, d.coil.temperature),
  });
  return { resistance: z.resistance, inductance: z.inductance };
}

/** Closed-form AC resistance of the winding (leads excluded) at a frequency, with the method's validity notes when `notes` is given. */
function closedFormWindingResistance(d: ResolvedHeaterDescription, props: CoilProperties, frequency: number, notes: ValidityNote[] | null): number {
  const coil = d.coil;
  const c = coil.conductor;
  const rho = props.resistivity;
  const delta = skinDepth({ resistivity: rho, frequency });
  if (c.kind === "litz") {
    const construction = { strands: c.strands, strandDiameter: c.strandDiameter };
    const windowBreadth = coil.shape === "solenoid" ? coil.length : coil.outerRadius - coil.innerRadius + props.conductorDiameter;
    const ratio = litzAcRatio({ construction, frequency, resistivity: rho, turns: coil.turns, windowBreadth });
    return litzDcResistance({ construction, resistivity: rho, length: props.windingLength }) * ratio;
  }
  const thickness = c.kind === "tube" ? c.wallThickness : c.diameter / 2;
  if (coil.shape === "solenoid") {
    notes?.push({
      code: "coil-inductance-uniform-current",
      message: `The empty coil's inductance is the current-sheet value with Rosa's corrections for round wire (uniform current in each turn). At working frequencies a turn's current crowds towards its neighbours and the part: against the field solutions of the reference scenarios (4–20 turns, 5–200 kHz) it reads 5.9–19.0 % high (bound ${CLOSED_FORM_COIL_INDUCTANCE_ERROR * 100} %), so the operating frequency reads 4–9 % low (the closed-form tier: the study proper uses the coil-impedance model).`,
      value: CLOSED_FORM_COIL_INDUCTANCE_ERROR,
    });
    const spaceFactor = Math.min(1, (coil.turns * props.conductorDiameter) / coil.length);
    notes?.push({
      code: "coil-resistance-current-sheet",
      message: "Coil resistance from the current-sheet estimate (current in one skin depth of the face towards the part); it ignores current on the sides and back of each turn and the proximity effect between turns, and reads low by an amount not measured here (the coil-impedance model with skin and proximity effect replaces it).",
    });
    if (thickness < 3 * delta) {
      notes?.push({
        code: "coil-conductor-thin",
        message: "The coil conductor (tube wall or wire radius) is thinner than 3 skin depths, so the current-sheet estimate of its resistance reads low.",
        value: thickness / delta,
        limit: 3,
      });
    }
    return (
      workCoilResistanceCurrentSheet({
        innerDiameter: 2 * coil.radius - props.conductorDiameter,
        coilLength: coil.length,
        turns: coil.turns,
        spaceFactor,
        frequency,
        resistivity: rho,
      })
    );
  }
  notes?.push({
    code: "coil-resistance-isolated-conductor",
    message: "Coil resistance from the isolated-conductor skin effect; the proximity effect between turns is not included, so it reads low.",
  });
  return isolatedResistancePerMetre(d, rho, frequency) * props.windingLength;
}

/** Coupling of the part at a frequency, resistivity and permeability. */
interface Coupling {
  readonly reflectedResistance: number;
  readonly inductanceChange: number;
  readonly skinDepth: number;
}

/**
 * The part's coupling to the coil, prepared once per coil and part geometry: the exact
 * coupling at any frequency and material, the peak tangential field at the part surface per
 * RMS ampere of coil current, and the approximations it makes.
 */
interface CouplingModel {
  readonly key: string;
  readonly coupling: (frequency: number, resistivity: number, relativePermeability: number) => Coupling;
  /** A cheap model with the same trends (long-coil solution), corrected to the exact one inside the iteration. */
  readonly surrogate: (frequency: number, resistivity: number, relativePermeability: number) => Coupling;
  /** Peak tangential field strength at the part surface per RMS ampere of coil current [A/m per A]. */
  readonly fieldPerAmpere: number;
  /** Share of the coil's squared field over a part shorter than the coil (1 otherwise). */
  readonly weight: number;
  readonly notes: readonly ValidityNote[];
}

/** Measured error of the part-shorter-than-coil weighting against the field solution (case G). */
export const SHORT_PART_ERROR_NOTE =
  "against the field solution of scenario G (a non-magnetic billet 0.47 × the coil length) this reads the part power 49 % low: the eddy currents close through the part's ends, which the weighting ignores; treat short parts as a lower bound until the field solver replaces it";

/**
 * The study's coupling (coil-impedance tier) against the axisymmetric field solutions of the
 * reference scenarios (test/fixtures/field-reference): the largest relative error of the part's
 * loss at a given coil current, and of ΔL as a fraction of the loaded inductance, per scenario,
 * as measured by test/study/field-reference.test.ts (on top of the fixture's own uncertainty).
 * Measured: part loss within 0.02 % (A, B, D), 0.1 % (C at 1 kHz), 0.04 % (E), 0.17 % (F) and
 * 1.5 % (G, a part shorter than the coil: end-effect factors); ΔL within 0.03 % of the loaded
 * inductance for the solenoids, 0.42 % over aluminium (E), 0.22 % over steel (F), 0.36 % (G).
 */
export const FIELD_REFERENCE_TOLERANCE: Readonly<Record<string, { readonly resistance: number; readonly inductance: number }>> = {
  A: { resistance: 0.001, inductance: 0.0005 },
  B: { resistance: 0.001, inductance: 0.0005 },
  C: { resistance: 0.0015, inductance: 0.0005 },
  D: { resistance: 0.0005, inductance: 0.0005 },
  E: { resistance: 0.001, inductance: 0.005 },
  F: { resistance: 0.0025, inductance: 0.003 },
  G: { resistance: 0.02, inductance: 0.005 },
};

/**
 * The closed-form tier's coupling (the optimiser's screening) against the axisymmetric field solutions of the reference scenarios
 * (test/fixtures/field-reference): the largest relative error of the part power at a given coil
 * current (the reflected resistance against the field solution's part losses), and of ΔL as a
 * fraction of the loaded inductance, per scenario, as measured and checked by
 * test/study/field-reference.test.ts (on top of the fixture's own uncertainty). Measured:
 * bars, billets and tubes longer than the coil (A–D) power −0.3 … −2.6 %, ΔL ≤ 0.7 %; pancake over
 * aluminium (E) power −0.3 … −0.7 %, ΔL up to 18 %; over μr 100 steel (F) power +7.6 … +11.4 %, ΔL 5.8–10.5 %;
 * a billet shorter than the coil (G) power −49 %, ΔL 9.5 %.
 */
export const CLOSED_FORM_FIELD_REFERENCE_TOLERANCE: Readonly<Record<string, { readonly resistance: number; readonly inductance: number }>> = {
  A: { resistance: 0.03, inductance: 0.005 },
  B: { resistance: 0.01, inductance: 0.005 },
  C: { resistance: 0.025, inductance: 0.008 },
  D: { resistance: 0.02, inductance: 0.006 },
  E: { resistance: 0.01, inductance: 0.19 },
  F: { resistance: 0.12, inductance: 0.11 },
  G: { resistance: 0.49, inductance: 0.095 },
};

/**
 * The study's operating point against the field solutions of the reference scenarios with the
 * part's properties fixed (test/study/field-reference-study.test.ts): the largest relative error
 * of the frequency and of the part power, per scenario, on top of the fixture's uncertainty.
 * The targets are 1 % (frequency) and 3 % (part power).
 * Measured: frequency within 0.03–0.09 % and part power within 0.05–0.26 % for A–F (bars,
 * a billet, a tube, pancakes over aluminium and steel, 1–200 kHz); the part shorter than the coil
 * (G) frequency 0.06 %, power −2.5 %.
 */
export const STUDY_FIELD_REFERENCE_TOLERANCE: Readonly<Record<string, { readonly frequency: number; readonly power: number }>> = {
  A: { frequency: 0.0005, power: 0.0015 },
  B: { frequency: 0.001, power: 0.0015 },
  C: { frequency: 0.001, power: 0.003 },
  D: { frequency: 0.0005, power: 0.001 },
  E: { frequency: 0.001, power: 0.0015 },
  F: { frequency: 0.001, power: 0.001 },
  G: { frequency: 0.001, power: 0.03 },
};

/** The empty solenoid's closed-form inductance (Rosa, uniform turn current) against the field solution, largest relative error measured (scenarios A–D, G: 5.9–19.0 % high). */
export const CLOSED_FORM_COIL_INDUCTANCE_ERROR = 0.2;

/** The empty coil's inductance from the study's coil-impedance tier against the field solution, largest relative error (scenarios A–G, every fixture frequency; measured 0.05–0.24 %). */
export const COIL_INDUCTANCE_ERROR = 0.003;

/**
 * Radial extent of the current layer the finite-coil solution gives each solenoid turn: the
 * conductor's whole radial extent, uniform. Against the field solution of scenario A (tube
 * turns, short coil) this reads the reflected resistance 1.8–2.7 % low, where a layer on the
 * face towards the part reads it 7–8 % high: at working frequencies a tube turn's current runs
 * round its whole wall, not only on the bore side.
 */
export function solenoidCurrentLayer(coil: ResolvedSolenoidCoil): { innerRadius: number; outerRadius: number } {
  const dc = conductorOuterDiameter(coil.conductor);
  return { innerRadius: coil.radius - dc / 2, outerRadius: coil.radius + dc / 2 };
}

/**
 * Relative agreement at which the surrogate's correction is taken as converged to the exact
 * model (resistances against the tank resistance, inductance a tenth of it against the
 * inductance): 1e-6, three orders below the exact model's own accuracy.
 */
const AGREEMENT = 1e-6;

/** The coil's state at one frequency and permeability: winding copper and part resistance [Ω], terminal and empty-coil inductance [H] (leads excluded). */
export interface CoilState {
  readonly copper: number;
  readonly part: number;
  readonly L: number;
  readonly emptyL: number;
}

/** The correction of the surrogate to the exact model: resistances by factors, inductances by offsets. */
interface Correction {
  readonly copper: number;
  readonly part: number;
  readonly L: number;
  readonly emptyL: number;
}

function correctionOf(exact: CoilState, cheap: CoilState): Correction {
  return { copper: exact.copper / cheap.copper, part: cheap.part > 0 ? exact.part / cheap.part : 1, L: exact.L - cheap.L, emptyL: exact.emptyL - cheap.emptyL };
}

function corrected(cheap: CoilState, c: Correction): CoilState {
  return { copper: cheap.copper * c.copper, part: cheap.part * c.part, L: cheap.L + c.L, emptyL: cheap.emptyL + c.emptyL };
}

/**
 * An exact model of the coil's state supplied from outside this file (the study's field model,
 * tier `"field"`): the state at a frequency, part resistivity and permeability, given the
 * surrogate's state there and the part temperature.
 */
export interface OutsideCoilModel {
  state(frequency: number, resistivity: number, relativePermeability: number, withPart: boolean, partTemperature: number, cheap: CoilState): CoilState;
  /** Validity notes of the model (replacing the closed forms' and the coil-impedance model's). */
  readonly notes: readonly ValidityNote[];
}

const outsideModels = new WeakMap<CoilProperties, OutsideCoilModel>();

/** Makes the operating points solved with `props` use `model` as their exact coil model. */
export function useOutsideCoilModel(props: CoilProperties, model: OutsideCoilModel): void {
  outsideModels.set(props, model);
}

/** The surrogate correction each solved point ended with: a continued point starts from its neighbour's. */
const corrections = new WeakMap<OperatingPointStart, { withPart: boolean; correction: Correction }>();
const evaluatorCache = new Map<string, { evaluate: ReturnType<typeof prepareEncirclingCoilOverRod>; weight: number; fieldPerAmpere: number }>();
const modelCache = new WeakMap<CoilProperties, CouplingModel>();

/** ∫ f(u) du over [0, hi] (adaptive Gauss–Kronrod of the special module). */
function panelIntegral(fn: (u: number) => number, hi: number): number {
  return integrateAdaptive(fn, 0, hi, { relativeTolerance: 1e-11 }).value;
}

/**
 * The coupling model of a coil and part: finite coil over the rod, tube or ring
 * (`prepareEncirclingCoilOverRod`, weighted by the share of the coil's field over the part's
 * length), or the pancake over the plate (`coilOverPlate`).
 */
function couplingModel(d: ResolvedHeaterDescription, props: CoilProperties): CouplingModel {
  const coil = d.coil;
  const part = d.part;
  const key = JSON.stringify([coil, part.shape, "radius" in part ? part.radius : 0, "outerRadius" in part ? part.outerRadius : 0, "innerRadius" in part ? part.innerRadius : 0, "wallThickness" in part ? part.wallThickness : 0, "length" in part ? part.length : 0, "height" in part ? part.height : 0, "thickness" in part ? part.thickness : 0, "width" in part ? part.width : 0]);
  const cached = modelCache.get(props);
  if (cached !== undefined && cached.key === key) return cached;
  let model: CouplingModel;
  if (coil.shape === "solenoid") {
    if (part.shape === "plate") throw new RangeError("unreachable: plate in a solenoid");
    const layer = solenoidCurrentLayer(coil);
    const radius = part.shape === "bar" ? part.radius : part.outerRadius;
    const bore = part.shape === "bar" ? 0 : part.shape === "tube" ? part.outerRadius - part.wallThickness : part.innerRadius;
    const partLength = part.shape === "ring" ? part.height : part.length;
    const evalKey = JSON.stringify([layer.innerRadius, layer.outerRadius, coil.length, coil.turns, radius, bore, partLength]);
    let entry = evaluatorCache.get(evalKey);
    if (entry === undefined) {
      // turns enter as N² (uniform winding density): prepare for one turn, scale by N²
      const evaluate = prepareEncirclingCoilOverRod({
        coil: { innerRadius: layer.innerRadius, outerRadius: layer.outerRadius, length: coil.length, turns: 1 },
        rod: bore > 0 ? { radius, innerRadius: bore } : { radius },
      });
      // the coil's axial field along the part surface (loops at the layer's mean radius)
      const loops: SolenoidGeometry = { kind: "solenoid", radius: 0.5 * (layer.innerRadius + layer.outerRadius), length: coil.length, turns: coil.turns };
      const hz = (z: number): number => fieldNearCoil(loops, 1, { radialDistance: radius, axialPosition: z }).axial / MU_0;
      const scale = coil.length / 2 + loops.radius;
      const squared = (u: number): number => {
        const h = hz(scale * Math.sinh(u));
        return h * h * Math.cosh(u);
      };
      const full = panelIntegral(squared, 7);
      const span = panelIntegral(squared, Math.asinh(partLength / 2 / scale));
      const weight = Math.min(1, span / full);
      entry = { evaluate, weight, fieldPerAmpere: Math.SQRT2 * Math.abs(hz(0)) };
      if (evaluatorCache.size > 256) evaluatorCache.clear();
      evaluatorCache.set(evalKey, entry);
    }
    const { evaluate, weight, fieldPerAmpere } = entry;
    const n2 = coil.turns * coil.turns * weight;
    const notes: ValidityNote[] = [
      {
        code: "finite-coil-coupling",
        message:
          "Part coupling from the finite-coil solution (Dodd–Deeds–Luquire, prepareEncirclingCoilOverRod) with each turn's current spread uniformly over the conductor's radial extent and the part as infinitely long, weighted by the share of the empty coil's squared axial field at the part surface that lies over the part's length. Against field solutions with solid turns (scenarios A–D: short and long coils, μr 50–100 bars, a billet, a tube; 5–200 kHz) the part power reads 0.3–2.6 % low and ΔL is within 0.7 % of the loaded inductance.",
      },
    ];
    if (partLength < coil.length) {
      notes.push({
        code: "part-shorter-than-coil",
        message: `The part is shorter than the coil: its coupling is the infinite part's, weighted by the share of the coil's squared field over the part's length (${(weight * 100).toFixed(1)} %); the part's own end effects are ignored (${SHORT_PART_ERROR_NOTE}).`,
        value: partLength / coil.length,
        limit: 1,
      });
    }
    const longCoil = { innerRadius: layer.innerRadius, length: coil.length, turns: coil.turns };
    model = {
      key,
      fieldPerAmpere,
      weight: partLength < coil.length ? weight : 1,
      notes,
      surrogate: (f, rho, mur) => {
        const r = tubeInLongCoil({ coil: longCoil, tube: { outerRadius: radius, innerRadius: bore, resistivity: rho, relativePermeability: mur }, frequency: f });
        return { reflectedResistance: r.reflectedResistance, inductanceChange: r.inductanceChange, skinDepth: r.skinDepth };
      },
      coupling: (f, rho, mur) => {
        const z = evaluate(f, rho, mur);
        return { reflectedResistance: n2 * z.reflectedResistance, inductanceChange: n2 * z.inductanceChange, skinDepth: Math.sqrt((2 * rho) / (2 * Math.PI * f * MU_0 * mur)) };
      },
    };
  } else {
    if (part.shape !== "plate") throw new RangeError("unreachable: pancake coil over a non-plate part");
    const dc = props.conductorDiameter;
    const geometry = { innerRadius: coil.innerRadius - dc / 2, outerRadius: coil.outerRadius + dc / 2, liftOff: coil.liftOff, length: dc, turns: coil.turns };
    const notes: ValidityNote[] = [
      {
        code: "plate-coupling",
        message:
          "Plate coupling from the coil over an infinitely wide plate (Dodd & Deeds, coilOverPlate) with the turns as one winding of uniform current density. Against the field solution with solid turns (scenario E, 8 tube turns over aluminium, 20 kHz) the part power reads 0.3–0.7 % low and ΔL is up to 18 % of the loaded inductance too negative (part of it the change of the turns' own current distribution, the coil model's share); over a μr 100 steel plate (scenario F) the part power reads 11 % high.",
      },
    ];
    const halfSpan = Math.min(part.length, part.width) / 2;
    if (halfSpan < 1.5 * (coil.outerRadius + dc / 2)) {
      notes.push({
        code: "plate-not-wide",
        message: "The plate is modelled as infinitely wide (Dodd & Deeds); its half-width is less than 1.5 × the coil's outer radius, so edge effects may matter.",
        value: halfSpan,
        limit: 1.5 * (coil.outerRadius + dc / 2),
      });
    }
    // tangential field at the plate surface: twice the empty coil's radial field there (the
    // image of the coil in a plate that excludes the normal field), largest over radius
    const loops = Array.from({ length: coil.turns }, (_, i) => ({ radius: coil.turns === 1 ? coil.innerRadius : coil.innerRadius + (i * (coil.outerRadius - coil.innerRadius)) / (coil.turns - 1) }));
    let peak = 0;
    for (let i = 1; i <= 80; i++) {
      const r = (i / 80) * (coil.outerRadius + 2 * dc);
      const b = fieldNearCoil(loops, 1, { radialDistance: r, axialPosition: -(coil.liftOff + dc / 2) });
      peak = Math.max(peak, Math.abs(b.radial));
    }
    // surrogate: the plate's thickness as the wall of a tube of the coil's radius in a long coil
    const outer = geometry.outerRadius;
    const surrogateCoil = { innerRadius: outer + coil.liftOff + dc, length: 2 * outer, turns: coil.turns };
    const surrogateBore = Math.max(0, outer - part.thickness);
    model = {
      key,
      fieldPerAmpere: (2 * Math.SQRT2 * peak) / MU_0,
      weight: 1,
      notes,
      surrogate: (f, rho, mur) => {
        const r = tubeInLongCoil({ coil: surrogateCoil, tube: { outerRadius: outer, innerRadius: surrogateBore, resistivity: rho, relativePermeability: mur }, frequency: f });
        return { reflectedResistance: r.reflectedResistance, inductanceChange: r.inductanceChange, skinDepth: r.skinDepth };
      },
      coupling: (f, rho, mur) => {
        const r = coilOverPlate({ coil: geometry, plate: { thickness: part.thickness, resistivity: rho, relativePermeability: mur }, frequency: f });
        return { reflectedResistance: r.reflectedResistance, inductanceChange: r.inductanceChange, skinDepth: r.skinDepth };
      },
    };
  }
  modelCache.set(props, model);
  return model;
}


/**
 * Mesh refinement of the study's coil-impedance model (`prepareWorkCoil`): 0.5, the coarsest,
 * keeps the reduced model's build within a few hundred milliseconds for the demo coils. Measured
 * against the field solutions of scenarios A–F (test/fixtures/field-reference) at this
 * refinement: empty and loaded inductance within 0.17 %, the part's loss within 0.05 %, the
 * loaded coil's copper loss within 1.6 %.
 */
export const STUDY_COIL_REFINEMENT = 0.5;

/**
 * The coil-impedance tier's error for a part shorter than the coil (the long part's exact
 * coupling times the end-effect factor of `prepareShortPartFactor`, corrected towards the
 * model's own cells for a non-magnetic part), measured against the library's axisymmetric field
 * solver (scripts/measurements/short-part-grid.ts, table in docs/workpiece.md: tube solenoids
 * of length/diameter 0.3, 1, 2 and 4 with 3–20 turns; bars and rings 0.3–0.9 × the coil's
 * length, centred; μr 1, 20, 100, 600; 3–150 skin depths; metal resistivities 1.5e-8–1.5e-6
 * Ω·m; the field solver itself within 1e-3 of scikit-fem on four of these points,
 * test/fixtures/short-part): the largest relative error of the part's loss at a given coil
 * current (the reflected resistance the study reports), and of ΔL as a fraction of the empty
 * coil's inductance, by the tier of the part's thinnest section w — the radial section or half
 * the part's length, whichever is smaller (`shortPartSection`) — against δ and μr·δ
 * (`shortPartTier`): `thick` (w ≥ 100 δ and ≥ 0.15 μr·δ), `general` (w ≥ 5 δ), `thin`
 * (w < 5 δ), `outside` (w < 0.15 μr·δ: the flux crosses the section, which a surface impedance
 * cannot hold; the largest error seen, not a bound). Measured: thick 6.1 % and 1.09 %, general
 * 9.2 % and 1.16 %, thin 24.2 % and 4.35 % (with scripts/measurements/short-magnetic-part.ts on
 * the bearing-race coil, μr 3–300: the thin and general maxima are its μr 3 ring), outside up to
 * 24 × and 78 %. Measured with the radial section alone and 0.09 μr·δ, as before, short discs
 * landed in the `general` tier with errors up to 51 %, and sections of 0.09–0.15 μr·δ up to 21 %.
 */
export const SHORT_PART_ERROR = {
  thick: { resistance: 0.065, inductance: 0.011 },
  general: { resistance: 0.095, inductance: 0.012 },
  thin: { resistance: 0.25, inductance: 0.044 },
  outside: { resistance: 25, inductance: 0.79 },
} as const;

/** The validity note of a part shorter than the coil at an operating point (coil-impedance tier): the measured error bound that applies. */
function shortPartNote(d: ResolvedHeaterDescription, frequency: number, resistivity: number, relativePermeability: number, note: ValidityNote): ValidityNote {
  const part = d.part;
  const radial = part.shape === "bar" ? part.radius : part.shape === "tube" ? part.wallThickness : part.shape === "ring" ? part.outerRadius - part.innerRadius : part.thickness;
  const length = part.shape === "ring" ? part.height : part.shape === "plate" ? Infinity : part.length;
  const section = shortPartSection(radial, 0, length);
  const delta = skinDepth({ resistivity, frequency, relativePermeability });
  const depths = section / delta;
  const flux = section / (relativePermeability * delta);
  const tierName = shortPartTier(section, delta, relativePermeability);
  const tier = SHORT_PART_ERROR[tierName];
  const range =
    tierName !== "outside"
      ? `here the part's thinnest section (radial section or half its length) is ${depths.toPrecision(3)} skin depths and ${flux.toPrecision(2)} × μr·δ, where the field solver puts it within ${+(100 * tier.resistance).toPrecision(3)} % (the part's loss at a given coil current) and ${+(100 * tier.inductance).toPrecision(3)} % of the empty coil's inductance (ΔL)`
      : `here the part's thinnest section (radial section or half its length) is only ${flux.toPrecision(2)} × μr·δ (flux crosses the whole section, which a surface impedance cannot hold; the model needs ≥ 0.15): outside the model's range, where the field solver found errors up to ${tier.resistance} × (the part's loss) and ${+(100 * tier.inductance).toPrecision(3)} % of the empty coil's inductance; use the field model for this part`;
  return {
    ...note,
    message: `The part is shorter than the coil: the long part's exact coupling is scaled by a complex end-effect factor from a surface-impedance model of the short and the long part (Leontovich condition, ψ = p ∂ψ/∂n with p = (1 − j)μrδ/2, solved by a boundary-element method), corrected towards the coil-impedance model's own cells for the non-magnetic part (weight 1 at μr = 1 falling to 0 at μr = 20); ${range}. Measured against the library's axisymmetric field solver over solenoids of length/diameter 0.3–4, bars and rings 0.3–0.9 × the coil length, μr 1–600, 3–150 skin depths.`,
    value: depths,
  };
}

/** The validity note of the coil-impedance tier (numbers measured by test/study/field-reference.test.ts). */
const CELL_MODEL_NOTE: ValidityNote = {
  code: "coil-impedance-model",
  message:
    "The coil's own resistance and inductance, empty and with the part, come from the coil-impedance model (prepareWorkCoil at refinement 0.5, reduced fast path: each turn split into ring cells, skin and proximity effect in the conductor, the part through the Dodd–Deeds kernels). Against the field solutions of the reference scenarios with solid turns (A–F: 4–20-turn solenoids around bars and a tube, a pancake over aluminium and μr 100 steel; 1–200 kHz) the empty inductance is within 0.24 %, the part's loss within 0.17 % and ΔL within 0.42 % of the loaded inductance; the study's frequency within 0.09 % and part power within 0.26 % (test/study/field-reference-study.test.ts). Leads are added from their length as an isolated conductor.",
};

/** A coil-impedance model prepared for one coil and part geometry over a frequency band. */
interface CellEntry {
  prepared: PreparedWorkCoil;
  reduced: ReducedWorkCoil;
  fMin: number;
  fMax: number;
}

/** The prepared coil-impedance models by coil and part geometry (`null`: outside the model's domain, the closed form is used). */
const cellCache = new Map<string, { coil: WorkCoilSolenoid | WorkCoilPancake; part: WorkCoilPart; entry: CellEntry | null; failed: boolean; ends: Map<string, EndFactors> }>();

/** The study's coil as a `workCoilImpedance` coil. */
function workCoilOf(d: ResolvedHeaterDescription, props: CoilProperties): WorkCoilSolenoid | WorkCoilPancake {
  const coil = d.coil;
  const c = coil.conductor;
  const conductor: WorkCoilConductor =
    c.kind === "tube"
      ? { kind: "tube", outerDiameter: c.outerDiameter, wallThickness: c.wallThickness }
      : c.kind === "solid"
        ? { kind: "round", diameter: c.diameter }
        : { kind: "litz", strands: c.strands, strandDiameter: c.strandDiameter };
  if (coil.shape === "solenoid") return { shape: "solenoid", radius: coil.radius, length: coil.length, turns: coil.turns, conductor, resistivity: props.resistivity };
  const pitch = coil.turns > 1 ? (coil.outerRadius - coil.innerRadius) / (coil.turns - 1) : 2 * props.conductorDiameter;
  return { shape: "pancake", innerRadius: coil.innerRadius, pitch, turns: coil.turns, conductor, resistivity: props.resistivity };
}

/** The study's part as a `workCoilImpedance` part (its material is given per evaluation). */
function workPartOf(d: ResolvedHeaterDescription): WorkCoilPart {
  const part = d.part;
  const material = { resistivity: 1e-7, relativePermeability: 2 };
  switch (part.shape) {
    case "bar":
      return { shape: "bar", radius: part.radius, length: part.length, ...material };
    case "tube":
      return { shape: "tube", radius: part.outerRadius, innerRadius: part.outerRadius - part.wallThickness, length: part.length, ...material };
    case "ring":
      return { shape: "tube", radius: part.outerRadius, innerRadius: part.innerRadius, length: part.height, ...material };
    case "plate":
      return { shape: "plate", radius: Math.min(part.length, part.width) / 2, thickness: part.thickness, gap: d.coil.shape === "pancake" ? d.coil.liftOff : 0, ...material };
  }
}

/**
 * The frequency band of the study's coil-impedance model, from the description alone (so that a
 * study's numbers do not depend on what ran before it): whole octaves around the empty coil's
 * closed-form resonance ÷/× 2√2 (a part moves the loaded resonance by less than √2 either way
 * for ΔL/L from −0.5 to +1), widened to a fixed switching frequency and, for a power-tracking
 * series inverter, to 4 × the resonance.
 */
function studyBand(d: ResolvedHeaterDescription, props: CoilProperties): [number, number] {
  const resonance = 1 / (2 * Math.PI * Math.sqrt(props.inductance * d.capacitor.capacitance));
  let lo = resonance / (2 * Math.SQRT2);
  let hi = resonance * 2 * Math.SQRT2;
  const inv = d.inverter;
  if (inv.kind === "voltage-fed-series") {
    if (inv.control === "fixed" && inv.frequency !== null) {
      lo = Math.min(lo, inv.frequency / 1.5);
      hi = Math.max(hi, inv.frequency * 1.5);
    } else hi = Math.max(hi, 4 * resonance);
  }
  return [2 ** Math.floor(Math.log2(lo)), 2 ** Math.ceil(Math.log2(hi))];
}

/**
 * End effects of a part shorter than the coil: the copper change's factor (exact short
 * non-magnetic part over the long one at the start resistivity), the surface-impedance model's
 * complex short-over-long ratio F(μrδ/2) (`prepareShortPartFactor`), and a table of its
 * correction to the exact non-magnetic part (the model's own cells), as [log |c|, arg c] by
 * node k of t = 2^(k/2) m, filled when first needed.
 */
interface EndFactors {
  readonly copper: number;
  readonly factor: (t: number) => [number, number];
  readonly cells: Map<number, [number, number]>;
}

/** (a + jb)/(c + jd) as [re, im]. */
function complexRatio(a: number, b: number, c: number, d: number): [number, number] {
  const den = c * c + d * d;
  return [(a * c + b * d) / den, (b * c - a * d) / den];
}

/**
 * The coil-impedance model's state at a frequency and part material (the reduced fast path of
 * `prepareWorkCoil`, built once per coil, part geometry and band and kept for later studies;
 * outside its band the reduced model extrapolates, which the operating point reports), or
 * `null` when the geometry is outside the model's domain.
 *
 * A part shorter than the coil: the reduced model holds the infinitely long part; its
 * impedance change is multiplied by a complex end-effect factor (see {@link EndFactors}): the
 * exact short non-magnetic part over the long one (the model's own part cells, computed once
 * per geometry at the start resistivity and the band's centre), blended with the
 * surface-impedance model's factor at μrδ/2 by weights 1/μr and 1 − 1/μr; the copper's change
 * is scaled by the non-magnetic factor. Errors: {@link SHORT_PART_ERROR}.
 */
function cellState(d: ResolvedHeaterDescription, props: CoilProperties, frequency: number, resistivity: number, relativePermeability: number, withPart: boolean): CoilState | null {
  const coil = workCoilOf(d, props);
  const part = workPartOf(d);
  const [fMin, fMax] = studyBand(d, props);
  const key = JSON.stringify([coil, part, fMin, fMax]);
  let slot = cellCache.get(key);
  if (slot === undefined) {
    slot = { coil, part, entry: null, failed: false, ends: new Map() };
    if (cellCache.size >= 64) cellCache.delete(cellCache.keys().next().value as string);
    cellCache.set(key, slot);
  }
  if (slot.failed) return null;
  let entry = slot.entry;
  try {
    if (entry === null) {
      const prepared = prepareWorkCoil({ coil, frequency: fMax, refinement: STUDY_COIL_REFINEMENT });
      entry = { prepared, reduced: prepared.reduce({ part, minFrequency: fMin, maxFrequency: fMax }), fMin, fMax };
      slot.entry = entry;
    }
    const z = entry.reduced.impedance(frequency, resistivity, relativePermeability);
    if (!withPart) return { copper: z.emptyResistance, part: 0, L: z.emptyInductance, emptyL: z.emptyInductance };
    const partLength = part.shape === "plate" ? Infinity : part.length;
    if (coil.shape !== "solenoid" || part.shape === "plate" || !(partLength < coil.length)) {
      return { copper: z.copperResistance, part: z.partResistance, L: z.emptyInductance + z.inductanceChange, emptyL: z.emptyInductance };
    }
    const rhoStart = resistivityAt(d.part.material, d.part.startTemperature);
    const centre = Math.sqrt(entry.fMin * entry.fMax);
    const endsKey = `${rhoStart}|${centre}`;
    let ends = slot.ends.get(endsKey);
    if (ends === undefined) {
      const exact = entry.prepared.impedance(centre, { ...part, resistivity: rhoStart, relativePermeability: 1 });
      const long = entry.reduced.impedance(centre, rhoStart, 1);
      const copperLong = long.copperResistance - long.emptyResistance;
      const copperExact = exact.copperResistance - exact.emptyResistance;
      const turns = coil.turns;
      const factor = prepareShortPartFactor({
        coilRadius: coil.radius,
        turnPositions: Array.from({ length: turns }, (_, i) => coil.length * ((i + 0.5) / turns - 0.5)),
        outerRadius: part.radius,
        innerRadius: part.shape === "tube" ? part.innerRadius : 0,
        length: part.length,
      });
      ends = {
        copper: Math.abs(copperLong) > 1e-3 * long.emptyResistance ? Math.min(2, Math.max(0, copperExact / copperLong)) : 1,
        factor,
        cells: new Map(),
      };
      slot.ends.set(endsKey, ends);
    }
    const w = 2 * Math.PI * frequency;
    const t = (relativePermeability * skinDepth({ resistivity, frequency, relativePermeability })) / 2;
    let [gr, gi] = ends.factor(t);
    const weight = nonMagneticWeight(relativePermeability);
    if (weight > 0) {
      // the surface-impedance factor corrected towards the exact non-magnetic part (own cells)
      // at the non-magnetic skin depth, table in log t half an octave apart, linear between
      const wc = 2 * Math.PI * centre;
      const table = ends.cells;
      const e = ends;
      const node = (k: number): [number, number] => {
        let v = table.get(k);
        if (v === undefined) {
          const tk = 2 ** (k / 2);
          const rho = (wc * MU_0 * (2 * tk) ** 2) / 2;
          const exact = entry!.prepared.impedance(centre, { ...part, resistivity: rho, relativePermeability: 1 });
          const long = entry!.reduced.impedance(centre, rho, 1);
          const [kr, ki] = complexRatio(exact.partResistance, wc * exact.inductanceChange, long.partResistance, wc * long.inductanceChange);
          const [fr, fi] = e.factor(tk);
          const [cr, ci] = complexRatio(kr, ki, fr, fi);
          v = [Math.log(Math.hypot(cr, ci)), Math.atan2(ci, cr)];
          table.set(k, v);
        }
        return v;
      };
      const x = 2 * Math.log2(skinDepth({ resistivity, frequency }) / 2);
      const k0 = Math.floor(x);
      const u = x - k0;
      const [a0, p0] = node(k0);
      const [a1, p1] = node(k0 + 1);
      const magnitude = Math.exp(weight * ((1 - u) * a0 + u * a1));
      const phase = weight * ((1 - u) * p0 + u * p1);
      const cr = magnitude * Math.cos(phase);
      const ci = magnitude * Math.sin(phase);
      [gr, gi] = [gr * cr - gi * ci, gr * ci + gi * cr];
    }
    const zr = z.partResistance;
    const zi = w * z.inductanceChange;
    return {
      copper: z.emptyResistance + ends.copper * (z.copperResistance - z.emptyResistance),
      part: gr * zr - gi * zi,
      L: z.emptyInductance + (gr * zi + gi * zr) / w,
      emptyL: z.emptyInductance,
    };
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    slot.failed = true;
    return null;
  }
}

/** A point to start the operating-point iteration from (a neighbouring temperature's solution). */
export interface OperatingPointStart {
  /** Operating frequency [Hz]. */
  readonly frequency: number;
  /** Peak surface field [A/m]. */
  readonly surfaceFieldStrengthPeak: number;
}

/**
 * Thrown when the loaded current-fed tank cannot oscillate for any permeability the part can
 * take at this temperature (its resistance exceeds √(L/C) for every field strength).
 */
export class NoOscillationError extends InputError {}

/**
 * Solves one operating point of the heater at a part temperature: frequency and the part's
 * field-dependent permeability to a fixed point, the tank, the inverter and the source.
 *
 * The iteration starts from `start` (a neighbouring temperature's solution: continuation) or,
 * without one, from the empty coil's resonance and the field its current produces at the part
 * surface; it is accelerated (Anderson, depth 1) and damped back towards the last iterate the
 * inverter could run at. When that fails, a bracketing search over the surface field (each
 * field with its own frequency fixed point) finds the self-consistent field; if the inverter can
 * run at no field strength, the design's limit is thrown: {@link NoOscillationError} when the
 * current-fed tank cannot oscillate for any permeability the part can take, else the
 * inverter's own {@link InputError} (e.g. a target power the source cannot deliver).
 *
 * @param d - resolved description
 * @param partTemperature - part temperature [K]
 * @param withPart - `false` for the empty coil
 * @param props - the coil's own properties (from {@link coilProperties})
 * @param start - where to start the iteration (a neighbouring solution), or `null`
 */
export function heaterOperatingPoint(
  d: ResolvedHeaterDescription,
  partTemperature: number,
  withPart: boolean,
  props: CoilProperties = coilProperties(d),
  start: OperatingPointStart | null = null,
): HeaterOperatingPoint {
  const inv = d.inverter;
  const cap = d.capacitor;
  const L0 = props.inductance;
  const C = cap.capacitance;
  const model = withPart ? couplingModel(d, props) : null;
  const partResistivity = resistivityAt(d.part.material, partTemperature);
  const fixedFrequency = inv.kind === "voltage-fed-series" && inv.control === "fixed" && inv.frequency !== null ? inv.frequency : null;

  // the exact coil and coupling are costly: the iteration runs on the closed-form surrogate
  // (current-sheet resistance, Rosa's inductance, long-coil coupling) corrected to the exact value
  // at the last exact evaluation (resistances by factors, inductances by offsets); the outer loop
  // re-evaluates the exact model at the converged point until the correction no longer moves.
  // A continued point starts from its neighbour's correction; otherwise the first evaluation is exact.
  const stored = start !== null ? corrections.get(start) : undefined;
  let correction: Correction | null = stored !== undefined && withPart && stored.withPart ? stored.correction : null;
  let emptyCorrection: Correction | null = stored !== undefined && !withPart && !stored.withPart ? stored.correction : null;
  let cellsUsed = props.impedanceTier === "cells";
  const outside = outsideModels.get(props);
  /** The exact model: the coil-impedance model (cells tier) or the closed form with the finite-coil coupling. */
  function exactState(f: number, mur: number, part: boolean): CoilState {
    if (outside !== undefined) return outside.state(f, partResistivity, mur, part, partTemperature, cheapState(f, mur, part));
    if (cellsUsed) {
      const z = cellState(d, props, f, partResistivity, mur, part && model !== null);
      if (z !== null) return z;
      cellsUsed = false;
    }
    const copper = closedFormWindingResistance(d, props, f, null);
    if (!part || model === null) return { copper, part: 0, L: L0, emptyL: L0 };
    const c = model.coupling(f, partResistivity, mur);
    return { copper, part: c.reflectedResistance, L: L0 + c.inductanceChange, emptyL: L0 };
  }
  /** The cheap surrogate with the same trends. */
  function cheapState(f: number, mur: number, part: boolean): CoilState {
    const copper = closedFormWindingResistance(d, props, f, null);
    if (!part || model === null) return { copper, part: 0, L: L0, emptyL: L0 };
    const c = model.surrogate(f, partResistivity, mur);
    return { copper, part: c.reflectedResistance, L: L0 + c.inductanceChange, emptyL: L0 };
  }
  function coilState(f: number, mur: number, part: boolean): CoilState {
    const slot = part ? correction : emptyCorrection;
    if (slot === null) {
      const exact = exactState(f, mur, part);
      const next = correctionOf(exact, cheapState(f, mur, part));
      if (part) correction = next;
      else emptyCorrection = next;
      return exact;
    }
    return corrected(cheapState(f, mur, part), slot);
  }

  // concentrator: Steinmetz loss at the peak flux the coil voltage drives through its section, as a series resistance
  function evaluateCoreResistance(f: number, current: number, voltagePeak: number): number {
    if (d.concentrator === null || !(voltagePeak > 0) || !(current > 0)) return 0;
    const bPeak = sinusoidalPeakFluxDensity({ voltageRms: voltagePeak / Math.SQRT2, frequency: f, turns: d.coil.turns, coreArea: d.concentrator.crossSectionArea });
    const k = d.concentrator.material.steinmetz;
    const loss = steinmetzLoss({ k: k.k, alpha: k.alpha, beta: k.beta, frequency: f, fluxDensityPeak: bPeak }) * d.concentrator.volume;
    return loss / (current * current);
  }

  // the leads in series with the coil (one-entry cache: the iteration revisits a frequency)
  let leadFrequency = Number.NaN;
  let lead = { resistance: 0, inductance: 0 };
  const leadAt = (f: number): { resistance: number; inductance: number } => {
    if (f !== leadFrequency) {
      lead = leadSeriesImpedance(d, props, f);
      leadFrequency = f;
    }
    return lead;
  };

  function evaluate(f: number, h: number, previousCurrent: number, previousVoltagePeak: number, part: boolean) {
    // the coil's own impedance at f, empty or with the part
    const mur = part ? relativePermeabilityAt(d.part.material, { temperature: partTemperature, fieldStrengthPeak: h }) : 1;
    const st = coilState(f, mur, part && model !== null);
    const { resistance: leadR, inductance: leadL } = leadAt(f);
    const coilResistance = st.copper + leadR;
    const reflectedResistance = st.part;
    const inductanceChange = st.L - st.emptyL;
    // the tank sees the coil and the leads in series
    const L = st.L + leadL;
    // the capacitor's dielectric loss as its equivalent series resistance tanδ/(ωC), in the coil branch
    const capacitorResistance = capacitorSeriesResistance({ capacitance: C, dissipationFactor: cap.dissipationFactor, frequency: f });
    const coreResistance = evaluateCoreResistance(f, previousCurrent, previousVoltagePeak);
    const tankResistance = coilResistance + reflectedResistance + capacitorResistance + coreResistance;
    return { coilResistance, mur, reflectedResistance, inductanceChange, L, coilL: st.L, leadR, leadL, emptyL: st.emptyL, capacitorResistance, coreResistance, tankResistance, f, h };
  }
  type Evaluation = ReturnType<typeof evaluate>;
  /** Peak voltage at the coil's terminals: the tank's voltage less the leads' share (the same without lead inductance). */
  const coilVoltagePeakOf = (e: Evaluation, s: { coilCurrentRms: number; tankVoltagePeak: number }): number =>
    e.leadL > 0 ? Math.SQRT2 * s.coilCurrentRms * Math.hypot(e.tankResistance - e.capacitorResistance - e.leadR, 2 * Math.PI * e.f * e.coilL) : s.tankVoltagePeak;

  function solveInverter(e: Evaluation, final: boolean) {
    const Rint = d.supply.internalResistance;
    const Vs = d.supply.voltage;
    if (inv.kind === "current-fed-parallel") {
      const op = currentFedParallelInverterWithSource({
        sourceVoltage: Vs,
        sourceResistance: Rint,
        switchOnResistance: inv.switchOnResistance,
        inductance: e.L,
        capacitance: C,
        coilResistance: e.tankResistance,
        chokeInductance: inv.chokeInductance,
      });
      const st = final ? tankStresses(parallelTank({ inductance: e.L, capacitance: C, coilResistance: e.tankResistance }), { frequency: op.frequency, voltageRms: op.tankVoltageRms }) : null;
      return {
        reactivePower: st?.capacitorReactivePower ?? 0,
        storedEnergyPeak: st?.storedEnergyPeak ?? 0,
        coilVoltageRmsStress: st?.coilVoltageRms ?? op.tankVoltageRms,
        frequency: op.frequency,
        vin: op.inputVoltage,
        terminalVoltage: op.terminalVoltage,
        supplyCurrent: op.sourceCurrent,
        sourcePower: op.sourcePower,
        sourceLoss: op.sourceLoss,
        coilCurrentRms: op.coilCurrentRms,
        tankVoltagePeak: op.tankVoltagePeak,
        capacitorVoltageRms: op.tankVoltageRms,
        capacitorCurrentRms: op.capacitorCurrentRmsWithHarmonics,
        switchVoltagePeak: op.switchVoltagePeak,
        switchCurrentPeak: op.switchCurrentPeak,
        switchCurrentRms: op.switchCurrentRms,
        switchLoss: op.switchConductionLoss,
        switchResistance: 0,
        qualityFactor: op.qualityFactor,
        zvs: null,
        cautions: op.cautions,
        validity: op.validity,
      };
    }
    const common = {
      sourceVoltage: Vs,
      sourceResistance: Rint,
      bridge: inv.bridge,
      inductance: e.L,
      capacitance: C,
      resistance: e.tankResistance,
      switchOnResistance: inv.switchOnResistance,
    };
    const op = seriesInverterWithSource(fixedFrequency !== null ? { ...common, switchingFrequency: fixedFrequency } : { ...common, power: inv.targetPower ?? 0 });
    const st = tankStresses(seriesTank({ inductance: e.L, capacitance: C, resistance: op.tankResistance }), { frequency: op.switchingFrequency, currentRms: op.currentRms });
    return {
      reactivePower: st.capacitorReactivePower,
      storedEnergyPeak: st.storedEnergyPeak,
      coilVoltageRmsStress: st.coilVoltageRms,
      frequency: op.switchingFrequency,
      vin: op.inputVoltage,
      terminalVoltage: op.terminalVoltage,
      supplyCurrent: op.sourceCurrent,
      sourcePower: op.sourcePower,
      sourceLoss: op.sourceLoss,
      coilCurrentRms: op.currentRms,
      tankVoltagePeak: Math.SQRT2 * st.coilVoltageRms,
      capacitorVoltageRms: op.capacitorVoltageRms,
      capacitorCurrentRms: op.currentRms,
      switchVoltagePeak: op.inputVoltage,
      switchCurrentPeak: op.switchCurrentPeak,
      switchCurrentRms: op.switchCurrentRms,
      switchLoss: op.switchConductionLoss,
      switchResistance: op.tankResistance - e.tankResistance,
      qualityFactor: (2 * Math.PI * op.switchingFrequency * e.L) / op.tankResistance,
      zvs: op.zeroVoltageSwitching,
      cautions: op.cautions,
      validity: [] as readonly ValidityNote[],
    };
  }
  /**
   * What the fixed-point iteration reads of an inverter solution. The current-fed inverter's
   * come from its allocation-free kernel (the same numbers as `solveInverter`, which builds the
   * whole result with its cautions on every call); the final point is solved in full below.
   * Its arguments must stay those of the current-fed call in `solveInverter`.
   */
  type Solution = Pick<ReturnType<typeof solveInverter>, "frequency" | "coilCurrentRms" | "tankVoltagePeak">;
  const figures = new Float64Array(3);
  const figureScratch = new Float64Array(7);
  function solveStep(e: Evaluation): Solution {
    if (
      inv.kind === "current-fed-parallel" &&
      currentFedWithSourceFigures(d.supply.voltage, d.supply.internalResistance, inv.switchOnResistance, e.L, C, e.tankResistance, inv.chokeInductance, figures, figureScratch)
    ) {
      return { frequency: figures[0]!, coilCurrentRms: figures[1]!, tankVoltagePeak: figures[2]! };
    }
    // the other inverters, and the public function's error where the kernel declines
    return solveInverter(e, false);
  }
  const fieldOf = (s: Solution): number => (model === null ? 0 : model.fieldPerAmpere * s.coilCurrentRms);

  // the starting iterate: a neighbour's solution, else the empty coil's resonance and its field
  const coilResonance = 1 / (2 * Math.PI * Math.sqrt(L0 * C));
  let f0 = fixedFrequency ?? 1 / (2 * Math.PI * Math.sqrt((L0 + leadAt(coilResonance).inductance) * C));
  let h0 = 0;
  let emptyField = 0;
  if (withPart) {
    try {
      const empty = solveStep(evaluate(f0, 0, 0, 0, false));
      f0 = fixedFrequency ?? empty.frequency;
      emptyField = fieldOf(empty);
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
    }
    h0 = emptyField;
    // continuation from a neighbour's solution (an empty-coil start carries no field: keep the estimate)
    if (start !== null && start.surfaceFieldStrengthPeak > 0) {
      f0 = fixedFrequency ?? start.frequency;
      h0 = start.surfaceFieldStrengthPeak;
    }
  }

  /** Anderson-accelerated, damped fixed point from (f, h); `null` when it cannot proceed. */
  function iterate(frequency: number, field: number): { e: Evaluation; s: Solution; iterations: number; converged: boolean } | null {
    let coilCurrent = 0;
    let coilVoltagePeak = 0;
    let e: Evaluation;
    let s: Solution;
    try {
      e = evaluate(frequency, field, coilCurrent, coilVoltagePeak, withPart);
      s = solveStep(e);
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      return null;
    }
    let previous = false;
    let previousX = [0, 0];
    let previousG = [0, 0];
    const next = [0, 0];
    let iterations = 1;
    for (; iterations < 80; iterations++) {
      const newField = fieldOf(s);
      const df = Math.abs(s.frequency - frequency) / frequency;
      const dh = Math.abs(newField - field) / Math.max(newField, 1);
      const nextCore = d.concentrator === null ? 0 : evaluateCoreResistance(s.frequency, s.coilCurrentRms, coilVoltagePeakOf(e, s));
      const dc = Math.abs(nextCore - e.coreResistance) / e.tankResistance;
      if (df < 1e-10 && dh < 1e-9 && dc < 1e-11 && iterations > 1) return { e, s, iterations, converged: true };
      let nextFrequency = s.frequency;
      let nextField = newField;
      // Anderson acceleration (depth 1) over (frequency, field), each scaled by its size
      const x = [frequency, field];
      const g = [s.frequency, newField];
      if (previous && andersonStep(2, x, g, previousX, previousG, [frequency, Math.max(newField, 1)], next)) {
        const candidateFrequency = next[0]!;
        const candidateField = next[1]!;
        if (candidateFrequency > 0.8 * s.frequency && candidateFrequency < 1.25 * s.frequency && candidateField >= 0 && Number.isFinite(candidateField)) {
          nextFrequency = candidateFrequency;
          nextField = candidateField;
        }
      }
      previousX = x;
      previousG = g;
      previous = true;
      coilCurrent = s.coilCurrentRms;
      coilVoltagePeak = coilVoltagePeakOf(e, s);
      const good = { frequency, field };
      // damping: an iterate the inverter cannot run at is pulled back towards the last good one
      let accepted = false;
      for (let k = 0; k < 40; k++) {
        try {
          const eNext = evaluate(nextFrequency, nextField, coilCurrent, coilVoltagePeak, withPart);
          const sNext = solveStep(eNext);
          e = eNext;
          s = sNext;
          frequency = nextFrequency;
          field = nextField;
          accepted = true;
          break;
        } catch (error) {
          if (!(error instanceof InputError)) throw error;
          nextFrequency = 0.5 * (nextFrequency + good.frequency);
          nextField = 0.5 * (nextField + good.field);
          previous = false;
        }
      }
      if (!accepted) return null;
    }
    return { e, s, iterations, converged: false };
  }

  /**
   * The robust path: the frequency fixed point at a given surface field, and a bracketing search
   * (log field) for the field the resulting coil current reproduces.
   */
  function bracketField(reference: number): { frequency: number; field: number } {
    if (!withPart) {
      // the empty coil has no field to iterate: its inverter failure is the design's limit
      solveStep(evaluate(f0, 0, 0, 0, false));
      return { frequency: f0, field: 0 };
    }
    let lastError: InputError | null = null;
    let allOscillation = true;
    const atField = (h: number): { f: number; r: number } | null => {
      let f = f0;
      correction = null; // the first coupling at this field is exact
      try {
        let e = evaluate(f, h, 0, 0, withPart);
        let s = solveStep(e);
        for (let k = 0; k < 60 && Math.abs(s.frequency - f) > 1e-12 * f; k++) {
          f = s.frequency;
          e = evaluate(f, h, s.coilCurrentRms, coilVoltagePeakOf(e, s), withPart);
          s = solveStep(e);
        }
        return { f: s.frequency, r: Math.log(Math.max(fieldOf(s), 1e-300) / h) };
      } catch (error) {
        if (!(error instanceof InputError)) throw error;
        lastError = error;
        if (error.parameter !== "coilResistance") allOscillation = false;
        return null;
      }
    };
    const ref = Math.max(reference, 1);
    const fields: number[] = [];
    for (let k = -24; k <= 24; k++) fields.push(ref * 10 ** (k / 4));
    const values = fields.map(atField);
    for (let i = 0; i + 1 < fields.length; i++) {
      const a = values[i];
      const b = values[i + 1];
      if (a === null || a === undefined || b === null || b === undefined || !(a.r > 0 && b.r <= 0)) continue;
      let lo = Math.log(fields[i]!);
      let hi = Math.log(fields[i + 1]!);
      let best = { frequency: b.f, field: fields[i + 1]! };
      for (let k = 0; k < 60 && hi - lo > 1e-13; k++) {
        const mid = 0.5 * (lo + hi);
        const m = atField(Math.exp(mid));
        if (m === null) break;
        best = { frequency: m.f, field: Math.exp(mid) };
        if (m.r > 0) lo = mid;
        else hi = mid;
      }
      return best;
    }
    if (values.every((v) => v === null)) {
      const err = lastError as InputError | null;
      if (inv.kind === "current-fed-parallel" && allOscillation && err !== null) {
        throw new NoOscillationError(
          "heaterOperatingPoint",
          "part",
          partTemperature,
          "K",
          `a part temperature at which the loaded tank can oscillate: its resistance exceeds √(L/C) for every surface field from ${ref * 1e-6} to ${ref * 1e6} A/m, so the switches would latch on and only the supply would limit the current (${err.message})`,
        );
      }
      if (err !== null) throw err;
    }
    throw new InputError("heaterOperatingPoint", "part", partTemperature, "K", "a part temperature with a self-consistent operating point (no surface field reproduces itself)");
  }

  let result = iterate(f0, h0);
  if (result === null || !result.converged) {
    const found = bracketField(Math.max(h0, emptyField));
    const polished = iterate(found.frequency, found.field);
    if (polished !== null) result = polished;
    if (result === null) throw new InputError("heaterOperatingPoint", "part", partTemperature, "K", "a part temperature with an operating point the inverter can run");
  }
  // refresh the correction at the converged point until the exact model agrees with it; the
  // corrections are a fixed point of their own, solved by the secant method per component
  let previousCorrection: { c: Correction; g: Correction } | null = null;
  const loaded = withPart && model !== null;
  for (let outer = 0; outer < 16; outer++) {
    const at = result.e;
    const exact = exactState(at.f, at.mur, loaded);
    const g = correctionOf(exact, cheapState(at.f, at.mur, loaded));
    const agreed =
      Math.abs(exact.part - at.reflectedResistance) <= AGREEMENT * at.tankResistance &&
      Math.abs(exact.copper + at.leadR - at.coilResistance) <= AGREEMENT * at.tankResistance &&
      Math.abs(exact.L - at.coilL) <= 0.1 * AGREEMENT * at.coilL;
    if (agreed) {
      // the reported numbers come from the exact model at this point
      correction = g;
      result = { ...result, e: evaluate(at.f, at.h, result.s.coilCurrentRms, coilVoltagePeakOf(at, result.s), loaded) };
      break;
    }
    const c = correction ?? g;
    let next = g;
    if (previousCorrection !== null) {
      const secant = (cn: number, gn: number, cp: number, gp: number): number => {
        const denominator = gn - cn - (gp - cp);
        return denominator !== 0 ? cn - ((gn - cn) * (cn - cp)) / denominator : gn;
      };
      const p = previousCorrection;
      const candidate: Correction = {
        copper: secant(c.copper, g.copper, p.c.copper, p.g.copper),
        part: secant(c.part, g.part, p.c.part, p.g.part),
        L: secant(c.L, g.L, p.c.L, p.g.L),
        emptyL: secant(c.emptyL, g.emptyL, p.c.emptyL, p.g.emptyL),
      };
      const factorOk = (x: number, ref: number): boolean => x > 0.5 * ref && x < 2 * ref;
      if (factorOk(candidate.copper, g.copper) && factorOk(candidate.part, g.part) && Number.isFinite(candidate.L) && Number.isFinite(candidate.emptyL)) next = candidate;
    }
    previousCorrection = { c, g };
    if (loaded) correction = next;
    else emptyCorrection = next;
    const again = iterate(at.f, at.h);
    if (again === null) {
      if (loaded) correction = g;
      else emptyCorrection = g;
      break;
    }
    result = again;
  }
  const { e, iterations, converged } = result;
  const s = solveInverter(e, true);
  const validity: ValidityNote[] = [];
  if (outside !== undefined) {
    validity.push(...outside.notes);
  } else if (cellsUsed) {
    validity.push(CELL_MODEL_NOTE);
    const [bandLow, bandHigh] = studyBand(d, props);
    if (e.f < bandLow || e.f > bandHigh) {
      validity.push({
        code: "coil-impedance-outside-band",
        message: `The operating frequency lies outside the band the coil-impedance model was reduced over (${bandLow}–${bandHigh} Hz, from the empty coil's resonance); the reduced model extrapolates there, beyond its tested accuracy.`,
        value: e.f,
      });
    }
    if (withPart && model !== null) {
      for (const note of model.notes) {
        if (note.code === "finite-coil-coupling" || note.code === "plate-coupling") continue;
        if (note.code === "part-shorter-than-coil") {
          validity.push(shortPartNote(d, e.f, partResistivity, e.mur, note));
          continue;
        }
        validity.push(note);
      }
    }
  } else {
    if (props.impedanceTier === "cells") {
      validity.push({
        code: "coil-impedance-closed-form",
        message: "The coil is outside the coil-impedance model's domain (turns that touch, or a part that does not fit inside the turns), so the study falls back to the closed-form coil inductance, resistance and coupling, whose errors the notes below state.",
      });
    }
    closedFormWindingResistance(d, props, e.f, validity);
    if (withPart && model !== null) validity.push(...model.notes);
  }
  validity.push(...s.validity);
  if (e.mur > 1) validity.push({ code: "constant-permeability", message: "The part's permeability is taken as constant through its depth at the value for the surface field (a linear model of a saturating material)." });
  if (!converged) {
    validity.push({ code: "operating-point-not-converged", message: "The frequency/permeability fixed point did not settle to 1e-10 within 80 iterations; numbers are from the last iterate." });
  }
  if (d.concentrator !== null) {
    validity.push({
      code: "concentrator-loss-only",
      message: "The flux concentrator's core loss is estimated (Steinmetz, all coil flux through its section); its effect on inductance and coupling is not modelled.",
    });
  }
  const I2 = s.coilCurrentRms * s.coilCurrentRms;
  const lossesPlace: HeaterLosses = {
    supply: s.sourceLoss,
    switches: s.switchLoss,
    coil: I2 * e.coilResistance,
    capacitors: I2 * e.capacitorResistance,
    core: I2 * e.coreResistance,
    part: I2 * e.reflectedResistance,
  };
  const inputPower = s.sourcePower;
  const point: HeaterOperatingPoint = {
    withPart,
    partTemperature,
    frequency: s.frequency,
    coilInductance: e.emptyL,
    inductanceChange: e.inductanceChange,
    inductance: e.coilL,
    leadInductance: e.leadL,
    leadResistance: e.leadR,
    coilResistance: e.coilResistance,
    reflectedResistance: e.reflectedResistance,
    capacitorResistance: e.capacitorResistance,
    coreResistance: e.coreResistance,
    switchResistance: s.switchResistance,
    tankResistance: e.tankResistance + s.switchResistance,
    partRelativePermeability: e.mur,
    partResistivity,
    partSkinDepth: withPart ? skinDepth({ resistivity: partResistivity, frequency: e.f, relativePermeability: e.mur }) : null,
    surfaceFieldStrengthPeak: e.h,
    inverterInputVoltage: s.vin,
    supplyCurrent: s.supplyCurrent,
    supplyTerminalVoltage: s.terminalVoltage,
    tankVoltagePeak: s.tankVoltagePeak,
    coilVoltageRms: e.leadL > 0 ? coilVoltagePeakOf(e, s) / Math.SQRT2 : s.coilVoltageRmsStress,
    leadVoltageRms: s.coilCurrentRms * Math.hypot(e.leadR, 2 * Math.PI * e.f * e.leadL),
    coilCurrentRms: s.coilCurrentRms,
    capacitorVoltageRms: s.capacitorVoltageRms,
    capacitorCurrentRms: s.capacitorCurrentRms,
    capacitorReactivePower: s.reactivePower,
    storedEnergyPeak: s.storedEnergyPeak,
    switchVoltagePeak: s.switchVoltagePeak,
    switchCurrentPeak: s.switchCurrentPeak,
    switchCurrentRms: s.switchCurrentRms,
    qualityFactor: s.qualityFactor,
    inputPower,
    losses: lossesPlace,
    efficiency: inputPower > 0 ? lossesPlace.part / inputPower : 0,
    coilEfficiency: coilEfficiency({ coilResistance: e.coilResistance, reflectedResistance: e.reflectedResistance }),
    zeroVoltageSwitching: s.zvs,
    iterations,
    cautions: s.cautions,
    validity,
  };
  const finalCorrection = withPart ? correction : emptyCorrection;
  if (finalCorrection !== null) corrections.set(point, { withPart, correction: finalCorrection });
  return point;
}

/**
 * The coil branch's inductance and resistance (coil with the part, and the leads in series) at
 * any frequency, with the part's permeability held at the operating point's value: for
 * impedance sweeps. The closed-form surrogate carries the operating point's correction to the
 * exact model (resistances by factors, inductances by offsets), so the sweep is exact at the
 * operating frequency and follows the closed form's trend away from it.
 */
export function coilImpedanceAt(
  d: ResolvedHeaterDescription,
  props: CoilProperties,
  point: HeaterOperatingPoint,
  frequency: number,
): { inductance: number; resistance: number } {
  const copper = closedFormWindingResistance(d, props, frequency, null);
  let cheap: CoilState = { copper, part: 0, L: props.inductance, emptyL: props.inductance };
  if (point.withPart) {
    const c = couplingModel(d, props).surrogate(frequency, point.partResistivity, point.partRelativePermeability);
    cheap = { copper, part: c.reflectedResistance, L: props.inductance + c.inductanceChange, emptyL: props.inductance };
  }
  const stored = corrections.get(point);
  const st = stored !== undefined ? corrected(cheap, stored.correction) : cheap;
  const lead = leadSeriesImpedance(d, props, frequency);
  return { inductance: st.L + lead.inductance, resistance: st.copper + st.part + lead.resistance };
}

/**
 * The study's coil and part at a given frequency, resistivity and relative permeability (the
 * exact model of the tier the operating point reports): the part's loss resistance at 1 A,
 * ΔL, the loaded and empty inductance, the loaded winding's copper resistance, and the surface
 * field per ampere: for checks against field solutions at fixed material properties.
 *
 * @internal
 */
export function studyPartCoupling(
  d: ResolvedHeaterDescription,
  frequency: number,
  resistivity: number,
  relativePermeability: number,
  impedanceTier: CoilImpedanceTier = "cells",
): { reflectedResistance: number; inductanceChange: number; inductance: number; emptyInductance: number; copperResistance: number; fieldPerAmpere: number } {
  const props = coilProperties(d, impedanceTier);
  const model = couplingModel(d, props);
  const z = impedanceTier === "cells" ? cellState(d, props, frequency, resistivity, relativePermeability, true) : null;
  if (z !== null) {
    return { reflectedResistance: z.part, inductanceChange: z.L - z.emptyL, inductance: z.L, emptyInductance: z.emptyL, copperResistance: z.copper, fieldPerAmpere: model.fieldPerAmpere };
  }
  const c = model.coupling(frequency, resistivity, relativePermeability);
  return {
    reflectedResistance: c.reflectedResistance,
    inductanceChange: c.inductanceChange,
    inductance: props.inductance + c.inductanceChange,
    emptyInductance: props.inductance,
    copperResistance: closedFormWindingResistance(d, props, frequency, null),
    fieldPerAmpere: model.fieldPerAmpere,
  };
}
