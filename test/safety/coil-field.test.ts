import { describe, it, expect } from "vitest";
import ellipk from "@stdlib/math-base-special-ellipk";
import ellipe from "@stdlib/math-base-special-ellipe";
import { fieldOnAxis, fieldNearCoil, InputError, MU_0 } from "../../src/index.js";
import fixture from "../fixtures/safety/loop-field.json" with { type: "json" };

const close = (actual: number, expected: number, rtol: number, atol = 0): void => {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected) + atol);
};

describe("fieldOnAxis: Biot–Savart on the axis", () => {
  it("a single loop at its centre gives μ0 I/(2a) (Jackson, Classical Electrodynamics 3rd ed., §5.5)", () => {
    close(fieldOnAxis({ coil: [{ radius: 0.05 }], current: 10, axialPosition: 0 }), (MU_0 * 10) / (2 * 0.05), 1e-15);
  });

  it("the deprecated positional form (kept until 1.0) gives the same numbers and the same errors", () => {
    const coil = { kind: "solenoid", radius: 0.04, length: 0.08, turns: 10 } as const;
    for (const z of [-0.1, 0, 0.03]) {
      // eslint-disable-next-line @typescript-eslint/no-deprecated -- the positional form itself is under test
      expect(fieldOnAxis(coil, 3, z)).toBe(fieldOnAxis({ coil, current: 3, axialPosition: z }));
    }
    // eslint-disable-next-line @typescript-eslint/no-deprecated -- the positional form itself is under test
    expect(() => fieldOnAxis(coil, 3, Number.NaN)).toThrow(/fieldOnAxis: distance must be/);
  });

  it("the options form refuses unknown keys, a coil without current, and names axialPosition", () => {
    expect(() => fieldOnAxis({ coil: [{ radius: 0.05 }], current: 1, axialPosition: 0, distance: 0 } as never)).toThrow(/options\.distance/);
    expect(() => fieldOnAxis([{ radius: 0.05 }] as never)).toThrow(InputError);
    expect(() => fieldOnAxis({ kind: "solenoid", radius: 0.04, length: 0.08, turns: 10 } as never)).toThrow(/a coil alone has no current/);
    expect(() => fieldOnAxis({ coil: [{ radius: 0.05 }], current: 1, axialPosition: Number.NaN })).toThrow(/axialPosition must be/);
  });

  it("a single loop at distance z gives μ0 I a²/(2 (a² + z²)^{3/2}) (Jackson §5.5)", () => {
    for (const z of [-0.2, 0.01, 0.05, 1, 30]) {
      close(fieldOnAxis({ coil: [{ radius: 0.05, position: 0.02, turns: 3 }], current: 7, axialPosition: z }), (3 * MU_0 * 7 * 0.0025) / (2 * (0.0025 + (z - 0.02) ** 2) ** 1.5), 1e-14);
    }
  });

  it("a many-turn solenoid approaches the current-sheet closed form (μ0 N I /(2ℓ)) [cos θ1 − cos θ2] (Jackson §5.5, problem 5.3)", () => {
    const radius = 0.03;
    const length = 0.1;
    const turns = 4000;
    const sheet = (z: number): number =>
      ((MU_0 * turns * 1) / (2 * length)) *
      ((z + length / 2) / Math.hypot(z + length / 2, radius) - (z - length / 2) / Math.hypot(z - length / 2, radius));
    for (const z of [0, 0.03, 0.05, 0.08, 0.3]) close(fieldOnAxis({ coil: { kind: "solenoid", radius, length, turns }, current: 1, axialPosition: z }), sheet(z), 1e-6);
  });

  it("a many-turn flat spiral approaches the continuous-winding closed form", () => {
    // B(z) = μ0 N I /(2(b − a)) [ln((b + √(b² + z²))/(a + √(a² + z²))) − b/√(b² + z²) + a/√(a² + z²)]
    // (integral of the loop formula over a uniform turn density, calculus).
    const a = 0.01;
    const b = 0.06;
    const turns = 3000;
    const continuous = (z: number): number =>
      ((MU_0 * turns) / (2 * (b - a))) *
      (Math.log((b + Math.hypot(b, z)) / (a + Math.hypot(a, z))) - b / Math.hypot(b, z) + a / Math.hypot(a, z));
    for (const z of [0, 0.005, 0.02, 0.1]) close(fieldOnAxis({ coil: { kind: "spiral", innerRadius: a, outerRadius: b, turns }, current: 1, axialPosition: z }), continuous(z), 1e-6);
    // At the centre: μ0 N I ln(b/a) / (2(b − a)).
    close(continuous(0), (MU_0 * turns * Math.log(b / a)) / (2 * (b - a)), 1e-14);
  });

  it("far away it falls as the dipole field μ0 m /(2π z³), m = N I π a² (Jackson eq. 5.56)", () => {
    const z = 50;
    close(fieldOnAxis({ coil: [{ radius: 0.05, turns: 10 }], current: 2, axialPosition: z }), (MU_0 * 10 * 2 * Math.PI * 0.0025) / (2 * Math.PI * z ** 3), 1e-5);
  });
});

describe("fieldNearCoil: exact loop field off the axis", () => {
  it("matches the mpmath fixture (closed form, cross-checked by numerical Biot–Savart; generate_loop_field.py) within 1e-13", () => {
    const { radius, current } = fixture.loop;
    for (const p of fixture.points) {
      const b = fieldNearCoil([{ radius }], current, { radialDistance: p.radialDistance, axialPosition: p.axialPosition });
      const scale = Math.hypot(p.radial, p.axial);
      close(b.axial, p.axial, fixture.meta.rtol, 1e-13 * scale);
      close(b.radial, p.radial, fixture.meta.rtol, 1e-13 * scale);
    }
  });

  it("agrees with the same closed form evaluated with @stdlib ellipk/ellipe (general-purpose library) within 1e-12", () => {
    const a = 0.04;
    for (const [rho, z] of [[0.02, 0.01], [0.1, -0.05], [0.045, 0.002], [0.2, 0.3]] as const) {
      const alpha2 = (a - rho) ** 2 + z ** 2;
      const beta2 = (a + rho) ** 2 + z ** 2;
      const m = 1 - alpha2 / beta2;
      const c = (MU_0 * 5) / (2 * Math.PI * alpha2 * Math.sqrt(beta2));
      const bz = c * ((a * a - rho * rho - z * z) * ellipe(m) + alpha2 * ellipk(m));
      const br = ((c * z) / rho) * ((a * a + rho * rho + z * z) * ellipe(m) - alpha2 * ellipk(m));
      const b = fieldNearCoil([{ radius: a }], 5, { radialDistance: rho, axialPosition: z });
      close(b.axial, bz, 1e-12);
      close(b.radial, br, 1e-12);
    }
  });

  it("on the axis it equals fieldOnAxis exactly, and is continuous just off it", () => {
    const coil = { kind: "solenoid" as const, radius: 0.04, length: 0.08, turns: 10 };
    for (const z of [0, 0.03, -0.1]) {
      const onAxis = fieldOnAxis({ coil, current: 20, axialPosition: z });
      expect(fieldNearCoil(coil, 20, { radialDistance: 0, axialPosition: z }).axial).toBeCloseTo(onAxis, 15);
      close(fieldNearCoil(coil, 20, { radialDistance: 1e-7, axialPosition: z }).axial, onAxis, 1e-9);
      close(fieldNearCoil(coil, 20, { radialDistance: 1e-4, axialPosition: z }).axial, onAxis, 1e-4);
    }
  });

  it("in the loop's plane far away it is the dipole field −μ0 m /(4π ρ³) (Jackson eq. 5.56)", () => {
    const rho = 20;
    const b = fieldNearCoil([{ radius: 0.05 }], 1, { radialDistance: rho, axialPosition: 0 });
    close(b.axial, -(MU_0 * Math.PI * 0.0025) / (4 * Math.PI * rho ** 3), 1e-5);
    expect(Math.abs(b.radial)).toBeLessThan(1e-25);
  });

  it("stays finite 1e-6 radii from the wire", () => {
    const b = fieldNearCoil([{ radius: 0.05 }], 1, { radialDistance: 0.05 + 5e-8, axialPosition: 0 });
    expect(Number.isFinite(b.magnitude)).toBe(true);
    // Close to a straight wire: μ0 I /(2π d).
    close(b.magnitude, MU_0 / (2 * Math.PI * 5e-8), 1e-5);
  });
});

describe("field functions: bad input throws InputError", () => {
  it.each([
    ["empty loop array", () => fieldOnAxis({ coil: [], current: 1, axialPosition: 0 })],
    ["negative loop radius", () => fieldOnAxis({ coil: [{ radius: -1 }], current: 1, axialPosition: 0 })],
    ["non-integer turns", () => fieldOnAxis({ coil: [{ radius: 1, turns: 1.5 }], current: 1, axialPosition: 0 })],
    ["unknown kind", () => fieldOnAxis({ coil: { kind: "toroid" }, current: 1, axialPosition: 0 } as never)],
    ["solenoid with zero length", () => fieldOnAxis({ coil: { kind: "solenoid", radius: 0.1, length: 0, turns: 3 }, current: 1, axialPosition: 0 })],
    ["spiral with outer ≤ inner", () => fieldOnAxis({ coil: { kind: "spiral", innerRadius: 0.05, outerRadius: 0.05, turns: 3 }, current: 1, axialPosition: 0 })],
    ["non-finite current", () => fieldOnAxis({ coil: [{ radius: 1 }], current: Number.NaN, axialPosition: 0 })],
    ["non-finite distance", () => fieldOnAxis({ coil: [{ radius: 1 }], current: 1, axialPosition: Infinity })],
    ["negative radial distance", () => fieldNearCoil([{ radius: 1 }], 1, { radialDistance: -1, axialPosition: 0 })],
    ["a point on the wire", () => fieldNearCoil([{ radius: 1 }], 1, { radialDistance: 1, axialPosition: 0 })],
  ])("%s", (_name, call) => {
    expect(call).toThrow(InputError);
  });
});
