/**
 * A 200 kHz LLC converter transformer (390 V bus, half bridge, 24 V / 10 A out) on an E core of
 * invented dimensions with the invented example ferrite: the turns of least total loss, the
 * winding loss of each winding from the MMF diagram, and what interleaving the primary around
 * the secondary does to the winding loss and the leakage inductance.
 *
 * Run: npx tsx docs/examples/transformers-llc.ts
 */
import {
  celsius,
  eCore,
  inventedExampleFerrite,
  transformerDesign,
  transformerFluxOptimum,
  transformerTurns,
} from "../../src/index.js";
import type { TransformerDesignOptions } from "../../src/index.js";

function expectClose(name: string, value: number, expected: number, rtol: number): void {
  console.log(`${name} = ${value.toPrecision(6)}`);
  if (!(Math.abs(value / expected - 1) <= rtol)) throw new Error(`${name}: got ${value}, expected ${expected}`);
}

const frequency = 200e3;
const bus = 390; // V, half bridge: the primary sees ±195 V
const voltSeconds = (bus / 2) / (2 * frequency); // one half-cycle of the square wave [V·s]
const outputCurrent = 10; // A DC
const secondaryCurrentRms = (Math.PI / (2 * Math.SQRT2)) * outputCurrent; // full-wave rectified sine: 11.1 A
const turnsRatio = 8;
const primaryCurrentRms = 1.6; // load current referred (1.39 A) plus magnetising current, from the tank design

// invented E-core dimensions (not a catalogue part)
const core = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
console.log(`core: Ae = ${(core.effectiveArea * 1e6).toFixed(1)} mm², Ve = ${(core.effectiveVolume * 1e9).toFixed(0)} mm³, window ${(core.windowWidth * 1e3).toFixed(1)} × ${(core.windowHeight * 1e3).toFixed(1)} mm`);

// fewest turns for 0.2 T, and the flux density of least loss with the window filled (first sizing)
const fewest = transformerTurns({ voltSeconds, maxFluxDensity: 0.2, effectiveArea: core.effectiveArea });
console.log(`fewest primary turns for 0.2 T: ${fewest.turns}`);
const optimum = transformerFluxOptimum({
  voltSeconds, frequency, effectiveArea: core.effectiveArea, effectiveVolume: core.effectiveVolume,
  windowArea: core.windowArea, meanTurnLength: core.meanTurnLength, fillFactor: 0.3, resistivity: 2.3e-8,
  totalCurrentRms: 2 * primaryCurrentRms, coreLoss: inventedExampleFerrite.steinmetz, acFactor: 1.3,
});
console.log(`loss-optimal peak flux density (window filled): ${optimum.peakFluxDensity.toFixed(3)} T, ${optimum.turns.toFixed(1)} primary turns`);

// the design: 60 × 0.1 mm litz primary, 0.2 mm copper foil secondary
const bobbin = 1e-3; // bobbin wall and margins taken off the window
const base: TransformerDesignOptions = {
  frequency, voltSeconds, primaryCurrentRms, secondaryCurrentRms, turnsRatio,
  core: { ...core, windowWidth: core.windowWidth - bobbin, windowHeight: core.windowHeight - bobbin },
  coreLoss: inventedExampleFerrite.steinmetz,
  maxFluxDensity: 0.2,
  primary: { conductor: { kind: "litz", construction: { strands: 60, strandDiameter: 0.1e-3, strandOuterDiameter: 0.115e-3 } } },
  secondary: { conductor: { kind: "foil", thickness: 0.2e-3, width: core.windowHeight - bobbin - 0.5e-3 } },
  layerInsulation: 0.06e-3,
  sectionInsulation: 0.3e-3, // tape between primary and secondary
  resistivity: 2.3e-8, // copper near 100 °C
  ambientTemperature: celsius(40),
  thermal: { surfaceArea: core.surfaceArea, height: 0.021 },
};

const plain = transformerDesign({ ...base, sections: [0, 1] });
const interleaved = transformerDesign({ ...base, sections: [0, 1, 0] });
for (const [name, d] of [["P|S", plain], ["P-S-P", interleaved]] as const) {
  console.log(`${name}: ${d.turns.primary}:${d.turns.secondary} turns, B = ${d.peakFluxDensity.toFixed(3)} T`);
  console.log(`  core ${d.losses.core.toFixed(2)} W, primary ${d.losses.primaryCopper.toFixed(2)} W (Fr ${d.windings[0].acFactor.toFixed(2)}), secondary ${d.losses.secondaryCopper.toFixed(2)} W (Fr ${d.windings[1].acFactor.toFixed(2)})`);
  console.log(`  total ${d.losses.total.toFixed(2)} W, leakage ${(d.leakageInductance * 1e6).toFixed(2)} µH, surface rise ${d.temperature.temperatureRise.toFixed(0)} K`);
  console.log(`  cautions: ${d.cautions.map((c) => c.code).join(", ")}`);
}

// interleaving halves the peak MMF: the leakage falls to about a quarter (the ideal factor for two
// sections; the tape is not split, so a little more) and the foil secondary's proximity loss falls with it
const sameTurns = transformerDesign({ ...base, sections: [0, 1], turns: interleaved.turns });
expectClose("leakage ratio P-S-P / P|S at the same turns", interleaved.leakageInductance / sameTurns.leakageInductance, 0.25, 0.1);
if (!(interleaved.windings[1].acFactor < sameTurns.windings[1].acFactor)) throw new Error("interleaving should lower the secondary's AC factor");
console.log(`secondary AC factor at ${interleaved.turns.primary}:${interleaved.turns.secondary} turns: P|S ${sameTurns.windings[1].acFactor.toFixed(2)}, P-S-P ${interleaved.windings[1].acFactor.toFixed(2)}`);
