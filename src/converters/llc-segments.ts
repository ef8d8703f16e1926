/**
 * The closed-form segment maps of the ideal LLC converter in normalised units (see
 * `llc-kernel.ts` for the units and the modes P, N, O): each advances the state (j, u, g) over
 * one segment of one mode. Internal.
 *
 * @packageDocumentation
 */

export const MODE_O = 0;
export const MODE_P = 1;
export const MODE_N = 2;

/** Most segments in one half period. */
export const MAX_SEGMENTS = 48;

// ---------------------------------------------------------------------------------------------
// Segment flows. Each takes a state and a duration and writes the end state into `out`.

/**
 * End state of the last flow (0–2), then the cosine and sine of the last forced segment's
 * phase ωτ (3, 4), kept for the tangent pass: typed-array slots, written in place (a number
 * written to a module variable is boxed on every write).
 */
export const out = new Float64Array(5);
export const SEG_COS = 3;
export const SEG_SIN = 4;
out[SEG_COS] = 1;

/** Advance by one segment of mode `mode` for time `tau`; `forced` = false drops the constant forcing (linear part only). */
export function flow(mode: number, tau: number, j: number, u: number, g: number, m: number, lam: number, forced: boolean): void {
  if (mode === MODE_O) {
    const drive = forced ? 1 : 0;
    if (lam > 0) {
      const w = Math.sqrt(lam / (1 + lam));
      const c = Math.cos(w * tau);
      const s = Math.sin(w * tau);
      out[0] = j * c - (u - drive) * w * s;
      out[1] = drive + (u - drive) * c + (j / w) * s;
      out[SEG_COS] = c;
      out[SEG_SIN] = s;
    } else {
      out[0] = j;
      out[1] = u + j * tau;
    }
    out[2] = out[0];
    return;
  }
  const sign = mode === MODE_P ? 1 : -1;
  const e = forced ? 1 - sign * m : 0;
  const c = Math.cos(tau);
  const s = Math.sin(tau);
  out[0] = j * c + (e - u) * s;
  out[1] = e + (u - e) * c + j * s;
  out[2] = g + (forced ? sign * m * lam * tau : 0);
}

/**
 * {@link flow} (forced) and {@link diodeIntegral} of one P or N segment together, one cosine
 * and sine for both: writes the end state into `out`, returns s·∫(j − g) dθ (s = ±1 for P/N).
 */
export function flowDiode(mode: number, tau: number, j: number, u: number, g: number, m: number, lam: number): number {
  const sign = mode === MODE_P ? 1 : -1;
  const e = 1 - sign * m;
  const c = Math.cos(tau);
  const s = Math.sin(tau);
  out[0] = j * c + (e - u) * s;
  out[1] = e + (u - e) * c + j * s;
  out[2] = g + sign * m * lam * tau;
  out[SEG_COS] = c;
  out[SEG_SIN] = s;
  return sign * (j * s + (e - u) * (1 - c) - g * tau - 0.5 * sign * m * lam * tau * tau);
}

/** ∫ (j − g) dθ over a P or N segment from (j, u, g). */
export function diodeIntegral(mode: number, tau: number, j: number, u: number, g: number, m: number, lam: number): number {
  const sign = mode === MODE_P ? 1 : -1;
  const e = 1 - sign * m;
  return j * Math.sin(tau) + (e - u) * (1 - Math.cos(tau)) - g * tau - 0.5 * sign * m * lam * tau * tau;
}

