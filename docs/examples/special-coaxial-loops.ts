/**
 * Two ways to the mutual inductance of two coaxial circular loops, used as a cross-check of
 * the special-function kernels: Maxwell's closed form with complete elliptic integrals
 * (parameter m = k²), and the Bessel-integral form that Dodd–Deeds-type solutions generalise,
 * integrated over the separation constant with integrateToInfinity.
 *
 *   M = μ0 √(ab) [ (2/k − k) K(m) − (2/k) E(m) ],  m = k² = 4ab / ((a + b)² + d²)
 *   M = μ0 π a b ∫₀^∞ J₁(αa) J₁(αb) e^(−α d) dα
 *
 * (Both forms from memory, as given e.g. by W. R. Smythe, Static and Dynamic Electricity, 1950,
 * and F. W. Grover, Inductance Calculations, 1946.) Scenario (invented): two 40 mm and 45 mm
 * loops of a wireless-power pad, 5 mm apart, then pushed to near-contact where m → 1.
 *
 * Run: npx tsx docs/examples/special-coaxial-loops.ts
 */
import { MU_0, ellipticE, ellipticK, besselJ1, integrateToInfinity } from "../../src/index.js";

function maxwell(a: number, b: number, d: number): number {
  const m = (4 * a * b) / ((a + b) ** 2 + d * d);
  const k = Math.sqrt(m);
  return MU_0 * Math.sqrt(a * b) * ((2 / k - k) * ellipticK(m) - (2 / k) * ellipticE(m));
}

function besselIntegral(a: number, b: number, d: number): number {
  const r = integrateToInfinity((alpha) => besselJ1(alpha * a) * besselJ1(alpha * b) * Math.exp(-alpha * d), 0, {
    intervalLength: Math.PI / Math.max(a, b), // about half a period of the faster Bessel factor
    relativeTolerance: 1e-10,
  });
  if (!r.converged) throw new Error("Bessel integral did not converge");
  return MU_0 * Math.PI * a * b * r.value;
}

for (const [a, b, d] of [
  [0.02, 0.0225, 0.005],
  [0.02, 0.0225, 0.0005],
  [0.02, 0.0201, 0.0002],
] as const) {
  const m1 = maxwell(a, b, d);
  const m2 = besselIntegral(a, b, d);
  const k2 = (4 * a * b) / ((a + b) ** 2 + d * d);
  console.log(`a=${a} b=${b} d=${d}: m = ${k2.toFixed(6)}, M = ${m1.toExponential(9)} H (elliptic), ${m2.toExponential(9)} H (Bessel integral)`);
  if (!(Math.abs(m1 - m2) <= 1e-8 * m1)) throw new Error(`methods disagree: ${m1} vs ${m2}`);
}
