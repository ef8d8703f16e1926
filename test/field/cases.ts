/**
 * Benchmark arrangements of the field solver, shared by the benchmark and the timing script:
 * the TEAM Problem 15 coil (problem 1, stranded) over its 12.22 mm aluminium plate, and
 * scenario A of the shared field fixtures (four copper tube turns around a 400 mm steel bar).
 */
import type { SolveAxisymmetricFieldOptions } from "../../src/index.js";

/** TEAM 15 problem-1 coil over the plate at 900 Hz, to the given accuracy. */
export function coilOverPlateCase(accuracy: number): SolveAxisymmetricFieldOptions {
  return {
    frequency: 900,
    accuracy,
    coils: [
      {
        name: "probe",
        current: 1,
        resistivity: 1.75e-8,
        model: "stranded",
        turns: { shape: { kind: "rectangle", rMin: 6.15e-3, rMax: 12.4e-3, zMin: 0.88e-3, zMax: 7.03e-3 }, count: 3790 },
      },
    ],
    regions: [{ name: "plate", shape: { kind: "rectangle", rMin: 0, rMax: 0.3, zMin: -12.22e-3, zMax: 0 }, resistivity: 1 / 3.06e7 }],
  };
}

/** Four solid tube turns (OD 6 mm, wall 1 mm, radius 20 mm, pitch 8 mm) around a 400 mm bar, 10 kHz. */
export function solenoidBarCase(accuracy: number): SolveAxisymmetricFieldOptions {
  return {
    frequency: 10e3,
    accuracy,
    coils: [
      {
        name: "coil",
        current: 1,
        resistivity: 1.75e-8,
        model: "solid",
        turns: [0, 1, 2, 3].map((i) => ({ kind: "circle" as const, r: 0.02, z: -0.016 + (i + 0.5) * 0.008, radius: 0.003, innerRadius: 0.002 })),
      },
    ],
    regions: [{ name: "bar", shape: { kind: "rectangle", rMin: 0, rMax: 0.008, zMin: -0.2, zMax: 0.2 }, resistivity: 2e-7, relativePermeability: 50 }],
  };
}
