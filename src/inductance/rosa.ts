/**
 * Rosa's round-wire corrections A and B for single-layer solenoids.
 *
 * @packageDocumentation
 */
import { requireInRange, requireInteger } from "../core/index.js";

/**
 * Rosa's correction A: the self-inductance of one turn of round wire of diameter d minus that
 * of a current strip of width p (the pitch), in units of μ₀ × turn radius.
 *
 * $$ A = \frac{5}{4} - \ln\frac{2p}{d} $$
 *
 * @param pitchOverDiameter - pitch / wire diameter p/d, ≥ 1 (turns do not overlap)
 * @returns A (dimensionless); negative when p/d > e^{5/4}/2 ≈ 1.745
 * @throws {@link InputError} when p/d is not finite or below 1
 * @remarks Exact for the defining formula; the formula itself assumes wire and pitch small
 * compared with the coil radius and uniform current in the wire (low frequency).
 * @see E. B. Rosa, "The self and mutual inductances of linear conductors", Bull. Bur. Stand. 4 (1908)
 *   and Rosa, Bull. Bur. Stand. 2, 161 (1906); F. W. Grover, Inductance Calculations (1946), the table of A (table number not confirmed).
 * @example
 * ```ts
 * import { rosaCorrectionA } from "fluxwright";
 * console.log(rosaCorrectionA(1).toFixed(4)); // 0.5569
 * ```
 * @category Inductance
 */
export function rosaCorrectionA(pitchOverDiameter: number): number {
  const r = requireInRange("rosaCorrectionA", "pitchOverDiameter", pitchOverDiameter, "", 1, Infinity, "[)");
  return 1.25 - Math.log(2 * r);
}

/** ln s − ln g_s for two strips of unit width at centre distance s ≥ 1 (g_s their GMD). */
function stripCorrection(s: number): number {
  if (s < 4) {
    // ln g_s = [(s+1)^2 ln(s+1) - 2 s^2 ln s + (s-1)^2 ln(s-1)]/2 - 3/2
    const sp = s + 1;
    const sm = s - 1;
    const lng = (sp * sp * Math.log(sp) - 2 * s * s * Math.log(s) + (sm > 0 ? sm * sm * Math.log(sm) : 0)) / 2 - 1.5;
    return Math.log(s) - lng;
  }
  // sum_j s^{-2j} / (j (2j+1)(2j+2)), converges for s > 1
  const x = 1 / (s * s);
  let p = x;
  let total = 0;
  for (let j = 1; j < 40; j++) {
    const term = p / (j * (2 * j + 1) * (2 * j + 2));
    total += term;
    if (term < 1e-18 * total) break;
    p *= x;
  }
  return total;
}

/** Bernoulli numbers B2, B4, B6, B8 over (2k)!: Euler–Maclaurin coefficients. */
const EM = [1 / 12, -1 / 720, 1 / 30240, -1 / 1209600];

/** Σ_{s=a}^{b} s^{-p} for integers 64 ≤ a ≤ b, p ≥ 1, by Euler–Maclaurin (error < 1e-18 relative). */
function powerSum(p: number, a: number, b: number): number {
  if (b < a) return 0;
  const integral = p === 1 ? Math.log(b / a) : (Math.pow(a, 1 - p) - Math.pow(b, 1 - p)) / (p - 1);
  let total = integral + 0.5 * (Math.pow(a, -p) + Math.pow(b, -p));
  // f^{(2k-1)}(x) = -p(p+1)...(p+2k-2) x^{-p-2k+1}
  let coef = p; // p (p+1) ... (p + 2k - 2)
  for (let k = 1; k <= 4; k++) {
    const q = p + 2 * k - 1;
    total += (EM[k - 1] as number) * (-coef) * (Math.pow(b, -q) - Math.pow(a, -q));
    coef *= (p + 2 * k - 1) * (p + 2 * k);
  }
  return total;
}

/**
 * Rosa's correction B: the mutual inductances of the current strips of a current-sheet solenoid
 * minus those of the round-wire turns, per turn, in units of μ₀ × coil radius.
 *
 * $$ B = \frac{2}{N}\sum_{s=1}^{N-1}(N-s)\left(\ln s - \ln g_s\right),\quad
 * \ln g_s = \tfrac12\left[(s+1)^2\ln(s+1) - 2s^2\ln s + (s-1)^2\ln(s-1)\right] - \tfrac32 $$
 *
 * where g_s/p is the geometric mean distance of two coplanar strips of width p whose centres are
 * s p apart. Summed exactly for s < 64; beyond, $\ln s - \ln g_s = \sum_j s^{-2j}/(j(2j+1)(2j+2))$
 * and the power sums by Euler–Maclaurin, so the cost does not grow with N.
 *
 * @param turns - number of turns N, an integer ≥ 1
 * @returns B (dimensionless): 0 for one turn, 0.1137 for two, rising to 0.3269 at 100 turns and towards 0.3379 for very many
 * @throws {@link InputError} when turns is not an integer ≥ 1
 * @remarks Accuracy ≤ 1e-12 relative vs the defining sum evaluated in mpmath (fixture rosa.json).
 * @see E. B. Rosa, Bull. Bur. Stand. 2, 161 (1906); F. W. Grover, Inductance Calculations (1946), p. 150 (table of B).
 * @example
 * ```ts
 * import { rosaCorrectionB } from "fluxwright";
 * console.log(rosaCorrectionB(2).toFixed(4)); // 0.1137
 * ```
 * @category Inductance
 */
export function rosaCorrectionB(turns: number): number {
  const n = requireInteger("rosaCorrectionB", "turns", turns, 1);
  return rosaB(n);
}

/** Unchecked B(N). */
export function rosaB(n: number): number {
  const direct = Math.min(n - 1, 63);
  let s1 = 0;
  let s2 = 0;
  for (let s = 1; s <= direct; s++) {
    const d = stripCorrection(s);
    s1 += d;
    s2 += s * d;
  }
  if (n - 1 > 63) {
    // tail s = 64 .. n-1 of sum (1 - s/n) delta_s with delta_s = sum_j c_j s^{-2j}
    for (let j = 1; j <= 8; j++) {
      const cj = 1 / (j * (2 * j + 1) * (2 * j + 2));
      s1 += cj * powerSum(2 * j, 64, n - 1);
      s2 += cj * powerSum(2 * j - 1, 64, n - 1);
    }
  }
  return 2 * s1 - (2 * s2) / n;
}
