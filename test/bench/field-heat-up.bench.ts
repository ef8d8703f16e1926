import { bench, describe } from "vitest";
import { fieldHeatUp } from "../../src/index.js";
import { billetThroughCurieCase } from "../field/heat-up-cases.js";

// A whole electro-thermal heat-up through Curie (every field solution, the permeability
// iterations and the conduction); a NaN or too few field solutions fails the run.
describe("fieldHeatUp", () => {
  bench(
    "steel billet through Curie to 1150 K, 6 × 4 cells, re-solve step 80 K",
    () => {
      const run = fieldHeatUp(billetThroughCurieCase());
      if (!Number.isFinite(run.meanTemperature.at(-1)!) || run.fieldSolutions < 10) throw new Error("bad heat-up");
    },
    { time: 5000, iterations: 3 },
  );
});
