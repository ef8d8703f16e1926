import { transformerTurns, transformerFluxOptimum, windowFill } from "../src/index.js";
console.log(transformerTurns({ voltSeconds: 200 * 2.5e-6, maxFluxDensity: 0.1, effectiveArea: 1e-4 }));
const o = transformerFluxOptimum({ voltSeconds: 200 * 2.5e-6, frequency: 200e3, effectiveArea: 1e-4,
  effectiveVolume: 5e-6, windowArea: 1e-4, meanTurnLength: 0.06, fillFactor: 0.3, resistivity: 2.2e-8,
  totalCurrentRms: 6, coreLoss: { k: 3, alpha: 1.4, beta: 2.6 } });
console.log(o, o.copperLoss/o.coreLoss);
console.log(windowFill({ windowArea: 1e-4, windings: [{ turns: 20, copperArea: 0.5e-6, conductorArea: 0.8e-6 }, { turns: 5, copperArea: 2e-6 }] }));
