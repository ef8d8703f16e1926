/**
 * Checks of the parts of a {@link ConductiveMaterial} that the property readers use, so that a
 * material of the caller's own with a missing or non-finite field is rejected with an
 * {@link InputError} naming the field instead of giving NaN (internal, not exported publicly).
 * The checks allocate nothing and cost a few comparisons per table entry.
 *
 * @packageDocumentation
 */
import { InputError, requireFinite, requireInRange, requireKnownKeys, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import type { ConductiveMaterial, TemperatureTable } from "./types.js";

/**
 * Checks a temperature table: matching non-empty arrays, positive strictly increasing
 * temperatures [K] and positive finite values.
 *
 * @param where - the public function doing the check
 * @param path - the field path of the table, e.g. `"material.thermalConductivityTable"`
 * @param table - the table to check
 * @param unit - the unit of the values
 * @returns the table
 */
export function checkTemperatureTable(where: string, path: string, table: unknown, unit: string): TemperatureTable {
  const t = requireObject(where, path, table);
  const xs = t.temperatures;
  const ys = t.values;
  if (!Array.isArray(xs) || xs.length === 0) throw new InputError(where, `${path}.temperatures`, xs, "K", "a non-empty array of temperatures");
  if (!Array.isArray(ys) || ys.length !== xs.length) {
    throw new InputError(where, `${path}.values`, ys, unit, `an array of ${xs.length} values (one per temperature)`);
  }
  // field paths are built only on failure: the valid path allocates nothing
  let previous = 0;
  for (let i = 0; i < xs.length; i++) {
    const x: unknown = xs[i];
    if (typeof x !== "number" || !(x > previous) || x === Infinity) {
      const expected = i === 0 ? "a finite number > 0" : `a finite number above the temperature before it (${previous})`;
      throw new InputError(where, `${path}.temperatures[${i}]`, x, "K", expected);
    }
    previous = x;
    const y: unknown = ys[i];
    if (typeof y !== "number" || !(y > 0) || y === Infinity) throw new InputError(where, `${path}.values[${i}]`, y, unit, "a finite number > 0");
  }
  return table as TemperatureTable;
}

/**
 * Checks `material.temperatureRange`: positive finite ends with min ≤ max.
 *
 * @param where - the public function doing the check
 * @param material - the material (already known to be an object)
 */
export function checkTemperatureRange(where: string, material: ConductiveMaterial): void {
  const range = requireObject(where, "material.temperatureRange", material.temperatureRange);
  const min = requirePositive(where, "material.temperatureRange.min", range.min, "K");
  requireInRange(where, "material.temperatureRange.max", range.max, "K", min, Infinity);
}

/**
 * Checks the resistivity model of a material: a table, or the linear law with
 * `resistivity20` > 0, a finite `temperatureCoefficient` and a valid temperature range.
 *
 * @param where - the public function doing the check
 * @param material - the material (already known to be an object)
 */
export function checkResistivityModel(where: string, material: ConductiveMaterial): void {
  const model = requireObject(where, "material.resistivity", material.resistivity);
  const kind = requireOneOf(where, "material.resistivity.kind", model.kind, ["linear", "table"]);
  if (kind === "table") {
    checkTemperatureTable(where, "material.resistivity.table", model.table, "Ω·m");
    return;
  }
  requirePositive(where, "material.resistivity20", material.resistivity20, "Ω·m");
  requireFinite(where, "material.temperatureCoefficient", material.temperatureCoefficient, "1/K");
  checkTemperatureRange(where, material);
}

/**
 * Checks the specific-heat model of a material (a table or the EN 1993 carbon-steel law) and its
 * temperature range.
 *
 * @param where - the public function doing the check
 * @param material - the material (already known to be an object)
 */
export function checkSpecificHeatModel(where: string, material: ConductiveMaterial): void {
  const model = requireObject(where, "material.specificHeat", material.specificHeat);
  const kind = requireOneOf(where, "material.specificHeat.kind", model.kind, ["table", "en1993-carbon-steel"]);
  if (kind === "table") checkTemperatureTable(where, "material.specificHeat.table", model.table, "J/(kg·K)");
  checkTemperatureRange(where, material);
}

/**
 * Checks the magnetic part of a material when it is `magnetic` and has a permeability model:
 * Curie temperature > 0, initial relative permeability ≥ 1, saturation flux density > 0,
 * transition width > 0, magnetisation shape 0 … 1 and exponent > 0.
 *
 * @param where - the public function doing the check
 * @param material - the material (already known to be an object)
 */
export function checkPermeabilityModel(where: string, material: ConductiveMaterial): void {
  if (!material.magnetic || material.permeability === undefined || material.curieTemperature === undefined) return;
  requirePositive(where, "material.curieTemperature", material.curieTemperature, "K");
  const model = requireObject(where, "material.permeability", material.permeability);
  requireInRange(where, "material.permeability.initialRelativePermeability", model.initialRelativePermeability, "", 1, Infinity);
  requirePositive(where, "material.permeability.saturationFluxDensity", model.saturationFluxDensity, "T");
  requirePositive(where, "material.permeability.transitionWidth", model.transitionWidth, "K");
  requireInRange(where, "material.permeability.magnetisationShape", model.magnetisationShape, "", 0, 1);
  requirePositive(where, "material.permeability.magnetisationExponent", model.magnetisationExponent, "");
}

const MATERIAL_FIELDS: readonly string[] = Object.freeze([
  "name", "id", "resistivity20", "temperatureCoefficient", "resistivity", "density", "specificHeat20", "specificHeat",
  "thermalConductivity", "thermalConductivityTable", "emissivity", "meltingTemperature", "temperatureRange", "magnetic",
  "curieTemperature", "permeability", "sources",
]);
const TABLE_FIELDS: readonly string[] = Object.freeze(["temperatures", "values", "source"]);
const EMISSIVITY_FIELDS: readonly string[] = Object.freeze(["min", "max", "typical", "source"]);
const RANGE_FIELDS: readonly string[] = Object.freeze(["min", "max"]);
const PERMEABILITY_FIELDS: readonly string[] = Object.freeze([
  "initialRelativePermeability", "saturationFluxDensity", "transitionWidth", "magnetisationShape", "magnetisationExponent", "source",
]);

function requireText(where: string, path: string, value: unknown): string {
  if (typeof value !== "string") throw new InputError(where, path, value, "", "a string");
  return value;
}

function checkTable(where: string, path: string, value: unknown, unit: string): void {
  requireKnownKeys(where, path, requireObject(where, path, value), TABLE_FIELDS);
  checkTemperatureTable(where, path, value, unit);
  requireText(where, `${path}.source`, (value as TemperatureTable).source);
}

/**
 * Checks a whole conductive material set field by field (a caller's own set, e.g. one written
 * in a study file), naming the path of the first bad field: every field of
 * {@link ConductiveMaterial} present with its type and range, the models well formed, and no
 * unknown fields.
 *
 * @param where - the public function doing the check
 * @param path - where the material sits in the caller's input (`"part.material"`)
 * @param value - the material set
 * @returns the value, typed as a material
 * @throws InputError naming `path.field` for the first bad field
 */
export function checkConductiveMaterial(where: string, path: string, value: unknown): ConductiveMaterial {
  const m = requireKnownKeys(where, path, requireObject(where, path, value), MATERIAL_FIELDS);
  requireText(where, `${path}.name`, m.name);
  requireText(where, `${path}.id`, m.id);
  requirePositive(where, `${path}.resistivity20`, m.resistivity20, "Ω·m");
  requireFinite(where, `${path}.temperatureCoefficient`, m.temperatureCoefficient, "1/K");
  const resistivity = requireObject(where, `${path}.resistivity`, m.resistivity);
  const rKind = requireOneOf(where, `${path}.resistivity.kind`, resistivity.kind, ["linear", "table"]);
  if (rKind === "table") {
    requireKnownKeys(where, `${path}.resistivity`, resistivity, ["kind", "table"]);
    checkTable(where, `${path}.resistivity.table`, resistivity.table, "Ω·m");
  } else {
    requireKnownKeys(where, `${path}.resistivity`, resistivity, ["kind", "source"]);
    requireText(where, `${path}.resistivity.source`, resistivity.source);
  }
  requirePositive(where, `${path}.density`, m.density, "kg/m³");
  requirePositive(where, `${path}.specificHeat20`, m.specificHeat20, "J/(kg·K)");
  const heat = requireObject(where, `${path}.specificHeat`, m.specificHeat);
  const hKind = requireOneOf(where, `${path}.specificHeat.kind`, heat.kind, ["table", "en1993-carbon-steel"]);
  if (hKind === "table") {
    requireKnownKeys(where, `${path}.specificHeat`, heat, ["kind", "table"]);
    checkTable(where, `${path}.specificHeat.table`, heat.table, "J/(kg·K)");
  } else {
    requireKnownKeys(where, `${path}.specificHeat`, heat, ["kind", "source"]);
    requireText(where, `${path}.specificHeat.source`, heat.source);
  }
  requirePositive(where, `${path}.thermalConductivity`, m.thermalConductivity, "W/(m·K)");
  checkTable(where, `${path}.thermalConductivityTable`, m.thermalConductivityTable, "W/(m·K)");
  const e = requireKnownKeys(where, `${path}.emissivity`, requireObject(where, `${path}.emissivity`, m.emissivity), EMISSIVITY_FIELDS);
  const eMin = requireInRange(where, `${path}.emissivity.min`, e.min, "", 0, 1);
  const eMax = requireInRange(where, `${path}.emissivity.max`, e.max, "", eMin, 1);
  requireInRange(where, `${path}.emissivity.typical`, e.typical, "", eMin, eMax);
  requireText(where, `${path}.emissivity.source`, e.source);
  const range = requireKnownKeys(where, `${path}.temperatureRange`, requireObject(where, `${path}.temperatureRange`, m.temperatureRange), RANGE_FIELDS);
  const min = requirePositive(where, `${path}.temperatureRange.min`, range.min, "K");
  requireInRange(where, `${path}.temperatureRange.max`, range.max, "K", min, Infinity);
  requirePositive(where, `${path}.meltingTemperature`, m.meltingTemperature, "K");
  if (typeof m.magnetic !== "boolean") throw new InputError(where, `${path}.magnetic`, m.magnetic, "", "true or false");
  if (m.magnetic) {
    requirePositive(where, `${path}.curieTemperature`, m.curieTemperature, "K");
    const p = requireKnownKeys(where, `${path}.permeability`, requireObject(where, `${path}.permeability`, m.permeability), PERMEABILITY_FIELDS);
    requireInRange(where, `${path}.permeability.initialRelativePermeability`, p.initialRelativePermeability, "", 1, Infinity);
    requirePositive(where, `${path}.permeability.saturationFluxDensity`, p.saturationFluxDensity, "T");
    requirePositive(where, `${path}.permeability.transitionWidth`, p.transitionWidth, "K");
    requireInRange(where, `${path}.permeability.magnetisationShape`, p.magnetisationShape, "", 0, 1);
    requirePositive(where, `${path}.permeability.magnetisationExponent`, p.magnetisationExponent, "");
    requireText(where, `${path}.permeability.source`, p.source);
  }
  if (!Array.isArray(m.sources) || !m.sources.every((s) => typeof s === "string")) {
    throw new InputError(where, `${path}.sources`, m.sources, "", "an array of source strings");
  }
  return value as ConductiveMaterial;
}
