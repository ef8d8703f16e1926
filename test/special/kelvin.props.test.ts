import { describe, it } from "vitest";
import fc from "fast-check";
import { kelvinFunctions, kelvinFunctionsScaled } from "../../src/special/index.js";

const logX = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true, noDefaultInfinity: true }).map(Math.exp);

describe("Kelvin function invariants", () => {
  it("satisfy the Wronskian (ber + i·bei)(ker′ + i·kei′) − (ker + i·kei)(ber′ + i·bei′) = −1/x (DLMF 10.28.2 at z = x·e^{iπ/4})", () => {
    fc.assert(
      fc.property(logX(1e-3, 600), (x) => {
        const k = kelvinFunctionsScaled(x); // the scale factors cancel in these products
        const re = k.ber * k.kerPrime - k.bei * k.keiPrime - (k.ker * k.berPrime - k.kei * k.beiPrime);
        const im = k.ber * k.keiPrime + k.bei * k.kerPrime - (k.ker * k.beiPrime + k.kei * k.berPrime);
        const scale = Math.hypot(k.ber, k.bei) * Math.hypot(k.kerPrime, k.keiPrime) + Math.hypot(k.ker, k.kei) * Math.hypot(k.berPrime, k.beiPrime);
        return Math.abs(re + 1 / x) <= 1e-14 * scale && Math.abs(im) <= 1e-14 * scale;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("scaled and plain forms differ exactly by e^{±x/√2} below overflow", () => {
    fc.assert(
      fc.property(logX(1e-2, 700), (x) => {
        const p = kelvinFunctions(x);
        const s = kelvinFunctionsScaled(x);
        const e = Math.exp(x / Math.SQRT2);
        const okI = Math.abs(p.ber / e - s.ber) <= 1e-13 * Math.hypot(s.ber, s.bei);
        const okK = Math.abs(p.kei * e - s.kei) <= 1e-13 * Math.hypot(s.ker, s.kei);
        return okI && okK;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("ber′ and ker′ agree with a central difference of ber and ker", () => {
    fc.assert(
      fc.property(logX(0.05, 60), (x) => {
        const h = 1e-5 * x;
        const d = (kelvinFunctions(x + h).ber - kelvinFunctions(x - h).ber) / (2 * h);
        const dk = (kelvinFunctions(x + h).ker - kelvinFunctions(x - h).ker) / (2 * h);
        const k = kelvinFunctions(x);
        return (
          Math.abs(d - k.berPrime) <= 1e-7 * Math.hypot(k.berPrime, k.beiPrime) &&
          Math.abs(dk - k.kerPrime) <= 1e-7 * Math.hypot(k.kerPrime, k.keiPrime)
        );
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("|ber + i·bei| grows and |ker + i·kei| decays monotonically with x", () => {
    fc.assert(
      fc.property(logX(1e-3, 900), logX(1e-3, 900), (a, b) => {
        const lo = Math.min(a, b);
        const hi = Math.max(a, b);
        const p = kelvinFunctions(lo);
        const q = kelvinFunctions(hi);
        const slack = 1 + 1e-14;
        return Math.hypot(p.ber, p.bei) <= Math.hypot(q.ber, q.bei) * slack && Math.hypot(q.ker, q.kei) <= Math.hypot(p.ker, p.kei) * slack;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("scaled forms are never NaN for 1e-300 ≤ x ≤ 1e300, and finite for x ≥ 1e-150", () => {
    fc.assert(
      fc.property(logX(1e-300, 1e300), (x) => {
        const values = Object.values(kelvinFunctionsScaled(x));
        return values.every((v) => !Number.isNaN(v)) && (x < 1e-150 || values.every(Number.isFinite));
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
