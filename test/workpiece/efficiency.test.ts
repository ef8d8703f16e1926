import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { coilEfficiency, InputError, powerInPart } from "../../src/index.js";

describe("coilEfficiency", () => {
  it("is Rr/(Rr + Rc) (Davies 1990, ch. 5; common practice)", () => {
    expect(coilEfficiency({ coilResistance: 0.01, reflectedResistance: 0.03 })).toBe(0.75);
    expect(coilEfficiency({ coilResistance: 0, reflectedResistance: 0.03 })).toBe(1);
    expect(coilEfficiency({ coilResistance: 0.01, reflectedResistance: 0 })).toBe(0);
  });

  it("stays in [0, 1] and rises with the reflected resistance", () => {
    const r = fc.double({ min: 0, max: 1e3, noNaN: true, noDefaultInfinity: true });
    fc.assert(
      fc.property(r, r, (rc, rr) => {
        if (rc + rr === 0) return true;
        const e = coilEfficiency({ coilResistance: rc, reflectedResistance: rr });
        const e2 = coilEfficiency({ coilResistance: rc, reflectedResistance: rr * 2 + 1e-9 });
        return e >= 0 && e <= 1 && e2 >= e;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("throws InputError for negative, non-finite or all-zero resistances", () => {
    expect(() => coilEfficiency({ coilResistance: -1, reflectedResistance: 1 })).toThrow(InputError);
    expect(() => coilEfficiency({ coilResistance: 1, reflectedResistance: Number.NaN })).toThrow(InputError);
    expect(() => coilEfficiency({ coilResistance: 0, reflectedResistance: 0 })).toThrow(InputError);
    expect(() => coilEfficiency(undefined as never)).toThrow(InputError);
  });
});

describe("powerInPart", () => {
  it("is I^2 Rr (Joule's law)", () => {
    expect(powerInPart({ coilCurrentRms: 200, reflectedResistance: 0.05 })).toBe(2000);
  });

  it("scales with the square of the coil current", () => {
    const pos = fc.double({ min: 1e-3, max: 1e4, noNaN: true, noDefaultInfinity: true });
    fc.assert(
      fc.property(pos, pos, pos, (i, r, k) => {
        const a = powerInPart({ coilCurrentRms: i, reflectedResistance: r });
        const b = powerInPart({ coilCurrentRms: i * k, reflectedResistance: r });
        return Math.abs(b / (a * k * k) - 1) < 1e-12;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("throws InputError for bad input", () => {
    expect(() => powerInPart({ coilCurrentRms: -1, reflectedResistance: 1 })).toThrow(InputError);
    expect(() => powerInPart({ coilCurrentRms: 1, reflectedResistance: Infinity })).toThrow(InputError);
  });
});
