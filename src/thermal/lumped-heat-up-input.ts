/**
 * The options of {@link lumpedHeatUp} checked and read, and the validity notes of a run.
 *
 * @packageDocumentation
 */
import { InputError, requireInRange, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import type { ConductiveMaterial } from "../materials/index.js";
import { specificHeatAt, thermalConductivityAt } from "../materials/index.js";
import type { LumpedHeatUpOptions } from "./lumped-heat-up.js";
import { checkSurface, effectiveCoefficient, powerFunction } from "./surface-loss.js";

export const WHERE = "lumpedHeatUp";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LUMPED_FIELDS: readonly string[] = Object.freeze(["mass", "specificHeat", "material", "power", "powerAt", "surfaceArea", "convectionCoefficient", "emissivity", "ambientTemperature", "initialTemperature", "targetTemperature", "duration", "thermalConductivity", "density", "characteristicLength", "relativeTolerance"]);

/** The options of {@link lumpedHeatUp}, checked and read. */
export interface LumpedHeatUpInput {
  readonly mass: number;
  readonly material: ConductiveMaterial | undefined;
  readonly heatCapacityAt: (temperature: number) => number;
  /** The given constant specific heat, or null when it comes from the material. */
  readonly constantSpecificHeat: number | null;
  readonly power: (temperature: number) => number;
  readonly surface: { area: number; convection: number; emissivity: number; ambient: number };
  readonly initial: number;
  readonly target: number | null;
  readonly duration: number | null;
  readonly conductivityOption: number | null;
  readonly densityOption: number | null;
  readonly lengthOption: number | null;
  readonly rtol: number;
}

/** Checks the options of {@link lumpedHeatUp} (throws {@link InputError}) and returns them read. */
export function readLumpedHeatUpOptions(options: LumpedHeatUpOptions): LumpedHeatUpInput {
  requireObject(WHERE, "options", options);
  requireKnownKeys(WHERE, "", options, LUMPED_FIELDS);
  const mass = requirePositive(WHERE, "mass", options.mass, "kg");
  const material = options.material;
  if (material !== undefined) requireObject(WHERE, "material", material);
  let heatCapacityAt: (temperature: number) => number;
  let constantSpecificHeat: number | null = null;
  if (options.specificHeat !== undefined) {
    const c = requirePositive(WHERE, "specificHeat", options.specificHeat, "J/(kg·K)");
    constantSpecificHeat = c;
    heatCapacityAt = (): number => mass * c;
  } else if (material !== undefined) {
    heatCapacityAt = (temperature: number): number => mass * specificHeatAt(material, temperature);
  } else {
    throw new InputError(WHERE, "specificHeat", options.specificHeat, "J/(kg·K)", "a finite number > 0 (or give material)");
  }
  if (options.powerAt === undefined && options.power !== undefined) {
    requireInRange(WHERE, "power", options.power, "W", 0, Infinity);
  }
  const power = powerFunction(WHERE, options.power, options.powerAt);
  const surface = checkSurface(WHERE, options);
  const { ambient } = surface;
  const initial =
    options.initialTemperature === undefined
      ? ambient
      : requirePositive(WHERE, "initialTemperature", options.initialTemperature, "K");
  const target =
    options.targetTemperature === undefined
      ? null
      : requirePositive(WHERE, "targetTemperature", options.targetTemperature, "K");
  const duration =
    options.duration === undefined ? null : requirePositive(WHERE, "duration", options.duration, "s");
  const conductivityOption =
    options.thermalConductivity === undefined
      ? null
      : requirePositive(WHERE, "thermalConductivity", options.thermalConductivity, "W/(m·K)");
  const densityOption =
    options.density === undefined ? null : requirePositive(WHERE, "density", options.density, "kg/m³");
  const lengthOption =
    options.characteristicLength === undefined
      ? null
      : requirePositive(WHERE, "characteristicLength", options.characteristicLength, "m");
  const rtol =
    options.relativeTolerance === undefined
      ? 1e-10
      : requireInRange(WHERE, "relativeTolerance", options.relativeTolerance, "", 1e-13, 1e-3);

  return { mass, material, heatCapacityAt, constantSpecificHeat, power, surface, initial, target, duration, conductivityOption, densityOption, lengthOption, rtol };
}

/** The Biot number at the curve's extreme temperature and the validity notes of a run. */
export function lumpedRunNotes(input: LumpedHeatUpInput, temperatures: readonly number[]): { biotNumber: number | null; validity: ValidityNote[] } {
  const { mass, material, surface, initial, densityOption, lengthOption, conductivityOption } = input;
  const { area, convection, emissivity, ambient } = surface;
  // Biot number at the hottest (or coldest) temperature of the curve.
  const validity: ValidityNote[] = [];
  let extreme = initial;
  for (const t of temperatures) if (Math.abs(t - ambient) > Math.abs(extreme - ambient)) extreme = t;
  const density = densityOption ?? material?.density ?? null;
  const lc = lengthOption ?? (density !== null ? mass / density / area : null);
  const k = conductivityOption ?? (material !== undefined ? thermalConductivityAt(material, extreme) : null);
  let biotNumber: number | null = null;
  if (lc !== null && k !== null) {
    biotNumber = (effectiveCoefficient(extreme, ambient, convection, emissivity) * lc) / k;
    if (biotNumber > 0.1) {
      validity.push({
        code: "lumped-biot-above-limit",
        message: `Biot number ${biotNumber.toPrecision(3)} exceeds 0.1: the part's surface and core differ in temperature and the lumped curve is only an average; use radialHeatUp for surface and core temperatures.`,
        value: biotNumber,
        limit: 0.1,
      });
    }
  } else {
    validity.push({
      code: "lumped-biot-unknown",
      message: "The Biot number could not be checked (give material, or thermalConductivity with density or characteristicLength); the lumped model assumes a uniform part temperature.",
    });
  }
  if (material !== undefined) {
    let lowest = initial;
    let highest = initial;
    for (const t of temperatures) {
      if (t < lowest) lowest = t;
      if (t > highest) highest = t;
    }
    if (highest > material.temperatureRange.max || lowest < material.temperatureRange.min) {
      validity.push({
        code: "material-data-range",
        message: `The curve leaves the temperature range of the material data (${material.temperatureRange.min}–${material.temperatureRange.max} K); end values are held there.`,
        value: highest > material.temperatureRange.max ? highest : lowest,
        limit: highest > material.temperatureRange.max ? material.temperatureRange.max : material.temperatureRange.min,
      });
    }
    if (highest >= material.meltingTemperature) {
      validity.push({
        code: "above-melting",
        message: "The part would reach its melting temperature; the model ignores latent heat of fusion and is not valid there.",
        value: highest,
        limit: material.meltingTemperature,
      });
    }
  }

  return { biotNumber, validity };
}
