/**
 * Fuzz suite over every exported function, generated from the robustness table (one spec per
 * function, `test/robustness/examples.ts`): each run perturbs the documented example — every
 * numeric leaf scaled by a log-uniform factor, or one leaf replaced by a bad value, or a made-up
 * field added to one options object — and calls the function on deep-frozen arguments. It checks:
 *
 * - a call either returns finite numbers (except result paths the table whitelists) or throws
 *   InputError — never another error, NaN or ±Infinity;
 * - a bad value (NaN, ±Infinity, text) put in one field gives an InputError whose parameter
 *   names that field, unless the table allows that value there;
 * - a made-up field gives an InputError naming it;
 * - no argument is written to (the arguments are frozen; a write throws a TypeError);
 * - every call returns within a time bound;
 * - a few cheap physical properties (signs and monotonicity, `PROPERTIES` below).
 *
 * CI runs a small budget with a fixed seed (a few seconds in all). A larger budget on demand:
 * `FUZZ_RUNS=2000 FUZZ_MS=20000 FUZZ_SEED=7 npx vitest run test/fuzz` (runs per function,
 * milliseconds per function, seed).
 */
import { describe, expect, it } from "vitest";
import * as api from "../../src/index.js";
import { InputError } from "../../src/index.js";
import { EXAMPLES, OPAQUE, type Example } from "../robustness/examples.js";
import { findLeaves, nonFiniteValues, pathKey, replaceAt, resultPathPattern, type Path } from "../robustness/harness.js";

type AnyFunction = (...args: unknown[]) => unknown;

const RUNS = Number(process.env["FUZZ_RUNS"] ?? 12);
const BUDGET_MS = Number(process.env["FUZZ_MS"] ?? 60);
const SEED = Number(process.env["FUZZ_SEED"] ?? 1);
/** Longest a single call may take [ms] (generous: CI machines are shared). */
const CALL_LIMIT_MS = Number(process.env["FUZZ_CALL_MS"] ?? 8000);
/** Decades by which a numeric leaf is scaled either way. */
const SPREAD = 2;

for (const [, v] of Object.entries(api as Record<string, unknown>)) if (typeof v === "object" && v !== null) OPAQUE.add(v);
for (const m of api.conductiveMaterials) OPAQUE.add(m);

/** Small deterministic generator (mulberry32). */
function generator(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function seedOf(name: string): number {
  let h = SEED;
  for (let i = 0; i < name.length; i++) h = Math.imul(h ^ name.charCodeAt(i), 16777619);
  return h;
}

function isPlain(v: unknown): v is object {
  if (typeof v !== "object" || v === null || ArrayBuffer.isView(v)) return false;
  const proto = Object.getPrototypeOf(v) as unknown;
  return Array.isArray(v) || proto === Object.prototype || proto === null;
}

function deepFreeze<T>(v: T): T {
  if (isPlain(v) && !Object.isFrozen(v)) {
    Object.freeze(v);
    for (const x of Object.values(v)) deepFreeze(x);
  }
  return v;
}

function valueAt(args: readonly unknown[], path: Path): unknown {
  let node: unknown = args;
  for (const p of path) node = (node as Record<string | number, unknown>)[p];
  return node;
}

/** Cheap physical properties: result sign, and direction of change with one leaf. */
interface Property {
  positive?: boolean;
  /** Path key of a numeric leaf and the sign of d(result)/d(leaf) over the fuzzed region. */
  monotone?: { path: string; sign: 1 | -1; strict?: boolean };
}
const PROPERTIES: Readonly<Record<string, Property>> = {
  solenoidInductance: { positive: true, monotone: { path: "0.turns", sign: 1, strict: true } },
  loopMutualInductance: { positive: true, monotone: { path: "0.axialDistance", sign: -1 } },
  loopInductance: { positive: true },
  skinDepth: { positive: true, monotone: { path: "0.frequency", sign: -1, strict: true } },
  wireDcResistance: { positive: true, monotone: { path: "0.length", sign: 1, strict: true } },
  roundWireAcRatio: { monotone: { path: "0.frequency", sign: 1 } },
  dowellFactor: { monotone: { path: "0.penetrationRatio", sign: 1 } },
  // a loss density below the double range rounds to 0 (representable), so non-strict
  steinmetzLoss: { monotone: { path: "0.fluxDensityPeak", sign: 1 } },
  multilayerCoilInductance: { positive: true },
  spiralCoilInductance: { positive: true },
  nagaokaCoefficient: { positive: true, monotone: { path: "0", sign: -1, strict: true } },
};

const functions = Object.entries(api as Record<string, unknown>).filter((e): e is [string, AnyFunction] => typeof e[1] === "function");

/** One random variant of the example: scaled leaves, then maybe one bad leaf or one unknown key. */
type Variant =
  | { kind: "scaled"; args: unknown[] }
  | { kind: "bad"; args: unknown[]; key: string; value: unknown }
  | { kind: "unknown"; args: unknown[]; key: string };

const BAD_VALUES: readonly unknown[] = [Number.NaN, Infinity, -Infinity, "x"];

function variant(example: Example, random: () => number): Variant {
  const base = example.args();
  const found = findLeaves(base, OPAQUE, example.quantityStrings ?? false);
  const skipped = (key: string): boolean => example.skip?.paths.some((p) => (p.endsWith("*") ? key.startsWith(p.slice(0, -1)) : p === key)) ?? false;
  const numbers = found.numbers.filter((n) => !skipped(pathKey(n.path)));
  const objects = found.objects.filter((o) => !skipped(pathKey(o.path)));
  // one fault at a time: a bad value or an unknown field goes into the documented example itself
  const roll = random();
  if (roll < 0.2 && numbers.length > 0) {
    const leaf = numbers[Math.floor(random() * numbers.length)]!;
    const value = BAD_VALUES[Math.floor(random() * BAD_VALUES.length)];
    return { kind: "bad", args: replaceAt(base, leaf.path, value), key: pathKey(leaf.path), value };
  }
  const open = objects.filter((o) => !o.isArray && !OPAQUE.has(valueAt(base, o.path) as object) && !(example.openObjects ?? []).includes(pathKey(o.path)));
  if (roll < 0.3 && open.length > 0) {
    const target = open[Math.floor(random() * open.length)]!;
    return { kind: "unknown", args: replaceAt(base, [...target.path, "fuzzUnknownField"], 1), key: pathKey(target.path) };
  }
  let args = base;
  for (const { path, value } of numbers) {
    if (typeof valueAt(args, path) !== "number" || random() < 0.5) continue;
    const factor = 10 ** (SPREAD * (2 * random() - 1));
    const scaled = Number.isInteger(value) && value >= 1 ? Math.max(1, Math.round(value * factor)) : value * factor;
    args = replaceAt(args, path, scaled);
  }
  return { kind: "scaled", args };
}

function allowedBad(example: Example, key: string, value: unknown): boolean {
  const kind = typeof value === "string" ? "string" : Number.isNaN(value) ? "NaN" : value === Infinity ? "Infinity" : "-Infinity";
  return (
    example.allow?.some((a) => a.kinds.includes(kind) && a.paths.some((p) => (p === "*" ? true : p.endsWith("*") ? key.startsWith(p.slice(0, -1)) : p === key))) ??
    false
  );
}

describe("fuzz over the public API (generated from the robustness table)", () => {
  for (const [name, fn] of functions) {
    const example = EXAMPLES[name];
    if (example === undefined || (example.kind ?? "checked") !== "checked") continue;
    it(`${name}: InputError or finite results; names bad and unknown fields; no mutation; bounded time`, () => {
      const random = generator(seedOf(name));
      const failures: string[] = [];
      const property = PROPERTIES[name];
      const start = performance.now();
      for (let run = 0; run < RUNS && (run === 0 || performance.now() - start < BUDGET_MS); run++) {
        const v = variant(example, random);
        const args = deepFreeze(v.args);
        const t0 = performance.now();
        let result: unknown;
        let error: unknown = null;
        try {
          result = fn(...args);
        } catch (e) {
          error = e;
        }
        const ms = performance.now() - t0;
        const label = `run ${run} (${v.kind}${v.kind === "scaled" ? "" : ` ${v.key}`})`;
        if (ms > CALL_LIMIT_MS) failures.push(`${label}: took ${ms.toFixed(0)} ms`);
        if (error !== null) {
          if (!(error instanceof InputError)) {
            failures.push(`${label}: threw ${error instanceof Error ? `${error.constructor.name}: ${error.message}` : "a non-Error value"}`);
            continue;
          }
          if (v.kind === "bad" && !allowedBad(example, v.key, v.value)) {
            const leaf = v.key.split(".").slice(1).join(".");
            const named = leaf === "" || error.parameter.includes(leaf.split(".").pop()!) || error.message.includes(leaf.split(".").pop()!);
            if (!named) failures.push(`${label}: InputError names ${error.parameter}, not ${leaf}`);
          }
          if (v.kind === "unknown" && !error.message.includes("fuzzUnknownField")) failures.push(`${label}: InputError does not name the unknown field: ${error.message}`);
          continue;
        }
        if (v.kind === "unknown") failures.push(`${label}: accepted an unknown field`);
        if (v.kind === "bad" && !allowedBad(example, v.key, v.value)) failures.push(`${label}: accepted ${String(v.value)}`);
        const bad = nonFiniteValues(result).filter((b) => example.nonFinite?.[resultPathPattern(b.path)] === undefined);
        if (bad.length > 0) failures.push(`${label}: non-finite ${bad.slice(0, 3).map((b) => `${b.path || "(result)"}=${String(b.value)}`).join(", ")}`);
        if (property?.positive === true && typeof result === "number" && !(result > 0)) failures.push(`${label}: result ${result} not > 0`);
        const mono = property?.monotone;
        if (mono !== undefined && v.kind === "scaled" && typeof result === "number") {
          const path = mono.path.split(".").map((p) => (/^\d+$/.test(p) ? Number(p) : p));
          const x = valueAt(args, path);
          if (typeof x === "number") {
            const stepped = Number.isInteger(x) && x >= 1 ? x + 1 : x * 1.01;
            let other: unknown;
            try {
              other = fn(...replaceAt(args, path, stepped));
            } catch (e) {
              if (!(e instanceof InputError)) failures.push(`${label}: monotonicity probe threw ${String(e)}`);
            }
            if (typeof other === "number") {
              const d = (other - result) * mono.sign;
              if (mono.strict === true ? !(d > 0) : d < -1e-12 * Math.abs(result)) {
                failures.push(`${label}: not ${mono.sign > 0 ? "increasing" : "decreasing"} in ${mono.path} (${result} → ${other})`);
              }
            }
          }
        }
      }
      expect(failures, failures.slice(0, 10).join("\n")).toEqual([]);
    });
  }
});
