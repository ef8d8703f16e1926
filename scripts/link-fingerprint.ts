/**
 * Exact fingerprint of the link results and the voltage cautions, to show that a speed change of
 * `src/links/` or of the caution builders leaves every result bit for bit unchanged:
 * `inductiveLink` on seeded inputs over every compensation (default and given capacitors, filter
 * inductors, source voltages from safe to several kilovolts so that most results carry cautions,
 * and the messages of rejected inputs), `voltageCaution` over voltages that straddle every
 * rounding branch of its three-digit text, and `solenoidInductance` on seeded coils with and
 * without a wire diameter. Prints one SHA-256 per case of the exact JSON of the results (JSON
 * writes each double as the shortest text that reads back as the same double, so equal text
 * means equal bits) and the number of calls each case made.
 *
 * Usage (build first with `npm run build`):
 *   npx tsx scripts/link-fingerprint.ts [distDir]            print the fingerprints
 *   npx tsx scripts/link-fingerprint.ts distDir otherDistDir  compare two builds, case by case
 */
import { fingerprintBuilds } from "./fingerprint-compare.js";

type Lib = typeof import("../src/index.js");

/** A seeded generator of its own (the same sequence on every run and every build). */
function generator(seed: number): { uniform: () => number; logUniform: (lo: number, hi: number) => number } {
  let state = seed >>> 0;
  const uniform = (): number => {
    state = (state * 1103515245 + 12345) >>> 0;
    return state / 4294967296;
  };
  return { uniform, logUniform: (lo, hi) => lo * (hi / lo) ** uniform() };
}

/** The message of the error a call throws, or its result. */
function outcome(call: () => unknown): unknown {
  try {
    return call();
  } catch (error) {
    return { error: error instanceof Error ? `${error.name}: ${error.message}` : String(error) };
  }
}

const COMPENSATIONS = ["series-series", "series-parallel", "parallel-series", "parallel-parallel", "lcc-series", "double-lcc"] as const;
let calls = 0;

function linkCases(lib: Lib, given: boolean): string {
  const { uniform, logUniform } = generator(given ? 2027 : 1846);
  const results: unknown[] = [];
  for (let i = 0; i < 6000; i++) {
    const compensation = COMPENSATIONS[i % 6] ?? "series-series";
    const l1 = logUniform(5e-6, 500e-6);
    const l2 = logUniform(5e-6, 500e-6);
    const f = logUniform(20e3, 7e6);
    const w2 = (2 * Math.PI * f) ** 2;
    const options = {
      primaryInductance: l1, secondaryInductance: l2, mutualInductance: logUniform(0.01, 0.6) * Math.sqrt(l1 * l2),
      primaryResistance: logUniform(0.001, 1), secondaryResistance: logUniform(0.001, 1), frequency: f, compensation,
      loadResistance: logUniform(0.5, 200), sourceVoltage: logUniform(1, 3000),
      ...(given ? { primaryCapacitance: logUniform(0.5, 2) / (w2 * l1), secondaryCapacitance: logUniform(0.5, 2) / (w2 * l2) } : {}),
      ...(compensation === "lcc-series" || compensation === "double-lcc" ? { primaryFilterInductance: (0.1 + 0.8 * uniform()) * l1 } : {}),
      ...(compensation === "double-lcc" ? { secondaryFilterInductance: (0.1 + 0.8 * uniform()) * l2 } : {}),
    };
    results.push(outcome(() => lib.inductiveLink(options)));
    calls++;
  }
  return JSON.stringify(results);
}

function rejectedLinks(lib: Lib): string {
  const base = {
    primaryInductance: 24e-6, secondaryInductance: 12e-6, mutualInductance: 4e-6, primaryResistance: 0.1, secondaryResistance: 0.08,
    frequency: 140e3, compensation: "series-series", loadResistance: 5, sourceVoltage: 10,
  };
  const bad: Record<string, unknown>[] = [
    { mutualInductance: 20e-6 }, { frequency: -1 }, { compensation: "series" }, { loadResistance: Number.NaN }, { sourceVoltage: "10" },
    { primaryCapacitence: 1e-6 }, { primaryFilterInductance: 1e-6 }, { compensation: "lcc-series" }, { compensation: "lcc-series", primaryFilterInductance: 30e-6 },
    { compensation: "parallel-series", primaryCapacitance: undefined, primaryResistance: 0, secondaryResistance: 0, mutualInductance: 16e-6, loadResistance: 0.01 },
  ];
  return JSON.stringify(bad.map((change) => {
    calls++;
    return outcome(() => lib.inductiveLink({ ...base, ...change } as unknown as Parameters<Lib["inductiveLink"]>[0]));
  }));
}

function voltageCautions(lib: Lib): string {
  const { uniform, logUniform } = generator(61140);
  const voltages: number[] = [0, -0, 49.999, 50, 50.0000001, 119.99, 120, 120.5, 999.5, 999.4999999, 999.5000001, 1e6, 999999, 1e9, 0.1, 0.01, 0.001, 0.0995, 99.95];
  for (let k = -3; k <= 6; k++) for (let n = 100; n <= 999; n += 7) voltages.push(n * 10 ** (k - 2), (n + 0.5) * 10 ** (k - 2), -n * 10 ** (k - 2));
  for (let i = 0; i < 20000; i++) voltages.push((uniform() < 0.1 ? -1 : 1) * logUniform(1e-4, 1e8));
  const results = voltages.flatMap((voltage) => (["ac", "dc"] as const).map((waveform) => {
    calls++;
    return lib.voltageCaution({ voltage, waveform, location: "tank capacitor" });
  }));
  return JSON.stringify(results);
}

function solenoids(lib: Lib): string {
  const { uniform, logUniform } = generator(1909);
  const results: unknown[] = [];
  for (let i = 0; i < 20000; i++) {
    const radius = logUniform(1e-4, 1);
    const length = logUniform(1e-4, 1);
    const turns = 1 + Math.floor(uniform() * 200);
    const wire = i % 3 === 0 ? { wireDiameter: (length / turns) * (0.2 + 0.8 * uniform()) } : {};
    results.push(outcome(() => lib.solenoidInductance({ radius, length, turns, ...wire })));
    calls++;
  }
  // extreme scales, non-finite and unknown fields (the checked path)
  const extremes: Record<string, unknown>[] = [
    { radius: 1e200, length: 1e200, turns: 1 }, { radius: 1e-300, length: 1, turns: 1 }, { radius: 1, length: 1, turns: 1e200 },
    { radius: 1e300, length: 1e-300, turns: 1 }, { radius: Infinity, length: 1, turns: 1 }, { radius: 1, length: 1, turns: 1, wireDiameter: undefined },
    { radius: -1, length: -1, turns: 1 }, { radius: 0.1, length: 0.1, turns: 10, radios: 1 }, { radius: 0.1, length: 0.1, turns: 0.5 },
  ];
  for (const options of extremes) {
    results.push(outcome(() => lib.solenoidInductance(options as unknown as Parameters<Lib["solenoidInductance"]>[0])));
    calls++;
  }
  return JSON.stringify(results);
}

await fingerprintBuilds((lib) => {
  calls = 0;
  const cases = new Map<string, string>([
    ["inductiveLink, 6000 seeded links, default capacitors", linkCases(lib, false)],
    ["inductiveLink, 6000 seeded links, given capacitors", linkCases(lib, true)],
    ["inductiveLink, rejected inputs", rejectedLinks(lib)],
    ["voltageCaution, AC and DC over every rounding branch", voltageCautions(lib)],
    ["solenoidInductance, 20000 seeded coils and extremes", solenoids(lib)],
  ]);
  console.log(`${calls} calls on this build`);
  return cases;
});
