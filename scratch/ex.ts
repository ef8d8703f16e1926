import { transformerWindingResistance } from "../src/index.js";
const wire = { kind: "round", diameter: 0.4e-3, outerDiameter: 0.45e-3 } as const;
const foil = { kind: "foil", thickness: 0.1e-3 } as const;
const r = transformerWindingResistance({ frequency: 100e3, resistivity: 1.72e-8, windowBreadth: 8e-3, meanTurnLength: 0.05,
  layers: [{ winding: 0, turns: 8, conductor: wire }, { winding: 1, turns: 1, conductor: foil }, { winding: 1, turns: 1, conductor: foil },
    { winding: 1, turns: 1, conductor: foil }, { winding: 1, turns: 1, conductor: foil }, { winding: 0, turns: 8, conductor: wire }],
  spacers: [0.1e-3, 0.03e-3, 0.03e-3, 0.03e-3, 0.1e-3] });
console.log(r.windings[0].acFactor, r.windings[1].acFactor, r.validity.length, r.leakageInductance);
