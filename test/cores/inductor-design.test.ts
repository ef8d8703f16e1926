import { describe, expect, it } from "vitest";
import {
  ANNEALED_COPPER_RESISTIVITY,
  ANNEALED_COPPER_TEMPERATURE_COEFFICIENT,
  celsius,
  componentTemperatureRise,
  eCore,
  gappedInductor,
  igseCoefficient,
  inductorDesign,
  InputError,
  inventedExampleFerrite,
  MU_0,
  steinmetzTemperatureFactor,
} from "../../src/index.js";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const core = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
const material = inventedExampleFerrite;
const base = {
  inductance: 100e-6,
  frequency: 100e3,
  core,
  material,
  current: { kind: "triangular" as const, average: 5, ripple: 2, dutyCycle: 0.4 },
  conductor: { kind: "litz" as const, strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 },
  ambientTemperature: celsius(40),
  maxFluxDensityRatio: 0.7,
};

describe("inductorDesign", () => {
  it("agrees with a hand calculation of every step (closed forms: N, triangle iGSE, triangle Fourier series, Sullivan litz)", () => {
    const d = inductorDesign(base);
    // Turns: N = ceil(L Î / (0.7 Bsat A_min)).
    const n = Math.ceil((100e-6 * 6) / (0.7 * material.saturationFluxDensity * core.minimumArea));
    expect(d.turns).toBe(n);
    // Gap: the inductance is met with the gap returned.
    const gapCore = {
      effectiveArea: core.effectiveArea, effectivePathLength: core.effectivePathLength, relativePermeability: material.relativePermeability,
      gapArea: core.legArea, legShape: core.legShape, legWidth: core.legWidth, legDepth: core.legDepth, windowHeight: core.windowHeight,
    };
    const m = gappedInductor({ core: gapCore, turns: n, gapLength: d.gapLength, fringing: "muhlethaler" });
    expect(rel(m.inductance, 100e-6)).toBeLessThan(1e-10);
    const reluctance = m.coreReluctance + m.gapReluctance;
    const perAmp = n / (reluctance * core.effectiveArea);
    expect(rel(d.fluxDensitySwing, 2 * perAmp)).toBeLessThan(1e-12);
    // Core loss: iGSE of a triangle in closed form (Venkatachalam et al. 2002),
    // Pv = ki ΔB^(β−α) [ΔB^α (DT)^(1−α) + ΔB^α ((1−D)T)^(1−α)] / T, times the temperature factor.
    const { k, alpha, beta } = material.steinmetz;
    const ki = igseCoefficient({ k, alpha, beta });
    const T = 1e-5;
    const dB = d.fluxDensitySwing;
    const pv = (ki * dB ** (beta - alpha) * (dB ** alpha * (0.4 * T) ** (1 - alpha) + dB ** alpha * (0.6 * T) ** (1 - alpha))) / T;
    const temperature = d.surfaceTemperature;
    const coreLoss = pv * core.effectiveVolume * steinmetzTemperatureFactor(material.temperatureTerm!, temperature);
    expect(rel(d.coreLoss, coreLoss)).toBeLessThan(1e-8);
    // Winding loss: triangle harmonics I_n = √2 r |sin(π n D)| / (2π² n² D(1−D)) (Fourier series of a
    // triangle wave), each at Sullivan's litz factor 1 + K n² (closed form, Sullivan 1999).
    const rho = ANNEALED_COPPER_RESISTIVITY * (1 + ANNEALED_COPPER_TEMPERATURE_COEFFICIENT * (temperature - 293.15));
    const copper = (105 * Math.PI * 0.1e-3 ** 2) / 4;
    const rdc = (rho * n * core.meanTurnLength) / copper;
    expect(rel(d.dcResistance, rdc)).toBeLessThan(1e-6);
    let ac = 0;
    for (let h = 1; h <= 4000; h++) {
      const ih = (Math.SQRT2 * 2 * Math.abs(Math.sin(Math.PI * h * 0.4))) / (2 * Math.PI ** 2 * h * h * 0.4 * 0.6);
      const omega = 2 * Math.PI * h * 100e3;
      const a = (Math.PI * omega * MU_0 * n) / (rho * core.windowHeight);
      const fr = 1 + (a * a * 105 ** 2 * 0.1e-3 ** 6) / 768;
      ac += fr * ih * ih;
    }
    const windingLoss = rdc * (25 + ac);
    // Harmonics above the 40th are charged at the 40th's factor: measured effect < 1e-4 here.
    expect(rel(d.windingLoss, windingLoss)).toBeLessThan(1e-4);
    // Temperature: the surface balance of the total loss.
    const t = componentTemperatureRise({ power: d.totalLoss, ambientTemperature: celsius(40), surfaceArea: core.surfaceArea, height: Math.sqrt(core.surfaceArea / 6) });
    expect(Math.abs(t.surfaceTemperature - d.surfaceTemperature)).toBeLessThan(2e-3);
    expect(rel(d.totalLoss, d.coreLoss + d.windingLoss)).toBeLessThan(1e-15);
  });

  it("takes a sampled waveform: the same triangle as samples gives the same design", () => {
    const d1 = inductorDesign(base);
    const d2 = inductorDesign({ ...base, current: { kind: "samples", time: [0, 4e-6, 1e-5], current: [4, 6, 4] } });
    expect(d2.turns).toBe(d1.turns);
    expect(rel(d2.coreLoss, d1.coreLoss)).toBeLessThan(1e-9);
    expect(rel(d2.windingLoss, d1.windingLoss)).toBeLessThan(1e-9);
  });

  it("cautions: forced turns that saturate, a gap near the winding, a full window", () => {
    const d = inductorDesign({ ...base, turns: 5 });
    expect(d.cautions.map((c) => c.code)).toContain("core-saturates");
    const near = inductorDesign({ ...base, windingClearance: 0.2e-3 });
    expect(near.cautions.map((c) => c.code)).toContain("gap-fringing-near-winding");
    const far = inductorDesign({ ...base, windingClearance: 5e-3 });
    expect(far.cautions.map((c) => c.code)).not.toContain("gap-fringing-near-winding");
    const thick = inductorDesign({ ...base, conductor: { kind: "round", diameter: 2.5e-3 }, inductance: 400e-6 });
    expect(thick.cautions.map((c) => c.code)).toContain("window-overfull");
  });

  it("foil and round conductors run through Dowell's model", () => {
    const foil = inductorDesign({ ...base, conductor: { kind: "foil", thickness: 0.1e-3 } });
    expect(foil.layers).toBe(foil.turns);
    expect(foil.rippleAcFactor).toBeGreaterThan(1);
    const round = inductorDesign({ ...base, conductor: { kind: "round", diameter: 1e-3 } });
    expect(round.rippleAcFactor).toBeGreaterThan(1);
  });

  it("rejects bad input", () => {
    expect(() => inductorDesign({ ...base, current: { kind: "samples", time: [0, 4e-6, 1e-5], current: [4, 6, 5] } })).toThrow(InputError);
    expect(() => inductorDesign({ ...base, current: { kind: "triangular", average: 5, ripple: 2, dutyCycle: 1 } })).toThrow(InputError);
    expect(() => inductorDesign({ ...base, conductor: { kind: "litz", strands: 105, strandDiameter: 0.1e-3, outerDiameter: 0.5e-3 } })).toThrow(/outerDiameter/);
    expect(() => inductorDesign({ ...base, inductance: 1 })).toThrow(/inductance/);
    expect(() => inductorDesign({ ...base, colour: 1 } as never)).toThrow(/colour/);
  });
});
