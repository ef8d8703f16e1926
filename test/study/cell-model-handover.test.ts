/**
 * The coil-impedance model handed from the calling thread to the pool's workers: what a worker
 * rebuilds from the data (after a structured clone, as `postMessage` sends it) evaluates
 * exactly as a model built from scratch, bit for bit, at seeded frequencies and materials; the
 * end-effect factor started from another thread's table equals a fresh one, also at nodes the
 * table did not hold. (The pooled sweeps themselves are compared row by row for 0, 1, 2 and 4
 * workers in worker-pool.test.ts.)
 */
import { describe, it, expect } from "vitest";
import { prepareWorkCoil, studyHeater } from "../../src/index.js";
import { readHeaterDescription } from "../../src/study/read-description.js";
import { coilProperties } from "../../src/study/operating-point-coil.js";
import { exportCellModels } from "../../src/study/operating-point-cells.js";
import { STUDY_COIL_REFINEMENT } from "../../src/study/operating-point-accuracy.js";
import { reducedWorkCoilFromData } from "../../src/workpiece/work-coil-impedance.js";
import { prepareShortPartFactor } from "../../src/workpiece/work-coil-short-part.js";
import { loadExample } from "./cases.js";
import { uniform as random } from "../support/seeded.js";

describe("coil-impedance model handed to workers", () => {
  const race = loadExample("study-bearing-race.json");
  studyHeater(race, { heatUp: false, temperatureScan: false, impedanceSweep: false });
  const d = readHeaterDescription(race);
  const models = structuredClone(exportCellModels(d, coilProperties(d)));

  it("the bearing race's model and its end-effect tables are handed over", () => {
    expect(models).toHaveLength(1);
    expect(models[0]?.reduced.model.k).toBeGreaterThan(0);
    // the ring (30 mm) is shorter than the coil (48 mm): one end-effect entry with table nodes
    expect(models[0]?.ends).toHaveLength(1);
    expect(models[0]?.ends[0]?.factor.nodes.length).toBeGreaterThan(0);
  });

  it("the rebuilt reduced model evaluates bit for bit as one built from scratch", () => {
    const m = models[0]!;
    const fresh = prepareWorkCoil({ coil: m.coil, frequency: m.fMax, refinement: STUDY_COIL_REFINEMENT }).reduce({ part: m.part, minFrequency: m.fMin, maxFrequency: m.fMax });
    const rebuilt = reducedWorkCoilFromData(m.reduced);
    expect(rebuilt.basisSize).toBe(fresh.basisSize);
    expect(rebuilt.cellCount).toBe(fresh.cellCount);
    const u = random(20);
    for (let i = 0; i < 200; i++) {
      // frequencies over the band and an octave beyond, steel-like to copper-like materials
      const f = m.fMin * (m.fMax / m.fMin) ** (1.4 * u() - 0.2);
      const rho = 1.7e-8 * 100 ** u();
      const mur = 1 + 300 * u() ** 2;
      expect(JSON.stringify(rebuilt.impedance(f, rho, mur))).toBe(JSON.stringify(fresh.impedance(f, rho, mur)));
    }
  });

  it("the end-effect factor from a handed-over table equals a fresh one", () => {
    const e = models[0]!.ends[0]!;
    const handed = prepareShortPartFactor(e.factor.geometry, e.factor.nodes);
    const fresh = prepareShortPartFactor(e.factor.geometry);
    const u = random(7);
    // t = μr·δ/2 from 10 µm to 0.1 m: most of it outside the handed-over table
    for (let i = 0; i < 60; i++) {
      const t = 1e-5 * 1e4 ** u();
      expect(JSON.stringify(handed(t))).toBe(JSON.stringify(fresh(t)));
    }
  });
});
