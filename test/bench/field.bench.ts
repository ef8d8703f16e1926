import { bench, describe } from "vitest";
import { solveAxisymmetricField } from "../../src/index.js";
import { coilOverPlateCase, solenoidBarCase } from "../field/cases.js";

// Whole solves (meshing, two or more factorisations, error estimate); a NaN fails the run.
const check = (x: number): void => {
  if (!Number.isFinite(x)) throw new Error("non-finite impedance");
};

describe("solveAxisymmetricField", () => {
  bench("coil over a plate (TEAM 15 coil), accuracy 1e-2", () => {
    check(solveAxisymmetricField(coilOverPlateCase(1e-2)).coils.probe!.resistance);
  }, { time: 2000 });
  bench("coil over a plate (TEAM 15 coil), accuracy 1e-3", () => {
    check(solveAxisymmetricField(coilOverPlateCase(1e-3)).coils.probe!.resistance);
  }, { time: 2000 });
  bench("four tube turns around a 400 mm steel bar, accuracy 1e-2", () => {
    check(solveAxisymmetricField(solenoidBarCase(1e-2)).coils.coil!.resistance);
  }, { time: 2000 });
});
