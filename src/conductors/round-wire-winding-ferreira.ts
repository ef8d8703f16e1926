/**
 * AC resistance factor of a multilayer winding of round wire: Ferreira's orthogonal skin +
 * proximity model with exact round-wire (Kelvin-function) factors.
 *
 * @packageDocumentation
 */
import { MU_0 } from "../units/index.js";
import { wireProximityFactorKernel, wireSkinFactorKernel } from "./round-wire-kernels.js";
import { checkWinding } from "./round-wire-winding.js";
import type { RoundWireWindingOptions, RoundWireWindingOptionsWithWidth } from "./round-wire-winding.js";

/**
 * Ferreira's AC-to-DC resistance ratio of a round-wire winding: skin and proximity losses of
 * the round wire are orthogonal and are computed exactly for a round conductor (Kelvin
 * functions), with the wire in layer k of m exposed to the uniform transverse field
 * $H_k = \tfrac{2k-1}{2}\, N_l I / w$ (the mean of the fields on its two sides):
 *
 * $$
 * F_R = \frac{q}{2} \frac{\mathrm{ber}\,q\, \mathrm{bei}'q - \mathrm{bei}\,q\, \mathrm{ber}'q}{\mathrm{ber}'^2 q + \mathrm{bei}'^2 q}
 *  + \frac{\pi^2 \eta^2 (4m^2 - 1)}{12}\, q\, \frac{\mathrm{ber}\,q\, \mathrm{ber}'q + \mathrm{bei}\,q\, \mathrm{bei}'q}{\mathrm{ber}^2 q + \mathrm{bei}^2 q}
 * $$
 *
 * with $q = d/(\sqrt{2}\,\delta)$ and porosity $\eta = N_l d / w$. The first term is the
 * skin effect of the isolated wire ({@link roundWireAcRatio}); the second is the eddy loss of a
 * round wire in a uniform transverse field, summed over layers. Low-frequency limit of the
 * proximity term: $\pi^2 \eta^2 (4m^2-1)(d/\delta)^4/768$; high-frequency limit:
 * $\pi^2 \eta^2 (4m^2-1)\, d/(24\,\delta)$.
 *
 * Hard domain: as {@link roundWireWindingAcRatio}. Validity: one-dimensional layer field;
 * each wire sees a uniform field and keeps the isolated-wire field pattern (it ignores the
 * neighbours' screening, which matters for closely packed wires with d ≫ δ). Agrees with the
 * equivalent-foil model within 4 % for d ≤ 1.5 δ (tested within 10 % for d < δ) and reads
 * higher beyond 2 δ (by 15–100 % at 3–5 δ in multilayer windings); its skin term is the exact
 * round-wire value, so for one or two layers and d ≳ δ it is the better of the two.
 *
 * Accuracy: the formula is evaluated to ≤ 1e-12 relative against mpmath (fixture).
 *
 * @param options - {@link RoundWireWindingOptions}
 * @returns $R_\mathrm{ac}/R_\mathrm{dc}$ [-], ≥ 1
 * @throws {@link InputError} on non-finite, non-positive or inconsistent inputs
 * @see J. A. Ferreira, "Improved analytical modeling of conductive losses in magnetic components", IEEE Trans. Power Electron. 9(1), 127–131 (1994) (orthogonality of skin and proximity losses; layer field as above).
 * @see J. Lammeraner, M. Štafl, Eddy Currents, Iliffe (1966), ch. 6 (cylinder in a transverse field).
 * @example
 * ```ts
 * import { roundWireWindingAcRatioFerreira } from "fluxwright";
 * const options = { wireDiameter: 0.5e-3, frequency: 100e3, resistivity: 1.7241e-8,
 *   layers: 4, turnsPerLayer: 12, windowBreadth: 8e-3 };
 * console.log(roundWireWindingAcRatioFerreira(options)); // ≈ 13.15
 * ```
 * @category Conductors
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- the former name windingWidth is accepted until 1.0
export function roundWireWindingAcRatioFerreira(options: RoundWireWindingOptions | RoundWireWindingOptionsWithWidth): number {
  const w = checkWinding("roundWireWindingAcRatioFerreira", options);
  const delta = Math.sqrt(w.resistivity / (Math.PI * w.frequency * MU_0));
  const q = w.diameter / (Math.SQRT2 * delta);
  const eta = (w.turnsPerLayer * w.diameter) / w.width;
  const m = w.layers;
  return wireSkinFactorKernel(q) + ((Math.PI * eta * eta * (4 * m * m - 1)) / 24) * wireProximityFactorKernel(q);
}
