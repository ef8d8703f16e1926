import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError, workpieceGeometry } from "../../src/index.js";

describe("workpieceGeometry", () => {
  it("gives the elementary volumes and areas (hand calculation)", () => {
    // bar r 10 mm × 100 mm: V = π·1e-4·0.1 = 3.14159e-5 m³, A = 2π·0.01·0.11 = 6.91150e-3 m²
    const bar = workpieceGeometry({ shape: "bar", radius: 0.01, length: 0.1 });
    expect(bar.volume).toBeCloseTo(3.141592653589793e-5, 18);
    expect(bar.surfaceArea).toBeCloseTo(6.911503837897545e-3, 15);
    // ring 124/100 mm × 30 mm: V = π(0.062² − 0.05²)·0.03 = π·4.032e-5 = 1.266690e-4 m³
    expect(workpieceGeometry({ shape: "tube", outerRadius: 0.062, innerRadius: 0.05, length: 0.03 }).volume).toBeCloseTo(1.2666902e-4, 10);
    const plate = workpieceGeometry({ shape: "plate", length: 0.2, width: 0.1, thickness: 0.01 });
    expect(plate.volume).toBeCloseTo(2e-4, 15);
    expect(plate.surfaceArea).toBeCloseTo(2 * (0.02 + 0.002 + 0.001), 15);
  });
  it("a tube without a bore is the bar", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1, noNaN: true }), fc.double({ min: 1e-3, max: 1, noNaN: true }), (r, l) => {
        const a = workpieceGeometry({ shape: "bar", radius: r, length: l });
        const b = workpieceGeometry({ shape: "tube", outerRadius: r, innerRadius: 0, length: l });
        return Math.abs(a.volume - b.volume) <= 1e-15 * a.volume && Math.abs(a.surfaceArea - b.surfaceArea) <= 1e-14 * a.surfaceArea;
      }),
      { seed: 5, numRuns: 50 },
    );
  });
  it("rejects bad shapes, sizes and unknown keys", () => {
    expect(() => workpieceGeometry({ shape: "cone" } as never)).toThrow(InputError);
    expect(() => workpieceGeometry({ shape: "tube", outerRadius: 0.01, innerRadius: 0.02, length: 1 })).toThrow(/innerRadius/);
    expect(() => workpieceGeometry({ shape: "bar", radius: 0.01, length: 1, lenght: 2 } as never)).toThrow(/unknown field/);
  });
});
