/**
 * The worker pool's speed-up, memory over a long streamed sweep, and abort latency, measured on
 * the built package (`npm run build` first): `tsx scripts/pool-benchmark.ts [speedup|scale|first|memory|abort]`.
 * `npm run bench:scale` builds and prints the speed-up target's line (`scale [designs]`, 1000 by default).
 * Results are reported in docs/benchmarks.md.
 */
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { availableParallelism, loadavg } from "node:os";
import { pathToFileURL } from "node:url";
import type { HeaterDescription } from "../src/index.js";

// `--dist=<folder>` measures another build (e.g. an older one kept aside, for before/after
// rounds run alternately); the other arguments are positional
const distArg = process.argv.find((a) => a.startsWith("--dist="));
const args = process.argv.filter((a) => !a.startsWith("--dist="));
const distUrl = distArg === undefined ? new URL("../dist/", import.meta.url) : pathToFileURL(`${distArg.slice("--dist=".length).replace(/\/$/, "")}/`);

// the built package (its worker script lives in dist), typed by the sources so that the type
// check passes on a clean clone before the build
const { sweepHeater, sweepHeaterStream } = (await import(new URL("index.js", distUrl).href)) as typeof import("../src/index.js");

const race = JSON.parse(readFileSync(new URL("../docs/examples/study-bearing-race.json", import.meta.url), "utf8")) as HeaterDescription;
const what = args[2] ?? "speedup";
console.log(`${distArg ?? "dist"}: node ${process.version}, ${availableParallelism()} cores, load average ${loadavg().map((l) => l.toFixed(2)).join(" ")}`);

/**
 * CPU time [s] of each thread of this process (Linux: /proc/self/task), keyed by thread id; null
 * elsewhere. Tells the workers' JavaScript threads from V8's helper threads (background JIT
 * compilation, parallel and concurrent garbage collection), which one run of a few designs per
 * worker cannot, and which the wall-clock ratio hides.
 */
function threadCpu(): Map<string, number> | null {
  if (!existsSync("/proc/self/task")) return null;
  const ticks = 100; // USER_HZ on Linux
  const out = new Map<string, number>();
  for (const tid of readdirSync("/proc/self/task")) {
    try {
      const stat = readFileSync(`/proc/self/task/${tid}/stat`, "utf8");
      const f = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      out.set(tid, (Number(f[11]) + Number(f[12])) / ticks);
    } catch {
      // the thread ended between the listing and the read
    }
  }
  return out;
}

/**
 * Steal time so far [s] (Linux `/proc/stat`, summed over the cores): time the host gave this
 * virtual machine's CPUs to others while they had work; `null` elsewhere. A wall-clock ratio
 * under its CPU-time estimate with steal time growing during the run measures the host.
 */
function stealTime(): number | null {
  if (!existsSync("/proc/stat")) return null;
  const f = readFileSync("/proc/stat", "utf8").split("\n")[0]?.trim().split(/\s+/) ?? [];
  const steal = Number(f[8]);
  return Number.isFinite(steal) ? steal / 100 : null;
}

/** CPU used since `before` [s]: main thread, the `k` busiest other threads (the workers), the rest (V8's helpers). */
function cpuSplit(before: Map<string, number>, after: Map<string, number>, k: number): { main: number; workers: number; helpers: number; each: number[] } {
  const used = [...after].map(([tid, t]) => [tid, t - (before.get(tid) ?? 0)] as const);
  const main = used.find(([tid]) => tid === String(process.pid))?.[1] ?? 0;
  const others = used.filter(([tid]) => tid !== String(process.pid)).map(([, t]) => t).sort((a, b) => b - a);
  const each = others.slice(0, k);
  const workers = each.reduce((a, b) => a + b, 0);
  const helpers = others.slice(k).reduce((a, b) => a + b, 0);
  return { main, workers, helpers, each };
}

/**
 * The speed-up that the CPU times of two runs predict for two free cores: the one-worker run
 * takes its worker's JavaScript time (its helpers use the other core), the two-worker run the
 * larger of its busiest worker and half of all its threads' time (helpers included).
 */
function cpuSpeedup(one: { workers: number }, two: { main: number; workers: number; helpers: number; each: number[] }): number {
  return one.workers / Math.max(two.each[0] ?? 0, (two.main + two.workers + two.helpers) / 2);
}

if (what === "speedup") {
  // studies with the electro-thermal heat-up: several milliseconds each
  const n = Number(args[3] ?? 120);
  const values = Array.from({ length: n }, (_, i) => 2e-6 + i * 2e-8);
  const spec = { field: "capacitor.capacitance", values, heatUp: true };
  const t0 = performance.now();
  sweepHeater(race, { ...spec, values: values.slice(0, 10) });
  const perDesign = (performance.now() - t0) / 10;
  console.log(`one design: ${perDesign.toFixed(2)} ms (calling thread)`);
  for (let round = 0; round < Number(args[4] ?? 3); round++) {
    const times: Record<string, number> = {};
    const cores: Record<string, number> = {};
    const split: Record<string, string> = {};
    const parts: Record<string, ReturnType<typeof cpuSplit>> = {};
    for (const workers of [1, 2]) {
      const before = threadCpu();
      const t = performance.now();
      const c = process.cpuUsage();
      // /proc lists live threads only: read them at the last progress report, before the pool
      // stops its workers
      let after: Map<string, number> | null = null;
      await sweepHeater(race, spec, { workers, onProgress: (p) => { if (p.done === p.total) after = threadCpu(); } });
      times[workers] = performance.now() - t;
      const used = process.cpuUsage(c);
      // CPU time of all threads over wall time: how many cores the run actually got
      cores[workers] = (used.user + used.system) / 1000 / (times[workers] ?? NaN);
      if (before !== null && after !== null) {
        const part = cpuSplit(before, after, workers);
        parts[workers] = part;
        split[workers] = `main ${part.main.toFixed(2)} s, workers ${part.each.map((t) => t.toFixed(2)).join(" + ")} s, V8 helpers ${part.helpers.toFixed(2)} s`;
      }
    }
    const one = times[1] ?? NaN;
    const two = times[2] ?? NaN;
    console.log(
      `round ${round + 1}: ${n} designs, 1 worker ${(one / 1000).toFixed(2)} s (${(cores[1] ?? NaN).toFixed(2)} cores obtained), ` +
        `2 workers ${(two / 1000).toFixed(2)} s (${(cores[2] ?? NaN).toFixed(2)} cores obtained), speed-up ${(one / two).toFixed(2)}x, ` +
        `load average ${loadavg()[0]?.toFixed(1) ?? "?"}`,
    );
    if (split[1] !== undefined && split[2] !== undefined) console.log(`  CPU by thread: 1 worker: ${split[1]}; 2 workers: ${split[2]}`);
    const [p1, p2] = [parts[1], parts[2]];
    if (p1 !== undefined && p2 !== undefined) console.log(`  CPU-time estimate of the speed-up on two free cores: ${cpuSpeedup(p1, p2).toFixed(2)}x`);
  }
}

if (what === "scale") {
  // the target in one line: a sweep on the calling thread (one thread, as a script runs it,
  // starting cold) against the same sweep on two workers; studies with the heat-up. 1000
  // designs by default: the sweep sizes the pool is for, where each worker's fixed warm-up
  // (compiling the study's code, about 1 s of CPU) no longer weighs; smaller sizes by argument
  const n = Number(args[3] ?? 1000);
  const values = Array.from({ length: n }, (_, i) => 2e-6 + i * 2e-8);
  const spec = { field: "capacitor.capacitance", values, heatUp: true };
  const start = threadCpu();
  const steal0 = stealTime();
  const t1 = performance.now();
  sweepHeater(race, spec);
  const one = performance.now() - t1;
  const steal1 = stealTime();
  const before = threadCpu();
  let after: Map<string, number> | null = null;
  const t2 = performance.now();
  let rss = 0;
  await sweepHeater(race, spec, {
    workers: 2,
    onProgress: (p) => {
      if (p.done === p.total) after = threadCpu();
      rss = Math.max(rss, process.memoryUsage.rss());
    },
  });
  const two = performance.now() - t2;
  const steal2 = stealTime();
  let helpers = "";
  if (before !== null && after !== null) {
    const two = cpuSplit(before, after, 2);
    const { workers: js, helpers: h } = two;
    // V8's helper threads (compilation, garbage collection) over the workers' JavaScript time:
    // with both cores busy they take turns with the workers, so 2 / (1 + h) bounds the speed-up
    helpers = `; V8 helpers ${((100 * h) / js).toFixed(1)} % of the workers' CPU (bound 2/(1+h) = ${(2 / (1 + h / js)).toFixed(2)}x)`;
    if (start !== null) {
      // the calling thread's own CPU time for the one-thread sweep, against the two-worker run's
      const mainOne = (before.get(String(process.pid)) ?? 0) - (start.get(String(process.pid)) ?? 0);
      helpers += `; CPU time: calling thread ${mainOne.toFixed(2)} s, workers ${two.each.map((t) => t.toFixed(2)).join(" + ")} s, helpers ${h.toFixed(2)} s, main ${two.main.toFixed(2)} s (estimate on two free cores ${cpuSpeedup({ workers: mainOne }, two).toFixed(2)}x)`;
    }
  }
  if (steal0 !== null && steal1 !== null && steal2 !== null) {
    helpers += `; host steal time ${(steal1 - steal0).toFixed(1)} s (calling thread), ${(steal2 - steal1).toFixed(1)} s (two workers)`;
  }
  const mb = (b: number): string => (b / 2 ** 20).toFixed(0);
  const m = process.memoryUsage();
  helpers += `; at the end: rss ${mb(rss)} MiB during the run (workers alive), ${mb(m.rss)} MiB after, main heap ${mb(m.heapUsed)} MiB`;
  console.log(
    `speed-up ${(one / two).toFixed(2)}x with 2 workers over the calling thread (target >= 1.8x): ${n} designs of ${(one / n).toFixed(0)} ms, ` +
      `${(one / 1000).toFixed(1)} s -> ${(two / 1000).toFixed(1)} s${helpers}; load average ${loadavg()[0]?.toFixed(1) ?? "?"} (needs an idle machine)`,
  );
}

if (what === "first") {
  // a thread's fixed cost: CPU time of this thread and of V8's helpers per study, one design
  // per sweep on the calling thread (the first study builds the coil model and compiles it)
  const n = Number(args[3] ?? 20);
  const mainCpu = (m: Map<string, number>): number => m.get(String(process.pid)) ?? 0;
  const rest = (m: Map<string, number>): number => [...m].reduce((s, [tid, t]) => (tid === String(process.pid) ? s : s + t), 0);
  const first = threadCpu();
  if (first === null) throw new Error("needs Linux /proc/self/task");
  let prev: Map<string, number> = first;
  for (let i = 0; i < n; i++) {
    sweepHeater(race, { field: "capacitor.capacitance", values: [2e-6 + i * 2e-8], heatUp: true });
    const now: Map<string, number> = threadCpu() ?? prev;
    console.log(`study ${i + 1}: JavaScript ${(mainCpu(now) - mainCpu(prev)).toFixed(2)} s, V8 helpers ${(rest(now) - rest(prev)).toFixed(2)} s`);
    prev = now;
  }
}

if (what === "memory") {
  // "rows": designs whose value the reader rejects (a negative capacitance): each row is cheap,
  // so a 10⁶-row run exercises the pool, the transfer and the ordering at full length
  const n = Number(args[3] ?? 100_000);
  const cheap = args[4] === "rows";
  const values = Array.from({ length: n }, (_, i) => (cheap ? -1e-6 - (i % 1000) * 1e-9 : 1e-6 + (i % 1000) * 1e-8));
  const mb = (b: number): string => (b / 2 ** 20).toFixed(1);
  let count = 0;
  let lastPart = 0;
  const t = performance.now();
  for await (const row of sweepHeaterStream(race, { field: "capacitor.capacitance", values, heatUp: false }, { workers: 2 })) {
    count++;
    if (row.summary !== null) lastPart = row.summary.partPower;
    if (count % (n / 10) === 0) {
      const m = process.memoryUsage();
      console.log(`${count} designs: rss ${mb(m.rss)} MiB, heap used ${mb(m.heapUsed)} MiB, ${((performance.now() - t) / 1000).toFixed(1)} s`);
    }
  }
  console.log(`last part power ${lastPart.toFixed(1)} W`);
}

if (what === "abort") {
  const values = Array.from({ length: 2000 }, (_, i) => 2e-6 + i * 1e-9);
  for (const workers of [0, 2]) {
    const latencies: number[] = [];
    for (let k = 0; k < 5; k++) {
      const controller = new AbortController();
      let abortedAt = 0;
      try {
        for await (const row of sweepHeaterStream(race, { field: "capacitor.capacitance", values, heatUp: true }, { workers, signal: controller.signal })) {
          if (row.index === 2) {
            setTimeout(() => {
              abortedAt = performance.now();
              controller.abort();
            }, 0);
          }
        }
      } catch {
        latencies.push(performance.now() - abortedAt);
      }
    }
    console.log(`workers ${workers}: abort latency ${latencies.map((l) => l.toFixed(1)).join(", ")} ms`);
  }
}
