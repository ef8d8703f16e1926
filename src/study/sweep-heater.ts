/**
 * Sweeping one field of a heater description.
 *
 * @packageDocumentation
 */
import { InputError, nearestName, requireKnownKeys } from "../core/index.js";
import { HeaterDescriptionError, readHeaterDescription } from "./read-description.js";
import type { HeaterDescription, QuantityInput } from "./description.js";
import type { ReadHeaterDescriptionOptions } from "./read-description.js";
import { studyHeater } from "./study-heater.js";
import { summarise } from "./summary.js";
import type { HeaterSummary } from "./summary.js";

/**
 * What {@link sweepHeater} varies.
 *
 * @category Heater study
 */
export interface HeaterSweepSpec {
  /** Dotted path of a numeric field of the description, e.g. `"coil.turns"`, `"capacitor.capacitance"`, `"supply.voltage"`. */
  readonly field: string;
  /** The values to give it: SI numbers or text quantities (`"3.3 µF"`), at least one. */
  readonly values: readonly QuantityInput[];
  /** Also run the electro-thermal heat-up for each value (default `true`). */
  readonly heatUp?: boolean;
  /**
   * Read the description and the values as a study file is read (default `false`): a bare
   * number for a field with a dimension is refused (see {@link ReadHeaterDescriptionOptions}).
   */
  readonly requireUnits?: boolean;
}

/**
 * One row of a sweep table.
 *
 * @category Heater study
 */
export interface HeaterSweepRow {
  /** The value given to the field, as written. */
  readonly value: QuantityInput;
  /** The headline numbers, or `null` when the description was invalid with this value. */
  readonly summary: HeaterSummary | null;
  /** Number of cautions the study raised (0 when invalid). */
  readonly cautionCount: number;
  /** Why the row has no result (the description's problem, with field path), else `null`. */
  readonly problem: string | null;
}

/**
 * The result of {@link sweepHeater}.
 *
 * @category Heater study
 */
export interface HeaterSweep {
  /** The swept field's path. */
  readonly field: string;
  /** One row per value, in the order given. */
  readonly rows: readonly HeaterSweepRow[];
}

/** The problems of a description (empty when it reads). */
function problemsOf(description: unknown, options: ReadHeaterDescriptionOptions): readonly InputError[] {
  try {
    readHeaterDescription(description, options);
    return [];
  } catch (e) {
    if (e instanceof HeaterDescriptionError) return e.problems;
    throw e;
  }
}

/** Whether the path names a field whose parent object exists in the description. */
function setField(root: unknown, path: string, value: unknown): unknown {
  const copy = structuredClone(root) as Record<string, unknown>;
  const keys = path.split(".");
  let node: Record<string, unknown> = copy;
  for (const key of keys.slice(0, -1)) {
    const next = node[key];
    if (typeof next !== "object" || next === null || Array.isArray(next)) {
      throw new InputError("sweepHeater", "field", path, "", "the dotted path of a field of the description (its parent objects must exist)");
    }
    node = next as Record<string, unknown>;
  }
  const last = keys[keys.length - 1] as string;
  const current = node[last];
  if (current !== undefined && typeof current !== "number" && typeof current !== "string") {
    throw new InputError("sweepHeater", "field", path, "", "a numeric field (number or quantity text), not an object");
  }
  node[last] = value;
  return copy;
}

/**
 * Sweeps one numeric field of a heater description over a list of values and studies each
 * variant with {@link studyHeater}: a table of headline numbers per value. A value that makes
 * the description invalid gives a row with its `problem` (field path and reason) instead of
 * stopping the sweep.
 *
 * @param description - the base design (see {@link HeaterDescription})
 * @param sweep - `field` (dotted path) and `values`
 * @returns the table
 * @throws {@link InputError} when the base description is invalid, `field` is not a field of
 * the description (a typo such as `coil.turn`, with the nearest field suggested), a value is a
 * bare number for a field with a dimension under `requireUnits`, `field` is not a dotted path
 * to a numeric field, or `values` is empty or holds something other than numbers and strings
 * @example
 * ```ts
 * import { sweepHeater } from "fluxwright";
 * import type { HeaterDescription } from "fluxwright";
 * const base: HeaterDescription = {
 *   supply: { kind: "battery", voltage: "48 V" },
 *   inverter: { kind: "current-fed-parallel", chokeInductance: "100 µH", switchOnResistance: "8 mΩ" },
 *   coil: { shape: "solenoid", radius: "75 mm", length: "48 mm", turns: 6,
 *     conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm" } },
 *   capacitor: { capacitance: "4 µF" },
 *   part: { shape: "ring", material: "lowCarbonSteel", outerRadius: "62 mm", innerRadius: "50 mm",
 *     height: "30 mm", targetTemperature: "120 °C" },
 * };
 * const table = sweepHeater(base, { field: "coil.turns", values: [5, 6, 0], heatUp: false });
 * console.log(table.rows.length, table.rows[2]?.problem !== null); // 3 true
 * ```
 * @category Heater study
 */
export function sweepHeater(description: HeaterDescription, sweep: HeaterSweepSpec): HeaterSweep {
  const where = "sweepHeater";
  if (typeof sweep !== "object" || sweep === null) throw new InputError(where, "sweep", sweep, "", "an object { field, values }");
  requireKnownKeys(where, "sweep", sweep, ["field", "values", "heatUp", "requireUnits"]);
  if (typeof sweep.field !== "string" || !/^[A-Za-z]\w*(\.[A-Za-z]\w*)*$/.test(sweep.field)) {
    throw new InputError(where, "field", sweep.field, "", "a dotted field path such as \"coil.turns\"");
  }
  const values: readonly QuantityInput[] = sweep.values;
  if (!Array.isArray(values) || values.length === 0) throw new InputError(where, "values", values, "", "a non-empty array");
  values.forEach((v, i) => {
    if (typeof v !== "number" && typeof v !== "string") throw new InputError(where, `values[${i}]`, v, "", "a number or a quantity text");
  });
  if (sweep.requireUnits !== undefined && typeof sweep.requireUnits !== "boolean") throw new InputError(where, "requireUnits", sweep.requireUnits, "", "a boolean");
  const requireUnits = sweep.requireUnits === true;
  // the base must be valid (otherwise every row would carry the same problem)
  readHeaterDescription(description, { requireUnits });
  studyHeater(description, { heatUp: false, temperatureScan: false, impedanceSweep: false });
  // a field the description does not have (a typo such as coil.turn) would fail every row: refuse it
  values.forEach((value, i) => {
    const problems = problemsOf(setField(description, sweep.field, value), { requireUnits });
    for (const p of problems) {
      if (p.parameter !== sweep.field) continue;
      const known = /known fields: (.*)\)$/u.exec(p.expected)?.[1]?.split(", ");
      if (known !== undefined || p.expected.startsWith("absent")) {
        const parent = sweep.field.split(".").slice(0, -1).join(".");
        const near = known === undefined ? null : nearestName(sweep.field.split(".").pop() ?? "", known);
        const hint = near !== null ? ` (did you mean ${JSON.stringify(parent === "" ? near : `${parent}.${near}`)}?)` : known === undefined ? ` (${p.expected})` : ` (fields there: ${known.join(", ")})`;
        throw new InputError(where, "field", sweep.field, "", `a field of the description${hint}`);
      }
      if (p.expected.includes("a bare number has no unit")) throw new InputError(where, `values[${i}]`, value, "", p.expected);
    }
  });
  const rows: HeaterSweepRow[] = values.map((value: QuantityInput): HeaterSweepRow => {
    const variant = setField(description, sweep.field, value) as HeaterDescription;
    try {
      if (requireUnits) readHeaterDescription(variant, { requireUnits });
      const s = studyHeater(variant, { heatUp: sweep.heatUp !== false, radialHeatUp: false, temperatureScan: false, impedanceSweep: false });
      return { value, summary: summarise(s.operating, s.emptyCoil, s.heatUp?.timeToTarget ?? null), cautionCount: s.cautions.length, problem: null };
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      return { value, summary: null, cautionCount: 0, problem: e.message };
    }
  });
  return { field: sweep.field, rows };
}
