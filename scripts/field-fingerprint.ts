/**
 * Exact fingerprint of the field module's results, to show that a refactoring or a speed change
 * of `src/field/` leaves every result bit for bit unchanged: `solveAxisymmetricField` (linear and
 * saturating, solid and stranded coils, several coils, with `fieldAt` and `powerDensityAt` on a
 * grid of points), `fieldHeatUp`, `axisymmetricHeatConduction`, `studyHeater` with the field
 * model (its run time left out), and the messages of rejected inputs, run on a built package.
 * Prints one SHA-256 per case of the exact JSON of the results (JSON writes each double as the
 * shortest text that reads back as the same double, so equal text means equal bits).
 *
 * Usage (build first with `npm run build`):
 *   npx tsx scripts/field-fingerprint.ts [distDir]            print the fingerprints
 *   npx tsx scripts/field-fingerprint.ts distDir otherDistDir  compare two builds, case by case
 */
import { readFileSync } from "node:fs";
import { fingerprintBuilds } from "./fingerprint-compare.js";

type Lib = typeof import("../src/index.js");
type FieldOptions = Parameters<Lib["solveAxisymmetricField"]>[0];
type FieldResult = ReturnType<Lib["solveAxisymmetricField"]>;

const examples = new URL("../docs/examples/", import.meta.url);

/** JSON of a field result with its point evaluations on a grid over the arrangement. */
function fieldJson(result: FieldResult, rMax: number, zMin: number, zMax: number): string {
  const points: unknown[] = [];
  for (let i = 0; i <= 12; i++) {
    for (let j = 0; j <= 12; j++) {
      const point = { r: (1.3 * rMax * i) / 12, z: zMin - 0.2 * (zMax - zMin) + (1.4 * (zMax - zMin) * j) / 12 };
      points.push([result.fieldAt(point), result.powerDensityAt(point)]);
    }
  }
  // JSON leaves out the two methods
  return JSON.stringify({ result, points });
}

/** The message of the error a call throws, or "no error". */
function thrown(call: () => unknown): string {
  try {
    call();
    return "no error";
  } catch (error) {
    return error instanceof Error ? `${error.name}: ${error.message}` : String(error);
  }
}

/** Case name → exact JSON of its results. */
function cases(lib: Lib): Map<string, string> {
  const out = new Map<string, string>();
  const field = (name: string, options: FieldOptions, rMax: number, zMin: number, zMax: number): void => {
    out.set(`solveAxisymmetricField ${name}`, fieldJson(lib.solveAxisymmetricField(options), rMax, zMin, zMax));
  };
  const copper = 1.75e-8;
  field(
    "TEAM 15 coil over a plate, 1e-2",
    {
      frequency: 900,
      accuracy: 1e-2,
      coils: [{ name: "probe", current: 1, resistivity: copper, model: "stranded", turns: { shape: { kind: "rectangle", rMin: 6.15e-3, rMax: 12.4e-3, zMin: 0.88e-3, zMax: 7.03e-3 }, count: 3790 } }],
      regions: [{ name: "plate", shape: { kind: "rectangle", rMin: 0, rMax: 0.3, zMin: -12.22e-3, zMax: 0 }, resistivity: 1 / 3.06e7 }],
    },
    0.02,
    -0.015,
    0.01,
  );
  const tubes = [0, 1, 2, 3].map((i) => ({ kind: "circle" as const, r: 0.02, z: -0.016 + (i + 0.5) * 0.008, radius: 0.003, innerRadius: 0.002 }));
  field(
    "four tube turns around a steel bar, 1e-2",
    {
      frequency: 10e3,
      accuracy: 1e-2,
      coils: [{ name: "coil", current: 100, resistivity: copper, model: "solid", turns: tubes }],
      regions: [{ name: "bar", shape: { kind: "rectangle", rMin: 0, rMax: 0.008, zMin: -0.2, zMax: 0.2 }, resistivity: 2e-7, relativePermeability: 50 }],
    },
    0.025,
    -0.03,
    0.03,
  );
  field(
    "pancake over a plate, 1e-2",
    {
      frequency: 20e3,
      coils: [{ name: "pancake", current: 100, resistivity: copper, model: "solid", turns: [20e-3, 28e-3, 36e-3].map((r) => ({ kind: "circle" as const, r, z: 5e-3, radius: 2e-3, innerRadius: 1.2e-3 })) }],
      regions: [{ name: "plate", shape: { kind: "rectangle", rMin: 0, rMax: 0.08, zMin: -10e-3, zMax: 0 }, resistivity: 2e-7, relativePermeability: 1 }],
      accuracy: 1e-2,
    },
    0.05,
    -0.012,
    0.01,
  );
  field(
    "two coils, a tube, a ferrite ring and a non-conductor, 3e-3",
    {
      frequency: 50e3,
      accuracy: 3e-3,
      coils: [
        { name: "primary", current: 20, resistivity: copper, model: "stranded", turns: [0, 1, 2].map((k) => ({ kind: "rectangle" as const, rMin: 0.01, rMax: 0.012, zMin: 0.002 * k, zMax: 0.002 * k + 0.0015 })) },
        { name: "pickup", current: 3, resistivity: copper, model: "solid", turns: [{ kind: "circle", r: 0.03, z: 0.01, radius: 0.001 }] },
      ],
      regions: [
        { name: "tube", shape: { kind: "rectangle", rMin: 0.004, rMax: 0.007, zMin: -0.02, zMax: 0.02 }, resistivity: 7e-7, relativePermeability: 1 },
        { name: "ferrite", shape: { kind: "rectangle", rMin: 0.015, rMax: 0.018, zMin: -0.005, zMax: 0.008 }, relativePermeability: 200 },
        { name: "spacer", shape: { kind: "rectangle", rMin: 0.02, rMax: 0.025, zMin: -0.01, zMax: -0.005 } },
      ],
    },
    0.035,
    -0.025,
    0.025,
  );
  const curve = [
    { fieldStrength: 400, fluxDensity: 0.5 },
    { fieldStrength: 4000, fluxDensity: 1.5 },
    { fieldStrength: 40000, fluxDensity: 1.9 },
  ];
  for (const current of [0.01, 300]) {
    field(
      `saturating pin, ${current} A, 1e-2`,
      {
        frequency: 5e3,
        accuracy: 1e-2,
        coils: [{ name: "coil", current, resistivity: copper, model: "stranded", turns: { shape: { kind: "rectangle", rMin: 0.012, rMax: 0.014, zMin: -0.006, zMax: 0.006 }, count: 6 } }],
        regions: [{ name: "pin", shape: { kind: "rectangle", rMin: 0, rMax: 0.006, zMin: -0.015, zMax: 0.015 }, resistivity: 2e-7, magnetisation: { curve } }],
      },
      0.015,
      -0.02,
      0.02,
    );
  }
  field(
    "a solid ring at 1 MHz, 1e-4",
    {
      frequency: 1e6,
      accuracy: 1e-4,
      coils: [{ name: "ring", current: 1, resistivity: copper, model: "solid", turns: [{ kind: "circle", r: 0.02, z: 0, radius: 0.002 }] }],
    },
    0.025,
    -0.005,
    0.005,
  );

  const billet = {
    frequency: 10e3,
    coils: [{ name: "coil", current: 1200, resistivity: copper, model: "stranded" as const, turns: { shape: { kind: "rectangle" as const, rMin: 0.025, rMax: 0.03, zMin: -0.05, zMax: 0.05 }, count: 6 } }],
    part: { name: "billet", shape: { kind: "rectangle" as const, rMin: 0, rMax: 0.015, zMin: -0.04, zMax: 0.04 }, material: lib.mediumCarbonSteel, cells: { radial: 6, axial: 4 } },
    surface: { convectionCoefficient: 10, emissivity: 0.8, ambientTemperature: 293.15 },
    duration: 20,
    targetTemperature: 1150,
    resolveStep: 80,
  };
  out.set("fieldHeatUp billet through Curie", JSON.stringify(lib.fieldHeatUp(billet)));
  out.set(
    "fieldHeatUp tube with a ring, mean target, maps",
    JSON.stringify(
      lib.fieldHeatUp({
        ...billet,
        part: { ...billet.part, shape: { kind: "rectangle", rMin: 0.006, rMax: 0.015, zMin: 0, zMax: 0.04 }, cells: { radial: 5, axial: 3 } },
        regions: [{ name: "ring", shape: { kind: "rectangle", rMin: 0.032, rMax: 0.036, zMin: -0.05, zMax: 0.05 }, relativePermeability: 40 }],
        insulatedFaces: ["lower"],
        initialTemperature: 400,
        duration: 8,
        targetTemperature: 900,
        targetLocation: "mean",
        accuracy: 2e-2,
        temperatureStep: 6,
        maxTimeStep: 0.5,
        mapTimes: [1, 3, 5],
      }),
    ),
  );

  const withoutSource = {
    shape: { kind: "rectangle" as const, rMin: 0, rMax: 0.02, zMin: 0, zMax: 0.1 },
    material: lib.mediumCarbonSteel,
    surface: { convectionCoefficient: 10, emissivity: 0.8, ambientTemperature: 293.15 },
    duration: 60,
  };
  const conduction = { ...withoutSource, powerDensity: 2e6 };
  out.set("axisymmetricHeatConduction billet, uniform generation", JSON.stringify(lib.axisymmetricHeatConduction(conduction)));
  out.set(
    "axisymmetricHeatConduction tube, callback, insulated faces, target",
    JSON.stringify(
      lib.axisymmetricHeatConduction({
        shape: { kind: "rectangle", rMin: 0.01, rMax: 0.03, zMin: -0.02, zMax: 0.02 },
        material: lib.mediumCarbonSteel,
        cells: { radial: 9, axial: 5 },
        surface: { convectionCoefficient: 25, emissivity: 0.6, ambientTemperature: 300 },
        insulatedFaces: ["inner", "upper"],
        initialTemperature: 350,
        generationAt: (request) => {
          request.temperatures.forEach((t, c) => (request.generation[c] = c % 3 === 0 ? 4e3 / (1 + t / 1000) : 200));
        },
        duration: 200,
        targetTemperature: 1200,
        targetLocation: "centre",
        temperatureStep: 8,
        mapTimes: [0, 10, 50],
      }),
    ),
  );
  out.set(
    "axisymmetricHeatConduction every face insulated",
    JSON.stringify(lib.axisymmetricHeatConduction({ ...conduction, cells: { radial: 4, axial: 3 }, insulatedFaces: ["outer", "lower", "upper"], duration: 10 })),
  );

  const shaft = JSON.parse(readFileSync(new URL("field-stepped-shaft.json", examples), "utf8")) as Parameters<Lib["studyHeater"]>[0];
  // the run time the study reports is left out (it differs on every run)
  const noTime = (key: string, value: unknown): unknown => (key === "seconds" ? undefined : value);
  out.set("studyHeater field-stepped-shaft.json, field model", JSON.stringify(lib.studyHeater(shaft, { model: "field" }), noTime));

  const coil = { name: "c", current: 1, resistivity: copper, model: "solid" as const, turns: [{ kind: "circle" as const, r: 0.02, z: 0, radius: 0.002 }] };
  const bad: [string, () => unknown][] = [
    ["unknown key", () => lib.solveAxisymmetricField({ frequency: 1e3, coils: [coil], extra: 1 } as never)],
    ["overlap", () => lib.solveAxisymmetricField({ frequency: 1e3, coils: [coil], regions: [{ name: "r", shape: { kind: "rectangle", rMin: 0, rMax: 0.021, zMin: -1, zMax: 1 } }] })],
    ["circle on the axis", () => lib.solveAxisymmetricField({ frequency: 1e3, coils: [{ ...coil, turns: [{ kind: "circle", r: 0.001, z: 0, radius: 0.002 }] }] })],
    ["block with solid", () => lib.solveAxisymmetricField({ frequency: 1e3, coils: [{ ...coil, turns: { shape: { kind: "rectangle", rMin: 0.01, rMax: 0.02, zMin: 0, zMax: 0.01 }, count: 2 } }] })],
    ["bad curve", () => lib.solveAxisymmetricField({ frequency: 1e3, coils: [coil], regions: [{ name: "r", shape: { kind: "rectangle", rMin: 0, rMax: 0.01, zMin: -1, zMax: 1 }, magnetisation: { curve: [{ fieldStrength: 10, fluxDensity: 1 }, { fieldStrength: 5, fluxDensity: 2 }] } }] })],
    ["bad point", () => lib.solveAxisymmetricField({ frequency: 1e3, coils: [coil], accuracy: 0.1 }).fieldAt({ r: -1, z: 0 })],
    ["heat-up cells", () => lib.fieldHeatUp({ ...billet, part: { ...billet.part, cells: { radial: 41, axial: 2 } } })],
    ["heat-up accuracy", () => lib.fieldHeatUp({ ...billet, accuracy: 0.5 })],
    ["heat-up part name", () => lib.fieldHeatUp({ ...billet, part: { ...billet.part, name: "" } })],
    ["conduction both sources", () => lib.axisymmetricHeatConduction({ ...conduction, generationAt: () => undefined })],
    ["conduction bad face", () => lib.axisymmetricHeatConduction({ ...conduction, insulatedFaces: ["side"] } as never)],
    ["conduction negative generation", () => lib.axisymmetricHeatConduction({ ...withoutSource, generationAt: (q) => q.generation.fill(-1) })],
  ];
  out.set("rejected inputs", JSON.stringify(bad.map(([name, call]) => [name, thrown(call)])));
  return out;
}

await fingerprintBuilds(cases);
