import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { jsonSyntaxError } from "../../src/cli/json-error.js";

const parses = (text: string): boolean => {
  try {
    JSON.parse(text);
    return true;
  } catch {
    return false;
  }
};

describe("jsonSyntaxError", () => {
  it("finds the offending character of common mistakes", () => {
    const cases: [string, number, RegExp][] = [
      ['{ "a": 1, }', 10, /trailing commas/],
      ['{ "a" 1 }', 6, /expected ":"/],
      ["{ 'a': 1 }", 2, /double quotes/],
      ['{ "a": 1 "b": 2 }', 9, /expected "," or "}"/],
      ['{ "a": [1, 2 }', 13, /expected "," or "]"/],
      ['{ "a": "x', 9, /not closed/],
      ["", 0, /expected a value, found the end/],
      ['{ "a": 1 } x', 11, /after the JSON value/],
      ['{ "a": 01 }', 8, /expected "," or "}"/],
    ];
    for (const [text, offset, reason] of cases) {
      const found = jsonSyntaxError(text);
      expect(found?.offset, text).toBe(offset);
      expect(found?.reason, text).toMatch(reason);
    }
  });

  it("agrees with JSON.parse (the engine's RFC 8259 parser) on what is JSON, over random texts and mutations", () => {
    const jsonish = fc.oneof(
      fc.json(),
      fc.json().chain((j) => fc.tuple(fc.constant(j), fc.nat(j.length), fc.constantFrom("", ",", "}", "]", ":", '"', "'", "x", " ", "\n", "-", "0", "\\")).map(([t, at, c]) => t.slice(0, at) + c + t.slice(at + 1))),
      fc.string({ unit: fc.constantFrom("{", "}", "[", "]", ",", ":", '"', "1", "-", "e", ".", " ", "t", "n", "\\", "u") }),
    );
    fc.assert(
      fc.property(jsonish, (text) => {
        expect(jsonSyntaxError(text) === null).toBe(parses(text));
      }),
      { seed: 16, numRuns: 3000 },
    );
  });
});
