import { describe, it, expect } from "vitest";
import { litzWindingAcRatio, optimalLitzStrandCount, InputError } from "../../src/index.js";
import { MU_0 } from "../../src/units/index.js";

const rho = 1.7241e-8;

describe("litzWindingAcRatio", () => {
  it("equals Sullivan's closed form 1 + π²ω²μ0²N²n²d⁶k/(768ρ²b²)", () => {
    // Sullivan 1999, §II (formula from memory; checked here in its δ form, 1 + π²N²n²d⁶/(192 δ⁴ b²))
    const o = { strands: 60, strandDiameter: 0.08e-3, turns: 30, windowBreadth: 15e-3, frequency: 150e3, resistivity: rho };
    const delta = Math.sqrt(rho / (Math.PI * o.frequency * MU_0));
    const expected = 1 + (Math.PI ** 2 * 30 ** 2 * 60 ** 2 * o.strandDiameter ** 6) / (192 * delta ** 4 * o.windowBreadth ** 2);
    expect(Math.abs(litzWindingAcRatio(o) / expected - 1)).toBeLessThan(1e-14);
    expect(Math.abs(litzWindingAcRatio({ ...o, fieldFactor: 2.5 }) - 1 - 2.5 * (expected - 1))).toBeLessThan(1e-14);
  });
  it("throws InputError on bad input", () => {
    const ok = { strands: 10, strandDiameter: 1e-4, turns: 5, windowBreadth: 1e-2, frequency: 1e5, resistivity: rho };
    expect(() => litzWindingAcRatio({ ...ok, strands: 0 })).toThrow(/strands/);
    expect(() => litzWindingAcRatio({ ...ok, turns: 2.2 })).toThrow(InputError);
    expect(() => litzWindingAcRatio({ ...ok, windowBreadth: 0 })).toThrow(/windowBreadth/);
    expect(() => litzWindingAcRatio({ ...ok, fieldFactor: -1 })).toThrow(/fieldFactor/);
  });
});

describe("optimalLitzStrandCount", () => {
  it("minimises Rdc·Fr over the integers (exhaustive search) and sits where Fr ≈ 2", () => {
    const o = { strandDiameter: 0.1e-3, turns: 20, windowBreadth: 20e-3, frequency: 100e3, resistivity: rho };
    const n = optimalLitzStrandCount(o);
    const loss = (k: number) => litzWindingAcRatio({ ...o, strands: k }) / k;
    let best = 1;
    for (let k = 1; k < 2000; k++) if (loss(k) < loss(best)) best = k;
    expect(n).toBe(best);
    expect(n).toBe(193);
    expect(litzWindingAcRatio({ ...o, strands: n })).toBeCloseTo(2, 1);
  });
  it("is capped by maxStrands", () => {
    const o = { strandDiameter: 0.1e-3, turns: 20, windowBreadth: 20e-3, frequency: 100e3, resistivity: rho };
    expect(optimalLitzStrandCount({ ...o, maxStrands: 50 })).toBe(50);
  });
  it("throws InputError on bad input", () => {
    const ok = { strandDiameter: 1e-4, turns: 5, windowBreadth: 1e-2, frequency: 1e5, resistivity: rho };
    expect(() => optimalLitzStrandCount({ ...ok, maxStrands: 0 })).toThrow(/maxStrands/);
    expect(() => optimalLitzStrandCount({ ...ok, strandDiameter: 0 })).toThrow(InputError);
  });
});
