import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { workCoilImpedance } from "../../src/index.js";
import type { WorkCoilImpedanceOptions } from "../../src/index.js";

const lu = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true, noDefaultInfinity: true }).map(Math.exp);

/** Small random coils (2–3 turns, so each case solves in milliseconds) with a random part. */
const scenario = fc
  .record({
    turns: fc.integer({ min: 2, max: 3 }),
    radius: lu(0.01, 0.05),
    od: lu(0.05, 0.2), // conductor size over radius
    pitch: lu(1.2, 3), // pitch over conductor size
    wall: fc.double({ min: 0.15, max: 0.5, noNaN: true }),
    frequency: lu(100, 2e5),
    fill: fc.double({ min: 0.2, max: 0.85, noNaN: true }),
    rho: lu(2e-8, 1e-6),
    mur: fc.oneof(fc.constant(1), lu(1, 200)),
    pancake: fc.boolean(),
  })
  .map((s): WorkCoilImpedanceOptions => {
    const od = s.od * s.radius;
    const conductor = { kind: "tube" as const, outerDiameter: od, wallThickness: s.wall * od };
    if (s.pancake) {
      return {
        coil: { shape: "pancake", innerRadius: s.radius, pitch: s.pitch * od, turns: s.turns, conductor, resistivity: 1.75e-8 },
        frequency: s.frequency,
        part: { shape: "plate", radius: 0.3, thickness: 0.2 * s.radius, gap: 0.2 * s.radius * s.fill, resistivity: s.rho, relativePermeability: s.mur },
      };
    }
    return {
      coil: { shape: "solenoid", radius: s.radius, length: s.turns * s.pitch * od, turns: s.turns, conductor, resistivity: 1.75e-8 },
      frequency: s.frequency,
      part: { shape: "bar", radius: s.fill * (s.radius - od / 2), length: 1, resistivity: s.rho, relativePermeability: s.mur },
    };
  });

describe("workCoilImpedance properties", () => {
  it("R ≥ R_dc, reflected resistance ≥ 0, copper and part losses ≥ 0; L and ΔL finite", () => {
    fc.assert(
      fc.property(scenario, (options) => {
        const r = workCoilImpedance(options);
        expect(r.emptyResistance).toBeGreaterThanOrEqual(r.dcResistance * (1 - 1e-12));
        expect(r.reflectedResistance).toBeGreaterThanOrEqual(0);
        expect(r.partResistance).toBeGreaterThanOrEqual(0);
        expect(r.copperResistance).toBeGreaterThanOrEqual(r.dcResistance * (1 - 1e-12));
        expect(r.inductance).toBeGreaterThan(0);
        expect(Number.isFinite(r.inductanceChange)).toBe(true);
      }),
      { seed: 14, numRuns: 12 },
    );
  });

  it("a non-magnetic part lowers the inductance", () => {
    fc.assert(
      fc.property(scenario, (options) => {
        const part = { ...options.part!, relativePermeability: 1 };
        const r = workCoilImpedance({ ...options, part });
        expect(r.inductanceChange).toBeLessThan(0);
      }),
      { seed: 15, numRuns: 8 },
    );
  });

  it("scales exactly: all lengths × k and frequency / k² give R / k and L × k (1e-9)", () => {
    fc.assert(
      fc.property(scenario, lu(0.1, 10), (options, k) => {
        const a = workCoilImpedance(options);
        const scale = (o: Record<string, unknown>, keys: readonly string[]): Record<string, unknown> => {
          const out: Record<string, unknown> = { ...o };
          for (const key of keys) if (typeof out[key] === "number") out[key] = (out[key]) * k;
          return out;
        };
        const lengths = ["radius", "length", "innerRadius", "pitch", "outerDiameter", "wallThickness", "thickness", "gap"];
        const coil = scale(options.coil as unknown as Record<string, unknown>, lengths);
        coil["conductor"] = scale(options.coil.conductor, lengths);
        const part = scale(options.part as unknown as Record<string, unknown>, lengths);
        const b = workCoilImpedance({ coil, part, frequency: options.frequency / (k * k) } as never);
        expect(Math.abs((b.resistance * k) / a.resistance - 1)).toBeLessThan(1e-9);
        expect(Math.abs(b.inductance / (k * a.inductance) - 1)).toBeLessThan(1e-9);
      }),
      { seed: 16, numRuns: 6 },
    );
  });
});
