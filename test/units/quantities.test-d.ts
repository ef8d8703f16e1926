import { expectTypeOf, test } from "vitest";
import { farads, henries, metres, type Henries, type Metres } from "../../src/units/index.js";

test("a length cannot stand where an inductance is expected", () => {
  const needsInductance = (l: Henries): Henries => l;
  expectTypeOf(needsInductance(henries(1e-6))).toEqualTypeOf<Henries>();
  // @ts-expect-error a Metres is not a Henries
  needsInductance(metres(0.01));
  // @ts-expect-error a Farads is not a Henries
  needsInductance(farads(1e-6));
  expectTypeOf(metres(1)).toEqualTypeOf<Metres>();
  expectTypeOf(metres(1)).toExtend<number>();
});
