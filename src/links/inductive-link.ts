/**
 * Compensated inductive power links: two coupled coils with series, parallel or LCC
 * compensation on each side, solved exactly as a linear phasor network. The types are in
 * `inductive-link-types.ts`, the option reading in `inductive-link-input.ts`, the phasor solve in
 * `inductive-link-solve.ts`.
 *
 * @packageDocumentation
 */
import { compensationCode, inductiveLinkChecked, linkFieldsKnown } from "./inductive-link-input.js";
import { setLinkArguments, solveLink } from "./inductive-link-solve.js";
import type { InductiveLink, InductiveLinkOptions } from "./inductive-link-types.js";

export type { InductiveLink, InductiveLinkOptions, LinkCapacitor, LinkCompensation } from "./inductive-link-types.js";

/**
 * The sinusoidal steady state of a compensated two-coil inductive link driven by a sinusoidal
 * voltage source, solved exactly as a linear phasor network. With $Z_2$ the secondary loop
 * impedance (coil, compensation, load) the primary sees the reflected impedance
 * $$ Z_\mathrm{ref} = \frac{(\omega M)^2}{Z_2},\qquad I_2 = \frac{j\omega M I_1}{Z_2} $$
 * and the primary network is reduced around $R_1 + j\omega L_1 + Z_\mathrm{ref}$. Secondary
 * side: series $Z = 1/(j\omega C_2) + R_L$; parallel $Z = R_L \parallel 1/(j\omega C_2)$; LCC
 * $Z = 1/(j\omega C_2) + [1/(j\omega C_{f2}) \parallel (j\omega L_{f2} + R_L)]$. Primary side:
 * series $Z_\mathrm{in} = 1/(j\omega C_1) + Z_b$; parallel $Z_\mathrm{in} = 1/(j\omega C_1)\parallel Z_b$;
 * LCC $Z_\mathrm{in} = j\omega L_{f1} + 1/(j\omega C_{f1}) \parallel (1/(j\omega C_1) + Z_b)$.
 *
 * Default capacitors: secondary series or parallel $C_2 = 1/(\omega^2L_2)$; LCC filter
 * capacitors $C_f = 1/(\omega^2L_f)$ and series $C = 1/(\omega^2(L - L_f))$ (the coil current is
 * then independent of the load); a primary series or parallel $C_1$ makes the input impedance
 * real at the given load (for series–series this is $1/(\omega^2L_1)$, for series–parallel with
 * $R_2 = 0$ the classic $1/(\omega^2(L_1 - M^2/L_2))$).
 *
 * @param options - {@link InductiveLinkOptions} (H, Ω, Hz, V, F)
 * @returns the {@link InductiveLink} (W, A, V, Ω)
 * @throws {@link InputError} for a non-finite or out-of-range value, M ≥ √(L₁L₂), an unknown
 *   option key or compensation, a missing or too large filter inductance, or a default
 *   capacitor that would have to be negative, or inputs so extreme (a frequency of 1e-300 Hz, a
 *   source of 1e300 V) that a result would leave the double range: refused, never answered with
 *   Infinity or NaN
 * @remarks Exact for the linear circuit (no approximation): ≤ 1e-12 relative, every result field
 * and every capacitor's capacitance, voltage and current, vs a 40-digit mpmath mesh solve of 360
 * seeded links with default and given capacitors (fixture test/fixtures/links/tuned.json; largest
 * error measured 1.1e-13, on an ill-conditioned parallel–parallel link) and vs an independent
 * numpy mesh solve (test/fixtures/links/phasor.json); input power = output power + coil losses to
 * 1e-12. A default capacitor's cancellation is written exactly: with a default primary series or
 * parallel capacitor the input reactance is exactly 0. Validity: lumped, linear components at a
 * single frequency; a square-wave inverter is represented by its fundamental.
 * @see C.-S. Wang, O. H. Stielau, G. A. Covic, "Design considerations for a contactless electric
 *   vehicle battery charger", IEEE Trans. Ind. Electron. 52(5), October 2005, from p. 1308 (title,
 *   journal, issue and first page read from the paper's first page; its primary and secondary
 *   resonant topologies SS, SP, PS, PP; the capacitor rules from memory); S. Li, W. Li, J. Deng,
 *   T. D. Nguyen, C. C. Mi, "A Double-Sided LCC Compensation Network and Its Tuning Method for
 *   Wireless Power Transfer", IEEE Trans. Veh. Technol., doi 10.1109/TVT.2014.2347006 (title and
 *   DOI read from the accepted manuscript, whose abstract states the tuning that makes the
 *   resonant frequency independent of coupling and load; volume 64(6), pp. 2261–2273 (2015) from memory).
 * @example
 * ```ts
 * import { inductiveLink } from "fluxwright";
 * const link = inductiveLink({
 *   primaryInductance: 24e-6, secondaryInductance: 12e-6, mutualInductance: 4e-6,
 *   primaryResistance: 0.1, secondaryResistance: 0.08, frequency: 140e3,
 *   compensation: "series-series", loadResistance: 5, sourceVoltage: 10,
 * });
 * console.log(link.efficiency.toFixed(4)); // 0.9455
 * console.log(link.outputPower.toFixed(3)); // 37.265
 * ```
 * @category Inductive links
 */
export function inductiveLink(options: InductiveLinkOptions): InductiveLink {
  // fast path: every check inline (no calls), the known-key test by constant comparisons
  if ((options as unknown) != null && typeof options === "object") {
    const l1 = options.primaryInductance;
    const l2 = options.secondaryInductance;
    const m = options.mutualInductance;
    const r1 = options.primaryResistance;
    const r2 = options.secondaryResistance;
    const f = options.frequency;
    const rl = options.loadResistance;
    const v = options.sourceVoltage;
    const c1 = options.primaryCapacitance;
    const c2 = options.secondaryCapacitance;
    const lf1 = options.primaryFilterInductance;
    const lf2 = options.secondaryFilterInductance;
    const code = compensationCode(options.compensation);
    // √(L₁L₂) once, for the bound on M and for k (NaN unless both are numbers: nothing coerced,
    // and the first test below fails before any comparison touches them)
    const root = typeof l1 === "number" && typeof l2 === "number" ? Math.sqrt(l1 * l2) : NaN;
    // the fast path takes a box inside which every result is finite (1 pH ≤ L ≤ 1 kH, k ≥ 1e-6,
    // R ≤ 1 MΩ, 1 mHz ≤ f ≤ 1 THz, 1 nΩ ≤ R_L ≤ 1 TΩ, 1 nV ≤ V ≤ 1 GV, 1e-9 ≤ L_f/L ≤ 1 − 1e-9, default
    // capacitors; test/links/links.props.test.ts samples its corners); outside it the checked
    // path solves and then verifies every result
    if (
      root > 0 && typeof m === "number" && typeof r1 === "number" &&
      typeof r2 === "number" && typeof f === "number" && typeof rl === "number" && typeof v === "number" &&
      l1 >= 1e-12 && l1 <= 1e3 && l2 >= 1e-12 && l2 <= 1e3 && m >= 1e-6 * root && m < root &&
      r1 >= 0 && r1 <= 1e6 && r2 >= 0 && r2 <= 1e6 && f >= 1e-3 && f <= 1e12 &&
      rl >= 1e-9 && rl <= 1e12 && v >= 1e-9 && v <= 1e9 && code >= 0 &&
      c1 === undefined && c2 === undefined &&
      ((code & 4) === 0 ? lf1 === undefined : typeof lf1 === "number" && lf1 >= 1e-9 * l1 && lf1 <= 0.999999999 * l1) &&
      ((code & 8) === 0 ? lf2 === undefined : typeof lf2 === "number" && lf2 >= 1e-9 * l2 && lf2 <= 0.999999999 * l2) &&
      linkFieldsKnown(options)
    ) {
      setLinkArguments(l1, l2, m, r1, r2, f, rl, v, 0, 0, lf1 ?? 0, lf2 ?? 0, root);
      return solveLink(code);
    }
  }
  return inductiveLinkChecked(options);
}

