import { describe, it, expect } from "vitest";
import { InputError, MU_0 } from "../../src/index.js";
import { coaxialCoilMutualInductance, loopMutualInductance, type CoilGeometry } from "../../src/inductance/index.js";
import { fieldNearCoil, fieldOnAxis } from "../../src/safety/index.js";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

/** Spirals of several turn counts, one turn included, as plain numbers. */
const SPIRALS = [
  { innerRadius: 0.01, outerRadius: 0.04, turns: 12 },
  { innerRadius: 0.023, outerRadius: 0.0617, turns: 7 },
  { innerRadius: 0.005, outerRadius: 0.3, turns: 40 },
  { innerRadius: 0.02, outerRadius: 0.021, turns: 2 },
] as const;

const PARTNERS: readonly CoilGeometry[] = [
  { kind: "loop", radius: 0.03, turns: 2 },
  { kind: "solenoid", radius: 0.02, length: 0.01, turns: 8 },
  { kind: "multilayer", innerRadius: 0.02, outerRadius: 0.03, length: 0.02, turns: 50 },
  { kind: "flatSpiral", innerEdgeRadius: 0, outerEdgeRadius: 0.05, turns: 5 },
];

describe("one coil-geometry family: the former spiral descriptions convert exactly", () => {
  it("coaxialCoilMutualInductance: { kind: 'spiral' } (turn centres) and flatSpiral by turn centres give bit-identical results", () => {
    let compared = 0;
    for (const s of SPIRALS) {
      const former = { kind: "spiral", ...s } as const;
      const current = { kind: "flatSpiral", innerTurnRadius: s.innerRadius, outerTurnRadius: s.outerRadius, turns: s.turns } as const;
      for (const partner of PARTNERS) {
        for (const d of [0.004, 0.015, 0.2]) {
          expect(coaxialCoilMutualInductance(current, partner, d)).toBe(coaxialCoilMutualInductance(former, partner, d));
          expect(coaxialCoilMutualInductance(partner, current, d)).toBe(coaxialCoilMutualInductance(partner, former, d));
          compared += 2;
        }
      }
    }
    const one = { kind: "spiral", innerRadius: 0.02, outerRadius: 0.02, turns: 1 } as const;
    const oneNew = { kind: "flatSpiral", innerTurnRadius: 0.02, outerTurnRadius: 0.02, turns: 1 } as const;
    expect(coaxialCoilMutualInductance(oneNew, PARTNERS[1]!, 0.01)).toBe(coaxialCoilMutualInductance(one, PARTNERS[1]!, 0.01));
    expect(compared).toBe(SPIRALS.length * PARTNERS.length * 6);
  });

  it("fieldOnAxis and fieldNearCoil: { kind: 'spiral' } (winding edges) and flatSpiral by edges give bit-identical results", () => {
    let compared = 0;
    for (const s of SPIRALS) {
      for (const position of [undefined, -0.013, 0.02]) {
        const p = position === undefined ? {} : { position };
        const former = { kind: "spiral", ...s, ...p } as const;
        const current = { kind: "flatSpiral", innerEdgeRadius: s.innerRadius, outerEdgeRadius: s.outerRadius, turns: s.turns, ...p } as const;
        for (const z of [-0.05, 0, 0.003, 0.4]) {
          expect(fieldOnAxis({ coil: current, current: 7, axialPosition: z })).toBe(fieldOnAxis({ coil: former, current: 7, axialPosition: z }));
          for (const rho of [0, 0.015, 0.6]) {
            const point = { radialDistance: rho, axialPosition: z + 0.001 };
            expect(fieldNearCoil(current, 7, point)).toEqual(fieldNearCoil(former, 7, point));
            compared++;
          }
        }
      }
    }
    expect(compared).toBe(SPIRALS.length * 3 * 4 * 3);
  });

  it("the field functions' loop description is the one-element loop array, bit for bit", () => {
    const described = { kind: "loop", radius: 0.05, turns: 3, position: 0.01 } as const;
    const listed = [{ radius: 0.05, turns: 3, position: 0.01 }];
    for (const z of [-0.2, 0, 0.01, 0.07]) {
      expect(fieldOnAxis({ coil: described, current: 2, axialPosition: z })).toBe(fieldOnAxis({ coil: listed, current: 2, axialPosition: z }));
      expect(fieldNearCoil(described, 2, { radialDistance: 0.02, axialPosition: z })).toEqual(fieldNearCoil(listed, 2, { radialDistance: 0.02, axialPosition: z }));
    }
  });
});

describe("one coil-geometry family: both modules read a description the same way", () => {
  it("a spiral by edges has its filaments half a pitch inside each edge, in the inductance functions too", () => {
    // turn radii r_i = r_in + (i + 1/2)(r_out − r_in)/N, written out here; the mutual inductance
    // with a loop is then the sum of Maxwell's loop–loop formula over the turns
    const inner = 0.01;
    const outer = 0.05;
    const turns = 8;
    const loopRadius = 0.035;
    let sum = 0;
    for (let i = 0; i < turns; i++) {
      const r = inner + ((i + 0.5) * (outer - inner)) / turns;
      sum += loopMutualInductance({ radius1: r, radius2: loopRadius, axialDistance: 0.006 });
    }
    const m = coaxialCoilMutualInductance(
      { kind: "flatSpiral", innerEdgeRadius: inner, outerEdgeRadius: outer, turns },
      { kind: "loop", radius: loopRadius },
      0.006,
    );
    expect(rel(m, sum)).toBeLessThan(1e-13);
  });

  it("the same spiral by edges and by turn centres agrees in both modules (to rounding)", () => {
    const inner = 0.01;
    const outer = 0.05;
    const turns = 8;
    const pitch = (outer - inner) / turns;
    const byEdges = { kind: "flatSpiral", innerEdgeRadius: inner, outerEdgeRadius: outer, turns } as const;
    const byCentres = { kind: "flatSpiral", innerTurnRadius: inner + pitch / 2, outerTurnRadius: outer - pitch / 2, turns } as const;
    const partner = { kind: "solenoid", radius: 0.03, length: 0.02, turns: 6 } as const;
    expect(rel(coaxialCoilMutualInductance(byEdges, partner, 0.02), coaxialCoilMutualInductance(byCentres, partner, 0.02))).toBeLessThan(1e-13);
    expect(rel(fieldOnAxis({ coil: byEdges, current: 1, axialPosition: 0.01 }), fieldOnAxis({ coil: byCentres, current: 1, axialPosition: 0.01 }))).toBeLessThan(1e-14);
    // half a pitch matters: the two readings of one pair of numbers differ by far more than rounding
    const edgesNumbers = { kind: "flatSpiral", innerTurnRadius: inner, outerTurnRadius: outer, turns } as const;
    expect(rel(fieldOnAxis({ coil: byEdges, current: 1, axialPosition: 0 }), fieldOnAxis({ coil: edgesNumbers, current: 1, axialPosition: 0 }))).toBeGreaterThan(1e-3);
  });

  it("the field on the axis of a one-turn flat spiral by centres is the loop's μ0 I/(2a) at its centre (Jackson §5.5)", () => {
    const b = fieldOnAxis({ coil: { kind: "flatSpiral", innerTurnRadius: 0.04, outerTurnRadius: 0.04, turns: 1 }, current: 5, axialPosition: 0 });
    expect(rel(b, (MU_0 * 5) / (2 * 0.04))).toBeLessThan(1e-15);
  });

  it("positions place the coils: only the centre distance matters, and without positions axialDistance is it exactly", () => {
    const a = { kind: "solenoid", radius: 0.02, length: 0.03, turns: 10 } as const;
    const b = { kind: "flatSpiral", innerTurnRadius: 0.01, outerTurnRadius: 0.04, turns: 6 } as const;
    const reference = coaxialCoilMutualInductance(a, b, 0.025);
    expect(coaxialCoilMutualInductance({ ...a, position: 0 }, { ...b, position: 0 }, 0.025)).toBe(reference);
    expect(coaxialCoilMutualInductance(a, { ...b, position: 0.025 }, 0)).toBe(reference);
    // coilB below coilA by the same distance: mirror symmetry about the mid-plane
    expect(coaxialCoilMutualInductance({ ...a, position: 0.025 }, b, 0)).toBe(reference);
    expect(rel(coaxialCoilMutualInductance({ ...a, position: 0.1 }, { ...b, position: 0.115 }, 0.01), reference)).toBeLessThan(1e-12);
  });
});

describe("one coil-geometry family: ambiguous or unsupported descriptions throw InputError", () => {
  const cases: readonly [string, unknown][] = [
    ["mixed turn-centre and edge radii", { kind: "flatSpiral", innerTurnRadius: 0.01, outerEdgeRadius: 0.04, turns: 5 }],
    ["both pairs", { kind: "flatSpiral", innerTurnRadius: 0.01, outerTurnRadius: 0.04, innerEdgeRadius: 0.009, outerEdgeRadius: 0.041, turns: 5 }],
    ["bare innerRadius on a flatSpiral", { kind: "flatSpiral", innerRadius: 0.01, outerRadius: 0.04, turns: 5 }],
    ["bare outerRadius beside turn centres", { kind: "flatSpiral", innerTurnRadius: 0.01, outerRadius: 0.04, turns: 5 }],
    ["no radii", { kind: "flatSpiral", turns: 5 }],
    ["half a pair", { kind: "flatSpiral", innerEdgeRadius: 0.01, turns: 5 }],
    ["fractional spiral turns", { kind: "flatSpiral", innerEdgeRadius: 0.01, outerEdgeRadius: 0.04, turns: 4.5 }],
    ["an unknown kind", { kind: "pancake", innerRadius: 0.01, outerRadius: 0.04, turns: 5 }],
  ];
  for (const [what, coil] of cases) {
    it(`${what}: both modules refuse it`, () => {
      expect(() => coaxialCoilMutualInductance(coil as CoilGeometry, { kind: "loop", radius: 0.1 }, 0.01)).toThrow(InputError);
      expect(() => fieldOnAxis({ coil: coil as CoilGeometry & { kind: "flatSpiral" }, current: 1, axialPosition: 0 })).toThrow(InputError);
    });
  }

  it("the messages name the field and say which radius each name means", () => {
    expect(() => fieldOnAxis({ coil: { kind: "flatSpiral", innerRadius: 0.01, outerRadius: 0.04, turns: 5 } as unknown as CoilGeometry & { kind: "flatSpiral" }, current: 1, axialPosition: 0 }))
      .toThrow(/coil\.innerRadius must be absent: a flatSpiral says which radius it means, innerTurnRadius and outerTurnRadius \(turn centres\) or innerEdgeRadius and outerEdgeRadius \(winding edges\)/);
    expect(() => coaxialCoilMutualInductance({ kind: "flatSpiral", innerTurnRadius: 0.01, outerTurnRadius: 0.04, outerEdgeRadius: 0.045, turns: 5 } as unknown as CoilGeometry, { kind: "loop", radius: 0.1 }, 0.01))
      .toThrow(/coilA\.outerEdgeRadius must be absent when turn-centre radii are given/);
  });

  it("the field functions refuse a multilayer winding (uniform current density has no filament loops)", () => {
    const multilayer = { kind: "multilayer", innerRadius: 0.02, outerRadius: 0.03, length: 0.02, turns: 50 };
    expect(() => fieldNearCoil(multilayer as unknown as CoilGeometry & { kind: "loop" }, 1, { radialDistance: 0.1, axialPosition: 0 })).toThrow(/give its loops as an array/);
  });

  it("the field functions keep their limit on the number of loops for the new descriptions", () => {
    expect(() => fieldOnAxis({ coil: { kind: "flatSpiral", innerEdgeRadius: 0, outerEdgeRadius: 1, turns: 100_001 }, current: 1, axialPosition: 0 })).toThrow(InputError);
    expect(() => fieldOnAxis({ coil: { kind: "solenoid", radius: 0.1, length: 0.1, turns: 2.5 }, current: 1, axialPosition: 0 })).toThrow(/coil\.turns/);
  });
});
