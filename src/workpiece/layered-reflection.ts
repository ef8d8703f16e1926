/**
 * The reflection coefficient of a layered conducting, possibly magnetic, half-space for the
 * Hankel-transform (Dodd–Deeds) solutions: the layer data at one frequency and Γ(α).
 *
 * @packageDocumentation
 */
import { MU_0 } from "../units/index.js";
import type { PlateLayer } from "./coil-over-plate-types.js";

/** Layer data for the reflection coefficient: k = ωμ0μr/ρ, μr, thickness. */
export interface LayerArrays {
  readonly k: Float64Array;
  readonly mu: Float64Array;
  readonly t: Float64Array;
}

export function layerArrays(layers: readonly PlateLayer[], omega: number): LayerArrays {
  const n = layers.length;
  const k = new Float64Array(n);
  const mu = new Float64Array(n);
  const t = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const layer = layers[i]!;
    k[i] = (omega * MU_0 * layer.relativePermeability) / layer.resistivity;
    mu[i] = layer.relativePermeability;
    t[i] = layer.thickness;
  }
  return { k, mu, t };
}

/**
 * Reflection coefficient Γ(α) = (α − Y)/(α + Y), Y the surface admittance of the layers,
 * written into out[0] (real) and out[1] (imaginary).
 */
export function reflectionInto(alpha: number, lay: LayerArrays, out: Float64Array): void {
  const { k, mu, t } = lay;
  const nLayers = k.length;
  const a2 = alpha * alpha;
  let yRe = alpha;
  let yIm = 0;
  for (let i = nLayers - 1; i >= 0; i--) {
    const ki = k[i]!;
    const rr = Math.hypot(a2, ki);
    const sRe = Math.sqrt(0.5 * (rr + a2));
    const sIm = ki / (2 * sRe);
    const ycRe = sRe / mu[i]!;
    const ycIm = sIm / mu[i]!;
    if (t[i] === Infinity) {
      yRe = ycRe;
      yIm = ycIm;
      continue;
    }
    // yb = y / yc
    const dd = ycRe * ycRe + ycIm * ycIm;
    const ybRe = (yRe * ycRe + yIm * ycIm) / dd;
    const ybIm = (yIm * ycRe - yRe * ycIm) / dd;
    // r = (1 − yb)/(1 + yb)
    const nRe = 1 - ybRe;
    const nIm = -ybIm;
    const dRe = 1 + ybRe;
    const dIm = ybIm;
    const d2 = dRe * dRe + dIm * dIm;
    const rRe = (nRe * dRe + nIm * dIm) / d2;
    const rIm = (nIm * dRe - nRe * dIm) / d2;
    // g = r · exp(−2 s t)
    const mag = Math.exp(-2 * sRe * t[i]!);
    const ph = -2 * sIm * t[i]!;
    const eRe = mag * Math.cos(ph);
    const eIm = mag * Math.sin(ph);
    const gRe = rRe * eRe - rIm * eIm;
    const gIm = rRe * eIm + rIm * eRe;
    // y = yc (1 − g)/(1 + g)
    const pRe = 1 - gRe;
    const pIm = -gIm;
    const qRe = 1 + gRe;
    const qIm = gIm;
    const q2 = qRe * qRe + qIm * qIm;
    const fRe = (pRe * qRe + pIm * qIm) / q2;
    const fIm = (pIm * qRe - pRe * qIm) / q2;
    yRe = ycRe * fRe - ycIm * fIm;
    yIm = ycRe * fIm + ycIm * fRe;
  }
  const nRe = alpha - yRe;
  const nIm = -yIm;
  const dRe = alpha + yRe;
  const dIm = yIm;
  const d2 = dRe * dRe + dIm * dIm;
  out[0] = (nRe * dRe + nIm * dIm) / d2;
  out[1] = (nIm * dRe - nRe * dIm) / d2;

}
