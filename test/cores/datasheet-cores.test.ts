/**
 * The shape functions against the effective parameters that core manufacturers print for
 * standard sizes (computed by them with the IEC 60205 method): each case names its data sheet
 * in test/fixtures/cores/datasheet-cores.json, with the tolerance the test reads and what the
 * section model leaves out.
 */
import { describe, expect, it } from "vitest";
import fixture from "../fixtures/cores/datasheet-cores.json" with { type: "json" };
import { eCore, planarECore, potCore, roundLegECore, toroidCore } from "../../src/index.js";
import type { CoreShape } from "../../src/index.js";

const mm = 1e-3;
const rel = (a: number, b: number): number => Math.abs(a / b - 1);

interface Case {
  designation: string;
  shape: string;
  source: string;
  dimensionsMm: Record<string, number>;
  c1PerMm: number;
  effectiveLengthMm: number;
  effectiveAreaMm2: number;
  effectiveVolumeMm3: number;
  minimumAreaMm2?: number;
  rtol: number;
}

function build(c: Case): CoreShape {
  const d: Record<string, number> = {};
  for (const [k, v] of Object.entries(c.dimensionsMm)) d[k] = v * mm;
  switch (c.shape) {
    case "eCore":
      return eCore(d as never);
    case "planarECore":
      return planarECore(d.plateThickness === undefined ? (d as never) : ({ ...d, mate: "plate" } as never));
    case "roundLegECore":
      return roundLegECore(d as never);
    case "potCore":
      return potCore(d as never);
    case "toroidCore":
      return toroidCore(d as never);
    default:
      throw new Error(`unknown shape ${c.shape}`);
  }
}

describe("shape functions against data-sheet effective parameters (IEC 60205 values printed by the maker)", () => {
  for (const c of fixture.cases as Case[]) {
    it(`${c.designation} — ${c.source}`, () => {
      const s = build(c);
      expect(rel(s.c1 * mm, c.c1PerMm), "C1").toBeLessThanOrEqual(c.rtol);
      expect(rel(s.effectivePathLength / mm, c.effectiveLengthMm), "le").toBeLessThanOrEqual(c.rtol);
      expect(rel(s.effectiveArea / mm ** 2, c.effectiveAreaMm2), "Ae").toBeLessThanOrEqual(c.rtol);
      expect(rel(s.effectiveVolume / mm ** 3, c.effectiveVolumeMm3), "Ve").toBeLessThanOrEqual(c.rtol);
      if (c.minimumAreaMm2 !== undefined) expect(rel(s.minimumArea / mm ** 2, c.minimumAreaMm2), "Amin").toBeLessThanOrEqual(c.rtol);
    });
  }

  it("the E 42/21/15 case is not met by the printed nominal dimensions (the data sheet uses the tolerance mid-points)", () => {
    // Ferroxcube E42/21/15 data sheet (2008): C1 = 0.548 /mm. Nominal (upper or lower limit) values
    // give 0.499 /mm: the test above can tell the two apart, so its 0.6 % is a real check.
    const nominal = eCore({ width: 43 * mm, height: 21 * mm, depth: 15.2 * mm, windowWidth: 29.5 * mm, centreLegWidth: 12.2 * mm, windowHeight: 14.8 * mm });
    expect(rel(nominal.c1 * mm, 0.548)).toBeGreaterThan(0.05);
  });
});
