/**
 * Kelvin functions in their natural job: the AC/DC resistance ratio of an isolated round
 * wire (the classic Bessel-function skin-effect solution), evaluated from kelvinFunctions for
 * moderate arguments and from kelvinFunctionsScaled far beyond the range where ber and bei
 * overflow. Checked against the two textbook limits (from memory; common practice):
 *
 *   Rac/Rdc = (x/2) · (ber x · bei′x − bei x · ber′x) / (ber′x² + bei′x²),  x = √2 · r/δ
 *   Rac/Rdc → 1 + x⁴/192             (x → 0)
 *   Rac/Rdc → x/(2√2) + 1/4 + …      (x → ∞)
 *
 * Scenario (invented): a 1.6 mm copper winding wire of a plate-warmer coil, at a sweep of
 * frequencies. The ratio only needs x, so x is swept directly here.
 *
 * Run: npx tsx docs/examples/special-kelvin-skin-effect.ts
 */
import { kelvinFunctions, kelvinFunctionsScaled } from "../../src/index.js";

function acRatio(x: number): number {
  // The scaled forms carry one common factor e^{−x/√2} on ber, bei, ber′, bei′; it cancels here.
  const k = x < 600 ? kelvinFunctions(x) : kelvinFunctionsScaled(x);
  return ((x / 2) * (k.ber * k.beiPrime - k.bei * k.berPrime)) / (k.berPrime ** 2 + k.beiPrime ** 2);
}

function check(name: string, value: number, expected: number, rtol: number): void {
  console.log(`${name}: ${value.toPrecision(10)} (limit ${expected.toPrecision(10)})`);
  if (!(Math.abs(value / expected - 1) <= rtol)) throw new Error(`${name}: ${value} vs ${expected}`);
}

// Low-frequency limit: the next term is O(x⁸), so at x = 0.1 the agreement is ~1e-10.
check("x = 0.1", acRatio(0.1), 1 + 0.1 ** 4 / 192, 1e-9);
// High-frequency limit: the next term is O(1/x), about 1.3e-4 at x = 1000 (relative 4e-7).
check("x = 1000", acRatio(1000), 1000 / (2 * Math.SQRT2) + 0.25, 1e-6);
// Far beyond overflow of ber/bei (e^{x/√2} with x = 1e5): only the scaled forms can do this.
check("x = 1e5", acRatio(1e5), 1e5 / (2 * Math.SQRT2) + 0.25, 1e-10);
// The ratio rises monotonically with x.
let previous = 1;
for (let x = 0.5; x < 50; x += 0.5) {
  const r = acRatio(x);
  if (!(r > previous)) throw new Error(`ratio not increasing at x = ${x}`);
  previous = r;
}
console.log("monotone on 0.5 ≤ x < 50: ok");
