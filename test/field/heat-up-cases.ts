/**
 * The benchmark heat-up of `fieldHeatUp`: a 30 mm steel billet, 80 mm long, in a 6-turn coil at
 * 10 kHz and 1.2 kA, heated through the Curie point until its hottest point reaches 1150 K
 * (about 16 field solutions with the re-solve step of 80 K).
 */
import { mediumCarbonSteel } from "../../src/index.js";
import type { FieldHeatUpOptions } from "../../src/index.js";

export function billetThroughCurieCase(): FieldHeatUpOptions {
  return {
    frequency: 10e3,
    coils: [
      {
        name: "coil",
        current: 1200,
        resistivity: 1.75e-8,
        model: "stranded",
        turns: { shape: { kind: "rectangle", rMin: 0.025, rMax: 0.03, zMin: -0.05, zMax: 0.05 }, count: 6 },
      },
    ],
    part: {
      name: "billet",
      shape: { kind: "rectangle", rMin: 0, rMax: 0.015, zMin: -0.04, zMax: 0.04 },
      material: mediumCarbonSteel,
      cells: { radial: 6, axial: 4 },
    },
    surface: { convectionCoefficient: 10, emissivity: 0.8, ambientTemperature: 293.15 },
    duration: 20,
    targetTemperature: 1150,
    resolveStep: 80,
  };
}
