/**
 * Coil of rectangular winding cross-section above a conducting, possibly magnetic, plate or
 * layered half-space: the Dodd & Deeds (1968) integral solution. Its types, input reading and
 * result assembly are in coil-over-plate-types.ts, -input.ts and -result.ts (re-exported here).
 *
 * @packageDocumentation
 */
import { requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { MU_0 } from "../units/index.js";
import { exponentialIntegralE5, gaussLegendreRule } from "../special/internal.js";
import { besselJ1MomentOverCube } from "./kernels.js";
import { layerArrays, reflectionInto } from "./layered-reflection.js";
import type { LayerArrays } from "./layered-reflection.js";
import { checkCoil, checkPlateLayers } from "./coil-over-plate-input.js";
import { assembleResult } from "./coil-over-plate-result.js";
import type { CoilAbovePlate, CoilOverPlateOptions, CoilOverPlateResult, PlateLayer } from "./coil-over-plate-types.js";

export { layerArrays, reflectionInto } from "./layered-reflection.js";
export type { LayerArrays } from "./layered-reflection.js";
export { checkCoil, checkPlateLayers } from "./coil-over-plate-input.js";
export { assembleResult } from "./coil-over-plate-result.js";
export type {
  CoilAbovePlate,
  // eslint-disable-next-line @typescript-eslint/no-deprecated -- exported until 1.0
  CoilAbovePlateWithHeight,
  CoilOverPlateOptions,
  CoilOverPlateResult,
  PlateLayer,
} from "./coil-over-plate-types.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const COIL_OVER_PLATE_FIELDS: readonly string[] = Object.freeze(["coil", "plate", "frequency"]);

const PANEL_NODES = 12;
/** The air-core sum runs to this multiple of the ΔZ sum's last wavenumber before its tail. */
const AIR_CORE_REACH = 4;
const RULE = gaussLegendreRule(PANEL_NODES);
const GL_NODES = RULE.nodes;
const GL_WEIGHTS = RULE.weights;

/** Smallest scale of α on which the integrand changes (coil length and radius, skin and thin-sheet scales). */
export function featureScale(coil: CoilAbovePlate, lay: LayerArrays): number {
  let scale = Math.min(1 / coil.length, 1 / coil.outerRadius);
  for (let i = 0; i < lay.k.length; i++) {
    const k = lay.k[i]!;
    const mu = lay.mu[i]!;
    const t = lay.t[i]!;
    scale = Math.min(scale, Math.sqrt(k) / mu);
    if (t < Infinity) scale = Math.min(scale, (k * t) / (2 * mu), 1 / (mu * t));
  }
  return scale;
}

/**
 * ψ(x) = (x + e^{−x} − 1)/x², the air-core factor of Dodd & Deeds divided by (αh)²: 1/2 at 0,
 * about 1/x for large x; a series below 0.1 (no cancellation), the closed form above.
 */
function psiAirCore(x: number): number {
  if (x < 0.1) return 0.5 + x * (-1 / 6 + x * (1 / 24 + x * (-1 / 120 + x * (1 / 720 + x * (-1 / 5040 + x * (1 / 40320 + x * (-1 / 362880 + x / 3628800)))))));
  return (x + Math.expm1(-x)) / (x * x);
}

/** ψ(5) = 1 + 1/2 + 1/3 + 1/4 − γ (digamma at 5). */
const DIGAMMA_5 = 25 / 12 - 0.5772156649015329;

/**
 * F(x0) = ∫_{x0}^∞ (x + e^{−x} − 1) x^{−5} dx = (x0/3 − 1/4 + E_5(x0))/x0⁴: the air-core tail
 * beyond the last panel with the radial factor replaced by its mean. Below 0.1 the power series
 * of E_5 (DLMF 8.19.8) is used, which removes the cancellation of the closed form.
 */
function airCoreTail(x0: number): number {
  if (x0 < 0.1) {
    return 1 / (4 * x0 * x0) - 1 / (6 * x0) + (DIGAMMA_5 - Math.log(x0)) / 24 + x0 * (1 / 120 + x0 * (-1 / 1440 + x0 / 15120));
  }
  return (x0 / 3 - 0.25 + exponentialIntegralE5(x0)) / x0 ** 4;
}

/**
 * Dodd–Deeds integrals for a checked coil and layer list at angular frequency omega:
 * returns [Re I, Im I, S] with ΔZ = jωπμ0 n² I and L0 = 2πμ0 (N/(r2 − r1))² S, where
 * S = ∫ q² (αh + e^{−αh} − 1)/h² dα is summed as one integrand (finite as h → 0: the flat
 * current-sheet limit), not as the difference h K + J of two O(h) terms.
 */
function doddDeedsIntegrals(coil: CoilAbovePlate, layers: readonly PlateLayer[], omega: number): [number, number, number] {
  const r1 = coil.innerRadius;
  const r2 = coil.outerRadius;
  const l1 = coil.liftOff;
  const h = coil.length;
  const l2 = l1 + h;
  const lay = layerArrays(layers, omega);
  const scale = featureScale(coil, lay);
  const gamma = new Float64Array(2);

  // panels: uniform width w up to aMax, the first one graded geometrically towards 0
  let w = Math.PI / r2;
  if (l1 > 0) w = Math.min(w, 5 / l1);
  const aMax = (40 * Math.PI) / r2;
  const aExp = l1 > 0 ? 20 / l1 : Infinity; // beyond it the ΔZ integrand is below 1e-17 of its peak

  let sumRe = 0;
  let sumIm = 0;
  let sumJ = 0;

  const panel = (a: number, b: number, airOnly = false): void => {
    const half = 0.5 * (b - a);
    const mid = 0.5 * (b + a);
    const wantDz = a < aExp && !airOnly;
    for (let i = 0; i < PANEL_NODES; i++) {
      const alpha = mid + half * GL_NODES[i]!;
      const wt = half * GL_WEIGHTS[i]!;
      const r23 = r2 * r2 * r2;
      const r13 = r1 * r1 * r1;
      const q = r23 * besselJ1MomentOverCube(alpha * r2) - (r1 > 0 ? r13 * besselJ1MomentOverCube(alpha * r1) : 0);
      const q2 = q * q;
      // air core: q² (αh + e^{−αh} − 1)/h² = q² α² ψ(αh), with no cancellation for thin windings
      sumJ += wt * q2 * alpha * alpha * psiAirCore(alpha * h);
      if (!wantDz) continue;
      const de = Math.exp(-alpha * l1) * -Math.expm1(-alpha * h);
      const f = wt * q2 * de * de;
      if (f === 0) continue;
      reflectionInto(alpha, lay, gamma);
      sumRe += f * gamma[0]!;
      sumIm += f * gamma[1]!;
    }
  };

  // graded panels inside [0, w]
  let lo = w;
  const floor = scale / 8;
  let levels = 0;
  while (lo / 2 > floor && levels < 40) {
    panel(lo / 2, lo);
    lo /= 2;
    levels++;
  }
  panel(0, lo);
  let a = w;
  while (a < aMax) {
    // beyond aExp only the air-core integrand remains: one oscillation period per panel is enough
    const b = Math.min(a + (a < aExp ? w : Math.PI / r2), aMax);
    panel(a, b);
    a = b;
  }
  // the air-core integrand decays only as α⁻³ (thin windings): sum it further before its tail
  const aAir = AIR_CORE_REACH * aMax;
  while (a < aAir) {
    // two oscillation periods per 12-point panel: smooth enough there (checked against the fixture)
    const b = Math.min(a + (4 * Math.PI) / r2, aAir);
    panel(a, b, true);
    a = b;
  }
  // tails beyond aMax (ΔZ) and aAir (air core) from the mean of the radial factor, (r1 + r2)/(π α^5)
  const c = (r1 + r2) / (Math.PI * aMax ** 4);
  sumJ += ((r1 + r2) / Math.PI) * h * h * airCoreTail(aAir * h);
  if (aMax < aExp) {
    reflectionInto(aMax, lay, gamma);
    const tail = c * (exponentialIntegralE5(2 * aMax * l1) - 2 * exponentialIntegralE5(aMax * (l1 + l2)) + exponentialIntegralE5(2 * aMax * l2));
    sumRe += tail * gamma[0]!;
    sumIm += tail * gamma[1]!;
  }
  return [sumRe, sumIm, sumJ];
}

/**
 * Impedance change of a coil of rectangular winding cross-section above a conducting,
 * possibly magnetic, plate or layered half-space — the pancake coil of induction hobs and
 * plate warmers, and the eddy-current probe — by the Dodd & Deeds (1968) integral.
 *
 * With $n = N/((r_2 - r_1)h)$ turns per unit cross-section, lift-off $l_1$, $l_2 = l_1 + h$ and
 * the radial coil integral $\chi(\alpha) = \int_{\alpha r_1}^{\alpha r_2} x J_1(x)\,dx$:
 *
 * $$
 * \Delta Z = j\omega\pi\mu_0 n^2 \int_0^\infty \Gamma(\alpha)\,
 *   \frac{\chi(\alpha)^2 \left(e^{-\alpha l_1} - e^{-\alpha l_2}\right)^2}{\alpha^6}\,d\alpha,
 * \qquad
 * L_0 = 2\pi\mu_0 n^2 \int_0^\infty \frac{\chi(\alpha)^2\,(\alpha h + e^{-\alpha h} - 1)}{\alpha^6}\,d\alpha
 * $$
 *
 * where the reflection coefficient is $\Gamma = (\alpha - Y_1)/(\alpha + Y_1)$, and the surface
 * admittance $Y$ of the layers follows from the bottom up: $Y = \alpha_i/\mu_{r,i}$ for a
 * half-space (or $\alpha$ for the air below a plate), and through a layer of thickness $t_i$,
 * with $\alpha_i = \sqrt{\alpha^2 + j\omega\mu_0\mu_{r,i}/\rho_i}$, $Y_c = \alpha_i/\mu_{r,i}$,
 * $g = \frac{Y_c - Y}{Y_c + Y}e^{-2\alpha_i t_i}$: $Y \leftarrow Y_c(1-g)/(1+g)$.
 *
 * The integral is taken with 12-point Gauss–Legendre panels one period of the fastest
 * oscillation wide (graded towards α = 0 to resolve the material's own scales) up to
 * $\alpha = 40\pi/r_2$, plus the tails from the mean of $\chi^2$, and for $L_0$ the closed form
 * $\int_0^\infty \chi^2/\alpha^5\,d\alpha = \tfrac{1}{3}\left[\tfrac{r_2^4 - r_1^4}{4} - r_1^3(r_2 - r_1)\right]$.
 *
 * Hard domain (throws {@link InputError}): radii 0 ≤ innerRadius < outerRadius, length > 0,
 * liftOff ≥ 0, turns an integer ≥ 1, frequency > 0, each layer's thickness > 0 (only the last may
 * be `Infinity`), resistivity > 0, relativePermeability ≥ 1.
 * Validity: axisymmetric coil, plate laterally much wider than the coil (a few outer radii
 * beyond it), linear materials of constant permeability, uniform current density in the
 * winding (no proximity effect inside it), frequencies far below the winding's self-resonance.
 * Notes are returned for magnetic layers and for a coil that touches the plate.
 *
 * Accuracy: ≤ 1e-6 relative to |ΔZ| and to $L_0$ vs an mpmath evaluation of the same integrals
 * (fixture `test/fixtures/workpiece/plate.json`); $L_0$ matches
 * `multilayerCoilInductance` of the inductance module within the same tolerance, and for thin
 * windings (length down to 10 nm, and the flat current-sheet limit it tends to) ≤ 1e-6 vs a scipy
 * quadrature (fixture `test/fixtures/workpiece/thin-air-core/`): $L_0$ is summed as one integrand
 * $\int q^2(\alpha h + e^{-\alpha h} - 1)/h^2\,d\alpha$, not as a difference of two $O(h)$ terms. About
 * 0.6 ms per frequency point (CPU time, random pancake geometries).
 *
 * @param options - coil, plate and frequency, see {@link CoilOverPlateOptions}
 * @returns the impedance change [Ω], inductance change and air-core inductance [H], and the
 *   terminal impedance without winding resistance [Ω]
 * @throws {@link InputError} for values outside the hard domain
 * @see C. V. Dodd and W. E. Deeds, "Analytical solutions to eddy-current probe-coil problems",
 *   J. Appl. Phys. 39 (1968) 2829–2838 (coil above a two-conductor plane, and the air-core
 *   inductance); the many-layer recursion is the same transmission-line form written for any
 *   number of layers.
 * @example
 * ```ts
 * import { coilOverPlate } from "fluxwright";
 * // pancake coil 20 turns, 10–30 mm radius, 4 mm above a 3 mm aluminium-alloy plate, 20 kHz
 * const r = coilOverPlate({
 *   coil: { innerRadius: 0.01, outerRadius: 0.03, liftOff: 0.004, length: 0.01, turns: 20 },
 *   plate: { thickness: 0.003, resistivity: 3e-8, relativePermeability: 1 },
 *   frequency: 2e4,
 * });
 * console.log(r.reflectedResistance.toPrecision(4)); // 0.02157
 * console.log(r.inductanceChange < 0); // true
 * ```
 * @category Workpiece
 */
export function coilOverPlate(options: CoilOverPlateOptions): CoilOverPlateResult {
  const where = "coilOverPlate";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, COIL_OVER_PLATE_FIELDS);
  const coil = checkCoil(where, options.coil);
  const layers = checkPlateLayers(where, options.plate);
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  return coilOverLayers(coil, layers, f);
}

/** The computation of {@link coilOverPlate} on checked input (used by the temperature helper). */
export function coilOverLayers(coil: CoilAbovePlate, layers: readonly PlateLayer[], f: number): CoilOverPlateResult {
  const omega = 2 * Math.PI * f;
  const [iRe, iIm, sheet] = doddDeedsIntegrals(coil, layers, omega);
  const perWidth = coil.turns / (coil.outerRadius - coil.innerRadius);
  return assembleResult(coil, layers, omega, iRe, iIm, 0, 2 * Math.PI * MU_0 * perWidth * perWidth * sheet);
}

