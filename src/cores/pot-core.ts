/**
 * The pot core from its dimensions.
 *
 * @packageDocumentation
 */
import { requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import { add, corner, finish, requireLess } from "./shape-sums.js";
import type { Sums } from "./shape-sums.js";
import type { CoreShape } from "./shapes.js";

/** Accepted fields of {@link potCore}. */
const POT_FIELDS: readonly string[] = Object.freeze([
  "outerDiameter",
  "windowOuterDiameter",
  "postDiameter",
  "postHoleDiameter",
  "height",
  "windowHeight",
]);

/**
 * Dimensions of one pot-core half; the core is a pair of identical halves.
 *
 * @category Cores
 */
export interface PotCoreOptions {
  /** Outer diameter [m], > windowOuterDiameter. */
  readonly outerDiameter: number;
  /** Inner diameter of the outer wall (window's outer edge) [m], > postDiameter. */
  readonly windowOuterDiameter: number;
  /** Diameter of the centre post [m], > postHoleDiameter. */
  readonly postDiameter: number;
  /** Diameter of the hole through the post [m], ≥ 0 (default 0). */
  readonly postHoleDiameter?: number;
  /** Height of one half [m], > windowHeight. */
  readonly height: number;
  /** Depth of the window in one half [m], > 0. */
  readonly windowHeight: number;
}

/**
 * A pot core pair: centre post and outer wall (axial flux), the two bases (radial flux,
 * integrated exactly as IEC 60205 does for radial sections) and four corner allowances.
 *
 * $$
 * C_1^{\text{base}} = \frac{\ln(r_2/r_p)}{2\pi t},\qquad C_2^{\text{base}} = \frac{1/r_p - 1/r_2}{4\pi^2 t^2}
 * \quad(\text{each of two bases, } t = \text{height} - \text{windowHeight})
 * $$
 *
 * plus posts $\lbrace 2h_w, \pi(r_p^2 - r_h^2)\rbrace$, wall $\lbrace 2h_w, \pi(r_3^2 - r_2^2)\rbrace$ and corners
 * (quarter circles through the limb mid-lines, area the mean of the adjoining areas, recalled from
 * memory). Wire slots are not modelled. Window area $(r_2 - r_p) 2h_w$, mean turn $\pi(r_p + r_2)$,
 * surface the closed cylinder.
 *
 * Hard domain (throws {@link InputError}): a dimension not finite and > 0 (hole ≥ 0); the
 * diameters not strictly decreasing outer > window > post > hole; windowHeight ≥ height.
 * Accuracy: against the axisymmetric finite-element fixture test/fixtures/cores/pot-gap.json
 * (ungapped, μr = 2000) $\mu_0\mu_r/C_1$ is 11.6 % below the field solution's inductance
 * factor (tolerance 12 %): the corner allowances lengthen the path more than the flux does.
 * Against the parameters printed for P 22/13 (IEC 60205 with its wire slots) within 5 %
 * (measured: $C_1$ 4.5 % low, $l_e$ 2.5 % low, $A_e$ 2.2 % high; fixture
 * test/fixtures/cores/datasheet-cores.json).
 *
 * @param options - {@link PotCoreOptions} [m]
 * @returns {@link CoreShape}
 * @throws {@link InputError} on bad input
 * @see IEC 60205:2016, clause 7 (pot cores: radial sections and corners).
 * @example
 * ```ts
 * import { potCore } from "fluxwright";
 * const p = potCore({ outerDiameter: 0.022, windowOuterDiameter: 0.018, postDiameter: 0.0092, height: 0.0058, windowHeight: 0.0036 });
 * console.log(p.windowHeight, p.legShape); // 0.0072 round
 * ```
 * @category Cores
 */
export function potCore(options: PotCoreOptions): CoreShape {
  const where = "potCore";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, POT_FIELDS);
  const d1 = requirePositive(where, "outerDiameter", options.outerDiameter, "m");
  const d2 = requirePositive(where, "windowOuterDiameter", options.windowOuterDiameter, "m");
  const d3 = requirePositive(where, "postDiameter", options.postDiameter, "m");
  const d4 = options.postHoleDiameter === undefined ? 0 : requireNonNegative(where, "postHoleDiameter", options.postHoleDiameter, "m");
  const height = requirePositive(where, "height", options.height, "m");
  const hw = requirePositive(where, "windowHeight", options.windowHeight, "m");
  requireLess(where, "windowOuterDiameter", d2, "outerDiameter", d1);
  requireLess(where, "postDiameter", d3, "windowOuterDiameter", d2);
  requireLess(where, "postHoleDiameter", d4, "postDiameter", d3);
  requireLess(where, "windowHeight", hw, "height", height);
  const r3 = d1 / 2;
  const r2 = d2 / 2;
  const rp = d3 / 2;
  const rh = d4 / 2;
  const t = height - hw;
  const postArea = Math.PI * (rp * rp - rh * rh);
  const wallArea = Math.PI * (r3 * r3 - r2 * r2);
  const sums: Sums = { c1: 0, c2: 0 };
  add(sums, 2 * hw, postArea);
  add(sums, 2 * hw, wallArea);
  // Two bases, radial flux between the post and the wall.
  sums.c1 += (2 * Math.log(r2 / rp)) / (2 * Math.PI * t);
  sums.c2 += (2 * (1 / rp - 1 / r2)) / (4 * Math.PI * Math.PI * t * t);
  const basePost = 2 * Math.PI * rp * t;
  const baseWall = 2 * Math.PI * r2 * t;
  for (let k = 0; k < 2; k++) {
    corner(sums, rp - rh, t, postArea, basePost);
    corner(sums, r3 - r2, t, wallArea, baseWall);
  }
  return finish(sums, {
    minimumArea: Math.min(postArea, wallArea, basePost),
    windowArea: (r2 - rp) * 2 * hw,
    windowHeight: 2 * hw,
    windowWidth: r2 - rp,
    meanTurnLength: Math.PI * (rp + r2),
    surfaceArea: 2 * Math.PI * r3 * 2 * height + 2 * Math.PI * r3 * r3,
    legArea: postArea,
    legShape: "round",
    legWidth: d3,
    legDepth: d3,
  });
}
