import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { currentFedParallelInverter, currentFedParallelInverterWithSource, InputError } from "../../src/index.js";
import { FIG_COIL_CURRENT_RMS, FIG_FREQUENCY, FIG_TANK_VOLTAGE_PEAK, currentFedFigures, currentFedWithSourceFigures } from "../../src/tank/current-fed-figures.js";

/** Log-uniform on [10^lo, 10^hi]. */
const logUniform = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true }).map((e) => 10 ** e);

describe("allocation-free current-fed inverter kernel: the public functions' numbers, bit for bit", () => {
  it("currentFedWithSourceFigures gives the frequency, coil current and tank voltage of currentFedParallelInverterWithSource, or declines where it throws", () => {
    const out = new Float64Array(3);
    const scratch = new Float64Array(7);
    let solved = 0;
    let declined = 0;
    fc.assert(
      fc.property(
        logUniform(-1, 3), // source voltage [V]
        fc.oneof(fc.constant(0), logUniform(-4, 0)), // source resistance [Ω]
        fc.oneof(fc.constant(undefined), fc.constant(0), logUniform(-4, -1)), // switch on-resistance [Ω]
        logUniform(-7, -3), // L [H]
        logUniform(-8, -4), // C [F]
        logUniform(-4, 1), // R [Ω]: above √(L/C) for some draws
        fc.oneof(fc.constant(undefined), logUniform(-6, -2)), // choke [H]
        (vs, rs, ron, L, C, R, choke) => {
          const ok = currentFedWithSourceFigures(vs, rs, ron, L, C, R, choke, out, scratch);
          let op;
          try {
            op = currentFedParallelInverterWithSource({
              sourceVoltage: vs,
              sourceResistance: rs,
              ...(ron === undefined ? {} : { switchOnResistance: ron }),
              inductance: L,
              capacitance: C,
              coilResistance: R,
              ...(choke === undefined ? {} : { chokeInductance: choke }),
            });
          } catch (e) {
            if (!(e instanceof InputError)) throw e;
            declined++;
            expect(ok).toBe(false);
            return;
          }
          solved++;
          expect(ok).toBe(true);
          expect([out[0], out[1], out[2]]).toEqual([op.frequency, op.coilCurrentRms, op.tankVoltagePeak]);
        },
      ),
      { seed: 2026, numRuns: 2000 },
    );
    // both outcomes were exercised
    expect(solved).toBeGreaterThan(200);
    expect(declined).toBeGreaterThan(50);
  });

  it("declines values outside the public function's hard domain", () => {
    const out = new Float64Array(3);
    const scratch = new Float64Array(7);
    const good = [24, 0.05, 0.01, 1e-6, 2e-6, 0.01, undefined] as const;
    expect(currentFedWithSourceFigures(...good, out, scratch)).toBe(true);
    for (const [i, bad] of [[0, 0], [0, Infinity], [1, -1], [2, NaN], [3, 0], [4, -2e-6], [5, Infinity], [6, 0]] as const) {
      const args: (number | undefined)[] = [...good];
      args[i] = bad;
      const [vs, rs, ron, L, C, R, choke] = args;
      expect(currentFedWithSourceFigures(vs!, rs!, ron, L!, C!, R!, choke, out, scratch)).toBe(false);
    }
  });

  it("currentFedFigures is what currentFedParallelInverter reports", () => {
    const out = new Float64Array(7);
    fc.assert(
      fc.property(logUniform(-1, 3), logUniform(-7, -3), logUniform(-8, -4), logUniform(-4, -1), (V, L, C, R) => {
        fc.pre(R < Math.sqrt(L / C));
        expect(currentFedFigures(V, L, C, R, out)).toBe(true);
        const op = currentFedParallelInverter({ supplyVoltage: V, inductance: L, capacitance: C, coilResistance: R });
        expect([out[FIG_FREQUENCY], out[FIG_COIL_CURRENT_RMS], out[FIG_TANK_VOLTAGE_PEAK]]).toEqual([op.frequency, op.coilCurrentRms, op.tankVoltagePeak]);
      }),
      { seed: 2027, numRuns: 300 },
    );
  });
});
