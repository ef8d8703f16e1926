import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { readHeaterDescription, studyHeater } from "../../src/index.js";
import type { HeaterDescription } from "../../src/index.js";
import { studyTextReport } from "../../src/report/text-report.js";
import { studyPlots } from "../../src/report/html-report.js";
import { loadExample, mutate } from "./cases.js";
import { checkSchema } from "./schema-check.js";

const schema = JSON.parse(readFileSync(new URL("../../docs/heater-study.schema.json", import.meta.url), "utf8")) as Record<string, unknown>;
const bar = loadExample("study-forging-bar.json");
const run = (location: "mean" | "surface" | "core", extra: Record<string, unknown> = {}) =>
  studyHeater(
    { ...bar, part: { ...(bar.part as unknown as Record<string, unknown>), targetLocation: location, ...extra } } as unknown as HeaterDescription,
    { temperatureScan: false, impedanceSweep: false },
  );

describe("studyHeater: surface and core temperature of a bar (radial model)", () => {
  const surface = run("surface", { soakBand: "30 K", hardeningTemperature: "800 °C" });
  const mean = run("mean");
  const core = run("core");
  it("reports surface, core and mean curves for a bar in a solenoid", () => {
    const r = surface.heatUp!.radial!;
    expect(r.times.length).toBeGreaterThan(10);
    expect(r.surfaceTemperatures.length).toBe(r.times.length);
    expect(r.coreTemperatures.length).toBe(r.times.length);
    expect(surface.validity.map((v) => v.code)).toContain("radial-heat-up");
  });
  it("the target applies to the chosen temperature: surface first, then mean, then core", () => {
    expect(surface.heatUp!.targetLocation).toBe("surface");
    expect(surface.timeToTarget).toBe(surface.heatUp!.radial!.heatingTime);
    expect(core.timeToTarget).toBe(core.heatUp!.radial!.heatingTime);
    expect(surface.timeToTarget!).toBeLessThan(core.timeToTarget!);
    // "mean" keeps today's meaning: the lumped model's time
    expect(mean.heatUp!.targetLocation).toBe("mean");
    expect(mean.timeToTarget).not.toBe(mean.heatUp!.radial!.heatingTime);
    // within one run the surface arrives first; the core target takes longest
    const m = mean.heatUp!.radial!;
    expect(m.timeToSurfaceTarget!).toBeLessThanOrEqual(m.timeToMeanTarget!);
    expect(m.timeToMeanTarget!).toBeLessThan(core.timeToTarget!);
  });
  it("reports the difference at target, the soak time and the hardening depth", () => {
    const r = surface.heatUp!.radial!;
    expect(r.surfaceCoreDifferenceAtTarget).not.toBeNull();
    expect(r.soakBand).toBe(30);
    expect(r.hardeningTemperature).toBeCloseTo(1073.15, 9);
    expect(r.hardeningDepth!).toBeGreaterThan(0);
    expect(r.uniformPowerDeviation).toBeGreaterThanOrEqual(0);
  });
  it("the text report lists them and the HTML report draws surface and core", () => {
    const text = studyTextReport(surface);
    expect(text).toContain("at the surface");
    expect(text).toContain("surface − core when the heating stops");
    expect(text).toContain("soak until within 30 K");
    expect(text).toContain("depth heated above");
    const plots = studyPlots(surface);
    expect(plots.some((p) => p.svg.includes("surface and core temperature"))).toBe(true);
  });
  it("sweeps and optimisers may skip it; a mean target without the option runs none", () => {
    const s = studyHeater(bar, { radialHeatUp: false, temperatureScan: false, impedanceSweep: false });
    expect(s.heatUp!.radial).toBeNull();
  });
});

describe("study files: targetLocation, soakBand, hardeningTemperature", () => {
  it("the schema accepts them for a bar", () => {
    const input = mutate(mutate(mutate(bar, "part.targetLocation", "core"), "part.soakBand", "20 K"), "part.hardeningTemperature", "850 °C");
    expect(checkSchema(schema, input)).toEqual([]);
    const d = readHeaterDescription(input);
    expect(d.part.targetLocation).toBe("core");
    expect(d.part.soakBand).toBe(20);
  });
  it("the schema and the reader reject an unknown location", () => {
    const input = mutate(bar, "part.targetLocation", "centre");
    expect(checkSchema(schema, input).length).toBeGreaterThan(0);
    expect(() => readHeaterDescription(input)).toThrow(/part.targetLocation/);
  });
  it("a ring accepts only the mean: surface and core are for bars and tubes", () => {
    const ring = loadExample("study-bearing-race.json");
    expect(() => readHeaterDescription(mutate(ring, "part.targetLocation", "surface"))).toThrow(/bars and tubes/);
    expect(() => readHeaterDescription(mutate(ring, "part.soakBand", "10 K"))).toThrow(/bars and tubes/);
    expect(readHeaterDescription(mutate(ring, "part.targetLocation", "mean")).part.targetLocation).toBe("mean");
  });
});
