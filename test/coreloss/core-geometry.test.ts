import { describe, expect, it } from "vitest";
import { InputError } from "../../src/index.js";
import { coreLossPower, rodCoreGeometry, toroidCoreGeometry } from "../../src/coreloss/index.js";

describe("core geometry", () => {
  it("toroidCoreGeometry follows the IEC 60205 ring-core constants C1 = Σl/A, C2 = Σl/A² (le = C1²/C2, Ae = C1/C2)", () => {
    const r1 = 0.01;
    const r2 = 0.02;
    const h = 0.01;
    // C1 and C2 by direct numerical integration over thin rings (midpoint rule, n = 200000)
    const n = 200000;
    let inv1 = 0;
    for (let i = 0; i < n; i++) {
      const r = r1 + ((i + 0.5) * (r2 - r1)) / n;
      // each thin ring: path 2πr, area h dr; rings in parallel => permeance adds
      inv1 += (h * ((r2 - r1) / n)) / (2 * Math.PI * r);
    }
    const c1 = 1 / inv1; // Σ l/A of the parallel rings
    const ln = Math.log(r2 / r1);
    expect(Math.abs(c1 - (2 * Math.PI) / (h * ln)) / c1).toBeLessThan(1e-9);
    const g = toroidCoreGeometry({ innerDiameter: 2 * r1, outerDiameter: 2 * r2, height: h });
    expect(g.effectivePathLength / g.effectiveArea).toBeCloseTo(c1, 6);
    expect(g.effectivePathLength).toBeCloseTo((2 * Math.PI * ln) / (1 / r1 - 1 / r2), 15);
    expect(g.effectiveVolume).toBeCloseTo(g.effectiveArea * g.effectivePathLength, 18);
  });

  it("a thin toroid tends to the mean-circumference path and the plain section", () => {
    const g = toroidCoreGeometry({ innerDiameter: 0.1, outerDiameter: 0.1001, height: 0.005 });
    expect(Math.abs(g.effectivePathLength - (Math.PI * 0.10005)) / g.effectivePathLength).toBeLessThan(1e-6);
    expect(Math.abs(g.effectiveArea - 0.005 * 0.00005) / g.effectiveArea).toBeLessThan(1e-6);
  });

  it("rodCoreGeometry is the cylinder's section, length and volume", () => {
    const g = rodCoreGeometry({ diameter: 0.01, length: 0.1 });
    expect(g.effectiveArea).toBeCloseTo((Math.PI * 1e-4) / 4, 18);
    expect(g.effectivePathLength).toBe(0.1);
  });

  it("coreLossPower multiplies density by volume", () => {
    expect(coreLossPower({ lossDensity: 200e3, effectiveVolume: 8e-6 })).toBeCloseTo(1.6, 14);
  });

  it("rejects bad input with InputError", () => {
    expect(() => toroidCoreGeometry({ innerDiameter: 0.02, outerDiameter: 0.02, height: 0.01 })).toThrow(/outerDiameter/);
    expect(() => toroidCoreGeometry({ innerDiameter: 0, outerDiameter: 0.02, height: 0.01 })).toThrow(InputError);
    expect(() => rodCoreGeometry({ diameter: 0.01, length: -1 })).toThrow(/length/);
    expect(() => coreLossPower({ lossDensity: -1, effectiveVolume: 1 })).toThrow(/lossDensity/);
  });
});
