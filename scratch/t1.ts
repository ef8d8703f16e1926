import { leakageInductance, transformerWindingResistance } from "../src/transformers/index.js";
console.log(leakageInductance({ turns: 20, meanTurnLength: 0.07, windowBreadth: 0.02,
   layers: [{ winding: 0, thickness: 0.5e-3 }, { winding: 0, thickness: 0.5e-3 }, { winding: 1, thickness: 1e-3 }],
   spacers: [0.05e-3, 0.2e-3] }));
const wire = { kind: "round", diameter: 0.5e-3, outerDiameter: 0.55e-3 } as const;
const foil = { kind: "foil", thickness: 0.1e-3 } as const;
const r = transformerWindingResistance({ frequency: 100e3, resistivity: 1.72e-8, windowBreadth: 8e-3, meanTurnLength: 0.05,
  layers: [{ winding: 0, turns: 8, conductor: wire }, { winding: 1, turns: 1, conductor: foil }, { winding: 1, turns: 1, conductor: foil },
     { winding: 1, turns: 1, conductor: foil }, { winding: 1, turns: 1, conductor: foil }, { winding: 0, turns: 8, conductor: wire }],
  spacers: [0.1e-3, 0.03e-3, 0.03e-3, 0.03e-3, 0.1e-3] });
console.log(JSON.stringify(r, null, 1));
