/**
 * Reading and validating heater descriptions (study files): text quantities through the units
 * module, defaults filled in, every problem reported with its field path.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys } from "../core/index.js";
import type { CoreMaterial } from "../materials/index.js";
import { celsius } from "../units/index.js";
import { CORE_MATERIALS, HeaterDescriptionError, limitText, Reader, WHERE } from "./description-reader.js";
import { readCoil, readFieldConcentrators, readInverter, readPart, rectangleBounds } from "./read-sections.js";
import { conductorOuterDiameter } from "./resolved-description.js";
import type { ResolvedCapacitorBank, ResolvedConcentrator, ResolvedEnvironment, ResolvedHeaterDescription, ResolvedSupply } from "./resolved-description.js";

export { HeaterDescriptionError } from "./description-reader.js";
export { conductorOuterDiameter } from "./resolved-description.js";
export type {
  ResolvedSupply,
  ResolvedCurrentFedInverter,
  ResolvedSeriesInverter,
  ResolvedInverter,
  ResolvedSolidConductor,
  ResolvedLitzConductor,
  ResolvedTubeConductor,
  ResolvedConductor,
  ResolvedCoilCommon,
  ResolvedRoundPairLeads,
  ResolvedFlatPairLeads,
  ResolvedCoaxialLeads,
  ResolvedLeads,
  ResolvedSolenoidCoil,
  ResolvedPancakeCoil,
  ResolvedCoil,
  ResolvedCapacitorBank,
  ResolvedConcentrator,
  ResolvedPartCommon,
  ResolvedRectangle,
  ResolvedFieldConcentrator,
  ResolvedBarPart,
  ResolvedTubePart,
  ResolvedRingPart,
  ResolvedPlatePart,
  ResolvedPart,
  ResolvedEnvironment,
  ResolvedHeaterDescription,
} from "./resolved-description.js";

/**
 * Options of {@link readHeaterDescription}.
 *
 * @category Heater study
 */
export interface ReadHeaterDescriptionOptions {
  /**
   * Refuse a bare number for a quantity with a dimension (`"radius": 32` must be written
   * `"32 mm"`), as study files must: the command line reads files this way. Default `false`:
   * descriptions built in code may give SI numbers.
   */
  readonly requireUnits?: boolean;
}

/**
 * Reads a heater description (a parsed study file, or an object built in code) and returns it
 * resolved: quantities as SI numbers (text such as `"30 mm"`, `"4.7 µF"` or `"20 °C"` is read
 * with `parseQuantity` in the field's unit), defaults filled in, material ids replaced by their
 * property sets. Every field is checked, and nothing is returned from a half-valid description:
 * all problems are collected and thrown together.
 *
 * Checks, each reported with the field's path (`coil.turns`, `part.targetTemperature`): missing
 * required fields, wrong types, text in the wrong unit (`"30 mF"` for a length), values out of
 * range (negative, zero where > 0 is needed, non-integer turns), unknown fields (a typo such as
 * `coil.turn`), fields that do not belong to the chosen variant (a `frequency` for a
 * self-oscillating inverter), and consistency (overlapping turns, a part that does not fit in
 * the coil, a target at or below the start temperature or at or above the melting point, a
 * coil shape that cannot heat the part shape: a solenoid takes bars, tubes and rings; a
 * pancake coil takes plates).
 *
 * @param input - the description (e.g. `JSON.parse` of a study file)
 * @param options - `requireUnits: true` refuses bare numbers for quantities with a dimension
 * @returns the resolved description
 * @throws {@link HeaterDescriptionError} (an {@link InputError} whose `parameter` is the field
 * path of the first problem and whose `problems` lists them all), e.g.
 * `readHeaterDescription: coil.turns must be an integer ≥ 1, got 0`
 * @example
 * ```ts
 * import { readHeaterDescription } from "fluxwright";
 * try {
 *   readHeaterDescription({ supply: { kind: "battery", voltage: "24 V" } });
 * } catch (e) {
 *   console.log((e as Error).message); // readHeaterDescription: inverter must be an object, got undefined
 * }
 * ```
 * @category Heater study
 */
export function readHeaterDescription(input: unknown, options: ReadHeaterDescriptionOptions = {}): ResolvedHeaterDescription {
  requireKnownKeys(WHERE, "options", options, ["requireUnits"]);
  if (options.requireUnits !== undefined && typeof options.requireUnits !== "boolean") throw new InputError(WHERE, "options.requireUnits", options.requireUnits, "", "a boolean");
  const rd = new Reader(options.requireUnits === true);
  const top = rd.object("", input, ["$schema", "title", "notes", "supply", "inverter", "coil", "capacitor", "concentrator", "part", "environment", "concentrators"]);
  if (top === undefined) throw new HeaterDescriptionError([new InputError(WHERE, "description", input, "", "an object")]);
  if (top.title !== undefined && typeof top.title !== "string") rd.fail("title", top.title, "", "a string");
  if (top.notes !== undefined && typeof top.notes !== "string") rd.fail("notes", top.notes, "", "a string");
  if (top.$schema !== undefined && typeof top.$schema !== "string") rd.fail("$schema", top.$schema, "", "a string (the schema's address)");

  // supply
  const so = rd.object("supply", top.supply, ["kind", "voltage", "internalResistance", "currentLimit"]);
  let supply: ResolvedSupply | undefined;
  if (so !== undefined) {
    const kind = rd.oneOf("supply.kind", so.kind, ["battery", "dc-bus"] as const);
    const voltage = rd.quantity("supply.voltage", so.voltage, "V", "positive");
    const internalResistance = rd.optional("supply.internalResistance", so.internalResistance, "Ω", "non-negative", 0);
    const currentLimit = rd.optionalOrNull("supply.currentLimit", so.currentLimit, "A");
    if (kind !== undefined) supply = { kind, voltage, internalResistance, currentLimit };
  }
  const inverter = readInverter(rd, top.inverter);
  const coil = readCoil(rd, top.coil);

  // capacitor bank
  const co = rd.object("capacitor", top.capacitor, ["capacitance", "dissipationFactor", "voltageRatingRms", "currentRatingRms"]);
  let capacitor: ResolvedCapacitorBank | undefined;
  if (co !== undefined) {
    capacitor = {
      capacitance: rd.quantity("capacitor.capacitance", co.capacitance, "F", "positive"),
      // 5e-4: polypropylene film capacitors at tens of kHz (common practice)
      dissipationFactor: rd.ratio("capacitor.dissipationFactor", co.dissipationFactor, 0, 0.1, false, 5e-4),
      voltageRatingRms: rd.optionalOrNull("capacitor.voltageRatingRms", co.voltageRatingRms, "V"),
      currentRatingRms: rd.optionalOrNull("capacitor.currentRatingRms", co.currentRatingRms, "A"),
    };
  }

  // concentrator
  let concentrator: ResolvedConcentrator | null = null;
  if (top.concentrator !== undefined) {
    const cc = rd.object("concentrator", top.concentrator, ["material", "crossSectionArea", "volume"]);
    if (cc !== undefined) {
      const given = cc.material;
      const isCore = typeof given === "object" && given !== null && typeof (given as Partial<CoreMaterial>).steinmetz === "object";
      const id = isCore ? ((given as CoreMaterial).name) : rd.oneOf("concentrator.material", given, Object.keys(CORE_MATERIALS));
      const crossSectionArea = rd.quantity("concentrator.crossSectionArea", cc.crossSectionArea, "m²", "positive");
      const volume = rd.quantity("concentrator.volume", cc.volume, "m³", "positive");
      const material = isCore ? (given as CoreMaterial) : id === undefined ? undefined : CORE_MATERIALS[id];
      if (material !== undefined && id !== undefined) concentrator = { material, materialId: id, crossSectionArea, volume };
    }
    if (coil !== undefined && coil.shape !== "pancake") rd.fail("concentrator", top.concentrator, "", "absent for a solenoid coil (concentrators are modelled behind pancake coils only)");
  }

  // environment (read before the part: the start temperature defaults to the ambient)
  let environment: ResolvedEnvironment = { ambientTemperature: celsius(20), convectionCoefficient: 10 };
  if (top.environment !== undefined) {
    const eo = rd.object("environment", top.environment, ["ambientTemperature", "convectionCoefficient"]);
    if (eo !== undefined) {
      environment = {
        ambientTemperature: rd.optional("environment.ambientTemperature", eo.ambientTemperature, "K", "positive", celsius(20)),
        convectionCoefficient: rd.optional("environment.convectionCoefficient", eo.convectionCoefficient, "W/(m²·K)", "non-negative", 10),
      };
    }
  }
  let part = readPart(rd, top.part, environment.ambientTemperature);
  const concentrators = top.concentrators === undefined ? undefined : readFieldConcentrators(rd, top.concentrators);

  // coil and part together
  if (coil !== undefined && part?.rectangles !== undefined && coil.shape === "pancake") {
    // a part of rectangles under a pancake coil: its bounding plate stands in for the surrogate
    const b = rectangleBounds(part.rectangles);
    const { rectangles, material, startTemperature, targetTemperature, emissivity } = part;
    part = { material, startTemperature, targetTemperature, emissivity, shape: "plate", length: 2 * b.rMax, width: 2 * b.rMax, thickness: b.zMax - b.zMin, rectangles };
  }
  if (coil !== undefined && part !== undefined) {
    if (coil.shape === "solenoid" && part.shape === "plate") rd.fail("part.shape", part.shape, "", `"bar", "tube" or "ring" inside a solenoid coil`);
    if (coil.shape === "pancake" && part.shape !== "plate") rd.fail("part.shape", part.shape, "", `"plate" under a pancake coil`);
    if (coil.shape === "solenoid" && part.shape !== "plate") {
      const outer = part.shape === "bar" ? part.radius : part.outerRadius;
      const bore = coil.radius - conductorOuterDiameter(coil.conductor) / 2;
      const key = part.shape === "bar" ? "radius" : "outerRadius";
      const written = (top.part as Record<string, unknown>)[key];
      if (outer >= bore) rd.fail(`part.${key}`, written, "", `< the coil's bore radius (coil.radius − conductor diameter / 2) = ${limitText(bore, "m", written)}`);
    }
  }

  if (rd.problems.length > 0) throw new HeaterDescriptionError(rd.problems);
  if (supply === undefined || inverter === undefined || coil === undefined || capacitor === undefined || part === undefined) {
    // unreachable: a missing piece always records a problem
    throw new HeaterDescriptionError([new InputError(WHERE, "description", input, "", "a complete heater description")]);
  }
  return {
    title: typeof top.title === "string" ? top.title : "heater study",
    supply,
    inverter,
    coil,
    capacitor,
    concentrator,
    part,
    environment,
    ...(concentrators === undefined ? {} : { concentrators }),
  };
}
