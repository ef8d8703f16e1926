import { describe, expect, it } from "vitest";
import { InputError } from "../../src/index.js";
import { igseCoefficient, igseLoss, steinmetzLoss, sinusoidalFluxWaveform, triangularFluxWaveform, trapezoidalFluxWaveform } from "../../src/coreloss/index.js";
import coefficientData from "../fixtures/coreloss/igse-coefficient.json" with { type: "json" };
import sinusoidData from "../fixtures/coreloss/igse-sinusoid.json" with { type: "json" };
import waveformData from "../fixtures/coreloss/igse-waveforms.json" with { type: "json" };

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("igseCoefficient", () => {
  it("matches mpmath quadrature of ∫|cos θ|^α dθ (fixture igse-coefficient.json)", () => {
    for (const c of coefficientData.cases) {
      expect(rel(igseCoefficient({ k: c.k, alpha: c.alpha, beta: c.beta }), c.ki)).toBeLessThanOrEqual(coefficientData.meta.rtol);
    }
  });

  it("agrees with the paper's approximation k/(2^(β+1) π^(α−1) (0.2761 + 1.7061/(α + 1.354))) within 0.2 % (Venkatachalam et al. 2002, from memory)", () => {
    for (let alpha = 0.5; alpha <= 3; alpha += 0.25) {
      for (const beta of [2, 2.5, 3]) {
        const approx = 1 / (2 ** (beta + 1) * Math.PI ** (alpha - 1) * (0.2761 + 1.7061 / (alpha + 1.354)));
        expect(rel(igseCoefficient({ k: 1, alpha, beta }), approx)).toBeLessThan(2e-3);
      }
    }
  });

  it("scales linearly with k", () => {
    expect(rel(igseCoefficient({ k: 7, alpha: 1.3, beta: 2.4 }), 7 * igseCoefficient({ k: 1, alpha: 1.3, beta: 2.4 }))).toBeLessThan(1e-15);
  });

  it("prints the documented example", () => {
    expect(igseCoefficient({ k: 2.5, alpha: 1.45, beta: 2.55 }).toPrecision(5)).toBe("0.14415");
  });

  it("throws InputError for non-positive coefficients", () => {
    expect(() => igseCoefficient({ k: 0, alpha: 1.5, beta: 2.5 })).toThrow(InputError);
    expect(() => igseCoefficient({ k: 1, alpha: -1, beta: 2.5 })).toThrow(/alpha/);
    expect(() => igseCoefficient({ k: 1, alpha: 1.5, beta: 0 })).toThrow(/beta/);
  });
});

describe("igseLoss", () => {
  it("reproduces the Steinmetz loss for an exact sinusoid to 1e-12 (its defining property; J from mpmath, igse-sinusoid.json)", () => {
    for (const c of sinusoidData.cases) {
      const ki = igseCoefficient({ k: c.k, alpha: c.alpha, beta: c.beta });
      const igse = ki * (2 * c.peakFluxDensity) ** (c.beta - c.alpha) * c.integral * c.frequency;
      const steinmetz = steinmetzLoss({ k: c.k, alpha: c.alpha, beta: c.beta, frequency: c.frequency, fluxDensityPeak: c.peakFluxDensity });
      expect(rel(igse, steinmetz)).toBeLessThanOrEqual(sinusoidData.meta.rtol);
    }
  });

  it("approaches the Steinmetz loss for a finely sampled sinusoid (within 5e-5 at 256 samples)", () => {
    const o = { k: 2.5, alpha: 1.45, beta: 2.55 };
    const w = sinusoidalFluxWaveform({ fluxDensityPeak: 0.1, frequency: 100e3 });
    const p = igseLoss({ ...o, period: w.period, flux: w });
    expect(rel(p, steinmetzLoss({ ...o, frequency: 100e3, fluxDensityPeak: 0.1 }))).toBeLessThan(5e-5);
  });

  it("matches numerical time integration in mpmath for triangles, trapezoids and minor loops (fixture igse-waveforms.json)", () => {
    for (const c of waveformData.cases) {
      const got = igseLoss({ k: c.k, alpha: c.alpha, beta: c.beta, period: c.period, flux: { time: c.time, fluxDensity: c.fluxDensity } });
      expect(rel(got, c.loss), c.name).toBeLessThanOrEqual(waveformData.meta.rtol);
    }
  });

  it("gives the closed form k_i 2^(α+β) f^α B̂^β for a symmetric triangle (Venkatachalam et al. 2002, piecewise-linear form of the iGSE)", () => {
    const o = { k: 2.5, alpha: 1.45, beta: 2.55 };
    const w = triangularFluxWaveform({ fluxDensityPeak: 0.1, frequency: 100e3 });
    const expected = igseCoefficient(o) * 2 ** (o.alpha + o.beta) * 100e3 ** o.alpha * 0.1 ** o.beta;
    expect(rel(igseLoss({ ...o, period: w.period, flux: w }), expected)).toBeLessThan(1e-13);
  });

  it("accepts an array of { time, fluxDensity } points", () => {
    const o = { k: 2.5, alpha: 1.45, beta: 2.55, period: 1e-5 };
    const cols = igseLoss({ ...o, flux: { time: [0, 3e-6, 1e-5], fluxDensity: [-0.1, 0.1, -0.1] } });
    const pts = igseLoss({ ...o, flux: [{ time: 0, fluxDensity: -0.1 }, { time: 3e-6, fluxDensity: 0.1 }, { time: 1e-5, fluxDensity: -0.1 }] });
    expect(pts).toBe(cols);
  });

  it("gives zero for a constant flux density", () => {
    expect(igseLoss({ k: 1, alpha: 1.5, beta: 2.5, period: 1, flux: { time: [0, 0.5, 1], fluxDensity: [0.3, 0.3, 0.3] } })).toBe(0);
  });

  it("a trapezoid at D = 1 equals the symmetric triangle", () => {
    const o = { k: 2.5, alpha: 1.45, beta: 2.55 };
    const a = trapezoidalFluxWaveform({ fluxDensityPeak: 0.1, frequency: 1e5, dutyCycle: 1 });
    const b = triangularFluxWaveform({ fluxDensityPeak: 0.1, frequency: 1e5 });
    expect(igseLoss({ ...o, period: a.period, flux: a })).toBe(igseLoss({ ...o, period: b.period, flux: b }));
  });

  it("prints the documented example", () => {
    const flux = triangularFluxWaveform({ fluxDensityPeak: 0.1, frequency: 100e3, dutyCycle: 0.3 });
    expect(igseLoss({ k: 2.5, alpha: 1.45, beta: 2.55, period: flux.period, flux }).toPrecision(6)).toBe("122414");
  });

  describe("rejects bad input with InputError", () => {
    const o = { k: 2.5, alpha: 1.45, beta: 2.55, period: 1e-5 };
    it("non-monotonic times", () => {
      expect(() => igseLoss({ ...o, flux: { time: [0, 6e-6, 5e-6, 1e-5], fluxDensity: [0, 0.1, 0.05, 0] } })).toThrow(InputError);
      expect(() => igseLoss({ ...o, flux: { time: [0, 5e-6, 5e-6, 1e-5], fluxDensity: [0, 0.1, 0.05, 0] } })).toThrow(/flux.time\[2\]/);
    });
    it("a waveform that does not close", () => {
      expect(() => igseLoss({ ...o, flux: { time: [0, 5e-6, 1e-5], fluxDensity: [0, 0.1, 0.01] } })).toThrow(/closes/);
    });
    it("times not spanning exactly one period", () => {
      expect(() => igseLoss({ ...o, flux: { time: [1e-7, 5e-6, 1e-5], fluxDensity: [0, 0.1, 0] } })).toThrow(/time\[0\]/);
      expect(() => igseLoss({ ...o, flux: { time: [0, 5e-6, 2e-5], fluxDensity: [0, 0.1, 0] } })).toThrow(/period/);
    });
    it("β ≤ 0, α ≤ 0, k ≤ 0, period ≤ 0", () => {
      const flux = { time: [0, 5e-6, 1e-5], fluxDensity: [0, 0.1, 0] };
      expect(() => igseLoss({ ...o, beta: 0, flux })).toThrow(InputError);
      expect(() => igseLoss({ ...o, beta: -2, flux })).toThrow(/beta/);
      expect(() => igseLoss({ ...o, alpha: 0, flux })).toThrow(/alpha/);
      expect(() => igseLoss({ ...o, k: Number.NaN, flux })).toThrow(/k must/);
      expect(() => igseLoss({ ...o, period: 0, flux })).toThrow(/period/);
    });
    it("malformed waveforms", () => {
      expect(() => igseLoss({ ...o, flux: { time: [0], fluxDensity: [0] } })).toThrow(InputError);
      expect(() => igseLoss({ ...o, flux: { time: [0, 1e-5], fluxDensity: [0, 0, 0] } })).toThrow(/length/);
      expect(() => igseLoss({ ...o, flux: { time: [0, 5e-6, 1e-5], fluxDensity: [0, Number.NaN, 0] } })).toThrow(InputError);
      expect(() => igseLoss({ ...o, flux: null as never })).toThrow(InputError);
      expect(() => igseLoss({ ...o, flux: [null] as never })).toThrow(InputError);
    });
  });
});
