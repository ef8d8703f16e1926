import { describe, it, expect, beforeAll } from "vitest";
import { InputError, resistivityAt, solveAxisymmetricField, studyHeater } from "../../src/index.js";
import type { HeaterDescription, HeaterStudy } from "../../src/index.js";
import { STUDY_FIELD_REFERENCE_TOLERANCE } from "../../src/study/operating-point.js";
import { FIELD_INTERPOLATION_ERROR, FIELD_ANCHOR_ERROR } from "../../src/study/field-model.js";
import { loadExample, mutate } from "./cases.js";

const QUICK = { heatUp: false, temperatureScan: false, impedanceSweep: false } as const;
const relative = (a: number, b: number): number => Math.abs(a / b - 1);

/** The closed-form model's stated study error over the reference scenarios it covers (A–F: bars, billets, tubes, pancakes). */
const CLOSED_FORM_FREQUENCY = Math.max(...["A", "B", "C", "D", "E", "F"].map((k) => STUDY_FIELD_REFERENCE_TOLERANCE[k]!.frequency));
const CLOSED_FORM_POWER = Math.max(...["A", "B", "C", "D", "E", "F"].map((k) => STUDY_FIELD_REFERENCE_TOLERANCE[k]!.power));

/**
 * A small bar heater of our own (4 copper tube turns around a steel bar longer than the coil,
 * about 25 kHz): small meshes, so a whole heat-up through Curie with the field model stays quick.
 */
const SMALL: HeaterDescription = {
  title: "small bar heater",
  supply: { kind: "dc-bus", voltage: "24 V", internalResistance: "10 mΩ" },
  inverter: { kind: "current-fed-parallel", chokeInductance: "100 µH", switchOnResistance: "5 mΩ" },
  coil: { shape: "solenoid", radius: "20 mm", length: "32 mm", turns: 4, conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm" } },
  capacitor: { capacitance: "100 µF" },
  part: { shape: "bar", material: "mediumCarbonSteel", radius: "8 mm", length: "60 mm", targetTemperature: "800 °C" },
};

describe("studyHeater with model \"field\"", () => {
  let forgingField: HeaterStudy;
  let forgingClosed: HeaterStudy;
  beforeAll(() => {
    forgingClosed = studyHeater(loadExample("study-forging-bar.json"), QUICK);
    forgingField = studyHeater(loadExample("study-forging-bar.json"), { ...QUICK, model: "field" });
  }, 600_000);

  it("says which model it used", () => {
    expect(forgingField.model).toBe("field");
    expect(forgingField.coil.impedanceTier).toBe("field");
    expect(forgingField.validity.map((v) => v.code)).toContain("field-model");
    expect(forgingField.field?.solves).toBeGreaterThan(0);
    expect(forgingClosed.model).toBe("closed-form");
    expect(forgingClosed.field).toBeNull();
  });

  it("agrees with the closed-form model on the forging bar (a bar longer than the coil) within the closed forms' stated error", () => {
    // comparison: the closed-form model's stated study error against field solutions of the
    // scenarios it covers (A–F; STUDY_FIELD_REFERENCE_TOLERANCE), plus the field model's own
    // estimated error (its largest over the solutions it ran)
    const fieldError = forgingField.field?.largestEstimatedError ?? 1;
    expect(fieldError).toBeLessThan(0.01);
    expect(relative(forgingField.frequency, forgingClosed.frequency)).toBeLessThan(CLOSED_FORM_FREQUENCY + fieldError);
    expect(relative(forgingField.partPower, forgingClosed.partPower)).toBeLessThan(CLOSED_FORM_POWER + 2 * fieldError);
    expect(relative(forgingField.operating.inductance, forgingClosed.operating.inductance)).toBeLessThan(0.003 + fieldError);
  });

  it("matches solveAxisymmetricField called directly for a magnetic ring shorter than the coil (the bearing race)", () => {
    const study = studyHeater(loadExample("study-bearing-race.json"), { ...QUICK, model: "field" });
    const op = study.operating;
    // the arrangement built here from the study file: 6 copper tube turns (6 mm, wall 1 mm) at
    // radius 75 mm over 48 mm, the ring 50–62 mm × 30 mm, both centred on z = 0
    const direct = solveAxisymmetricField({
      frequency: op.frequency,
      accuracy: 1e-2,
      coils: [
        {
          name: "coil",
          current: 1,
          resistivity: study.coil.resistivity,
          model: "solid",
          turns: Array.from({ length: 6 }, (_, i) => ({ kind: "circle" as const, r: 0.075, z: -0.024 + (i + 0.5) * 0.008, radius: 0.003, innerRadius: 0.002 })),
        },
      ],
      regions: [{ name: "ring", shape: { kind: "rectangle", rMin: 0.05, rMax: 0.062, zMin: -0.015, zMax: 0.015 }, resistivity: op.partResistivity, relativePermeability: op.partRelativePermeability }],
    });
    const tolerance = FIELD_ANCHOR_ERROR + direct.estimatedError + (study.field?.largestEstimatedError ?? 1);
    expect(relative(op.reflectedResistance, direct.regions.ring!.losses)).toBeLessThan(tolerance);
    expect(relative(op.inductance, direct.coils.coil!.inductance)).toBeLessThan(tolerance);
  }, 600_000);

  it("carries the field between anchors through a heat-up past Curie within the stated interpolation error", () => {
    const field = studyHeater(SMALL, { model: "field", impedanceSweep: false });
    const scan = field.temperatureScan!;
    const anchors = field.field!.anchors.map((a) => a.temperature);
    expect(anchors.length).toBeGreaterThanOrEqual(8);
    expect(field.heatUp?.timeToTarget).not.toBeNull();
    // the points farthest from any anchor below, across and above the Curie transition
    const material = field.description.part.material;
    const gap = (t: number): number => Math.min(...anchors.map((a) => Math.abs(a - t)));
    const pick = (lo: number, hi: number): number => {
      let best = -1;
      scan.temperatures.forEach((t, i) => {
        if (t > lo && t < hi && (best < 0 || gap(t) > gap(scan.temperatures[best]!))) best = i;
      });
      return best;
    };
    const curie = field.part.curieTemperature!;
    for (const i of [pick(300, curie - 100), pick(curie - 60, curie + 5), pick(curie + 30, 2000)]) {
      expect(i).toBeGreaterThanOrEqual(0);
      const t = scan.temperatures[i]!;
      const direct = solveAxisymmetricField({
        frequency: scan.frequencies[i]!,
        accuracy: 1e-2,
        coils: [
          {
            name: "coil",
            current: 1,
            resistivity: field.coil.resistivity,
            model: "solid",
            turns: Array.from({ length: 4 }, (_, k) => ({ kind: "circle" as const, r: 0.02, z: -0.016 + (k + 0.5) * 0.008, radius: 0.003, innerRadius: 0.002 })),
          },
        ],
        regions: [{ name: "bar", shape: { kind: "rectangle", rMin: 0, rMax: 0.008, zMin: -0.03, zMax: 0.03 }, resistivity: resistivityAt(material, t), relativePermeability: scan.relativePermeabilities[i]! }],
      });
      const current = scan.coilCurrentsRms[i]!;
      const reflected = scan.partPowers[i]! / (current * current);
      expect(relative(reflected, direct.regions.bar!.losses)).toBeLessThan(FIELD_INTERPOLATION_ERROR + direct.estimatedError);
    }
  }, 900_000);

  it("rejects an unknown model and a coil the field solver cannot mesh", () => {
    expect(() => studyHeater(loadExample("study-forging-bar.json"), { ...QUICK, model: "mesh" as "field" })).toThrow(InputError);
    // ten 6 mm turns in 60 mm: the turns touch
    const touching = mutate(loadExample("study-forging-bar.json"), "coil.length", "60 mm");
    expect(() => studyHeater(touching, { ...QUICK, model: "field" })).toThrow(/coil\.length/);
  });

  it("keeps the field picture's samples finite and the power density inside the part", () => {
    const p = forgingField.field!.picture!;
    expect(p.fluxDensity.length).toBe(p.r.length * p.z.length);
    expect(p.fluxDensity.every((b) => Number.isFinite(b) && b >= 0)).toBe(true);
    for (const block of p.powerDensity) expect(block.values.every((x) => Number.isFinite(x) && x >= 0)).toBe(true);
    // the part power density integrated over the part's cells ≈ the part power (within the cells' coarseness)
    let power = 0;
    for (const block of p.powerDensity) {
      const nr = block.r.length - 1;
      for (let j = 0; j + 1 < block.z.length; j++) {
        for (let i = 0; i < nr; i++) {
          const area = Math.PI * (block.r[i + 1]! ** 2 - block.r[i]! ** 2) * (block.z[j + 1]! - block.z[j]!);
          power += block.values[j * nr + i]! * area;
        }
      }
    }
    // midpoint cells graded from a quarter skin depth (growth 1.3): within 10 % of the solver's part loss
    expect(relative(power, forgingField.partPower)).toBeLessThan(0.1);
  });
});
