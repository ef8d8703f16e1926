/**
 * The basic calls of the conductors module, with their results checked.
 *
 * Run: npx tsx docs/examples/conductors-basics.ts
 */
import { skinDepth, roundWireAcRatio, dowellFactor, litzWindingAcRatio, optimalLitzStrandCount } from "../../src/index.js";

const rho = 1.7241e-8; // annealed copper at 20 °C (IEC 60028)

function expectClose(name: string, value: number, expected: number, rtol: number): void {
  console.log(`${name} = ${value.toPrecision(6)}`);
  if (!(Math.abs(value / expected - 1) <= rtol)) throw new Error(`${name}: got ${value}, expected ${expected}`);
}

expectClose("skin depth at 20 kHz [m]", skinDepth({ resistivity: rho, frequency: 20e3 }), 4.6729e-4, 1e-4);
expectClose("Rac/Rdc of 2 mm wire at 20 kHz", roundWireAcRatio({ diameter: 2e-3, frequency: 20e3, resistivity: rho }), 1.32668, 1e-5);
expectClose("Dowell Fr, Δ = 1, 3 layers", dowellFactor({ penetrationRatio: 1, layers: 3 }), 1.93996, 1e-5);
const winding = { turns: 20, windowBreadth: 20e-3, frequency: 100e3, resistivity: rho };
expectClose("litz 100 × 0.1 mm winding Fr", litzWindingAcRatio({ strands: 100, strandDiameter: 0.1e-3, ...winding }), 1.26952, 1e-5);
const n = optimalLitzStrandCount({ strandDiameter: 0.1e-3, ...winding });
console.log(`loss-minimising strand count of 0.1 mm strands: ${n}`);
if (n !== 193) throw new Error(`strand count ${n}`);
