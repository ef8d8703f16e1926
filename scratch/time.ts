import { transformerDesign, transformerWindingResistance } from "../src/index.js";
const design = { frequency: 200e3, voltSeconds: 200 * 2.5e-6, primaryCurrentRms: 2, turnsRatio: 8,
  core: { effectiveArea: 1e-4, effectiveVolume: 5e-6, windowHeight: 12e-3, windowWidth: 5e-3, meanTurnLength: 0.06 },
  coreLoss: { k: 3, alpha: 1.4, beta: 2.6 }, maxFluxDensity: 0.15,
  primary: { conductor: { kind: "litz", construction: { strands: 60, strandDiameter: 0.08e-3 } } },
  secondary: { conductor: { kind: "foil", thickness: 0.2e-3, width: 11e-3 } },
  sections: [0, 1, 0], layerInsulation: 0.05e-3, sectionInsulation: 0.2e-3,
  resistivity: 2.2e-8, ambientTemperature: 313.15, thermal: { thermalResistance: 20 } } as const;
let s = 0;
for (let r = 0; r < 3; r++) { const t0 = process.cpuUsage(); for (let i = 0; i < 2000; i++) s += transformerDesign({ ...design, primaryCurrentRms: 1 + i * 1e-4 } as any).losses.total; const t = process.cpuUsage(t0); console.log("design ms", (t.user + t.system) / 1000 / 2000); }
console.log(s > 0);
