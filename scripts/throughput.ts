/**
 * Measures the throughput targets of the library's hot functions on one core: each function is
 * called on a pre-generated array of varied inputs over its valid domain (so V8 cannot fold the
 * work), best of five rounds, and reported as evaluations per second. A NaN result fails.
 *
 * Each case runs in a timing loop of its own (one shared loop would see every function at its
 * call site, and V8 would stop inlining there: that measures the call site, not the function;
 * `llcGain` read 11–22 M/s through a shared loop and 60–75 M/s through its own). Besides the
 * wall-clock rate each row gives the rate in CPU time of this process (`process.cpuUsage`),
 * which a loaded machine moves less.
 *
 * The first rows are plain-JS references (no library code): a square root, a logarithm and a
 * division on varied inputs (the baseline of `throughput:check`), and the same with a small
 * result object allocated per call. A shared machine moves every row together, so the ratio of
 * a function's rate to a reference row's in the same run is comparable across days where the
 * absolute rates are not (`--ratios` prints them).
 *
 * Usage: npx tsx scripts/throughput.ts [--markdown] [--ratios] [--only=NAME]
 */
import { cases, mask, x } from "./throughput-cases.js";
import type { Case } from "./throughput-cases.js";

const markdown = process.argv.includes("--markdown");
const ratios = process.argv.includes("--ratios");
const only = process.argv.find((a) => a.startsWith("--only="))?.slice("--only=".length);

/** Plain-JS reference rows: measured like the cases, no target. */
const references: Case[] = [
  {
    name: "plain-JS reference: sqrt + log + division",
    target: 0,
    unit: "per second",
    n: 2e7,
    run: (i) => {
      const v = x[i & mask]!;
      return Math.sqrt(v) + Math.log(v) / (1 + v);
    },
  },
  {
    name: "plain-JS reference: the same, returning a new object",
    target: 0,
    unit: "per second",
    n: 1e7,
    run: (i) => {
      const v = x[i & mask]!;
      return makeReferenceObject(Math.sqrt(v), Math.log(v) / (1 + v)).sum;
    },
  },
];
function makeReferenceObject(a: number, b: number): { a: number; b: number; sum: number } {
  return { a, b, sum: a + b };
}

let loops = 0;
/**
 * A fresh timing loop per case: its call site sees one function only. The source text differs
 * per loop: V8 caches the compilation of identical text, and the closures of one cached
 * function share their type feedback (a second loop of the same text read llcGain 0.63 × the
 * first).
 */
function makeLoop(): (run: (i: number) => number, calls: number) => number {
  // deliberate: a new function object per case for its own type feedback (no input is evaluated)
  // eslint-disable-next-line @typescript-eslint/no-implied-eval
  return new Function("run", "calls", `/* loop ${loops++} */ let sink = 0; for (let i = 0; i < calls; i++) sink += run(i); return sink;`) as (run: (i: number) => number, calls: number) => number;
}

interface Measured {
  readonly wall: number;
  readonly cpu: number;
}

function measure(c: Case): Measured {
  const loop = makeLoop();
  let bestWall = Infinity;
  let bestCpu = Infinity;
  for (let round = 0; round < 5; round++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    const sink = loop(c.run, c.n);
    const t = (performance.now() - t0) / 1000;
    const used = process.cpuUsage(c0);
    if (Number.isNaN(sink)) throw new Error(`${c.name} returned NaN`);
    bestWall = Math.min(bestWall, t);
    bestCpu = Math.min(bestCpu, (used.user + used.system) / 1e6);
  }
  const evaluations = c.n * (c.evaluationsPerCall ?? 1);
  return { wall: evaluations / bestWall, cpu: evaluations / bestCpu };
}

const rate = (perSecond: number): string => (perSecond >= 1e6 ? `${(perSecond / 1e6).toFixed(2)} M/s` : `${(perSecond / 1e3).toFixed(1)} k/s`);
const rows: string[] = [];
let failed = false;
let referenceRate = NaN;
for (const c of [...references, ...cases]) {
  const isReference = references.includes(c);
  if (!isReference && only !== undefined && !c.name.startsWith(only)) continue;
  const { wall, cpu } = measure(c);
  if (c === references[0]) referenceRate = cpu;
  const ratio = ratios && !isReference ? `   ratio ${(cpu / referenceRate).toExponential(2)}` : "";
  if (isReference) {
    rows.push(markdown ? `| ${c.name} | ${rate(wall)} | ${rate(cpu)} | — | |` : `${c.name.padEnd(52)} ${rate(wall).padStart(11)}   CPU ${rate(cpu).padStart(11)}`);
    continue;
  }
  const perSecond = wall;
  const value = c.unit === "per second" ? perSecond : 1000 / perSecond;
  const ok = c.unit === "per second" ? value >= c.target : value <= c.target;
  if (!ok) failed = true;
  const shown = c.unit === "per second" ? rate(value) : `${value.toFixed(3)} ms`;
  const shownCpu = c.unit === "per second" ? rate(cpu) : `${(1000 / cpu).toFixed(3)} ms`;
  const target = c.unit === "per second" ? `≥ ${c.target >= 1e6 ? `${c.target / 1e6} M/s` : `${c.target / 1e3} k/s`}` : `≤ ${c.target} ms`;
  rows.push(
    markdown
      ? `| ${c.name} | ${shown} | ${shownCpu} | ${target} | ${ok ? "met" : "not met"} |`
      : `${c.name.padEnd(52)} ${shown.padStart(11)}   CPU ${shownCpu.padStart(11)}   target ${target.padEnd(10)} ${ok ? "met" : "NOT MET"}${ratio}`,
  );
}
if (markdown) console.log("| function | measured (best of 5) | CPU time (best of 5) | target | |\n| --- | --- | --- | --- | --- |");
console.log(rows.join("\n"));
process.exitCode = failed ? 1 : 0;
