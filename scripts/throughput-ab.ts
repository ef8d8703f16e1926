/**
 * Compares the speed of one hot function in two builds of the library, alternating in one
 * process: the same pre-generated inputs as `npm run throughput` (`throughput-cases.ts`), blocks
 * of calls timed in CPU time (`process.cpuUsage`), the two builds taking turns in both orders.
 * A shared machine moves both builds together, so the median of the per-pair ratios is
 * comparable where absolute rates are not; two copies of the same build read ×0.98–1.00.
 * Each build is called through a timing loop of its own source text (its own type feedback).
 * Keep both builds in folders that load the same way: a `dist` copied to a folder without a
 * `"type": "module"` package.json above it is loaded through tsx's CommonJS transform, and that
 * copy read ×1.12 against the same files loaded as ES modules.
 *
 * Usage (build both first, e.g. `npm run build` and a copy of another branch's `dist`):
 *   npx tsx scripts/throughput-ab.ts DIST_A DIST_B [--only=inductiveLink|solenoidInductance] [--rounds=40]
 */
import { resolve } from "node:path";
import { loadavg } from "node:os";
import { pathToFileURL } from "node:url";
import { linkCases, mask, solenoids } from "./throughput-cases.js";

type Lib = typeof import("../src/index.js");

const [dirA, dirB] = process.argv.slice(2).filter((a) => !a.startsWith("--"));
if (dirA === undefined || dirB === undefined) throw new Error("usage: throughput-ab.ts DIST_A DIST_B [--only=NAME] [--rounds=N]");
const only = process.argv.find((a) => a.startsWith("--only="))?.slice("--only=".length) ?? "inductiveLink";
const rounds = Number(process.argv.find((a) => a.startsWith("--rounds="))?.slice("--rounds=".length) ?? 40);
const load = async (dir: string): Promise<Lib> => (await import(pathToFileURL(resolve(dir, "index.js")).href)) as Lib;
const libs = [await load(dirA), await load(dirB)];

const inputs: readonly object[] = only === "inductiveLink" ? linkCases : only === "solenoidInductance" ? solenoids : [];
if (inputs.length === 0) throw new Error(`--only: inductiveLink or solenoidInductance, got ${only}`);
const block = only === "inductiveLink" ? 100_000 : 1_000_000;
const read = only === "inductiveLink" ? ".efficiency" : "";

type Loop = (f: unknown, cases: readonly object[], mask: number, start: number, calls: number) => number;
/**
 * One timing loop per build, of distinct source text, that calls the build's function itself:
 * closures of one function literal share their type feedback, so a shared wrapper would see both
 * builds at one call site and favour one of them (it read one build ×0.89 against the other).
 */
const loops = libs.map((_, k) => {
  // deliberate: a timing loop of distinct source text per build (no input is evaluated)
  // eslint-disable-next-line @typescript-eslint/no-implied-eval
  return new Function("f", "cases", "mask", "start", "calls", `/* build ${k} */ let sink = 0; for (let i = start; i < start + calls; i++) sink += f(cases[i & mask])${read}; return sink;`) as Loop;
});
const functions = libs.map((lib) => lib[only as "inductiveLink" | "solenoidInductance"]);
const rates: number[][] = [[], []];
const next = [0, 0];
function timeBlock(k: number): void {
  const c0 = process.cpuUsage();
  const sink = loops[k]!(functions[k], inputs, mask, next[k]!, block);
  const used = process.cpuUsage(c0);
  if (Number.isNaN(sink)) throw new Error(`build ${k} returned NaN`);
  next[k]! += block;
  rates[k]!.push(block / ((used.user + used.system) / 1e6));
}
for (let w = 0; w < 10; w++) for (const k of [0, 1]) loops[k]!(functions[k], inputs, mask, 0, block);
for (let r = 0; r < rounds; r++) for (const k of r % 2 === 0 ? [0, 1] : [1, 0]) timeBlock(k);

const median = (x: readonly number[]): number => [...x].sort((p, q) => p - q)[x.length >> 1] ?? NaN;
const [a, b] = rates as [number[], number[]];
const ratio = median(b.map((rate, i) => rate / a[i]!));
const rate = (x: number): string => (x >= 1e6 ? `${(x / 1e6).toFixed(2)} M/s` : `${(x / 1e3).toFixed(1)} k/s`);
console.log(`${only}: A ${rate(median(a))} (best ${rate(Math.max(...a))}), B ${rate(median(b))} (best ${rate(Math.max(...b))}), CPU time`);
console.log(`B/A: median of ${rounds} pair ratios ×${ratio.toFixed(3)}; load average ${loadavg().map((x) => x.toFixed(2)).join(" ")}`);
