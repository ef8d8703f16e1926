import { describe, expect, it } from "vitest";
import {
  austeniticStainless,
  barInLongCoil,
  fieldHeatUp,
  inductionRadialHeatUp,
  InputError,
  mediumCarbonSteel,
  resistivityAt,
} from "../../src/index.js";
import type { FieldHeatUpOptions } from "../../src/index.js";

const surface = { convectionCoefficient: 10, emissivity: 0.8, ambientTemperature: 293.15 };

/** A long bar (radius 10 mm, 300 mm) in a 600 mm, 300-turn stranded coil at 1 kHz, 100 A. */
function longBar(material: typeof mediumCarbonSteel, radial: number, duration: number): FieldHeatUpOptions {
  return {
    frequency: 1000,
    coils: [{ name: "coil", current: 100, resistivity: 1.75e-8, model: "stranded", turns: { shape: { kind: "rectangle", rMin: 0.014, rMax: 0.016, zMin: -0.3, zMax: 0.3 }, count: 300 } }],
    part: { name: "bar", shape: { kind: "rectangle", rMin: 0, rMax: 0.01, zMin: -0.15, zMax: 0.15 }, material, cells: { radial, axial: 3 } },
    surface,
    insulatedFaces: ["lower", "upper"],
    duration,
    resolveStep: 60,
    mapTimes: [duration / 2],
  };
}

/** Volume-mean temperature of the middle axial cell row of a map. */
function midMean(grid: { rEdges: readonly number[]; radial: number; axial: number }, t: Float64Array): number {
  let mean = 0;
  let vol = 0;
  const mid = Math.floor(grid.axial / 2);
  for (let i = 0; i < grid.radial; i++) {
    const v = grid.rEdges[i + 1]! ** 2 - grid.rEdges[i]! ** 2;
    vol += v;
    mean += v * t[i * grid.axial + mid]!;
  }
  return mean / vol;
}

describe("fieldHeatUp: against the exact long-coil solution and the one-dimensional model", () => {
  it("non-magnetic long bar: induced power per metre at mid-length within 1 % of the exact Bessel solution (barInLongCoil)", () => {
    const run = fieldHeatUp({ ...longBar(austeniticStainless, 6, 0.5), mapTimes: [] });
    const first = run.solutions[0]!;
    // the power of the whole bar per metre; the bar is 30 radii long, ends lose about 1 % (measured: 0.3 %)
    const exact = barInLongCoil({
      coil: { innerRadius: 0.015, length: 0.6, turns: 300 },
      bar: { radius: 0.01, resistivity: resistivityAt(austeniticStainless, 293.15), relativePermeability: 1 },
      frequency: 1000,
    });
    const perMetre = first.power / 0.3;
    const exactPerMetre = (exact.reflectedResistance * 100 * 100) / 0.6;
    expect(Math.abs(perMetre / exactPerMetre - 1)).toBeLessThan(0.01);
    expect(Math.abs(run.energy.imbalance)).toBeLessThan(1e-6 * run.energy.input);
  });

  it("steel long bar, 12 radial cells: mid-length mean and surface-cell temperature rise within 4 % of inductionRadialHeatUp (1-D layered Bessel field + radialHeatUp)", () => {
    const duration = 12;
    const run = fieldHeatUp(longBar(mediumCarbonSteel, 12, duration));
    const ref = inductionRadialHeatUp({
      part: { shape: "bar", radius: 0.01 },
      material: mediumCarbonSteel,
      coil: { innerRadius: 0.015, length: 0.6, turns: 300 },
      frequency: 1000,
      coilCurrentRms: 100,
      ...surface,
      duration,
    });
    for (const map of run.maps) {
      const k = ref.times.findIndex((t) => t >= map.time);
      const refMean = ref.meanTemperatures[k - 1]! + ((map.time - ref.times[k - 1]!) / (ref.times[k]! - ref.times[k - 1]!)) * (ref.meanTemperatures[k]! - ref.meanTemperatures[k - 1]!);
      const rise = refMean - surface.ambientTemperature;
      expect(Math.abs(midMean(run.grid, map.temperatures) - refMean)).toBeLessThan(0.04 * rise);
    }
    expect(run.fieldSolutions).toBeGreaterThanOrEqual(3);
  }, 120_000);
});

describe("fieldHeatUp: heat-up through the Curie point", () => {
  it("the power falls after the surface passes Curie, the field is re-solved as the part heats, and the energy balances", () => {
    const run = fieldHeatUp({
      frequency: 10e3,
      coils: [{ name: "coil", current: 1200, resistivity: 1.75e-8, model: "stranded", turns: { shape: { kind: "rectangle", rMin: 0.025, rMax: 0.03, zMin: -0.05, zMax: 0.05 }, count: 6 } }],
      part: { name: "billet", shape: { kind: "rectangle", rMin: 0, rMax: 0.015, zMin: -0.04, zMax: 0.04 }, material: mediumCarbonSteel, cells: { radial: 6, axial: 4 } },
      surface,
      duration: 20,
      targetTemperature: 1150,
      resolveStep: 80,
    });
    expect(run.targetReachedAt).not.toBeNull();
    expect(run.fieldSolutions).toBeGreaterThanOrEqual(8);
    const powers = run.solutions.map((s) => s.power);
    const peak = Math.max(...powers);
    // magnetic steel: the power peaks below Curie and falls once the skin layer is non-magnetic
    // (common practice: Rudnev et al. 2003, ch. 3)
    expect(powers.at(-1)!).toBeLessThan(0.9 * peak);
    expect(run.maximumTemperature.at(-1)!).toBeGreaterThan(mediumCarbonSteel.curieTemperature!);
    expect(Math.abs(run.energy.imbalance)).toBeLessThan(1e-6 * run.energy.input);
    expect(run.cautions.map((c) => c.code)).toContain("hot-surface-burn");
  }, 120_000);

  it("rejects bad input with InputError", () => {
    const good = longBar(austeniticStainless, 4, 0.1);
    expect(() => fieldHeatUp({ ...good, frequency: -1 })).toThrow(InputError);
    expect(() => fieldHeatUp({ ...good, resolveStep: 0 })).toThrow(InputError);
    expect(() => fieldHeatUp({ ...good, accuracy: 0.5 })).toThrow(InputError);
    expect(() => fieldHeatUp({ ...good, part: { ...good.part, name: "" } })).toThrow(InputError);
    expect(() => fieldHeatUp({ ...good, part: { ...good.part, shape: { ...good.part.shape, rMax: -1 } } })).toThrow(InputError);
    expect(() => fieldHeatUp({ ...good, regions: {} as never })).toThrow(InputError);
    expect(() => fieldHeatUp({ ...good, resolvStep: 3 } as never)).toThrow(InputError);
    expect(() => fieldHeatUp({ ...good, part: { ...good.part, colour: 1 } as never })).toThrow(InputError);
    expect(() => fieldHeatUp({ ...good, part: { ...good.part, cells: { radial: 41, axial: 2 } } })).toThrow(InputError);
    expect(() => fieldHeatUp({ ...good, part: { ...good.part, cells: { radial: 30, axial: 30 } } })).toThrow(InputError);
    expect(() => fieldHeatUp({ ...good, part: { ...good.part, cells: { radial: 1, axial: 2 } } })).toThrow(InputError);
    expect(() => fieldHeatUp({ ...good, part: { ...good.part, cells: null as never } })).toThrow(InputError);
  });
});
