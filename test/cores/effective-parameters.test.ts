import { describe, expect, it } from "vitest";
import { effectiveCoreParameters, InputError } from "../../src/index.js";

describe("effectiveCoreParameters", () => {
  it("sums two sections as IEC 60205 defines C1 and C2 (hand computation)", () => {
    // Hand computation: C1 = 0.04/1e-4 + 0.02/2e-4 = 500 m⁻¹; C2 = 0.04/1e-8 + 0.02/4e-8 = 4.5e6 m⁻³;
    // A_e = C1/C2 = 1.1111e-4 m², l_e = C1²/C2 = 0.055556 m, V_e = C1³/C2² = 6.1728e-6 m³.
    const p = effectiveCoreParameters({ sections: [{ length: 0.04, area: 1e-4 }, { length: 0.02, area: 2e-4 }] });
    expect(p.c1).toBeCloseTo(500, 10);
    expect(p.c2 / 4.5e6 - 1).toBeLessThan(1e-15);
    expect(p.effectiveArea / (1 / 9000) - 1).toBeLessThan(1e-14);
    expect(Math.abs(p.effectivePathLength / (1 / 18) - 1)).toBeLessThan(1e-14);
    expect(Math.abs(p.effectiveVolume / (500 ** 3 / 4.5e6 ** 2) - 1)).toBeLessThan(1e-14);
  });

  it("gives back a uniform core's own length and area (IEC 60205 definitions)", () => {
    const p = effectiveCoreParameters({ sections: [{ length: 0.1, area: 3e-5 }] });
    expect(p.effectiveArea).toBeCloseTo(3e-5, 18);
    expect(p.effectivePathLength).toBeCloseTo(0.1, 15);
  });

  it("rejects bad sections with InputError", () => {
    expect(() => effectiveCoreParameters({ sections: [] })).toThrow(InputError);
    expect(() => effectiveCoreParameters({ sections: [{ length: -1, area: 1 }] })).toThrow(/sections\[0\]\.length/);
    expect(() => effectiveCoreParameters({ sections: [{ length: 1, area: 0 }] })).toThrow(InputError);
    expect(() => effectiveCoreParameters({ sections: [{ length: 1, area: 1, width: 2 } as never] })).toThrow(/width/);
    expect(() => effectiveCoreParameters({ sections: "x" as never })).toThrow(InputError);
  });
});
