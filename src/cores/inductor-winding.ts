/**
 * The winding conductor of {@link inductorDesign}: reading round wire, litz or foil into the
 * numbers the layout needs, its resistivity at a temperature, and the AC resistance factor of
 * one harmonic of the current (Dowell through the equivalent foil, Sullivan's litz model, or
 * Dowell for foil directly).
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireNonNegative, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import { dowellFactor, litzWindingAcRatio, roundWireWindingAcRatio } from "../conductors/index.js";
import { ANNEALED_COPPER_RESISTIVITY, ANNEALED_COPPER_TEMPERATURE_COEFFICIENT, MU_0 } from "../units/index.js";
import type { InductorConductor } from "./inductor-design-types.js";

const ROUND_FIELDS: readonly string[] = Object.freeze(["kind", "diameter", "outerDiameter", "resistivity"]);
const LITZ_FIELDS: readonly string[] = Object.freeze(["kind", "strands", "strandDiameter", "outerDiameter", "resistivity"]);
const FOIL_FIELDS: readonly string[] = Object.freeze(["kind", "thickness", "insulationThickness", "resistivity"]);

/** Reference temperature of the conductor resistivity [K] (20 °C). */
const REFERENCE_TEMPERATURE = 293.15;

/** A checked winding conductor (NaN in the fields its kind does not use). */
export interface WindingConductor {
  readonly kind: "round" | "litz" | "foil";
  /** Copper cross-section of one turn [m²]. */
  readonly copperArea: number;
  /** Conductor height along the window height [m]. */
  readonly height: number;
  /** Radial build of one layer [m]. */
  readonly buildPerLayer: number;
  /** Litz strands (1 otherwise). */
  readonly strands: number;
  /** Litz strand diameter [m]. */
  readonly strandDiameter: number;
  /** Round-wire bare diameter [m]. */
  readonly roundDiameter: number;
  /** Foil thickness [m]. */
  readonly foilThickness: number;
  /** Resistivity at 20 °C [Ω·m]. */
  readonly rho20: number;
}

/** Reads and checks `options.conductor` for a window of height `windowHeight` [m]. */
export function readConductor(where: string, conductor: InductorConductor, windowHeight: number): WindingConductor {
  requireObject(where, "conductor", conductor);
  requireOneOf(where, "conductor.kind", (conductor as { kind?: unknown }).kind, ["round", "litz", "foil"] as const);
  let copperArea: number;
  let height: number; // conductor height along the window height
  let buildPerLayer: number;
  let strands = 1;
  let strandDiameter = NaN;
  let roundDiameter = NaN;
  let foilThickness = NaN;
  if (conductor.kind === "round") {
    requireKnownKeys(where, "conductor", conductor, ROUND_FIELDS);
    roundDiameter = requirePositive(where, "conductor.diameter", conductor.diameter, "m");
    const outer = conductor.outerDiameter === undefined ? 1.07 * roundDiameter : requirePositive(where, "conductor.outerDiameter", conductor.outerDiameter, "m");
    if (!(outer >= roundDiameter)) throw new InputError(where, "conductor.outerDiameter", outer, "m", `≥ conductor.diameter (${roundDiameter})`);
    copperArea = (Math.PI * roundDiameter * roundDiameter) / 4;
    height = outer;
    buildPerLayer = outer;
  } else if (conductor.kind === "litz") {
    requireKnownKeys(where, "conductor", conductor, LITZ_FIELDS);
    strands = requireInteger(where, "conductor.strands", conductor.strands, 1);
    strandDiameter = requirePositive(where, "conductor.strandDiameter", conductor.strandDiameter, "m");
    const outer = requirePositive(where, "conductor.outerDiameter", conductor.outerDiameter, "m");
    copperArea = (strands * Math.PI * strandDiameter * strandDiameter) / 4;
    if (!(outer * outer >= (strands * strandDiameter * strandDiameter))) {
      throw new InputError(where, "conductor.outerDiameter", outer, "m", `large enough to hold the strands (≥ ${Math.sqrt(strands) * strandDiameter})`);
    }
    height = outer;
    buildPerLayer = outer;
  } else {
    requireKnownKeys(where, "conductor", conductor, FOIL_FIELDS);
    foilThickness = requirePositive(where, "conductor.thickness", conductor.thickness, "m");
    const insulation = conductor.insulationThickness === undefined ? 50e-6 : requireNonNegative(where, "conductor.insulationThickness", conductor.insulationThickness, "m");
    copperArea = foilThickness * windowHeight;
    height = windowHeight;
    buildPerLayer = foilThickness + insulation;
  }
  const rho20 = conductor.resistivity === undefined ? ANNEALED_COPPER_RESISTIVITY : requirePositive(where, "conductor.resistivity", conductor.resistivity, "Ω·m");
  return { kind: conductor.kind, copperArea, height, buildPerLayer, strands, strandDiameter, roundDiameter, foilThickness, rho20 };
}

/** Resistivity of the conductor at `temperature` [K], with copper's linear temperature coefficient [Ω·m]. */
export function conductorResistivity(conductor: WindingConductor, temperature: number): number {
  return conductor.rho20 * (1 + ANNEALED_COPPER_TEMPERATURE_COEFFICIENT * (temperature - REFERENCE_TEMPERATURE));
}

/** AC resistance factor F_R of the winding at frequency `f` [Hz] and resistivity `rho` [Ω·m]. */
export function harmonicAcFactor(
  conductor: WindingConductor,
  layout: { readonly turns: number; readonly layers: number; readonly turnsPerLayer: number },
  windowHeight: number,
  f: number,
  rho: number,
): number {
  const { layers, turnsPerLayer, turns } = layout;
  if (conductor.kind === "round") {
    const roundDiameter = conductor.roundDiameter;
    return roundWireWindingAcRatio({ wireDiameter: roundDiameter, frequency: f, resistivity: rho, layers, turnsPerLayer, windingWidth: Math.max(windowHeight, turnsPerLayer * roundDiameter) });
  }
  if (conductor.kind === "litz") {
    return litzWindingAcRatio({ strands: conductor.strands, strandDiameter: conductor.strandDiameter, turns, windowBreadth: windowHeight, frequency: f, resistivity: rho });
  }
  const delta = Math.sqrt(rho / (Math.PI * f * MU_0));
  return dowellFactor({ penetrationRatio: conductor.foilThickness / delta, layers });
}
