import fc from "fast-check";
import { describe, it } from "vitest";
import { igseLoss, steinmetzLoss, sinusoidalFluxWaveform, fitSteinmetz } from "../../src/coreloss/index.js";

const runs = { seed: 1, numRuns: 200 };
const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);
const coefficients = fc.record({
  k: logUniform(1e-2, 1e2),
  alpha: fc.double({ min: 1, max: 2.5, noNaN: true, noDefaultInfinity: true }),
  beta: fc.double({ min: 1.5, max: 3.5, noNaN: true, noDefaultInfinity: true }),
});
/** A random closed piecewise-linear waveform (often with minor loops): times and flux densities. */
const waveform = fc
  .array(fc.record({ b: fc.double({ min: -1, max: 1, noNaN: true, noDefaultInfinity: true }), dt: fc.double({ min: 0.01, max: 1, noNaN: true, noDefaultInfinity: true }) }), { minLength: 2, maxLength: 14 })
  .map((pts) => {
    const time = [0];
    const fluxDensity = [pts[0]?.b ?? 0];
    for (let i = 1; i < pts.length; i++) {
      time.push((time[i - 1] as number) + (pts[i]?.dt ?? 1));
      fluxDensity.push(pts[i]?.b ?? 0);
    }
    time.push((time[time.length - 1] as number) + (pts[0]?.dt ?? 1));
    fluxDensity.push(fluxDensity[0] as number);
    return { time, fluxDensity, period: time[time.length - 1] as number };
  });

const rel = (a: number, b: number): number => (a === b ? 0 : Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b)));

/** The same periodic waveform started at time s (0 < s < period). */
function shifted(w: { time: number[]; fluxDensity: number[]; period: number }, s: number) {
  const { time, fluxDensity, period } = w;
  let j = 0;
  while ((time[j + 1] as number) <= s) j++;
  const t0 = time[j] as number;
  const t1 = time[j + 1] as number;
  const b0 = fluxDensity[j] as number;
  const b1 = fluxDensity[j + 1] as number;
  const bs = s === t0 ? b0 : b0 + ((b1 - b0) * (s - t0)) / (t1 - t0);
  const nt = [0];
  const nb = [bs];
  for (let i = j + 1; i < time.length; i++) {
    if ((time[i] as number) - s > 0) {
      nt.push((time[i] as number) - s);
      nb.push(fluxDensity[i] as number);
    }
  }
  for (let i = 1; i <= j; i++) {
    nt.push((time[i] as number) + period - s);
    nb.push(fluxDensity[i] as number);
  }
  if (s > t0) {
    nt.push(period);
    nb.push(bs);
  } else {
    nt[nt.length - 1] = period;
    nb[nb.length - 1] = bs;
  }
  return { time: nt, fluxDensity: nb, period };
}

describe("core-loss invariants", () => {
  it("iGSE loss is ≥ 0 and finite for any closed waveform", () => {
    fc.assert(
      fc.property(coefficients, waveform, (c, w) => {
        const p = igseLoss({ ...c, period: w.period, flux: w });
        return Number.isFinite(p) && p >= 0;
      }),
      runs,
    );
  });

  it("iGSE loss scales as B^β when the whole waveform is scaled", () => {
    fc.assert(
      fc.property(coefficients, waveform, logUniform(1e-3, 1e3), (c, w, s) => {
        const a = igseLoss({ ...c, period: w.period, flux: w });
        const b = igseLoss({ ...c, period: w.period, flux: { time: w.time, fluxDensity: w.fluxDensity.map((x) => x * s) } });
        return rel(b, a * s ** c.beta) < 1e-11;
      }),
      runs,
    );
  });

  it("iGSE loss scales as f^α when the waveform is compressed in time", () => {
    fc.assert(
      fc.property(coefficients, waveform, logUniform(1e-3, 1e3), (c, w, s) => {
        const a = igseLoss({ ...c, period: w.period, flux: w });
        const b = igseLoss({ ...c, period: w.period / s, flux: { time: w.time.map((t) => t / s), fluxDensity: w.fluxDensity } });
        return rel(b, a * s ** c.alpha) < 1e-11;
      }),
      runs,
    );
  });

  it("Steinmetz loss scales as f^α and B^β", () => {
    fc.assert(
      fc.property(coefficients, logUniform(1, 1e6), logUniform(1e-3, 2), logUniform(0.1, 10), (c, f, b, s) => {
        const p = steinmetzLoss({ ...c, frequency: f, fluxDensityPeak: b });
        return (
          rel(steinmetzLoss({ ...c, frequency: f * s, fluxDensityPeak: b }), p * s ** c.alpha) < 1e-13 &&
          rel(steinmetzLoss({ ...c, frequency: f, fluxDensityPeak: b * s }), p * s ** c.beta) < 1e-13
        );
      }),
      runs,
    );
  });

  it("iGSE of a sampled sinusoid agrees with Steinmetz (within 5e-5 at 256 samples) for any coefficients", () => {
    fc.assert(
      fc.property(coefficients, logUniform(10, 1e6), logUniform(1e-3, 1.5), (c, f, b) => {
        const w = sinusoidalFluxWaveform({ fluxDensityPeak: b, frequency: f });
        return rel(igseLoss({ ...c, period: w.period, flux: w }), steinmetzLoss({ ...c, frequency: f, fluxDensityPeak: b })) < 1e-4;
      }),
      runs,
    );
  });

  it("a zero-dB/dt interval adds no loss by itself (energy per cycle unchanged)", () => {
    fc.assert(
      fc.property(coefficients, waveform, fc.nat(), logUniform(1e-3, 10), (c, w, at, hold) => {
        const i = at % (w.time.length - 1);
        const time: number[] = [];
        const fluxDensity: number[] = [];
        for (let j = 0; j < w.time.length; j++) {
          time.push((w.time[j] as number) + (j > i ? hold : 0));
          fluxDensity.push(w.fluxDensity[j] as number);
          if (j === i) {
            time.push((w.time[j] as number) + hold);
            fluxDensity.push(w.fluxDensity[j] as number);
          }
        }
        const period = w.period + hold;
        const e1 = igseLoss({ ...c, period: w.period, flux: w }) * w.period;
        const e2 = igseLoss({ ...c, period, flux: { time, fluxDensity } }) * period;
        return rel(e1, e2) < 1e-11;
      }),
      runs,
    );
  });

  it("a time shift of the waveform changes nothing, minor loops included", () => {
    fc.assert(
      fc.property(coefficients, waveform, fc.double({ min: 0, max: 1, noNaN: true, noDefaultInfinity: true, maxExcluded: true }), (c, w, u) => {
        const s = u * w.period;
        if (!(s > 0)) return true;
        const a = igseLoss({ ...c, period: w.period, flux: w });
        const v = shifted(w, s);
        for (let i = 1; i < v.time.length; i++) if ((v.time[i] as number) - (v.time[i - 1] as number) < 1e-9 * w.period) return true;
        const b = igseLoss({ ...c, period: v.period, flux: v });
        return rel(a, b) < 1e-9;
      }),
      runs,
    );
  });

  it("fitSteinmetz recovers any coefficients from exact points", () => {
    fc.assert(
      fc.property(coefficients, (c) => {
        const pts = [];
        for (const frequency of [1e3, 1e4, 1e5])
          for (const fluxDensityPeak of [0.01, 0.1, 0.5]) pts.push({ frequency, fluxDensityPeak, lossDensity: steinmetzLoss({ ...c, frequency, fluxDensityPeak }) });
        const fit = fitSteinmetz(pts);
        return rel(fit.alpha, c.alpha) < 1e-9 && rel(fit.beta, c.beta) < 1e-9 && rel(fit.k, c.k) < 1e-8;
      }),
      runs,
    );
  });
});
