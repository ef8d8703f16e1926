/**
 * Invariants of a search's shards: for any shard count and any order of the outputs, the
 * merge equals one run exactly (compared as JSON, which keeps every bit of a finite double),
 * the shards' coil ranges are contiguous and cover every coil once.
 */
import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { mergeHeaterOptimisationShards, optimiseHeater, optimiseHeaterShard } from "../../src/index.js";
import type { HeaterGoal } from "../../src/index.js";
import { loadExample } from "./cases.js";

const race = loadExample("study-bearing-race.json");

describe("optimiseHeaterShard shards", () => {
  it("merged in any order equal one run, for any shard count and keep", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 7 }), fc.integer({ min: 1, max: 4 }), fc.integer({ min: 0, max: 1e6 }), (count, keep, shuffle) => {
        const goal: HeaterGoal = { targetPower: "1.2 kW", limits: { minFrequency: "20 kHz" }, search: { turns: [4, 5, 6, 7, 8], minCapacitance: "2.2 µF", maxCapacitance: "6.8 µF" }, keep };
        const whole = optimiseHeater(race, goal);
        const shards = Array.from({ length: count }, (_, k) => optimiseHeaterShard(race, goal, { shard: { index: k + 1, count } }));
        expect(shards[0]?.range[0]).toBe(0);
        for (let k = 1; k < count; k++) expect(shards[k]?.range[0]).toBe(shards[k - 1]?.range[1]);
        expect(shards[count - 1]?.range[1]).toBe(5);
        // a deterministic permutation from the drawn number
        const order = shards.map((s, k) => ({ s, key: (k * 7919 + shuffle) % 10007 })).sort((a, b) => a.key - b.key).map((x) => x.s);
        expect(JSON.stringify(mergeHeaterOptimisationShards(order))).toBe(JSON.stringify(whole));
      }),
      { seed: 20, numRuns: 5 },
    );
  }, 120_000);
});
