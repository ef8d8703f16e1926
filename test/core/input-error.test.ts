import { describe, expect, it } from "vitest";
import {
  InputError,
  requireFinite,
  requireInRange,
  requireInteger,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
} from "../../src/core/index.js";

describe("InputError", () => {
  it("is a RangeError carrying parameter, value, unit and expected", () => {
    const e = new InputError("solenoidInductance", "radius", -0.01, "m", "a finite number > 0");
    expect(e).toBeInstanceOf(RangeError);
    expect(e).toBeInstanceOf(InputError);
    expect(e.name).toBe("InputError");
    expect(e.where).toBe("solenoidInductance");
    expect(e.parameter).toBe("radius");
    expect(e.value).toBe(-0.01);
    expect(e.unit).toBe("m");
    expect(e.expected).toBe("a finite number > 0");
  });

  it("follows the one message pattern of the design", () => {
    // The pattern is spelled out in the foundation issue: "solenoidInductance: radius must be a
    // finite number > 0 m, got -0.01".
    expect(requireThrows(() => requirePositive("solenoidInductance", "radius", -0.01, "m")).message).toBe(
      "solenoidInductance: radius must be a finite number > 0 m, got -0.01",
    );
  });

  it("omits the unit of a dimensionless parameter and quotes strings", () => {
    expect(new InputError("f", "mode", "x", "", "one of \"a\"").message).toBe('f: mode must be one of "a", got "x"');
  });

  it("describes objects, arrays, null and undefined without dumping them", () => {
    expect(new InputError("f", "p", { a: 1 }, "", "a number").message).toMatch(/got an object$/u);
    expect(new InputError("f", "p", [1, 2], "", "a number").message).toMatch(/got an array of length 2$/u);
    expect(new InputError("f", "p", null, "", "a number").message).toMatch(/got null$/u);
    expect(new InputError("f", "p", undefined, "", "a number").message).toMatch(/got undefined$/u);
  });
});

function requireThrows(fn: () => unknown): InputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error("expected an InputError");
}

describe("validation helpers", () => {
  it("requireFinite passes finite numbers and rejects NaN, ±Infinity and non-numbers", () => {
    expect(requireFinite("f", "x", -3.5, "m")).toBe(-3.5);
    for (const bad of [NaN, Infinity, -Infinity, "1", null, undefined, {}]) {
      expect(() => requireFinite("f", "x", bad, "m")).toThrow(InputError);
    }
  });

  it("requirePositive rejects zero, negatives and non-finite values", () => {
    expect(requirePositive("f", "x", 1e-300, "m")).toBe(1e-300);
    for (const bad of [0, -0, -1, NaN, Infinity, "2"]) expect(() => requirePositive("f", "x", bad, "m")).toThrow(InputError);
  });

  it("requireNonNegative accepts zero and rejects negatives", () => {
    expect(requireNonNegative("f", "x", 0, "m")).toBe(0);
    for (const bad of [-1e-300, NaN, Infinity]) expect(() => requireNonNegative("f", "x", bad, "m")).toThrow(InputError);
  });

  it("requireInRange honours open and closed ends and says so in the message", () => {
    expect(requireInRange("f", "d", 0, "", 0, 1)).toBe(0);
    expect(requireInRange("f", "d", 1, "", 0, 1)).toBe(1);
    expect(() => requireInRange("f", "d", 0, "", 0, 1, "()")).toThrow(/> 0 and < 1/u);
    expect(() => requireInRange("f", "d", 1, "", 0, 1, "[)")).toThrow(/≥ 0 and < 1/u);
    expect(() => requireInRange("f", "t", -300, "°C", -273.15, Infinity)).toThrow("f: t must be a finite number ≥ -273.15 °C, got -300");
    expect(() => requireInRange("f", "d", NaN, "", 0, 1)).toThrow(InputError);
  });

  it("requireInteger rejects fractions and values below the minimum", () => {
    expect(requireInteger("f", "turns", 1)).toBe(1);
    expect(requireInteger("f", "layers", 0, 0)).toBe(0);
    expect(() => requireInteger("f", "turns", 0)).toThrow("f: turns must be an integer ≥ 1, got 0");
    expect(() => requireInteger("f", "turns", 2.5)).toThrow(InputError);
    expect(() => requireInteger("f", "turns", NaN)).toThrow(InputError);
  });

  it("requireOneOf narrows to the allowed strings", () => {
    const bridge: "half" | "full" = requireOneOf("f", "bridge", "full", ["half", "full"] as const);
    expect(bridge).toBe("full");
    expect(() => requireOneOf("f", "bridge", "quarter", ["half", "full"])).toThrow('f: bridge must be one of "half", "full", got "quarter"');
  });

  it("requireObject rejects null, arrays and primitives", () => {
    expect(requireObject("f", "options", { a: 1 })).toEqual({ a: 1 });
    for (const bad of [null, [], 3, "x", undefined]) expect(() => requireObject("f", "options", bad)).toThrow(InputError);
  });
});

describe("requireKnownKeys and nearestName", () => {
  it("requireKnownKeys returns the object when every field is known", async () => {
    const { requireKnownKeys } = await import("../../src/core/index.js");
    const options = { radius: 1, length: 2 };
    expect(requireKnownKeys("f", "options", options, ["radius", "length", "turns"])).toBe(options);
  });
  it("requireKnownKeys names the unknown field and suggests the nearest known one", async () => {
    const { requireKnownKeys } = await import("../../src/core/index.js");
    let error: unknown = null;
    try {
      requireKnownKeys("roundWireAcRatio", "options", { diameter: 1e-3, relativePermeabilty: 1000 }, ["diameter", "relativePermeability"]);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).parameter).toBe("options.relativePermeabilty");
    expect((error as InputError).message).toContain('did you mean "relativePermeability"?');
  });
  it("requireKnownKeys offers no suggestion for an unrelated name", async () => {
    const { requireKnownKeys } = await import("../../src/core/index.js");
    expect(() => requireKnownKeys("f", "", { zzzzzz: 1 }, ["radius"])).toThrow(/zzzzzz must be absent \(unknown field; known fields: radius\)/);
  });
  it("nearestName is case-insensitive and bounded by a third of the name", async () => {
    const { nearestName } = await import("../../src/core/index.js");
    expect(nearestName("TankVoltageRMS", ["tankVoltageRms", "coilCurrentRms"])).toBe("tankVoltageRms");
    expect(nearestName("heatup", ["heatUp", "points"])).toBe("heatUp");
    expect(nearestName("frequency", ["radius"])).toBeNull();
    expect(nearestName("x", [])).toBeNull();
  });
});
