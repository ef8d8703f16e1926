/**
 * Design principle 5 across the whole public surface: every function exported from the package
 * root (1) returns finite numbers for its documented example, (2) throws InputError (never a
 * TypeError, a plain Error or a silent NaN) when one numeric argument or field is replaced by
 * NaN, ±Infinity, a string, undefined, zero or a negative number, unless that value is in the
 * domain (listed with its reason in examples.ts), and (3) throws InputError when an options
 * object (or nested object) is replaced by null, a number, a string or undefined.
 * Special-function kernels are documented to return NaN outside their domain and get check (1)
 * only; unit brands are zero-cost identity casts and get check (1) only.
 */
import { describe, expect, it } from "vitest";
import * as api from "../../src/index.js";
import { InputError } from "../../src/index.js";
import { EXAMPLES, OPAQUE, type Allowance, type Example } from "./examples.js";
import {
  BAD_NUMBERS,
  BAD_OBJECTS,
  badNumber,
  badObject,
  findLeaves,
  nonFiniteValues,
  pathKey,
  replaceAt,
  resultPathPattern,
  type BadNumber,
  type BadObject,
} from "./harness.js";

/** A field name no function accepts: every options object must reject it by name. */
const UNKNOWN_KEY = "unknownFieldXyz";

type AnyFunction = (...args: unknown[]) => unknown;

const exported = Object.entries(api as Record<string, unknown>);
const functions = exported.filter((e): e is [string, AnyFunction] => typeof e[1] === "function");
// exported data sets (materials, catalogues) are passed in whole: not walked field by field
for (const [, v] of exported) if (typeof v === "object" && v !== null) OPAQUE.add(v);
for (const m of api.conductiveMaterials) OPAQUE.add(m);

function matches(pattern: string, key: string): boolean {
  if (pattern === "*") return true;
  if (pattern.endsWith("*")) return key.startsWith(pattern.slice(0, -1));
  return pattern === key;
}

function allowed(example: Example, key: string, kind: BadNumber | BadObject): Allowance | undefined {
  return example.allow?.find((a) => a.kinds.includes(kind) && a.paths.some((p) => matches(p, key)));
}

function skipped(example: Example, key: string): boolean {
  return example.skip?.paths.some((p) => matches(p, key)) ?? false;
}

/** Non-finite numbers and nulls of a result that the table does not whitelist. */
function unexpectedNonFinite(example: Example, result: unknown): string[] {
  return nonFiniteValues(result)
    .filter((b) => example.nonFinite?.[resultPathPattern(b.path)] === undefined)
    .map((b) => `${b.path === "" ? "(result)" : b.path} = ${String(b.value)}`);
}

function valueAt(args: readonly unknown[], path: readonly (string | number)[]): unknown {
  let node: unknown = args;
  for (const p of path) node = (node as Record<string | number, unknown>)[p];
  return node;
}

function describeThrown(e: unknown): string {
  if (e instanceof Error) return `${e.constructor.name}: ${e.message}`;
  return `non-Error ${String(e)}`;
}

/** Calls `fn(...args)` and describes what went wrong, if the outcome is not acceptable. */
function judge(fn: AnyFunction, args: unknown[], example: Example, allowance: Allowance | undefined): string | null {
  let result: unknown;
  try {
    result = fn(...args);
  } catch (e) {
    if (e instanceof InputError) return null;
    return `threw ${describeThrown(e)}`;
  }
  if (allowance === undefined) {
    const bad = unexpectedNonFinite(example, result);
    return `returned without an InputError${bad.length > 0 ? ` (non-finite: ${bad.slice(0, 3).join(", ")})` : ""}`;
  }
  const bad = unexpectedNonFinite(example, result);
  return bad.length > 0 ? `allowed (${allowance.reason}) but returned non-finite ${bad.slice(0, 3).join(", ")}` : null;
}

function show(v: unknown): string {
  return typeof v === "string" ? JSON.stringify(v) : String(v);
}

describe("the robustness table", () => {
  it("has an entry for every exported function, so new exports are covered", () => {
    // a deprecated former name is the same function object as its new name: covered by that entry
    const covered = new Set(functions.filter(([name]) => name in EXAMPLES).map(([, f]) => f));
    const missing = functions.filter(([name, f]) => !(name in EXAMPLES) && !covered.has(f)).map(([name]) => name);
    expect(missing).toEqual([]);
  });

  it("names only exported functions", () => {
    const names = new Set(functions.map(([name]) => name));
    expect(Object.keys(EXAMPLES).filter((name) => !names.has(name))).toEqual([]);
  });

  it("gives every allowance and skip a reason", () => {
    for (const example of Object.values(EXAMPLES)) {
      for (const a of example.allow ?? []) expect(a.reason.length).toBeGreaterThan(10);
      if (example.skip) expect(example.skip.reason.length).toBeGreaterThan(10);
    }
  });
});

for (const [name, fn] of functions) {
  const example = EXAMPLES[name];
  if (example === undefined) continue; // reported by the table test above
  const kind = example.kind ?? "checked";

  describe(name, () => {
    // the @example call first, then any further variants (other kinds of a union option)
    const calls = [example.args, ...(example.variants ?? [])];
    const label = (i: number): string => (i === 0 ? "" : `[variant ${i}] `);

    it("returns finite numbers for its documented example", () => {
      if (kind === "class") {
        const Ctor = fn as unknown as new (...args: unknown[]) => unknown;
        expect(new Ctor(...example.args())).toBeInstanceOf(InputError);
        return;
      }
      const bad = calls.flatMap((args, i) => unexpectedNonFinite(example, fn(...args())).map((b) => label(i) + b));
      expect(bad, bad.join("\n")).toEqual([]);
    });

    if (kind !== "checked") return;

    it("throws InputError for a non-finite, non-numeric, missing, zero or negative number", () => {
      const failures: string[] = [];
      calls.forEach((args, i) => {
        for (const { path, value } of findLeaves(args(), OPAQUE, example.quantityStrings ?? false).numbers) {
          const key = pathKey(path);
          if (skipped(example, key)) continue;
          for (const bad of BAD_NUMBERS) {
            const replacement = badNumber(bad, value, example.badString ?? "1");
            const problem = judge(fn, replaceAt(args(), path, replacement), example, allowed(example, key, bad));
            if (problem !== null) failures.push(`${label(i)}${key} = ${show(replacement)}: ${problem}`);
          }
        }
      });
      expect(failures, failures.join("\n")).toEqual([]);
    });

    it("throws InputError naming an unknown (misspelt) field of every options object", () => {
      const failures: string[] = [];
      calls.forEach((args, i) => {
        const original = args();
        for (const { path, isArray } of findLeaves(original, OPAQUE, example.quantityStrings ?? false).objects) {
          const key = pathKey(path);
          // library data sets and results passed back in are checked as whole objects, not by field name
          if (isArray || OPAQUE.has(valueAt(original, path) as object) || skipped(example, key) || example.openObjects?.some((p) => matches(p, key))) continue;
          const mutated = replaceAt(args(), [...path, UNKNOWN_KEY], 1);
          try {
            fn(...mutated);
            failures.push(`${label(i)}${key}.${UNKNOWN_KEY}: accepted`);
          } catch (e) {
            if (!(e instanceof InputError)) failures.push(`${label(i)}${key}.${UNKNOWN_KEY}: threw ${describeThrown(e)}`);
            else if (!e.message.includes(UNKNOWN_KEY)) failures.push(`${label(i)}${key}.${UNKNOWN_KEY}: InputError not naming it: ${e.message}`);
          }
        }
      });
      expect(failures, failures.join("\n")).toEqual([]);
    });

    it("throws InputError when an options object is null, a number, a string or missing", () => {
      const failures: string[] = [];
      calls.forEach((args, i) => {
        for (const { path } of findLeaves(args(), OPAQUE, example.quantityStrings ?? false).objects) {
          const key = pathKey(path);
          if (skipped(example, key)) continue;
          for (const bad of BAD_OBJECTS) {
            const replacement = badObject(bad);
            const problem = judge(fn, replaceAt(args(), path, replacement), example, allowed(example, key, bad));
            if (problem !== null) failures.push(`${label(i)}${key} = ${show(replacement)}: ${problem}`);
          }
        }
      });
      expect(failures, failures.join("\n")).toEqual([]);
    });
  });
}
