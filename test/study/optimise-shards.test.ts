/**
 * Shards of a design search: the outputs of 1 … n shards, merged, equal one run of
 * optimiseHeater bit for bit (compared as JSON, which keeps every bit of a finite double),
 * also after a round trip through JSON text (as between the tasks of a job array), in any
 * order; a missing, repeated or foreign shard is refused.
 */
import { describe, it, expect } from "vitest";
import { InputError, mergeHeaterOptimisationShards, optimiseHeater, optimiseHeaterShard } from "../../src/index.js";
import type { HeaterGoal, HeaterOptimisationShard } from "../../src/index.js";
import { loadExample } from "./cases.js";

const race = loadExample("study-bearing-race.json");
const exact = (x: unknown): string => JSON.stringify(x);
const viaJson = (s: HeaterOptimisationShard): HeaterOptimisationShard => JSON.parse(JSON.stringify(s)) as HeaterOptimisationShard;
const shardsOf = (goal: HeaterGoal, count: number): HeaterOptimisationShard[] =>
  Array.from({ length: count }, (_, k) => optimiseHeaterShard(race, goal, { shard: { index: k + 1, count } }));

describe("optimiseHeaterShard + mergeHeaterOptimisationShards", () => {
  const power: HeaterGoal = {
    targetPower: "1.5 kW",
    limits: { minFrequency: "20 kHz", tankVoltagePeak: "200 V" },
    search: { turns: [3, 4, 5, 6, 7, 8], minCapacitance: "1 µF", maxCapacitance: "22 µF" },
    keep: 4,
  };
  const single = optimiseHeater(race, power);

  it("merged shards equal one run for 1, 2, 3 and 9 shards (more shards than coils), in any order, through JSON", () => {
    for (const count of [1, 2, 3, 9]) {
      const shards = shardsOf(power, count);
      expect(exact(mergeHeaterOptimisationShards(shards)), `${count} shards`).toBe(exact(single));
      expect(exact(mergeHeaterOptimisationShards([...shards].reverse().map(viaJson))), `${count} shards, reversed, via JSON`).toBe(exact(single));
    }
  }, 60_000);

  it("splits the coils contiguously: counts add up to the one run's", () => {
    const shards = shardsOf(power, 4);
    expect(shards.map((s) => s.range)).toEqual([[0, 1], [1, 3], [3, 4], [4, 6]]);
    expect(shards.reduce((a, s) => a + s.evaluated, 0)).toBe(single.evaluated);
    expect(shards.reduce((a, s) => a + s.feasible, 0)).toBe(single.feasible);
  });

  it("merged shards equal one run for a heat-up-time goal (finalists through the heat-up)", () => {
    const time: HeaterGoal = { targetTime: "60 s", search: { turns: [5, 6], minCapacitance: "3.3 µF", maxCapacitance: "4.7 µF" }, keep: 2 };
    const whole = optimiseHeater(race, time);
    expect(exact(mergeHeaterOptimisationShards(shardsOf(time, 2).map(viaJson)))).toBe(exact(whole));
  }, 120_000);

  it("refuses a missing, repeated or foreign shard and bad options with InputError", () => {
    const shards = shardsOf(power, 3);
    expect(() => mergeHeaterOptimisationShards(shards.slice(0, 2))).toThrow(/missing: 3/);
    expect(() => mergeHeaterOptimisationShards([shards[0], shards[1], shards[1]] as HeaterOptimisationShard[])).toThrow(/not given twice/);
    const other = optimiseHeaterShard(race, { ...power, keep: 3 }, { shard: { index: 3, count: 3 } });
    expect(() => mergeHeaterOptimisationShards([shards[0], shards[1], other] as HeaterOptimisationShard[])).toThrow(/search \(description or goal\)/);
    expect(() => mergeHeaterOptimisationShards([])).toThrow(InputError);
    expect(() => mergeHeaterOptimisationShards([{ ...shards[0], range: [0, 5] }] as HeaterOptimisationShard[])).toThrow(InputError);
    expect(() => optimiseHeaterShard(race, power, {} as never)).toThrow(/options.shard/);
    expect(() => optimiseHeaterShard(race, power, { shard: { index: 4, count: 3 } })).toThrow(/options.shard.index/);
    expect(() => optimiseHeaterShard(race, power, { shard: { index: 1, count: 3 }, threads: 2 } as never)).toThrow(InputError);
  });
});
