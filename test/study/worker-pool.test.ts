/**
 * The worker pool behind `workers`: the same rows, bit for bit and in order, for 0, 1, 2 and 4
 * workers and for shards joined; progress; cancellation; a bounded number of items in flight.
 * The workers load a bundle of src/study/heater-worker.ts built here with esbuild (the dist
 * build is checked by the package step of CI).
 */
import { describe, it, expect, beforeAll } from "vitest";
import { build } from "esbuild";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { InputError, optimiseHeater, sweepHeater, sweepHeaterStream } from "../../src/index.js";
import type { HeaterProgress, HeaterSweepStreamRow } from "../../src/index.js";
import { batchSize, nextBatchSize, runPool } from "../../src/study/worker-pool.js";
import { loadExample } from "./cases.js";

const race = loadExample("study-bearing-race.json");
const root = fileURLToPath(new URL("../../", import.meta.url));
let workerUrl = "";
const T = 60_000;

beforeAll(async () => {
  const out = join(mkdtempSync(join(tmpdir(), "fluxwright-worker-")), "heater-worker.mjs");
  await build({ entryPoints: [join(root, "src/study/heater-worker.ts")], bundle: true, format: "esm", platform: "neutral", outfile: out, logLevel: "error" });
  workerUrl = out;
}, T);

const spec = { field: "capacitor.capacitance", values: ["2.2 µF", "2.7 µF", "3.3 µF", "3.9 µF", 4.7e-6, "5.6 µF", "-1 µF", "6.8 µF", "8.2 µF"], heatUp: false };
/** Exact comparison: JSON keeps every bit of a finite double (shortest round-trip form) and the order. */
const exact = (x: unknown): string => JSON.stringify(x);

describe("sweepHeater on the pool", () => {
  const single = sweepHeater(race, spec);

  it("gives the single-thread table bit for bit, in order, for 0, 1, 2 and 4 workers", async () => {
    for (const workers of [0, 1, 2, 4]) {
      const pooled = await sweepHeater(race, spec, { workers, workerUrl });
      expect(exact(pooled), `workers: ${workers}`).toBe(exact(single));
    }
    expect(single.rows[6]?.problem).not.toBeNull(); // the negative capacitance is a row problem, not a failure
  }, T);

  it("gives the same rows for three shards joined as for one run", async () => {
    const rows: HeaterSweepStreamRow[] = [];
    for (const index of [1, 2, 3]) for await (const row of sweepHeaterStream(race, spec, { workers: 2, workerUrl, shard: { index, count: 3 } })) rows.push(row);
    expect(rows.map((r) => r.index)).toEqual(spec.values.map((_, i) => i));
    expect(exact(rows.map((r) => ({ value: r.value, summary: r.summary, cautionCount: r.cautionCount, problem: r.problem })))).toBe(exact(single.rows));
  }, T);

  it("reports progress up to the total, with elapsed time and an estimate of what is left", async () => {
    const seen: HeaterProgress[] = [];
    await sweepHeater(race, spec, { workers: 0, onProgress: (p) => seen.push(p) });
    expect(seen.at(-1)).toMatchObject({ done: spec.values.length, total: spec.values.length, eta: 0 });
    for (const p of seen) {
      expect(p.elapsed).toBeGreaterThanOrEqual(0);
      expect(p.eta === null || p.eta >= 0).toBe(true);
    }
    expect(seen.map((p) => p.done)).toEqual([...seen.map((p) => p.done)].sort((a, b) => a - b));
  }, T);

  it("refuses bad pool options and shards with InputError at the call", () => {
    const bad: Record<string, unknown>[] = [{ workers: -1 }, { workers: 1.5 }, { workers: "2" }, { workers: 257 }, {}, { workers: 1, onProgress: 1 }, { workers: 1, signal: {} }, { workers: 1, workerUrl: 5 }, { workers: 1, threads: 2 }];
    for (const options of bad) expect(() => sweepHeater(race, spec, options as never), JSON.stringify(options)).toThrow(InputError);
    for (const shard of [{ index: 0, count: 3 }, { index: 4, count: 3 }, { index: 1, count: 0 }, { index: 1.5, count: 3 }, { index: 1, count: 3, part: 1 }]) {
      expect(() => sweepHeaterStream(race, spec, { workers: 0, shard }), JSON.stringify(shard)).toThrow(InputError);
    }
    expect(() => sweepHeaterStream(race, { field: "coil.turn", values: [5] }, { workers: 0 })).toThrow(/did you mean "coil.turns"/);
  });
});

describe("cancellation", () => {
  it("a signal aborted before the start rejects at once", async () => {
    const controller = new AbortController();
    controller.abort();
    await expect(sweepHeater(race, spec, { workers: 2, workerUrl, signal: controller.signal })).rejects.toMatchObject({ name: "AbortError" });
  });

  it("on the calling thread, stops within one design's time and keeps the rows before it", async () => {
    const values = Array.from({ length: 400 }, (_, i) => 2e-6 + i * 1e-8);
    const controller = new AbortController();
    const rows: HeaterSweepStreamRow[] = [];
    let abortedAt = 0;
    let designTime = 0;
    let last = performance.now();
    const started = performance.now();
    await expect(
      (async () => {
        for await (const row of sweepHeaterStream(race, { field: "capacitor.capacitance", values, heatUp: false }, { workers: 0, signal: controller.signal })) {
          const now = performance.now();
          designTime = Math.max(designTime, now - last);
          last = now;
          rows.push(row);
          if (rows.length === 5) {
            setTimeout(() => {
              abortedAt = performance.now();
              controller.abort();
            }, 0);
          }
        }
      })(),
    ).rejects.toMatchObject({ name: "AbortError" });
    const latency = performance.now() - abortedAt;
    expect(rows.length).toBeLessThan(values.length);
    expect(rows.map((r) => r.index)).toEqual(rows.map((_, i) => i));
    // one design's time (the slowest seen), plus the 20 ms the loop may run between yields to the event loop
    expect(latency, `latency ${latency.toFixed(1)} ms, slowest design ${designTime.toFixed(1)} ms, run ${(performance.now() - started).toFixed(0)} ms`).toBeLessThan(designTime + 25);
  }, T);

  it("on workers, stops them at once", async () => {
    const values = Array.from({ length: 200 }, (_, i) => 2e-6 + i * 1e-8);
    const controller = new AbortController();
    let count = 0;
    let abortedAt = 0;
    const run = (async () => {
      for await (const row of sweepHeaterStream(race, { field: "capacitor.capacitance", values, heatUp: false }, { workers: 2, workerUrl, signal: controller.signal })) {
        count += row.index >= 0 ? 1 : 0;
        if (count === 2) {
          abortedAt = performance.now();
          controller.abort();
        }
      }
    })();
    await expect(run).rejects.toMatchObject({ name: "AbortError" });
    expect(performance.now() - abortedAt).toBeLessThan(50);
    expect(count).toBe(2);
  }, T);
});

describe("batches", () => {
  it("shrink near the end of a run to the remaining items over twice the workers, down to one", () => {
    expect(batchSize(300, 2)).toBe(3);
    expect(nextBatchSize(300, 3, 2)).toBe(3);
    expect(nextBatchSize(9, 3, 2)).toBe(3);
    expect(nextBatchSize(8, 3, 2)).toBe(2);
    expect(nextBatchSize(4, 3, 2)).toBe(1);
    expect(nextBatchSize(1, 32, 4)).toBe(1);
  });

  it("of several items and shrinking at the tail give the single-thread table bit for bit", async () => {
    // mostly values the reader rejects (cheap rows), a design every 50 values
    const values = Array.from({ length: 300 }, (_, i) => (i % 50 === 7 ? 2e-6 + i * 1e-8 : -1e-6 - i * 1e-9));
    const many = { field: "capacitor.capacitance", values, heatUp: false };
    expect(exact(await sweepHeater(race, many, { workers: 2, workerUrl }))).toBe(exact(sweepHeater(race, many)));
  }, T);
});

describe("bounded memory", () => {
  it("takes no more items than about four batches per worker ahead of a consumer that does not read", async () => {
    let taken = 0;
    function* items(): Generator<number> {
      for (let i = 0; i < 100_000; i++) {
        taken++;
        yield i;
      }
    }
    const run = runPool({ kind: "sweep", context: null }, items(), 100_000, (_c, batch) => batch.map((x) => x), { workers: 0, onProgress: undefined, signal: undefined, workerUrl: undefined }, "test");
    const first = await run.next();
    expect(first.value).toBe(0);
    await new Promise((r) => setTimeout(r, 50));
    await run.return(undefined);
    // the calling thread takes one batch at a time: batchSize(100000, 0) = 32 items
    expect(taken).toBeLessThanOrEqual(32);
  });
});

describe("optimiseHeater on the pool", () => {
  const goal = { targetPower: "1.5 kW", limits: { minFrequency: "20 kHz" }, search: { turns: [4, 5, 6, 7] }, keep: 3 };
  it("gives the single-thread result bit for bit for 0 and 2 workers", async () => {
    const single = optimiseHeater(race, goal);
    for (const workers of [0, 2]) expect(exact(await optimiseHeater(race, goal, { workers, workerUrl })), `workers: ${workers}`).toBe(exact(single));
  }, T);

  it("refuses unknown pool options with InputError", () => {
    expect(() => optimiseHeater(race, goal, { workers: 1, threads: 2 } as never)).toThrow(InputError);
    expect(() => optimiseHeater(race, goal, { workers: -1 })).toThrow(/workers/);
  });
});
