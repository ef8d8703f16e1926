/* eslint-disable @typescript-eslint/no-deprecated -- this file checks the deprecated names themselves */
// Names renamed before 1.0 keep working until 1.0: a result carries the old field beside the
// new one with the same value; an input accepts either name and refuses both at once.
import { describe, expect, it } from "vitest";
import { coilOverPlate, encirclingCoilOverRod, prepareEncirclingCoilOverRod, workpieceCouplingAtTemperature, lowCarbonSteel, celsius, roundWireWindingAcRatio, roundWireWindingAcRatioFerreira, roundWireWindingValidity, optimiseHeater, optimizeHeater, relativePermeabilityAt, steinmetzLoss, sinusoidalFluxWaveform, triangularFluxWaveform, trapezoidalFluxWaveform, fitSteinmetz, couplingCoefficient, InputError } from "../../src/index.js";
import { renamedOption } from "../../src/core/renamed.js";

describe("renamedOption", () => {
  it("reads the current name, the former name, or neither", () => {
    expect(renamedOption("f", "", { length: 2 }, "length", "height")).toBe(2);
    expect(renamedOption("f", "", { height: 3 }, "length", "height")).toBe(3);
    expect(renamedOption("f", "", {}, "length", "height")).toBeUndefined();
  });
  it("refuses both names at once, naming the former one", () => {
    expect(() => renamedOption("f", "coil", { length: 2, height: 2 }, "length", "height")).toThrow(InputError);
    expect(() => renamedOption("f", "coil", { length: 2, height: 2 }, "length", "height")).toThrow(/^f: coil\.height must be absent when length is given/);
  });
});

describe("workpiece results carry the former field names", () => {
  it("coilOverPlate: resistanceChange = reflectedResistance, airCoreInductance = emptyCoilInductance", () => {
    const r = coilOverPlate({
      coil: { innerRadius: 0.01, outerRadius: 0.03, liftOff: 2e-3, length: 5e-3, turns: 10 },
      plate: { thickness: 5e-3, resistivity: 2.8e-8, relativePermeability: 1 },
      frequency: 20e3,
    });
    expect(r.resistanceChange).toBe(r.reflectedResistance);
    expect(r.airCoreInductance).toBe(r.emptyCoilInductance);
  });
  it("encirclingCoilOverRod and its prepared form: resistanceChange = reflectedResistance", () => {
    const coil = { innerRadius: 0.03, outerRadius: 0.035, length: 0.05, turns: 10 };
    const r = encirclingCoilOverRod({ coil, rod: { radius: 0.02, resistivity: 2e-7, relativePermeability: 1 }, frequency: 10e3 });
    expect(r.resistanceChange).toBe(r.reflectedResistance);
    const c = prepareEncirclingCoilOverRod({ coil, rod: { radius: 0.02 } })(10e3, 2e-7, 1);
    expect(c.resistanceChange).toBe(c.reflectedResistance);
  });
});

describe("a plate coil's axial extent: length, formerly height", () => {
  const coil = { innerRadius: 0.01, outerRadius: 0.03, liftOff: 2e-3, length: 5e-3, turns: 10 };
  const former = { innerRadius: 0.01, outerRadius: 0.03, liftOff: 2e-3, height: 5e-3, turns: 10 };
  const plate = { thickness: 5e-3, resistivity: 2.8e-8, relativePermeability: 1 };
  it("coilOverPlate accepts height with the same result and refuses both", () => {
    expect(coilOverPlate({ coil: former, plate, frequency: 20e3 }).inductance).toBe(coilOverPlate({ coil, plate, frequency: 20e3 }).inductance);
    expect(() => coilOverPlate({ coil: { ...coil, height: 5e-3 }, plate, frequency: 20e3 })).toThrow(/coil\.height must be absent when length is given/);
    expect(() => coilOverPlate({ coil: { ...former, height: -1 }, plate, frequency: 20e3 })).toThrow(/coil\.height must be/);
  });
  it("workpieceCouplingAtTemperature accepts part.coil.height and refuses both", () => {
    const at = (c: typeof coil | typeof former) =>
      workpieceCouplingAtTemperature({ material: lowCarbonSteel, temperature: celsius(20), frequency: 10e3, part: { kind: "plate", thickness: 3e-3, coil: c } });
    expect(at(former).reflectedResistance).toBe(at(coil).reflectedResistance);
    expect(() => at({ ...coil, height: 5e-3 })).toThrow(/part\.coil\.height must be absent/);
  });
});

describe("round-wire windings: windowBreadth, formerly windingWidth", () => {
  const o = { wireDiameter: 1e-3, frequency: 100e3, resistivity: 1.7241e-8, layers: 4, turnsPerLayer: 8, windowBreadth: 10e-3 };
  const { windowBreadth, ...rest } = o;
  const former = { ...rest, windingWidth: windowBreadth };
  it("the three functions accept windingWidth with the same result", () => {
    expect(roundWireWindingAcRatio(former)).toBe(roundWireWindingAcRatio(o));
    expect(roundWireWindingAcRatioFerreira(former)).toBe(roundWireWindingAcRatioFerreira(o));
    expect(roundWireWindingValidity({ ...former, windingWidth: 40e-3 })).toEqual(roundWireWindingValidity({ ...o, windowBreadth: 40e-3 }));
  });
  it("refuses both names and names the former one in its own errors", () => {
    expect(() => roundWireWindingAcRatio({ ...o, windingWidth: 10e-3 })).toThrow(/windingWidth must be absent when windowBreadth is given/);
    expect(() => roundWireWindingAcRatio({ ...former, windingWidth: 5e-3 })).toThrow(/windingWidth must be ≥/);
  });
});

describe("British spelling: optimiseHeater, formerly optimizeHeater", () => {
  it("the former name is the same function", () => {
    expect(optimizeHeater).toBe(optimiseHeater);
  });
});

describe("peak and RMS as suffixes: fluxDensityPeak and fieldStrengthPeak", () => {
  const k = { k: 2.5, alpha: 1.45, beta: 2.55, frequency: 100e3 };
  it("the core-loss functions accept peakFluxDensity with the same result and refuse both", () => {
    expect(steinmetzLoss({ ...k, peakFluxDensity: 0.1 })).toBe(steinmetzLoss({ ...k, fluxDensityPeak: 0.1 }));
    expect(() => steinmetzLoss({ ...k, fluxDensityPeak: 0.1, peakFluxDensity: 0.1 })).toThrow(/peakFluxDensity must be absent when fluxDensityPeak is given/);
    expect(() => steinmetzLoss({ ...k, peakFluxDensity: -1 })).toThrow(/steinmetzLoss: peakFluxDensity must be/);
    expect(sinusoidalFluxWaveform({ peakFluxDensity: 0.1, frequency: 50e3, samples: 8 })).toEqual(sinusoidalFluxWaveform({ fluxDensityPeak: 0.1, frequency: 50e3, samples: 8 }));
    expect(triangularFluxWaveform({ peakFluxDensity: 0.1, frequency: 50e3 })).toEqual(triangularFluxWaveform({ fluxDensityPeak: 0.1, frequency: 50e3 }));
    expect(trapezoidalFluxWaveform({ peakFluxDensity: 0.1, frequency: 50e3, dutyCycle: 0.5 })).toEqual(trapezoidalFluxWaveform({ fluxDensityPeak: 0.1, frequency: 50e3, dutyCycle: 0.5 }));
    const points = [1e5, 2e5, 4e5].flatMap((frequency) => [0.05, 0.1, 0.2].map((b) => ({ frequency, b, lossDensity: steinmetzLoss({ ...k, frequency, fluxDensityPeak: b }) })));
    expect(fitSteinmetz(points.map(({ b, ...p }) => ({ ...p, peakFluxDensity: b })))).toEqual(fitSteinmetz(points.map(({ b, ...p }) => ({ ...p, fluxDensityPeak: b }))));
  });
  it("relativePermeabilityAt and workpieceCouplingAtTemperature accept fieldStrength and refuse both", () => {
    const t = celsius(20);
    expect(relativePermeabilityAt(lowCarbonSteel, { temperature: t, fieldStrength: 1e5 })).toBe(relativePermeabilityAt(lowCarbonSteel, { temperature: t, fieldStrengthPeak: 1e5 }));
    expect(() => relativePermeabilityAt(lowCarbonSteel, { temperature: t, fieldStrength: 1e5, fieldStrengthPeak: 1e5 })).toThrow(/conditions\.fieldStrength must be absent/);
    const part = { kind: "bar", radius: 0.01, coil: { innerRadius: 0.02, length: 0.05, turns: 10 } } as const;
    const at = (o: object) => workpieceCouplingAtTemperature({ material: lowCarbonSteel, temperature: t, frequency: 10e3, part, ...o });
    expect(at({ fieldStrength: 1e4 }).reflectedResistance).toBe(at({ fieldStrengthPeak: 1e4 }).reflectedResistance);
    expect(() => at({ fieldStrength: 1e4, fieldStrengthPeak: 1e4 })).toThrow(/workpieceCouplingAtTemperature: fieldStrength must be absent/);
  });
});

describe("options objects: couplingCoefficient", () => {
  it("the positional form gives the same value and the same checks", () => {
    expect(couplingCoefficient(2e-6, 4e-6, 9e-6)).toBe(couplingCoefficient({ mutualInductance: 2e-6, selfInductance1: 4e-6, selfInductance2: 9e-6 }));
    expect(() => couplingCoefficient(7e-6, 4e-6, 9e-6)).toThrow(/couplingCoefficient: mutual must be at most/);
    expect(() => couplingCoefficient({ mutualInductance: 7e-6, selfInductance1: 4e-6, selfInductance2: 9e-6 })).toThrow(/couplingCoefficient: mutualInductance must be at most/);
    expect(() => couplingCoefficient({ mutualInductance: 1e-6, selfInductance1: 4e-6, selfInductance2: 9e-6, mutual: 1 } as never)).toThrow(/mutual must be absent/);
  });
});
