import { leakageInductance } from "../src/index.js";
import pot from "../test/fixtures/transformers/pot-core-leakage.json" with { type: "json" };
for (const c of pot.cases) { const L = leakageInductance(c.options as any); console.log(c.name, L, (L / c.leakageInductance - 1) * 100);
 const L2 = leakageInductance({ ...(c.options as any), windowBreadth: c.layerHeight }); console.log("  layer height breadth", (L2 / c.leakageInductance - 1) * 100); }
