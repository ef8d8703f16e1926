import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { InputError, readHeaterDescription, solveAxisymmetricField, studyHeater } from "../../src/index.js";
import type { HeaterDescription } from "../../src/index.js";
import { rectanglesGeometry } from "../../src/study/study-heater.js";
import { FIELD_ANCHOR_ERROR } from "../../src/study/field-model.js";
import { checkSchema } from "./schema-check.js";
import { mutate } from "./cases.js";

const schema = JSON.parse(readFileSync(new URL("../../docs/heater-study.schema.json", import.meta.url), "utf8")) as Record<string, unknown>;
const shaft = JSON.parse(readFileSync(new URL("../../docs/examples/field-stepped-shaft.json", import.meta.url), "utf8")) as HeaterDescription & Record<string, unknown>;
const QUICK = { heatUp: false, temperatureScan: false, impedanceSweep: false } as const;

describe("parts and concentrators as r–z rectangles", () => {
  it("the schema and the reader both accept the example file, with units required", () => {
    expect(checkSchema(schema, shaft)).toEqual([]);
    const d = readHeaterDescription(shaft, { requireUnits: true });
    expect(d.part.rectangles).toEqual([
      { rMin: 0, rMax: 0.012, zMin: -0.06, zMax: 0 },
      { rMin: 0, rMax: 0.02, zMin: 0, zMax: 0.06 },
    ]);
    // the bounding bar stands in for the closed-form surrogate
    expect(d.part.shape).toBe("bar");
    expect(d.concentrators?.[0]).toEqual({ name: "return ring", rectangles: [{ rMin: 0.036, rMax: 0.042, zMin: -0.036, zMax: 0.036 }], relativePermeability: 30, resistivity: null });
  });

  it("both reject malformed rectangles; the reader also rejects overlapping ones", () => {
    const bad: [string, unknown][] = [
      ["part.rectangles", []],
      ["part.rectangles", [{ rMin: "0 mm", rMax: "10 mm", zMin: "0 mm" }]],
      ["part.rectangles", [{ rMin: "0 mm", rMax: "10 mm", zMin: "0 mm", zMax: "5 mm", z: "1 mm" }]],
      ["concentrators", [{ rectangles: [{ rMin: "36 mm", rMax: "42 mm", zMin: "-3 mm", zMax: "3 mm" }], relativePermeability: 0.5 }]],
    ];
    for (const [path, value] of bad) {
      const input = mutate(shaft, path, value);
      expect(checkSchema(schema, input).length, path).toBeGreaterThan(0);
      expect(() => readHeaterDescription(input, { requireUnits: true }), path).toThrow(InputError);
    }
    // consistency the schema cannot express: rMax ≤ rMin, zMax ≤ zMin, overlap
    for (const rect of [
      [{ rMin: "10 mm", rMax: "10 mm", zMin: "0 mm", zMax: "5 mm" }],
      [{ rMin: "0 mm", rMax: "10 mm", zMin: "5 mm", zMax: "-5 mm" }],
      [{ rMin: "0 mm", rMax: "10 mm", zMin: "0 mm", zMax: "5 mm" }, { rMin: "5 mm", rMax: "12 mm", zMin: "4 mm", zMax: "8 mm" }],
    ]) {
      expect(() => readHeaterDescription(mutate(shaft, "part.rectangles", rect), { requireUnits: true })).toThrow(/part\.rectangles/);
    }
    // surface or core targets need the radial model of bars and tubes
    expect(() => readHeaterDescription(mutate(shaft, "part.targetLocation", "core"))).toThrow(/part\.targetLocation/);
  });

  it("need the field model: the closed-form study refuses them with a message saying so", () => {
    expect(() => studyHeater(shaft, QUICK)).toThrow(/options\.model must be "field"/);
    const bar = mutate(mutate(shaft, "part", { shape: "bar", material: "mediumCarbonSteel", radius: "12 mm", length: "100 mm", targetTemperature: "250 °C" }), "concentrators", undefined);
    expect(studyHeater(bar, QUICK).model).toBe("closed-form");
    expect(() => studyHeater(mutate(bar, "concentrators", shaft.concentrators), QUICK)).toThrow(/concentrators given as r–z rectangles/);
  });

  it("gives the volume and outer surface of a stepped body of revolution (exact geometry)", () => {
    // a shaft of radius 12 mm over 60 mm under one of 20 mm over 60 mm (exact: π r² h; the
    // shoulder's exposed annulus π(R² − r²); the sides 2π r h; the two end faces)
    const g = rectanglesGeometry([
      { rMin: 0, rMax: 0.012, zMin: -0.06, zMax: 0 },
      { rMin: 0, rMax: 0.02, zMin: 0, zMax: 0.06 },
    ]);
    const pi = Math.PI;
    expect(g.volume).toBeCloseTo(pi * 0.012 ** 2 * 0.06 + pi * 0.02 ** 2 * 0.06, 15);
    expect(g.surfaceArea).toBeCloseTo(pi * 0.012 ** 2 + 2 * pi * 0.012 * 0.06 + pi * (0.02 ** 2 - 0.012 ** 2) + 2 * pi * 0.02 * 0.06 + pi * 0.02 ** 2, 15);
    // a tube split lengthwise into two rectangles keeps the whole tube's surface (exact)
    const t = rectanglesGeometry([
      { rMin: 0.01, rMax: 0.02, zMin: 0, zMax: 0.03 },
      { rMin: 0.01, rMax: 0.02, zMin: 0.03, zMax: 0.05 },
    ]);
    expect(t.surfaceArea).toBeCloseTo(2 * pi * (0.02 ** 2 - 0.01 ** 2) + 2 * pi * (0.01 + 0.02) * 0.05, 15);
  });

  it("the study of the stepped shaft with its ring matches solveAxisymmetricField called directly", () => {
    const study = studyHeater(shaft, { ...QUICK, model: "field" });
    const op = study.operating;
    expect(study.part.volume).toBeCloseTo(Math.PI * (0.012 ** 2 + 0.02 ** 2) * 0.06, 12);
    // built here from the file: 8 copper tube turns at radius 30 mm over 64 mm, the shaft's two
    // rectangles, the ring (μr 30, non-conducting)
    const direct = solveAxisymmetricField({
      frequency: op.frequency,
      accuracy: 1e-2,
      coils: [{ name: "coil", current: 1, resistivity: study.coil.resistivity, model: "solid", turns: Array.from({ length: 8 }, (_, i) => ({ kind: "circle" as const, r: 0.03, z: -0.032 + (i + 0.5) * 0.008, radius: 0.003, innerRadius: 0.002 })) }],
      regions: [
        { name: "small", shape: { kind: "rectangle", rMin: 0, rMax: 0.012, zMin: -0.06, zMax: 0 }, resistivity: op.partResistivity, relativePermeability: op.partRelativePermeability },
        { name: "large", shape: { kind: "rectangle", rMin: 0, rMax: 0.02, zMin: 0, zMax: 0.06 }, resistivity: op.partResistivity, relativePermeability: op.partRelativePermeability },
        { name: "ring", shape: { kind: "rectangle", rMin: 0.036, rMax: 0.042, zMin: -0.036, zMax: 0.036 }, relativePermeability: 30 },
      ],
    });
    const tolerance = FIELD_ANCHOR_ERROR + direct.estimatedError + (study.field?.largestEstimatedError ?? 1);
    const partLoss = direct.regions.small!.losses + direct.regions.large!.losses;
    expect(Math.abs(op.reflectedResistance / partLoss - 1)).toBeLessThan(tolerance);
    expect(Math.abs(op.inductance / direct.coils.coil!.inductance - 1)).toBeLessThan(tolerance);
    expect(study.field?.picture?.passive.length).toBe(1);
  }, 600_000);

  it("refuses rectangles that reach into the turns", () => {
    const into = mutate(shaft, "concentrators", [{ rectangles: [{ rMin: "32 mm", rMax: "42 mm", zMin: "-36 mm", zMax: "36 mm" }], relativePermeability: 30 }]);
    expect(() => studyHeater(into, { ...QUICK, model: "field" })).toThrow(/concentrators\[0\]\.rectangles\[0\]/);
  });
});
