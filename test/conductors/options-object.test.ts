import { describe, expect, it } from "vitest";
import {
  dowellFactor,
  InputError,
  litzAcRatio,
  litzDcResistance,
  litzWindingAcRatio,
  litzWindingValidity,
  optimalLitzStrandCount,
  roundWireAcRatio,
  roundWireAcRatioSweep,
  roundWireWindingAcRatio,
  roundWireWindingAcRatioFerreira,
  roundWireWindingValidity,
  skinDepth,
  tubeAcResistance,
  wireDcResistance,
  wireDcResistanceAt,
  workCoilResistanceCurrentSheet,
} from "../../src/index.js";

// Every conductor function takes one options object; a missing or null object used to surface
// as a TypeError ("Cannot read properties of null") from the first field access.
const functions: Record<string, (options: never) => unknown> = {
  dowellFactor,
  litzAcRatio,
  litzDcResistance,
  litzWindingAcRatio,
  litzWindingValidity,
  optimalLitzStrandCount,
  roundWireAcRatio,
  roundWireAcRatioSweep,
  roundWireWindingAcRatio,
  roundWireWindingAcRatioFerreira,
  roundWireWindingValidity,
  skinDepth,
  tubeAcResistance,
  wireDcResistance,
  wireDcResistanceAt,
  workCoilResistanceCurrentSheet,
};

describe("conductor functions reject a missing or non-object options argument", () => {
  for (const [name, fn] of Object.entries(functions)) {
    it(`${name} throws InputError naming "options" for null, undefined, a number and a string`, () => {
      for (const bad of [null, undefined, 42, "options"]) {
        let thrown: unknown;
        try {
          fn(bad as never);
        } catch (e) {
          thrown = e;
        }
        expect(thrown).toBeInstanceOf(InputError);
        expect((thrown as InputError).where).toBe(name);
        expect((thrown as InputError).parameter).toBe("options");
      }
    });
  }
});
