/**
 * Exact fingerprint of every public function of the converters module over seeded random
 * inputs, to show that a change leaves every result bit for bit unchanged. Each function is
 * called on a few hundred to a few thousand option sets drawn log-uniformly around its
 * documented example (bridges, filters and frequencies from well below to well above
 * resonance, light to heavy loads); about a third of the calls get one to three bad fields (a
 * zero, negative, non-finite, missing or wrongly typed value, an unknown key, a bad choice, no
 * object at all), so rejected inputs are compared too. A result is written as exact JSON (each
 * double as the shortest text that reads back as the same double; −0, NaN and ±Infinity spelt
 * out); a thrown error as its class, message and InputError fields.
 *
 * Usage (build first with `npm run build`):
 *   npx tsx scripts/converter-fingerprint.ts [distDir]            print the fingerprints
 *   npx tsx scripts/converter-fingerprint.ts distDir otherDistDir  compare two builds, case by case
 * `CONVERTER_FINGERPRINT_SEED` (default 20261204) and `CONVERTER_FINGERPRINT_SCALE` (default 1:
 * the number of calls is multiplied by it) vary the draw.
 */
import { Xoshiro128 } from "../src/special/random.js";
import { fingerprintBuilds } from "./fingerprint-compare.js";

type Lib = typeof import("../src/index.js");
type Options = Record<string, unknown>;

const SEED = Number(process.env.CONVERTER_FINGERPRINT_SEED ?? 20261204);
const SCALE = Number(process.env.CONVERTER_FINGERPRINT_SCALE ?? 1);

/** Exact JSON: doubles round-trip through their shortest text; −0, NaN and ±Infinity spelt out. */
function exact(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) => {
    if (typeof v === "number" && (!Number.isFinite(v) || Object.is(v, -0))) return `#number ${Object.is(v, -0) ? "-0" : String(v)}`;
    if (v instanceof Float64Array) return { Float64Array: Array.from(v) };
    if (v === undefined) return "#undefined";
    return v;
  });
}

/** The outcome of one call as exact JSON: its result, or the error it threw. */
function outcome(call: () => unknown): { text: string; rejected: boolean } {
  try {
    return { text: exact(call()), rejected: false };
  } catch (e) {
    const error = e as Error & { parameter?: unknown; value?: unknown; unit?: unknown; expected?: unknown };
    return {
      text: exact({ error: error.name, ctor: error.constructor.name, message: error.message, parameter: error.parameter, value: error.value, unit: error.unit, expected: error.expected }),
      rejected: true,
    };
  }
}

class Draw {
  private readonly rng: Xoshiro128;
  constructor(seed: number) {
    this.rng = new Xoshiro128(seed);
  }
  uniform(lo: number, hi: number): number {
    return lo + (hi - lo) * this.rng.next();
  }
  log(lo: number, hi: number): number {
    return lo * Math.pow(hi / lo, this.rng.next());
  }
  pick<T>(items: readonly T[]): T {
    return items[Math.floor(this.rng.next() * items.length)] as T;
  }
  chance(p: number): boolean {
    return this.rng.next() < p;
  }
}

const BAD_NUMBERS: readonly unknown[] = [0, -1, -0, -1e-12, NaN, Infinity, -Infinity, "12", null, undefined, true, {}];

/**
 * Spoils one to three fields of `options` (or the whole object) in about a third of the draws,
 * so that the order in which a function checks its fields shows in the messages.
 */
function spoil(draw: Draw, options: Options, choices: Record<string, readonly unknown[]>): unknown {
  if (!draw.chance(0.35)) return options;
  if (draw.chance(0.04)) return draw.pick([null, undefined, 5, "options", []]);
  const keys = Object.keys(options);
  const count = 1 + Math.floor(draw.uniform(0, 3));
  for (let i = 0; i < count; i++) {
    const roll = draw.uniform(0, 1);
    if (roll < 0.08) {
      options[draw.pick(["frequency", "seriesCapacitor", "load", "bridgeType", "Vin"])] = 1;
      continue;
    }
    const key = draw.pick(keys);
    const choice = choices[key];
    if (roll < 0.16) Reflect.deleteProperty(options, key);
    else if (choice !== undefined) options[key] = draw.pick([...choice.map((c) => `${String(c)}x`), 1, null]);
    else options[key] = draw.pick(BAD_NUMBERS);
  }
  return options;
}

/**
 * Component values of a PRC/LCC around the documented examples, frequencies around f_r; one
 * draw in eight far outside (C_p/C_s over four decades, f_s/f_r over three), where the solvers
 * fall back to relaxation and continuation or find no steady state.
 */
function parallelConverter(draw: Draw, lcc: boolean): Options {
  const far = draw.chance(0.125);
  const lr = draw.log(2e-6, 1e-3);
  const cp = draw.log(1e-9, 1e-6);
  const cs = cp * (far ? draw.log(0.01, 100) : draw.log(0.2, 5));
  const fr = 1 / (2 * Math.PI * Math.sqrt(lr * (lcc ? cs : cp)));
  const options: Options = {
    bridge: draw.pick(["half", "full"]),
    inputVoltage: draw.log(12, 800),
    turnsRatio: draw.log(0.25, 12),
    resonantInductance: lr,
    parallelCapacitance: cp,
    switchingFrequency: fr * (far ? draw.log(0.01, 10) : draw.log(0.4, 3)),
    loadResistance: Math.sqrt(lr / cp) * (far ? draw.log(1e-3, 1e3) : draw.log(0.02, 5)),
  };
  if (lcc) options.seriesCapacitance = cs;
  return options;
}

function llcConverter(draw: Draw, magnetising: boolean): Options {
  const lr = draw.log(5e-6, 200e-6);
  const cr = draw.log(5e-9, 300e-9);
  const fr = 1 / (2 * Math.PI * Math.sqrt(lr * cr));
  const options: Options = {
    bridge: draw.pick(["half", "full"]),
    inputVoltage: draw.log(24, 420),
    turnsRatio: draw.log(0.5, 10),
    resonantInductance: lr,
    resonantCapacitance: cr,
  };
  if (magnetising) options.magnetisingInductance = lr * draw.log(2, 12);
  options.switchingFrequency = fr * draw.log(0.5, 2);
  options.loadResistance = Math.sqrt(lr / cr) * draw.log(0.05, 20);
  if (draw.chance(0.3)) options.rectifier = draw.pick(["centre-tap", "full-bridge"]);
  if (draw.chance(0.3)) options.deadTime = draw.log(20e-9, 400e-9);
  if (draw.chance(0.3)) options.switchCapacitance = draw.log(50e-12, 1e-9);
  return options;
}

interface Family {
  readonly name: string;
  readonly calls: number;
  readonly input: (draw: Draw) => unknown;
  readonly call: (lib: Lib, input: unknown) => unknown;
}

const BRIDGE = { bridge: ["half", "full"] } as const;
const fn = (name: keyof Lib) => (lib: Lib, input: unknown): unknown => (lib[name] as (o: unknown) => unknown)(input);

const families: readonly Family[] = [
  { name: "lccOperatingPoint", calls: 3000, input: (d) => spoil(d, parallelConverter(d, true), BRIDGE), call: fn("lccOperatingPoint") },
  { name: "parallelResonantOperatingPoint", calls: 2000, input: (d) => spoil(d, parallelConverter(d, false), BRIDGE), call: fn("parallelResonantOperatingPoint") },
  { name: "lccOperatingPointCapacitiveFilter", calls: 3000, input: (d) => spoil(d, parallelConverter(d, true), BRIDGE), call: fn("lccOperatingPointCapacitiveFilter") },
  { name: "parallelResonantOperatingPointCapacitiveFilter", calls: 2000, input: (d) => spoil(d, parallelConverter(d, false), BRIDGE), call: fn("parallelResonantOperatingPointCapacitiveFilter") },
  {
    name: "lccFrequencySweep",
    calls: 300,
    input: (d) => {
      const o = parallelConverter(d, true);
      const f0 = o.switchingFrequency as number;
      delete o.switchingFrequency;
      const count = 2 + Math.floor(d.uniform(0, 14));
      const up = d.chance(0.7);
      o.frequencies = Array.from({ length: count }, (_, i) => f0 * Math.pow(1.06, up ? i : count - i));
      if (d.chance(0.7)) o.outputFilter = d.pick(["inductive", "capacitive"]);
      return spoil(d, o, { ...BRIDGE, outputFilter: ["inductive", "capacitive"] });
    },
    call: fn("lccFrequencySweep"),
  },
  { name: "llcOperatingPoint", calls: 1500, input: (d) => spoil(d, llcConverter(d, true), { ...BRIDGE, rectifier: ["centre-tap", "full-bridge"] }), call: fn("llcOperatingPoint") },
  { name: "seriesResonantOperatingPoint", calls: 800, input: (d) => spoil(d, llcConverter(d, false), { ...BRIDGE, rectifier: ["centre-tap", "full-bridge"] }), call: fn("seriesResonantOperatingPoint") },
  {
    name: "llcDesign",
    calls: 120,
    input: (d) => {
      const nominal = d.log(24, 400);
      const o: Options = {
        inputVoltage: { min: nominal * d.uniform(0.7, 1), nominal, max: nominal * d.uniform(1, 1.2) },
        outputVoltage: d.log(5, 60),
        outputPower: d.log(10, 1000),
        resonantFrequency: d.log(50e3, 500e3),
        bridge: d.pick(["half", "full"]),
      };
      if (d.chance(0.4)) o.inductanceRatio = d.uniform(3, 10);
      if (d.chance(0.3)) o.gainMargin = d.uniform(1, 1.5);
      if (d.chance(0.3)) o.capacitorSeries = d.pick(["E12", "E24", "E96"]);
      return spoil(d, o, { ...BRIDGE, capacitorSeries: ["E12", "E24", "E96"] });
    },
    call: fn("llcDesign"),
  },
  {
    name: "llcGain",
    calls: 2000,
    input: (d) => spoil(d, { inductanceRatio: d.log(1, 20), qualityFactor: d.log(0.05, 5), normalisedFrequency: d.log(0.2, 5) }, {}),
    call: fn("llcGain"),
  },
  { name: "seriesResonantGain", calls: 1000, input: (d) => spoil(d, { qualityFactor: d.log(0.05, 5), normalisedFrequency: d.log(0.2, 5) }, {}), call: fn("seriesResonantGain") },
  { name: "parallelResonantGain", calls: 1000, input: (d) => spoil(d, { qualityFactor: d.log(0.05, 5), normalisedFrequency: d.log(0.2, 5) }, {}), call: fn("parallelResonantGain") },
  {
    name: "lccGain",
    calls: 1000,
    input: (d) => spoil(d, { qualityFactor: d.log(0.05, 5), normalisedFrequency: d.log(0.2, 5), capacitanceRatio: d.log(0.05, 5) }, {}),
    call: fn("lccGain"),
  },
];

/** Calls, accepted and rejected, per family (filled by the first build's run). */
const tally: { name: string; calls: number; rejected: number }[] = [];

function cases(lib: Lib): Map<string, string> {
  const out = new Map<string, string>();
  const first = tally.length === 0;
  families.forEach((family, index) => {
    const draw = new Draw(SEED + 7919 * index);
    const calls = Math.max(1, Math.round(family.calls * SCALE));
    const lines: string[] = [];
    let rejected = 0;
    for (let i = 0; i < calls; i++) {
      const input = family.input(draw);
      const inputText = exact(input);
      const result = outcome(() => family.call(lib, input));
      if (result.rejected) rejected++;
      lines.push(`${inputText}\n→ ${result.text}`);
    }
    out.set(`${family.name} (${calls} calls)`, lines.join("\n"));
    if (first) tally.push({ name: family.name, calls, rejected });
  });
  return out;
}

await fingerprintBuilds(cases);
const total = tally.reduce((s, t) => s + t.calls, 0);
const rejected = tally.reduce((s, t) => s + t.rejected, 0);
for (const t of tally) console.log(`  ${t.name}: ${t.calls} calls, ${t.calls - t.rejected} results, ${t.rejected} thrown`);
console.log(`${total} calls per build (${total - rejected} results, ${rejected} thrown), seed ${SEED}`);
