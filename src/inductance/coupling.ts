/**
 * The coupling coefficient of two inductors from their mutual and self-inductances.
 *
 * @packageDocumentation
 */
import { InputError, requireFinite, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";

/**
 * Options of {@link couplingCoefficient}.
 *
 * @category Inductance
 */
export interface CouplingCoefficientOptions {
  /** Mutual inductance M [H], finite (negative for opposing winding sense). */
  readonly mutualInductance: number;
  /** Self-inductance L₁ [H], > 0. */
  readonly selfInductance1: number;
  /** Self-inductance L₂ [H], > 0. */
  readonly selfInductance2: number;
}

const COUPLING_FIELDS: readonly string[] = Object.freeze(["mutualInductance", "selfInductance1", "selfInductance2"]);

/**
 * Coupling coefficient of two inductors from their mutual and self-inductances.
 *
 * $$ k = \frac{M}{\sqrt{L_1 L_2}} $$
 *
 * @param options - {@link CouplingCoefficientOptions}: `mutualInductance` M [H], finite
 *   (negative for opposing winding sense); `selfInductance1` L₁ and `selfInductance2` L₂ [H], > 0
 * @returns the coupling coefficient k (dimensionless), −1 ≤ k ≤ 1
 * @throws {@link InputError} for non-finite input, non-positive self-inductances, unknown
 *   option keys, or |M| > √(L₁L₂) (beyond a relative rounding allowance of 1e-12), which no
 *   pair of real coils has
 * @remarks Exact (one division and a square root).
 * @see F. W. Grover, Inductance Calculations (1946), ch. 1 (general principles).
 * @example
 * ```ts
 * import { couplingCoefficient } from "fluxwright";
 * console.log(couplingCoefficient({ mutualInductance: 2e-6, selfInductance1: 4e-6, selfInductance2: 9e-6 })); // 0.3333333333333333
 * ```
 * @category Inductance
 */
export function couplingCoefficient(options: CouplingCoefficientOptions): number;
/**
 * Coupling coefficient $k = M/\sqrt{L_1 L_2}$ from three positional inputs (M, L₁, L₂ [H]).
 *
 * @deprecated Pass `{ mutualInductance, selfInductance1, selfInductance2 }`; the positional
 *   form goes at 1.0.
 * @param mutual - mutual inductance M [H]
 * @param selfInductance1 - self-inductance L₁ [H]
 * @param selfInductance2 - self-inductance L₂ [H]
 * @returns the coupling coefficient k
 * @category Inductance
 */
export function couplingCoefficient(mutual: number, selfInductance1: number, selfInductance2: number): number;
export function couplingCoefficient(first: CouplingCoefficientOptions | number, second?: number, third?: number): number {
  const where = "couplingCoefficient";
  let mutual: unknown = first;
  let l1Given: unknown = second;
  let l2Given: unknown = third;
  let names = ["mutual", "selfInductance1", "selfInductance2"] as const as readonly string[];
  if (typeof first === "object") {
    requireObject(where, "options", first);
    requireKnownKeys(where, "", first, COUPLING_FIELDS);
    mutual = first.mutualInductance;
    l1Given = first.selfInductance1;
    l2Given = first.selfInductance2;
    names = COUPLING_FIELDS;
  }
  const m = requireFinite(where, names[0]!, mutual, "H");
  const l1 = requirePositive(where, names[1]!, l1Given, "H");
  const l2 = requirePositive(where, names[2]!, l2Given, "H");
  // √L1·√L2 rather than √(L1·L2): the product may leave the double range
  const k = m / Math.sqrt(l1) / Math.sqrt(l2);
  if (Math.abs(k) > 1 + 1e-12) {
    throw new InputError(where, names[0]!, m, "H", `at most √(selfInductance1·selfInductance2) = ${Math.sqrt(l1) * Math.sqrt(l2)} in magnitude`);
  }
  return Math.max(-1, Math.min(1, k));
}
