import { describe, it, expect } from "vitest";
import { exposureCheck, fieldOnAxis, studyHeater } from "../../src/index.js";
import { harmonicPowerShare } from "../../src/study/cautions.js";
import { loadExample, mutate } from "./cases.js";

describe("heater study cautions", () => {
  it("flags a part still heating at the top of its data, short of melting (forging bar at 150 V)", () => {
    const hot = mutate(loadExample("study-forging-bar.json"), "supply.voltage", "150 V");
    const s = studyHeater(hot, { temperatureScan: false, impedanceSweep: false });
    const melt = s.cautions.find((c) => c.code === "part-may-melt");
    expect(melt?.severity).toBe("danger");
    expect(s.heatUp?.steadyStateTemperature).toBeNull();
    expect(s.validity.map((v) => v.code)).toContain("settles-above-range");
    expect(melt?.limit).toBe(s.description.part.material.meltingTemperature);
    expect(melt?.value).toBe(s.heatUp?.powerCurveRange[1]);
    expect(melt?.message).toMatch(/would still be heating at \d+ °C, the top of the study's data/);
  });

  it("raises no melting caution when the part settles below its melting point (the forging-bar example)", () => {
    const s = studyHeater(loadExample("study-forging-bar.json"), { temperatureScan: false, impedanceSweep: false });
    expect(s.cautions.map((c) => c.code)).not.toContain("part-above-melting");
  });

  it("checks the field of each operating point at that point's own frequency and reports the worst (no mixed pair)", () => {
    // without the heat-up the study's operating points are exactly these three
    const hot = mutate(loadExample("study-forging-bar.json"), "supply.voltage", "150 V");
    const s = studyHeater(hot, { heatUp: false, temperatureScan: false, impedanceSweep: false });
    const field = s.cautions.filter((c) => c.code === "field-above-reference-level");
    expect(field).toHaveLength(1);
    const coil = s.description.coil;
    if (coil.shape !== "solenoid") throw new Error("expected a solenoid");
    const perAmp = Math.abs(fieldOnAxis({ coil: { kind: "solenoid", radius: coil.radius, length: coil.length, turns: coil.turns }, current: 1, axialPosition: 0.3 }));
    const points = [s.emptyCoil, s.operating, ...(s.atTarget === null ? [] : [s.atTarget])];
    const ratios = points.map((p) => exposureCheck({ fluxDensityRms: perAmp * p.coilCurrentRms, frequency: p.frequency, population: "general-public" }).ratio);
    const worst = points[ratios.indexOf(Math.max(...ratios))];
    // the reported flux density belongs to one operating point: B / I of that point is the coil's field per ampere
    const b = field[0]?.value ?? 0;
    expect(worst).toBeDefined();
    expect(b / ((worst?.coilCurrentRms ?? 0) * perAmp)).toBeCloseTo(1, 9);
    // the message names the worst point's own frequency (3 significant digits, kHz)
    const khz = Number(/RMS at (\d+(?:\.\d+)?) kHz/u.exec(field[0]?.message ?? "")?.[1]);
    expect(khz * 1e3).toBeCloseTo(Number((worst?.frequency ?? 0).toPrecision(3)), 6);
  });
});

describe("the first-harmonic note of a series bridge far above resonance", () => {
  it("harmonicPowerShare of an inductive load tends to Σ_{odd n ≥ 3} 1/n⁴ = π⁴/96 − 1 (Abramowitz & Stegun 23.2.20, λ(4) = π⁴/96)", () => {
    // R → 0 and C → ∞: |Z(nf)| = n|Z(f)|, so each harmonic carries 1/n⁴ of the fundamental's power
    const share = harmonicPowerShare(1e5, 1e-4, 1e3, 1e-9);
    const tail = Array.from({ length: 10000 }, (_, i) => 101 + 2 * i).reduce((s, n) => s + 1 / n ** 4, 0); // n > 99, left out by design
    expect(share + tail).toBeCloseTo(Math.PI ** 4 / 96 - 1, 9);
  });

  it("is tiny at resonance, where the harmonics see |Z(nf)| ≫ R", () => {
    const L = 1e-4;
    const C = 1e-6;
    const f0 = 1 / (2 * Math.PI * Math.sqrt(L * C));
    expect(harmonicPowerShare(f0, L, C, 0.05)).toBeLessThan(1e-4);
  });

  it("a power-tracking plate warmer run far above resonance gets the note; its impedance plot spans every operating point", () => {
    const light = mutate(loadExample("study-plate-warmer.json"), "inverter.targetPower", "20 W");
    const s = studyHeater(light, { heatUp: false, temperatureScan: false });
    const note = s.validity.find((v) => v.code === "first-harmonic-stretched");
    expect(note?.message).toMatch(/runs up to \d(\.\d)? × the loaded resonance/);
    const f = s.impedance?.frequencies ?? [];
    for (const p of [s.emptyCoil, s.operating, ...(s.atTarget === null ? [] : [s.atTarget])]) {
      expect(f[0] ?? Infinity).toBeLessThan(p.frequency);
      expect(f[f.length - 1] ?? 0).toBeGreaterThan(p.frequency);
    }
    // the example itself, near resonance, needs no note
    const usual = studyHeater(loadExample("study-plate-warmer.json"), { heatUp: false, temperatureScan: false, impedanceSweep: false });
    expect(usual.validity.map((v) => v.code)).not.toContain("first-harmonic-stretched");
  });
});
