import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { awgToDiameter, diameterToAwg, formatQuantity, parseQuantity, SI_PREFIXES } from "../../src/units/index.js";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);

describe("units properties", () => {
  it("parseQuantity(formatQuantity(x, u, { digits: 15 }), u) round-trips within 1e-14 over 1e-24 … 1e24", () => {
    const units = ["F", "H", "Hz", "Ω", "V", "A", "W", "m", "T", "J", "s", "m²", "m³", "W/m²", ""];
    fc.assert(
      fc.property(logUniform(1e-24, 1e24), fc.boolean(), fc.constantFrom(...units), (x, negative, unit) => {
        const v = negative ? -x : x;
        const back = parseQuantity(formatQuantity(v, unit, { digits: 15 }), unit);
        expect(Math.abs(back - v)).toBeLessThanOrEqual(1e-14 * Math.abs(v));
      }),
      { seed: 20261201, numRuns: 2000 },
    );
  });

  it("with 17 digits the round trip is exact", () => {
    fc.assert(
      fc.property(logUniform(1e-29, 1e32), (x) => {
        expect(parseQuantity(formatQuantity(x, "F", { digits: 17 }), "F")).toBe(x);
      }),
      { seed: 7, numRuns: 2000 },
    );
  });

  it("every SI prefix parses to its power of ten", () => {
    for (const p of SI_PREFIXES) {
      expect(parseQuantity(`1.5 ${p.symbol}Hz`, "Hz")).toBe(Number(`1.5e${p.exponent}`));
      expect(parseQuantity(`2${p.symbol}V`, "V")).toBe(Number(`2e${p.exponent}`));
    }
  });

  it("formatted mantissas lie in [1, 1000) inside the prefix range", () => {
    fc.assert(
      fc.property(logUniform(1e-30, 1e32), (x) => {
        const text = formatQuantity(x, "F", { digits: 6 });
        const mantissa = Number(text.split(" ")[0]);
        expect(mantissa).toBeGreaterThanOrEqual(1);
        expect(mantissa).toBeLessThan(1000);
      }),
      { seed: 3, numRuns: 1000 },
    );
  });

  it("AWG ↔ diameter round-trips over the whole gauge range, fractional gauges included", () => {
    fc.assert(
      fc.property(fc.double({ min: -3, max: 56, noNaN: true }), (n) => {
        expect(diameterToAwg(awgToDiameter(n))).toBeCloseTo(n, 11);
      }),
      { seed: 11, numRuns: 1000 },
    );
  });

  it("a larger gauge number is always a thinner wire", () => {
    fc.assert(
      fc.property(fc.double({ min: -3, max: 55, noNaN: true }), fc.double({ min: 1e-3, max: 1, noNaN: true }), (n, dn) => {
        expect(awgToDiameter(n + dn)).toBeLessThan(awgToDiameter(n));
      }),
      { seed: 5, numRuns: 500 },
    );
  });
});
