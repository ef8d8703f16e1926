/**
 * The field reader behind {@link readHeaterDescription}: converts text quantities through the
 * units module and checks each field, recording every problem with its field path instead of
 * stopping at the first.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import { conductiveMaterials, inventedExampleFerrite, inventedExampleIronPowder } from "../materials/index.js";
import type { ConductiveMaterial, CoreMaterial } from "../materials/index.js";
import { checkConductiveMaterial } from "../materials/check-material.js";
import { formatQuantity, parseQuantity, ZERO_CELSIUS } from "../units/index.js";
import { canonicalUnit } from "../units/unit-symbols.js";
import { isQuantityText } from "./quantity-text.js";

/** The function name every problem is reported under. */
export const WHERE = "readHeaterDescription";

/**
 * Thrown by {@link readHeaterDescription} when a description has problems: an
 * {@link InputError} for the first problem (its `parameter` is the field path, e.g.
 * `"coil.turns"`), carrying all of them in `problems`.
 *
 * @category Heater study
 */
export class HeaterDescriptionError extends InputError {
  /** Every problem found, in document order (the first is this error's own). */
  readonly problems: readonly InputError[];

  /**
   * @param problems - the problems found (at least one)
   */
  constructor(problems: readonly InputError[]) {
    const first = problems[0] as InputError;
    super(first.where, first.parameter, first.value, first.unit, first.expected);
    this.name = "HeaterDescriptionError";
    this.problems = problems;
  }
}

/** Material ids accepted for parts and conductors (the materials catalogue). */
export const MATERIAL_IDS = conductiveMaterials.map((m) => m.id);
export const CONDUCTOR_IDS = ["copper", "aluminium", "silver"];
export const CORE_MATERIALS: Readonly<Record<string, CoreMaterial>> = {
  inventedExampleFerrite,
  inventedExampleIronPowder,
};

/** Problems collected before the reader stops (a huge malformed file would list millions). */
const MAX_PROBLEMS = 200;
/** Text that is only a number: it says nothing of its unit. */
const BARE_NUMBER_TEXT = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/u;
/** Lengths in inches or mils (`"1.25 in"`, `"40 mil"`), which the units module converts exactly (1 in = 25.4 mm). */
const INCH_TEXT = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(in|inch|inches|mil|mils)\s*$/u;

/** The unit a person would most likely write for each SI unit, for examples in messages. */
const EXAMPLE_UNIT: Readonly<Record<string, string>> = {
  m: "mm", F: "µF", H: "µH", V: "V", Ω: "mΩ", A: "A", Hz: "kHz", W: "W", K: "°C", "m²": "cm²", "m³": "cm³", "W/(m²·K)": "W/(m²·K)",
};

/** An example text for a quantity in `unit`. */
function unitExample(unit: string): string {
  return { m: "30 mm", F: "4.7 µF", H: "200 µH", V: "24 V", Ω: "10 mΩ", A: "50 A", Hz: "25 kHz", W: "1.5 kW", K: "20 °C", "m²": "6 cm²", "m³": "30 cm³", "W/(m²·K)": "10 W/(m²·K)", "": "0.5" }[unit] ?? "1";
}

/** The message for a bare number where a unit is needed: shows the fix with the number as written. */
function bareNumberFix(value: number, unit: string): string {
  const likely = EXAMPLE_UNIT[unit] ?? unit;
  const written = Number.isFinite(value) ? String(value) : "1";
  const alternative = likely === unit ? "" : ` or "${written} ${unit}"`;
  return `a quantity with its unit, e.g. "${written} ${likely}"${alternative} (a bare number has no unit in a study file)`;
}

/**
 * A limit for a message, in the unit the user wrote for the field (`"30 mm"` → mm, `"850 °C"`
 * → °C, `"1.25 in"` → in), else with an SI prefix; 4 significant digits, the unit after the number.
 */
export function limitText(value: number, unit: string, written: unknown): string {
  const digits = (x: number): string => String(Number(x.toPrecision(4)));
  if (!Number.isFinite(value)) return String(value);
  if (typeof written === "string") {
    const inch = INCH_TEXT.exec(written);
    if (inch !== null && unit === "m") {
      const mil = inch[2]?.startsWith("mil") === true;
      return `${digits(value / (mil ? 2.54e-5 : 0.0254))} ${mil ? "mil" : "in"}`;
    }
    const suffix = /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*(\S.*?)\s*$/u.exec(written)?.[1];
    if (suffix !== undefined) {
      if (unit === "K" && canonicalUnit(suffix) === "°C") return `${digits(value - ZERO_CELSIUS)} °C`;
      try {
        const scale = parseQuantity(`1 ${suffix}`, unit);
        if (unit !== "K" && scale > 0) return `${digits(value / scale)} ${suffix}`;
      } catch {
        // not a unit we can scale to: fall through to the prefixed SI form
      }
    }
  }
  if (unit === "K") return `${digits(value - ZERO_CELSIUS)} °C`;
  return formatQuantity(value, unit, { digits: 4 });
}

/** The reader: converts and checks fields, recording problems instead of stopping at the first. */
export class Reader {
  readonly problems: InputError[] = [];

  /** Refuse bare numbers for quantities with a dimension (study files). */
  constructor(readonly requireUnits = false) {}

  fail(path: string, value: unknown, unit: string, expected: string): number {
    this.problems.push(new InputError(WHERE, path, value, unit, expected));
    // bounded work on huge malformed input: stop collecting after MAX_PROBLEMS
    if (this.problems.length >= MAX_PROBLEMS) {
      this.problems.push(new InputError(WHERE, "(description)", `more than ${MAX_PROBLEMS} problems`, "", `fixed first: reading stopped after ${MAX_PROBLEMS} problems`));
      throw new HeaterDescriptionError(this.problems);
    }
    return Number.NaN;
  }

  object(path: string, value: unknown, known: readonly string[]): Record<string, unknown> | undefined {
    if (typeof value !== "object" || value === null || Array.isArray(value)) {
      this.fail(path, value, "", "an object");
      return undefined;
    }
    const record = value as Record<string, unknown>;
    for (const key of Object.keys(record)) {
      if (!known.includes(key)) {
        this.fail(`${path === "" ? "" : `${path}.`}${key}`, record[key], "", `absent (not a field here; known fields: ${known.join(", ")})`);
      }
    }
    return record;
  }

  oneOf<const T extends string>(path: string, value: unknown, allowed: readonly T[]): T | undefined {
    if (typeof value !== "string" || !(allowed as readonly string[]).includes(value)) {
      this.fail(path, value, "", `one of ${allowed.map((a) => JSON.stringify(a)).join(", ")}`);
      return undefined;
    }
    return value as T;
  }

  /**
   * A quantity: text with a unit (`"30 mm"`, `"1.25 in"`, `"850 °C"`), or a number in SI. With
   * `requireUnits` (study files) a bare number is refused where the field has a dimension; text
   * that is only a number (`"2.2"`) is refused everywhere a unit is expected. NaN after a problem.
   */
  quantity(path: string, value: unknown, unit: string, check: "positive" | "non-negative" | "finite", required = true): number {
    if (value === undefined) {
      return required ? this.fail(path, value, unit, check === "positive" ? "a finite number > 0" : "a finite number ≥ 0") : Number.NaN;
    }
    let v: number;
    if (typeof value === "number") {
      if (this.requireUnits && unit !== "") return this.fail(path, value, "", bareNumberFix(value, unit));
      v = value;
    } else if (typeof value === "string") {
      if (unit !== "" && BARE_NUMBER_TEXT.test(value)) return this.fail(path, value, "", bareNumberFix(Number(value.trim()), unit));
      // in a study file the text must name the unit: no RKM code ("4k7"), no bare prefix ("30 m" for a capacitance)
      if (this.requireUnits && unit !== "" && !isQuantityText(value, unit)) return this.fail(path, value, "", `a quantity in ${unit}, e.g. "${unitExample(unit)}"`);
      const inch = unit === "m" ? INCH_TEXT.exec(value) : null;
      try {
        v = inch === null ? parseQuantity(value, unit) : (Number(inch[1]) * 254) / (inch[2]?.startsWith("mil") === true ? 1e7 : 1e4);
      } catch (e) {
        if (!(e instanceof InputError)) throw e;
        // a well-formed temperature below absolute zero: out of range, not unreadable
        if (e.expected.includes("absolute zero")) return this.fail(path, value, unit, check === "positive" ? "a finite number > 0" : "a finite number ≥ 0");
        const example = unitExample(unit);
        return this.fail(path, value, "", unit === "" ? `a number, e.g. "${example}"` : `a quantity in ${unit}, e.g. "${example}"`);
      }
    } else {
      return this.fail(path, value, "", unit === "" ? "a number" : `a quantity text with its unit, e.g. "${unitExample(unit)}"`);
    }
    if (!Number.isFinite(v)) return this.fail(path, value, unit, "a finite number");
    if (check === "positive" && !(v > 0)) return this.fail(path, value, unit, "a finite number > 0");
    if (check === "non-negative" && !(v >= 0)) return this.fail(path, value, unit, "a finite number ≥ 0");
    return v;
  }

  optional(path: string, value: unknown, unit: string, check: "positive" | "non-negative", fallback: number): number {
    return value === undefined ? fallback : this.quantity(path, value, unit, check);
  }

  optionalOrNull(path: string, value: unknown, unit: string): number | null {
    return value === undefined ? null : this.quantity(path, value, unit, "positive");
  }

  integer(path: string, value: unknown, min: number): number {
    if (typeof value !== "number" || !Number.isInteger(value) || value < min) return this.fail(path, value, "", `an integer ≥ ${min}`);
    return value;
  }

  ratio(path: string, value: unknown, min: number, max: number, openLow: boolean, fallback: number): number {
    if (value === undefined) return fallback;
    const v = value;
    if (typeof v !== "number" || !Number.isFinite(v) || (openLow ? !(v > min) : !(v >= min)) || !(v <= max)) {
      return this.fail(path, value, "", `a number in ${openLow ? "(" : "["}${min}, ${max}]`);
    }
    return v;
  }

  material(path: string, value: unknown, allowed: readonly string[]): ConductiveMaterial | undefined {
    // a material set passed in code (e.g. the exported `lowCarbonSteel`, or one of the caller's own)
    if (typeof value === "object" && value !== null && !Array.isArray(value)) {
      // checked field by field, so that a caller's own set fails here with its path, not later
      try {
        return checkConductiveMaterial(WHERE, path, value);
      } catch (e) {
        if (!(e instanceof InputError)) throw e;
        this.fail(e.parameter, e.value, e.unit, e.expected);
        return undefined;
      }
    }
    const id = this.oneOf(path, value, allowed);
    return id === undefined ? undefined : conductiveMaterials.find((m) => m.id === id);
  }
}

