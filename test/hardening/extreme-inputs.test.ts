/**
 * Inputs near the ends of the double range that used to come back as NaN (found by
 * scripts/extreme-inputs.ts, which scales every numeric input of every public function by
 * 1e±150 and 1e±300): now an InputError naming the inputs.
 */
import { describe, expect, it } from "vitest";
import {
  brooksCoilInductance,
  litzDcResistance,
  multilayerCoilInductanceWheeler,
  solenoidInductanceWheeler,
  spiralCoilInductanceMohan,
  spiralCoilInductanceWheeler,
  wireDcResistance,
  wireDcResistanceAt,
} from "../../src/index.js";
import { copper } from "../../src/materials/index.js";
import { InputError, coaxialCoilMutualInductance, coilOverPlate, coilOverPlateTruncatedRegion, litzGeometry, workCoilImpedance, multilayerCoilInductance, seriesResonantGain, spiralCoilInductance, tubeAcResistance } from "../../src/index.js";

function refused(f: () => unknown, pattern: RegExp): void {
  let thrown: unknown;
  try {
    f();
  } catch (e) {
    thrown = e;
  }
  expect(thrown).toBeInstanceOf(InputError);
  expect((thrown as Error).message).toMatch(pattern);
}

describe("extreme but finite dimensions", () => {
  it("coaxialCoilMutualInductance: a spiral 4e298 m across is refused, not NaN", () => {
    refused(() => coaxialCoilMutualInductance({ kind: "flatSpiral", innerTurnRadius: 0.01, outerTurnRadius: 4e298, turns: 12 }, { kind: "solenoid", radius: 0.02, length: 0.01, turns: 8 }, 0.015), /double-precision range/);
  });

  it("spiralCoilInductance: an outer radius of 6e298 m is refused, not NaN", () => {
    refused(() => spiralCoilInductance({ innerRadius: 0.02, outerRadius: 6.2e298, turns: 15, wireDiameter: 0.002 }), /double-precision range/);
  });

  it("multilayerCoilInductance: a length of 1e298 m is refused, not NaN", () => {
    refused(() => multilayerCoilInductance({ innerRadius: 0.01, outerRadius: 0.02, length: 1e298, turns: 100 }), /double-precision range/);
  });

  it("tubeAcResistance: a tube 6e297 m across is refused, not NaN", () => {
    refused(() => tubeAcResistance({ outerDiameter: 6e297, wallThickness: 1e-3, frequency: 20e3, resistivity: 1.7241e-8 }), /double-precision range/);
  });

  it("seriesResonantGain: a normalised frequency of 1e-300 is refused, not NaN", () => {
    refused(() => seriesResonantGain({ qualityFactor: 0.5, normalisedFrequency: 1e-300 }), /double-precision range/);
  });

  it("litzGeometry: a twist pitch of 1e-300 m gives the lay factor's limit (2/3)·2πR/p to rounding, not NaN", () => {
    const construction = { strands: 105, strandDiameter: 0.1e-3, strandOuterDiameter: 0.112e-3 };
    const layFactor = litzGeometry({ ...construction, twistPitch: 1e-300 }).layFactor;
    const bundle = litzGeometry(construction).bundleDiameter;
    // mean of √(1 + (2πr/p)²) over the bundle's disc → (2/3)·2πR/p as p → 0 (R the bundle radius)
    expect(Math.abs(layFactor / ((2 / 3) * ((Math.PI * bundle) / 1e-300)) - 1)).toBeLessThan(1e-12);
  });

  it("coilOverPlate and its truncated-region form: a coil 3e298 m wide or a field of 2e304 Hz is refused, not NaN", () => {
    const base = {
      coil: { innerRadius: 0.01, outerRadius: 0.03, liftOff: 0.004, length: 0.01, turns: 20 },
      plate: { thickness: 0.003, resistivity: 3e-8, relativePermeability: 1 },
      frequency: 2e4,
    };
    const wide = { ...base, coil: { ...base.coil, outerRadius: 3e298 } };
    refused(() => coilOverPlate(wide), /double-precision range/);
    refused(() => coilOverPlate({ ...base, frequency: 2e304 }), /double-precision range/);
    refused(() => coilOverPlateTruncatedRegion(wide), /double-precision range/);
  });

  it("coilOverPlateTruncatedRegion: a coil 1e298 m tall is refused by its term count, not a RangeError", () => {
    const coil = { innerRadius: 0.01, outerRadius: 0.03, liftOff: 0.004, length: 1e298, turns: 20 };
    refused(() => coilOverPlateTruncatedRegion({ coil, plate: { thickness: 0.003, resistivity: 3e-8, relativePermeability: 1 }, frequency: 2e4 }), /terms/);
  });

  it("workCoilImpedance: extreme turns, resistivities and walls are refused with an InputError (they had exhausted memory or thrown an internal error)", () => {
    const coil = { shape: "solenoid" as const, radius: 0.02, length: 0.012, turns: 2, conductor: { kind: "round" as const, diameter: 0.002 }, resistivity: 1.75e-8 };
    refused(() => workCoilImpedance({ coil: { ...coil, turns: 1001 }, frequency: 1e3 }), /coil\.turns.*between 1 and 1000/);
    refused(() => workCoilImpedance({ coil: { ...coil, resistivity: 1.75e-308 }, frequency: 1e3 }), /skin depths/);
    refused(() => workCoilImpedance({ coil: { ...coil, conductor: { kind: "tube" as const, outerDiameter: 0.003, wallThickness: 1e-303 } }, frequency: 1e3 }), /impedance matrix can be factored|skin depths|wallThickness/);
  });

  it("closed forms whose value overflows (1e300 turns, a 1e-300 m wire) are refused, not Infinity", () => {
    const range = /double-precision range/;
    refused(() => wireDcResistance({ resistivity: 1.7241e-8, length: 1, diameter: 1e-300 }), range);
    refused(() => wireDcResistanceAt({ material: copper, temperature: 373.15, length: 10, diameter: 1e-300 }), range);
    refused(() => litzDcResistance({ construction: { strands: 105, strandDiameter: 1e-300 }, resistivity: 1.7241e-8, length: 1 }), range);
    refused(() => brooksCoilInductance({ sideLength: 0.01, turns: 1e300 }), range);
    refused(() => solenoidInductanceWheeler({ radius: 0.02, length: 0.05, turns: 1e300 }), range);
    refused(() => multilayerCoilInductanceWheeler({ innerRadius: 0.01, outerRadius: 0.02, length: 0.03, turns: 1e300 }), range);
    refused(() => spiralCoilInductanceWheeler({ innerRadius: 0.01, outerRadius: 0.05, turns: 1e300 }), range);
    refused(() => spiralCoilInductanceMohan({ innerRadius: 0.01, outerRadius: 0.05, turns: 1e300 }), range);
  });

  it("ordinary coils are unchanged by the check (finite, positive)", () => {
    expect(spiralCoilInductance({ innerRadius: 0.02, outerRadius: 0.062, turns: 15, wireDiameter: 0.002 })).toBeGreaterThan(0);
    expect(multilayerCoilInductance({ innerRadius: 0.01, outerRadius: 0.02, length: 0.03, turns: 100 })).toBeGreaterThan(0);
  });
});
