/**
 * Invariants of shards: for any number of parts, the parts are contiguous, cover every value
 * once, and joined give the single-thread sweep exactly (calling thread, `workers: 0`, so that
 * the property runs fast; worker counts are covered in worker-pool.test.ts).
 */
import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { sweepHeater, sweepHeaterStream } from "../../src/index.js";
import type { HeaterSweepStreamRow } from "../../src/index.js";
import { loadExample } from "./cases.js";

const race = loadExample("study-bearing-race.json");

describe("sweepHeaterStream shards", () => {
  it("joined in order equal the whole sweep for any shard count", async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(fc.integer({ min: 1, max: 14 }), { minLength: 1, maxLength: 9 }), fc.integer({ min: 1, max: 12 }), async (turns, count) => {
        const spec = { field: "coil.turns", values: turns, heatUp: false };
        const whole = sweepHeater(race, spec);
        const rows: HeaterSweepStreamRow[] = [];
        for (let index = 1; index <= count; index++) for await (const row of sweepHeaterStream(race, spec, { workers: 0, shard: { index, count } })) rows.push(row);
        expect(rows.map((r) => r.index)).toEqual(turns.map((_, i) => i));
        expect(JSON.stringify(rows.map((r) => ({ value: r.value, summary: r.summary, cautionCount: r.cautionCount, problem: r.problem })))).toBe(JSON.stringify(whole.rows));
      }),
      { seed: 20, numRuns: 12 },
    );
  }, 60_000);
});
