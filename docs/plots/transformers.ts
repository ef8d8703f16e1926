/**
 * Writes docs/img/transformers-mmf.svg and docs/img/transformers-loss.svg for
 * docs/transformers.md: the MMF diagram of the LLC example transformer wound P|S and P-S-P, and
 * its losses against peak flux density over the whole turns the window holds.
 *
 * Run: npx tsx docs/plots/transformers.ts
 */
import { writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { lineChart } from "../../src/report/chart.js";
import { celsius, eCore, inventedExampleFerrite, transformerDesign } from "../../src/index.js";
import type { LayerResistance, TransformerDesignOptions } from "../../src/index.js";

const here = dirname(fileURLToPath(import.meta.url));
const frequency = 200e3;
const core = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
const base: TransformerDesignOptions = {
  frequency, voltSeconds: 195 / (2 * frequency), primaryCurrentRms: 1.6, secondaryCurrentRms: 11.1, turnsRatio: 8,
  core: { ...core, windowWidth: core.windowWidth - 1e-3, windowHeight: core.windowHeight - 1e-3 },
  coreLoss: inventedExampleFerrite.steinmetz, maxFluxDensity: 0.2,
  primary: { conductor: { kind: "litz", construction: { strands: 60, strandDiameter: 0.1e-3, strandOuterDiameter: 0.115e-3 } } },
  secondary: { conductor: { kind: "foil", thickness: 0.2e-3, width: core.windowHeight - 1.5e-3 } },
  layerInsulation: 0.06e-3, sectionInsulation: 0.3e-3, resistivity: 2.3e-8, ambientTemperature: celsius(40),
  thermal: { surfaceArea: core.surfaceArea, height: 0.021 },
};

/** Points of the MMF diagram (ampere-turns per ampere of primary current) across the build, in mm. */
function diagram(layers: readonly LayerResistance[]): { x: number[]; y: number[] } {
  const x: number[] = [];
  const y: number[] = [];
  for (const l of layers) {
    x.push(l.position * 1e3, (l.position + l.thickness) * 1e3);
    y.push(l.mmfStart, l.mmfEnd);
  }
  return { x, y };
}

const turns = { primary: 40, secondary: 5 };
const plain = transformerDesign({ ...base, sections: [0, 1], turns });
const split = transformerDesign({ ...base, sections: [0, 1, 0], turns });
const mmf = lineChart({
  title: "MMF across the window build, 40:5 turns, per ampere of primary current",
  xLabel: "position across the build",
  xUnit: "mm",
  yLabel: "MMF per primary ampere [A·turn/A]",
  series: [
    { name: `P|S: leakage ${(plain.leakageInductance * 1e6).toFixed(2)} µH`, ...diagram(plain.layers) },
    { name: `P-S-P: leakage ${(split.leakageInductance * 1e6).toFixed(2)} µH`, ...diagram(split.layers) },
  ],
  referenceLines: [{ axis: "y", value: 0, label: "zero MMF" }],
});
writeFileSync(join(here, "..", "img", "transformers-mmf.svg"), mmf);

const search = transformerDesign({ ...base, sections: [0, 1, 0] });
const b: number[] = [];
const coreLoss: number[] = [];
const copper: number[] = [];
const total: number[] = [];
for (const c of search.candidates) {
  if (c.rejected !== null) continue;
  const d = transformerDesign({ ...base, sections: [0, 1, 0], turns: { primary: c.primaryTurns, secondary: c.secondaryTurns } });
  b.push(d.peakFluxDensity);
  coreLoss.push(d.losses.core);
  copper.push(d.losses.primaryCopper + d.losses.secondaryCopper);
  total.push(d.losses.total);
}
const loss = lineChart({
  title: "Losses of the P-S-P design against peak flux density (whole turns that fit)",
  xLabel: "peak flux density",
  xUnit: "T",
  xLog: true,
  yLabel: "loss",
  yUnit: "W",
  series: [
    { name: "core (iGSE)", x: b, y: coreLoss, markers: true },
    { name: "copper (Dowell per layer)", x: b, y: copper, markers: true },
    { name: "total", x: b, y: total, markers: true },
  ],
  referenceLines: [{ axis: "x", value: search.peakFluxDensity, label: `chosen: ${search.turns.primary}:${search.turns.secondary}` }],
});
writeFileSync(join(here, "..", "img", "transformers-loss.svg"), loss);
console.log("wrote docs/img/transformers-mmf.svg and docs/img/transformers-loss.svg");
