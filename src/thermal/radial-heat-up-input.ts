/**
 * The checked input of {@link radialHeatUp}: geometry, heat input, properties, surface, stop
 * and soak conditions and the grid and step controls.
 *
 * @packageDocumentation
 */
import { InputError, requireInRange, requireInteger, requireKnownKeys, requireNonNegative, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import type { ConductiveMaterial } from "../materials/index.js";
import { specificHeatAt, thermalConductivityAt } from "../materials/index.js";
import type { RadialGenerationRequest, RadialHeatUpOptions } from "./radial-heat-up.js";
import { checkSurface } from "./surface-loss.js";

/** The function name errors are reported under. */
export const WHERE = "radialHeatUp";
const KNOWN = [
  "geometry",
  "radius",
  "innerRadius",
  "thickness",
  "length",
  "faceArea",
  "power",
  "surfacePowerDensity",
  "generationAt",
  "skinDepth",
  "material",
  "density",
  "specificHeat",
  "thermalConductivity",
  "convectionCoefficient",
  "emissivity",
  "ambientTemperature",
  "initialTemperature",
  "duration",
  "targetTemperature",
  "stopAt",
  "soakBand",
  "hardeningTemperature",
  "cells",
  "temperatureTolerance",
  "maxTimeStep",
] as const;

/** The input of a run, checked and read. */
export interface RadialHeatUpInput {
  readonly cylinder: boolean;
  readonly size: number;
  readonly inner: number;
  readonly material: ConductiveMaterial | undefined;
  readonly density: number;
  readonly cAt: (t: number) => number;
  readonly kAt: (t: number) => number;
  readonly variable: boolean;
  readonly generationAt: ((request: RadialGenerationRequest) => void) | undefined;
  readonly flux: number;
  readonly skinDepth: number;
  readonly convection: number;
  readonly emissivity: number;
  readonly ambient: number;
  readonly initial: number;
  readonly duration: number;
  readonly target: number | null;
  readonly stopAt: "surface" | "core" | "mean" | null;
  readonly soakBand: number | null;
  readonly hardening: number | null;
  readonly cells: number;
  readonly tolerance: number;
  readonly maxStep: number;
}

/** Checks the options of {@link radialHeatUp} (throws {@link InputError}) and returns them read. */
export function readRadialHeatUpOptions(options: RadialHeatUpOptions): RadialHeatUpInput {
  requireObject(WHERE, "options", options);
  requireKnownKeys(WHERE, "options", options, KNOWN);
  const geometry = requireOneOf(WHERE, "geometry", options.geometry, ["cylinder", "slab"] as const);
  const cylinder = geometry === "cylinder";
  const size = cylinder
    ? requirePositive(WHERE, "radius", options.radius, "m")
    : 0.5 * requirePositive(WHERE, "thickness", options.thickness, "m");
  let inner = 0;
  if (options.innerRadius !== undefined) {
    if (!cylinder) throw new InputError(WHERE, "innerRadius", options.innerRadius, "m", "absent for a slab");
    inner = requireNonNegative(WHERE, "innerRadius", options.innerRadius, "m");
    if (!(inner < size)) throw new InputError(WHERE, "innerRadius", inner, "m", `a finite number ≥ 0 and < radius (${size})`);
  }
  const material = options.material;
  if (material !== undefined) requireObject(WHERE, "material", material);
  const density =
    options.density !== undefined
      ? requirePositive(WHERE, "density", options.density, "kg/m³")
      : material !== undefined
        ? material.density
        : missing("density", "kg/m³");
  const fixedC =
    options.specificHeat !== undefined ? requirePositive(WHERE, "specificHeat", options.specificHeat, "J/(kg·K)") : null;
  const fixedK =
    options.thermalConductivity !== undefined
      ? requirePositive(WHERE, "thermalConductivity", options.thermalConductivity, "W/(m·K)")
      : null;
  if (material === undefined && fixedC === null) missing("specificHeat", "J/(kg·K)");
  if (material === undefined && fixedK === null) missing("thermalConductivity", "W/(m·K)");
  const cAt = (t: number): number => fixedC ?? specificHeatAt(material!, t);
  const kAt = (t: number): number => fixedK ?? thermalConductivityAt(material!, t);
  const variable = fixedC === null || fixedK === null;

  // Heat input per unit heated surface: a fixed density, or a callback.
  let flux = 0;
  const generationAt = options.generationAt;
  if (generationAt !== undefined) {
    if (typeof generationAt !== "function") {
      throw new InputError(WHERE, "generationAt", generationAt, "", "a function filling request.generation");
    }
    if (options.power !== undefined) throw new InputError(WHERE, "power", options.power, "W", "absent when generationAt is given");
    if (options.surfacePowerDensity !== undefined) {
      throw new InputError(WHERE, "surfacePowerDensity", options.surfacePowerDensity, "W/m²", "absent when generationAt is given");
    }
  } else if (options.surfacePowerDensity !== undefined) {
    if (options.power !== undefined) {
      throw new InputError(WHERE, "power", options.power, "W", "given alone (not together with surfacePowerDensity)");
    }
    flux = requireNonNegative(WHERE, "surfacePowerDensity", options.surfacePowerDensity, "W/m²");
  } else {
    const power = requireNonNegative(WHERE, "power", options.power, "W");
    const heatedArea = cylinder
      ? 2 * Math.PI * size * requirePositive(WHERE, "length", options.length, "m")
      : 2 * requirePositive(WHERE, "faceArea", options.faceArea, "m²");
    flux = power / heatedArea;
  }
  const skinDepth = options.skinDepth === undefined ? 0 : requirePositive(WHERE, "skinDepth", options.skinDepth, "m");
  const surface = checkSurface(WHERE, options, false);
  const { convection, emissivity, ambient } = surface;
  const initial =
    options.initialTemperature === undefined
      ? ambient
      : requirePositive(WHERE, "initialTemperature", options.initialTemperature, "K");
  const duration = requirePositive(WHERE, "duration", options.duration, "s");
  const target =
    options.targetTemperature === undefined ? null : requirePositive(WHERE, "targetTemperature", options.targetTemperature, "K");
  const stopAt =
    options.stopAt === undefined ? null : requireOneOf(WHERE, "stopAt", options.stopAt, ["surface", "core", "mean"] as const);
  if (stopAt !== null && target === null) {
    throw new InputError(WHERE, "targetTemperature", options.targetTemperature, "K", "a finite number > 0 when stopAt is given");
  }
  const soakBand = options.soakBand === undefined ? null : requirePositive(WHERE, "soakBand", options.soakBand, "K");
  if (soakBand !== null && stopAt === null) throw new InputError(WHERE, "stopAt", options.stopAt, "", 'one of "surface", "core", "mean" when soakBand is given');
  const hardening =
    options.hardeningTemperature === undefined
      ? null
      : requirePositive(WHERE, "hardeningTemperature", options.hardeningTemperature, "K");
  const cells = options.cells === undefined ? 60 : requireInteger(WHERE, "cells", options.cells, 4);
  requireInRange(WHERE, "cells", cells, "", 4, 2000);
  const tolerance =
    options.temperatureTolerance === undefined
      ? 0.005
      : requirePositive(WHERE, "temperatureTolerance", options.temperatureTolerance, "K");
  const maxStep =
    options.maxTimeStep === undefined ? duration / 100 : requirePositive(WHERE, "maxTimeStep", options.maxTimeStep, "s");
  return { cylinder, size, inner, material, density, cAt, kAt, variable, generationAt, flux, skinDepth, convection, emissivity, ambient, initial, duration, target, stopAt, soakBand, hardening, cells, tolerance, maxStep };
}

function missing(parameter: string, unit: string): never {
  throw new InputError(WHERE, parameter, undefined, unit, "a finite number > 0 (or give material)");
}
