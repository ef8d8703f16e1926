/**
 * The generated study-file schema and readHeaterDescription give the same verdict on random
 * study files: each case takes a shipped example and changes one thing (a quantity written
 * another way, a bad value, a required field removed, an unknown field added, a variant
 * switched). The changes keep the file's consistency (part inside the coil, target above start),
 * which only the reader checks; everything else must be judged alike, and a rejection must name
 * the changed field on both sides. The validator is ajv (JSON Schema 2020-12, strict mode).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { readdirSync, readFileSync } from "node:fs";
import { HeaterDescriptionError, InputError, readHeaterDescription } from "../../src/index.js";
import { errorField, schemaErrors } from "./schema-check.js";

const DIR = new URL("../../docs/examples/", import.meta.url);
const FILES = readdirSync(DIR).filter((f) => /^study-.*\.json$/u.test(f));
const EXAMPLES = FILES.map((f) => JSON.parse(readFileSync(new URL(f, DIR), "utf8")) as Record<string, unknown>);

/** The reader's verdict: the field paths of its problems (empty when it accepts). */
function readerProblems(value: unknown): string[] {
  try {
    readHeaterDescription(value, { requireUnits: true });
    return [];
  } catch (e) {
    if (e instanceof HeaterDescriptionError) return e.problems.map((p) => p.parameter);
    if (e instanceof InputError) return [e.parameter];
    throw e; // anything else is a bug, not a verdict
  }
}

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Every field path of a study file with its value. */
function leaves(node: Json, path: string, out: [string, Json][]): [string, Json][] {
  if (typeof node === "object" && node !== null && !Array.isArray(node)) {
    for (const [k, v] of Object.entries(node)) {
      const p = path === "" ? k : `${path}.${k}`;
      out.push([p, v]);
      leaves(v, p, out);
    }
  }
  return out;
}

function setAt(base: Json, path: string, value: Json | undefined): Json {
  const copy = structuredClone(base) as Record<string, Json>;
  const keys = path.split(".");
  let node = copy;
  for (const k of keys.slice(0, -1)) node = node[k] as Record<string, Json>;
  const last = keys[keys.length - 1] as string;
  if (value === undefined) Reflect.deleteProperty(node, last);
  else node[last] = value;
  return copy;
}

const PREFIX: Readonly<Record<string, number>> = { "": 0, k: 3, m: -3, c: -2, µ: -6, u: -6, n: -9, p: -12, M: 6 };
const QUANTITY = /^\s*\+?([0-9]+\.?[0-9]*|\.[0-9]+)([eE][+-]?[0-9]+)?\s*(\S.*?)\s*$/u;
const SIMPLE_UNIT = /^(k|m|c|µ|u|n|p|M)?(m|V|Ω|A|H|F|Hz|W)$/u;

/** The same quantity written other ways: spacing, sign, exponent and prefix, °C ↔ K. */
function sameQuantity(text: string): string[] {
  const m = QUANTITY.exec(text);
  if (m === null) return [];
  const [, digits = "", exp = "", suffix = ""] = m;
  const number = `${digits}${exp}`;
  const out = [`${number}${suffix}`, `+${number} ${suffix}`, ` ${number}  ${suffix} `];
  const unit = SIMPLE_UNIT.exec(suffix);
  if (unit !== null) {
    const e = (PREFIX[unit[1] ?? ""] ?? 0) + (exp === "" ? 0 : Number(exp.slice(1)));
    const base = unit[2] as string;
    out.push(`${digits}e${e} ${base}`);
    if (base !== "m") out.push(`${digits}e${e - 3} k${base}`, `${digits}e${e + 6} µ${base}`, `${digits}e${e + 6} u${base}`);
    else out.push(`${digits}e${e + 3} mm`, `${digits}e${e + 2} cm`);
  }
  if (suffix === "°C") out.push(`${number} degC`, `${number}℃`, `${Number(number) + 273.15} K`);
  if (suffix === "K") out.push(`${Number(number) - 273.15} °C`);
  return out;
}

/** Values no field of a study file takes (for its field's kind, with the field's own unit where one helps). */
function badValues(value: Json): Json[] {
  const common: Json[] = [null, true, [], {}, "", "abc"];
  // counts (≥ 1) and ratios (≤ 1): each of these is outside both
  if (typeof value === "number") return [...common, -1, -0.5, 2.5, "6"];
  if (typeof value === "string") {
    const m = QUANTITY.exec(value);
    if (m === null) return [...common, `${value}x`, value.toUpperCase() === value ? "other" : value.toUpperCase(), 3];
    const suffix = m[3] ?? "";
    const bad: Json[] = [...common, 5, "5", "5 kg", "4k7", `5 ${suffix}/s`, `5 5 ${suffix}`];
    // negative or zero where a quantity must be > 0 (temperatures are judged in kelvin by the reader alone)
    if (!/°C|K$/u.test(suffix)) bad.push(`0 ${suffix}`, `-5 ${suffix}`);
    return bad;
  }
  return [...common, 5, "text"];
}

/**
 * Optional fields whose removal can break a consistency check that only the reader makes: the
 * litz bundle's default outer diameter (from a packing factor) may be larger than the one given,
 * and the turns may then overlap. Every other field may be dropped: a required one must be
 * refused by both, an optional one accepted by both.
 */
const KEEP = new Set(["coil.conductor.outerDiameter"]);

/** Enum swaps that keep the file consistent, and swaps of a variant tag (which both must refuse). */
const SWAPS: Readonly<Record<string, readonly string[]>> = {
  "supply.kind": ["battery", "dc-bus"],
  "inverter.bridge": ["half", "full"],
  "coil.conductor.material": ["copper", "aluminium", "silver"],
  "part.targetLocation": ["mean", "surface", "core"],
  "inverter.kind": ["current-fed-parallel", "voltage-fed-series"],
  "inverter.control": ["fixed", "power-tracking"],
  "coil.shape": ["solenoid", "pancake"],
  "coil.conductor.kind": ["solid", "litz", "tube"],
  "part.shape": ["bar", "tube", "ring", "plate"],
};

interface Case {
  readonly file: Json;
  readonly path: string;
  readonly kind: "rewrite" | "bad" | "drop" | "add" | "swap";
  readonly value?: Json;
}

const caseArb: fc.Arbitrary<Case> = fc
  .record({ example: fc.nat(EXAMPLES.length - 1), pick: fc.nat(), option: fc.nat(), kind: fc.constantFrom("rewrite", "bad", "drop", "add", "swap") })
  .map(({ example, pick, option, kind }): Case => {
    const file = EXAMPLES[example] as Json;
    const all = leaves(file, "", []);
    const [path, value] = all[pick % all.length] as [string, Json];
    const choose = <T>(xs: readonly T[]): T | undefined => xs[option % Math.max(xs.length, 1)];
    if (kind === "rewrite" && typeof value === "string") {
      const v = choose(sameQuantity(value));
      if (v !== undefined) return { file, path, kind, value: v };
    }
    if (kind === "swap" && SWAPS[path] !== undefined) return { file, path, kind, value: choose(SWAPS[path]) ?? null };
    if (kind === "drop" && !KEEP.has(path)) return { file, path, kind };
    if (kind === "add") {
      const objects = all.filter(([, v]) => typeof v === "object" && v !== null && !Array.isArray(v)).map(([p]) => p);
      const parent = choose(["", ...objects]) ?? "";
      return { file, path: parent === "" ? "colour" : `${parent}.colour`, kind, value: "red" };
    }
    return { file, path, kind: "bad", value: choose(badValues(value)) ?? null };
  });

/** Whether `field` is `path`, inside it or around it (a oneOf failure names the object that holds the field). */
const related = (field: string, path: string): boolean => field === path || path.startsWith(`${field}.`) || field.startsWith(`${path}.`);

describe("the generated schema and readHeaterDescription judge random study files alike", () => {
  it("every example study file in docs/examples conforms to the schema and reads", () => {
    expect(FILES.length).toBeGreaterThanOrEqual(3);
    for (const [i, example] of EXAMPLES.entries()) {
      expect(schemaErrors(example).map(errorField), FILES[i]).toEqual([]);
      expect(readerProblems(example), FILES[i]).toEqual([]);
    }
  });

  it("accepted by one ⇔ accepted by the other, and a rejection names the changed field on both sides", () => {
    const tally = { accepted: 0, rejected: 0 };
    fc.assert(
      fc.property(caseArb, (c) => {
        const input = setAt(c.file, c.path, c.kind === "drop" ? undefined : c.value);
        const schema = schemaErrors(input).map(errorField);
        const reader = readerProblems(input);
        expect(schema.length === 0, `schema ${JSON.stringify(schema)} vs reader ${JSON.stringify(reader)}`).toBe(reader.length === 0);
        if (reader.length === 0) {
          tally.accepted++;
          return;
        }
        tally.rejected++;
        // a swapped variant tag makes other fields missing or foreign: both must name the section
        const section = c.kind === "swap" ? c.path.split(".").slice(0, -1).join(".") : c.path;
        expect(reader.some((p) => related(p, section)), `reader ${JSON.stringify(reader)} for ${c.path}`).toBe(true);
        expect(schema.some((p) => related(p, section)), `schema ${JSON.stringify(schema)} for ${c.path}`).toBe(true);
      }),
      { seed: 17, numRuns: 600 },
    );
    // both verdicts must have been reached often enough for the property to mean something
    expect(tally.accepted).toBeGreaterThan(60);
    expect(tally.rejected).toBeGreaterThan(200);
  });
});
