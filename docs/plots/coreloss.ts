/**
 * Writes docs/img/coreloss-waveforms.svg for docs/coreloss.md: iGSE loss of triangular and
 * trapezoidal flux relative to a sinusoid of the same peak, against duty cycle, for the
 * invented example ferrite.
 *
 * Run: npx tsx docs/plots/coreloss.ts
 */
import { writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { lineChart } from "../../src/report/index.js";
import { igseLoss, inventedExampleFerrite, steinmetzLoss, trapezoidalFluxWaveform, triangularFluxWaveform } from "../../src/index.js";

const here = dirname(fileURLToPath(import.meta.url));
const c = inventedExampleFerrite.steinmetz; // invented example coefficients
const frequency = 100e3;
const peakFluxDensity = 0.1;
const sine = steinmetzLoss({ ...c, frequency, peakFluxDensity });
const duties: number[] = [];
for (let d = 0.05; d <= 0.951; d += 0.01) duties.push(d);

const svg = lineChart({
  title: "iGSE loss vs a sinusoid of equal peak (invented ferrite)",
  xLabel: "duty cycle D",
  yLabel: "loss / sinusoidal loss",
  series: [
    {
      name: "triangle, rising for D·T",
      x: duties,
      y: duties.map((d) => {
        const w = triangularFluxWaveform({ peakFluxDensity, frequency, dutyCycle: d });
        return igseLoss({ ...c, period: w.period, flux: w }) / sine;
      }),
    },
    {
      name: "trapezoid, ramps for D·T/2 (zero-voltage intervals)",
      x: duties,
      y: duties.map((d) => {
        const w = trapezoidalFluxWaveform({ peakFluxDensity, frequency, dutyCycle: d });
        return igseLoss({ ...c, period: w.period, flux: w }) / sine;
      }),
    },
  ],
  referenceLines: [{ axis: "y", value: 1, label: "sinusoid" }],
});
writeFileSync(join(here, "..", "img", "coreloss-waveforms.svg"), svg);
console.log("wrote docs/img/coreloss-waveforms.svg");
