import { describe, it } from "vitest";
import fc from "fast-check";
import { ellipticK, ellipticE } from "../../src/special/index.js";

const mInUnit = fc.double({ min: -1e6, max: 1, noNaN: true, noDefaultInfinity: true, maxExcluded: true });

describe("elliptic integral invariants", () => {
  it("Legendre's relation E K' + E' K − K K' = π/2 holds for 0 < m < 1 (A&S 17.3.13)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1 - 1e-6, noNaN: true, noDefaultInfinity: true }), (m) => {
        const k = ellipticK(m);
        const e = ellipticE(m);
        const kc = ellipticK(1 - m);
        const ec = ellipticE(1 - m);
        return Math.abs(e * kc + ec * k - k * kc - Math.PI / 2) < 2e-14 * k * kc;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("K increases and E decreases with m (to within 1 ulp of rounding), with E ≤ π/2 ≤ K on m ≥ 0", () => {
    fc.assert(
      fc.property(mInUnit, mInUnit, (a, b) => {
        const lo = Math.min(a, b);
        const hi = Math.max(a, b);
        const slack = 1 + 4.5e-16;
        const ordered = ellipticK(lo) <= ellipticK(hi) * slack && ellipticE(lo) * slack >= ellipticE(hi);
        const bounds = hi < 0 || (ellipticE(hi) <= Math.PI / 2 + 1e-15 && ellipticK(hi) >= Math.PI / 2 - 1e-15);
        return ordered && bounds;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("are finite and positive for every m < 1", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e300, max: 1, noNaN: true, noDefaultInfinity: true, maxExcluded: true }), (m) => {
        const k = ellipticK(m);
        const e = ellipticE(m);
        return Number.isFinite(k) && k > 0 && Number.isFinite(e) && e > 0;
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
