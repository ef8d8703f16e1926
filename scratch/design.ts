import { transformerDesign } from "../src/index.js";
const d = transformerDesign({ frequency: 200e3, voltSeconds: 200 * 2.5e-6, primaryCurrentRms: 2, turnsRatio: 8,
  core: { effectiveArea: 1e-4, effectiveVolume: 5e-6, windowHeight: 12e-3, windowWidth: 5e-3, meanTurnLength: 0.06 },
  coreLoss: { k: 3, alpha: 1.4, beta: 2.6 }, maxFluxDensity: 0.15,
  primary: { conductor: { kind: "litz", construction: { strands: 60, strandDiameter: 0.08e-3 } } },
  secondary: { conductor: { kind: "foil", thickness: 0.2e-3, width: 11e-3 } },
  sections: [0, 1, 0], layerInsulation: 0.05e-3, sectionInsulation: 0.2e-3,
  resistivity: 2.2e-8, ambientTemperature: 313.15, thermal: { thermalResistance: 20 } });
console.log(d.turns, d.peakFluxDensity, d.losses, d.leakageInductance, d.build, d.temperature.temperatureRise, d.candidates, d.cautions.map(c=>c.code), d.validity);
console.log(d.layers.map(l => [l.winding, l.mmfStart, l.mmfEnd, l.acFactor.toFixed(3)]));
