import { describe, it } from "vitest";
import fc from "fast-check";
import { currentFedParallelInverterWithSource, InputError, seriesInverterWithSource } from "../../src/index.js";

describe("inverters fed from a source: invariants", () => {
  it("the series inverter either balances V_s·I = R_s·I² + P to 1e-12 with V_in > 0, or throws InputError", () => {
    let reached = 0;
    fc.assert(
      fc.property(fc.double({ min: 5, max: 400, noNaN: true }), fc.double({ min: -4, max: 3, noNaN: true }), fc.double({ min: 0, max: 4, noNaN: true }), (vs, logRs, logP) => {
        try {
          const op = seriesInverterWithSource({ sourceVoltage: vs, sourceResistance: 10 ** logRs, bridge: "half", inductance: 50e-6, capacitance: 1e-6, resistance: 0.5, power: 10 ** logP });
          reached++;
          return op.inputVoltage > 0 && Math.abs(op.sourcePower - op.sourceLoss - op.power) <= 1e-12 * op.sourcePower;
        } catch (e) {
          if (!(e instanceof InputError)) throw e;
          return true;
        }
      }),
      { seed: 11, numRuns: 200 },
    );
    if (reached < 50) throw new Error(`only ${reached} runs reached the balance check`);
  });

  it("the current-fed inverter's input voltage falls as the source resistance rises", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 1.01, max: 10, noNaN: true }), (rs, k) => {
        const o = { sourceVoltage: 24, inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 };
        const a = currentFedParallelInverterWithSource({ ...o, sourceResistance: rs });
        const b = currentFedParallelInverterWithSource({ ...o, sourceResistance: rs * k + 1e-6 });
        return b.inputVoltage < a.inputVoltage;
      }),
      { seed: 12, numRuns: 50 },
    );
  });
});
