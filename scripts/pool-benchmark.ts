/**
 * The worker pool's speed-up, memory over a long streamed sweep, and abort latency, measured on
 * the built package (`npm run build` first): `tsx scripts/pool-benchmark.ts [speedup|memory|abort]`.
 * Results are reported in docs/benchmarks.md.
 */
import { readFileSync } from "node:fs";
import { availableParallelism, loadavg } from "node:os";
import type { HeaterDescription } from "../src/index.js";

// the built package (its worker script lives in dist), typed by the sources so that the type
// check passes on a clean clone before the build
const { sweepHeater, sweepHeaterStream } = (await import(new URL("../dist/index.js", import.meta.url).href)) as typeof import("../src/index.js");

const race = JSON.parse(readFileSync(new URL("../docs/examples/study-bearing-race.json", import.meta.url), "utf8")) as HeaterDescription;
const what = process.argv[2] ?? "speedup";
console.log(`node ${process.version}, ${availableParallelism()} cores, load average ${loadavg().map((l) => l.toFixed(2)).join(" ")}`);

if (what === "speedup") {
  // studies with the electro-thermal heat-up: several milliseconds each
  const n = Number(process.argv[3] ?? 120);
  const values = Array.from({ length: n }, (_, i) => 2e-6 + i * 2e-8);
  const spec = { field: "capacitor.capacitance", values, heatUp: true };
  const t0 = performance.now();
  sweepHeater(race, { ...spec, values: values.slice(0, 10) });
  const perDesign = (performance.now() - t0) / 10;
  console.log(`one design: ${perDesign.toFixed(2)} ms (calling thread)`);
  for (let round = 0; round < 3; round++) {
    const times: Record<string, number> = {};
    const cores: Record<string, number> = {};
    for (const workers of [1, 2]) {
      const t = performance.now();
      const c = process.cpuUsage();
      await sweepHeater(race, spec, { workers });
      times[workers] = performance.now() - t;
      const used = process.cpuUsage(c);
      // CPU time of all threads over wall time: how many cores the run actually got
      cores[workers] = (used.user + used.system) / 1000 / (times[workers] ?? NaN);
    }
    const one = times[1] ?? NaN;
    const two = times[2] ?? NaN;
    console.log(
      `round ${round + 1}: ${n} designs, 1 worker ${(one / 1000).toFixed(2)} s (${(cores[1] ?? NaN).toFixed(2)} cores obtained), ` +
        `2 workers ${(two / 1000).toFixed(2)} s (${(cores[2] ?? NaN).toFixed(2)} cores obtained), speed-up ${(one / two).toFixed(2)}x, ` +
        `load average ${loadavg()[0]?.toFixed(1) ?? "?"}`,
    );
  }
}

if (what === "memory") {
  // "rows": designs whose value the reader rejects (a negative capacitance): each row is cheap,
  // so a 10⁶-row run exercises the pool, the transfer and the ordering at full length
  const n = Number(process.argv[3] ?? 100_000);
  const cheap = process.argv[4] === "rows";
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
