import { leakageInductance, transformerWindingResistance } from "../src/transformers/index.js";
const wire = { kind: "round", diameter: 0.3e-3, outerDiameter: 0.34e-3 } as const;
const foil = { kind: "foil", thickness: 0.15e-3 } as const;
const r = transformerWindingResistance({ frequency: 200e3, resistivity: 2.3e-8, windowBreadth: 9e-3, meanTurnLength: 0.06,
  layers: [{ winding: 0, turns: 10, conductor: wire }, { winding: 1, turns: 1, conductor: foil },
    { winding: 1, turns: 1, conductor: foil }, { winding: 0, turns: 10, conductor: wire }],
  spacers: [0.2e-3, 0.05e-3, 0.2e-3] });
console.log(r.windings[0].acFactor, r.windings[1].acFactor, r.leakageInductance, leakageInductance);
