import { describe, expect, it } from "vitest";
import { InputError } from "../../src/core/index.js";
import { formatQuantity } from "../../src/units/index.js";

describe("formatQuantity options argument", () => {
  it("throws InputError when options is given but is not an object (null, a number, a string)", () => {
    // these were silently ignored before (the default 4 digits were used)
    for (const bad of [null, 3, "digits"]) {
      expect(() => formatQuantity(Math.PI, "V", bad as never)).toThrow(InputError);
    }
  });

  it("still formats with the default digits when options is omitted or empty", () => {
    expect(formatQuantity(Math.PI, "V")).toBe("3.142 V");
    expect(formatQuantity(Math.PI, "V", {})).toBe("3.142 V");
    expect(formatQuantity(Math.PI, "V", { digits: 3 })).toBe("3.14 V");
  });
});
