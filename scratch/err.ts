import { transformerWindingResistance } from "../src/index.js";
import stack from "../test/fixtures/transformers/stack-1d.json" with { type: "json" };
let worst = 0;
for (const c of stack.cases) { const r = transformerWindingResistance(c.options as any);
 for (const w of [0,1] as const) { const e = Math.abs(r.windings[w].acResistance / c.windings[w]!.acResistance - 1); worst = Math.max(worst, e); console.log(c.name, w, e.toExponential(2), r.windings[w].acFactor.toFixed(4)); } }
console.log("worst", worst);
