/**
 * The event-driven propagation of the LLC converter over the positive half period from a given
 * state: each segment ends where the rectifier current or the magnetising voltage crosses its
 * limit (closed-form extrema, Brent's method on the bracket); optionally records the waveform
 * figures. Internal.
 *
 * @packageDocumentation
 */
import { HalfPeriodRecord } from "./periodic-newton.js";
import { firstDownCrossing, sinusoidPeak, squareIntegral } from "./ramp-sinusoid.js";
import { MAX_SEGMENTS, MODE_N, MODE_O, MODE_P, diodeIntegral, flow, out } from "./llc-segments.js";

// ---------------------------------------------------------------------------------------------
// Event-driven propagation over the positive half period from a given state.

/** The segments of the last propagation. */
export const events = new HalfPeriodRecord(MAX_SEGMENTS);
/** The state at the end of the last propagation. */
export const evEnd = new Float64Array(3);

/** Mode at the start of a segment from the state (bridge +1). */
function startMode(j: number, u: number, g: number, m: number, lam: number): number {
  const d = j - g;
  const scale = Math.max(Math.abs(j), Math.abs(g), 1e-300);
  if (Math.abs(d) > 1e-12 * scale) return d > 0 ? MODE_P : MODE_N;
  const vm = (1 - u) / (1 + lam);
  if (vm >= m) return MODE_P;
  if (vm <= -m) return MODE_N;
  return MODE_O;
}

/** Crossing tolerance (relative to the half period) of a propagation that only seeds the sequence solve. */
const SEED_CROSSING_TOLERANCE = 1e-7;

/**
 * Propagates the half period from (j0, u0, g0) with gain m into {@link events} and
 * {@link evEnd}; `record` also accumulates the waveform figures and solves every crossing to the
 * last ulp (otherwise to 1e-7 of the half period, enough to seed the sequence solve).
 */
export function propagateEvents(j0: number, u0: number, g0: number, m: number, lam: number, theta: number, record: boolean): void {
  let j = j0;
  let u = u0;
  let g = g0;
  let t = 0;
  events.clear();
  let mode = startMode(j, u, g, m, lam);
  const band = m * (1 + lam);
  // a propagation that only finds the sequence seeds Newton: its crossings need not be exact
  const crossingTolerance = record ? 0 : SEED_CROSSING_TOLERANCE * theta;
  while (t < theta) {
    if (!events.hasRoom()) break;
    const remaining = theta - t;
    let tau: number;
    let next = mode;
    if (mode === MODE_O) {
      g = j;
      if (lam > 0) {
        const w = Math.sqrt(lam / (1 + lam));
        const a = u - 1;
        const b = j / w;
        // stays while 1 − band < u < 1 + band
        const tLow = firstDownCrossing(a, b, band, 0, w, remaining, crossingTolerance); // u − (1 − band)
        const tHigh = firstDownCrossing(-a, -b, band, 0, w, remaining, crossingTolerance); // (1 + band) − u
        tau = Math.min(tLow, tHigh, remaining);
        if (tau < remaining) next = tLow <= tHigh ? MODE_P : MODE_N;
        if (record) {
          events.currentPeak = Math.max(events.currentPeak, sinusoidPeak(0, j, -a * w, w, tau));
          events.thirdStatePeak = Math.max(events.thirdStatePeak, sinusoidPeak(0, j, -a * w, w, tau));
          events.capacitorPeak = Math.max(events.capacitorPeak, sinusoidPeak(1, a, b, w, tau));
          events.currentSquareIntegral += squareIntegral(j, -a * w, w * tau) / w;
        }
      } else {
        // series-resonant limit: the current rests at zero until the bridge switches
        tau = remaining;
        if (record) {
          events.currentPeak = Math.max(events.currentPeak, Math.abs(j));
          events.thirdStatePeak = Math.max(events.thirdStatePeak, Math.abs(j));
          events.capacitorPeak = Math.max(events.capacitorPeak, Math.abs(u), Math.abs(u + j * tau));
          events.currentSquareIntegral += j * j * tau;
        }
      }
    } else {
      const sign = mode === MODE_P ? 1 : -1;
      const e = 1 - sign * m;
      // s·(j − g) = s[j cos t + (e − u) sin t − g] − m λ t
      const root = firstDownCrossing(sign * j, sign * (e - u), -sign * g, -m * lam, 1, remaining, crossingTolerance);
      tau = Math.min(root, remaining);
      const integral = diodeIntegral(mode, tau, j, u, g, m, lam);
      events.loadIntegral += sign * integral;
      if (record) {
        const a = j;
        const b = e - u;
        events.currentPeak = Math.max(events.currentPeak, sinusoidPeak(0, a, b, 1, tau));
        events.capacitorPeak = Math.max(events.capacitorPeak, sinusoidPeak(e, u - e, j, 1, tau));
        const gEnd = g + sign * m * lam * tau;
        events.thirdStatePeak = Math.max(events.thirdStatePeak, Math.abs(g), Math.abs(gEnd));
        const j2 = squareIntegral(a, b, tau);
        events.currentSquareIntegral += j2;
        // ∫ (j − g − c t)² with c = s m λ
        const c = sign * m * lam;
        const sinT = Math.sin(tau);
        const cosT = Math.cos(tau);
        const intJ = a * sinT + b * (1 - cosT);
        const intJt = a * (tau * sinT + cosT - 1) + b * (sinT - tau * cosT);
        const intLin2 = g * g * tau + g * c * tau * tau + (c * c * tau * tau * tau) / 3;
        events.rectifierSquareIntegral += j2 - 2 * (g * intJ + c * intJt) + intLin2;
      }
      if (root < remaining) {
        flow(mode, tau, j, u, g, m, lam, true);
        const vm = (1 - (out[1] ?? 0)) / (1 + lam);
        next = vm >= m ? MODE_P : vm <= -m ? MODE_N : MODE_O;
        if (next === mode) next = MODE_O;
      }
    }
    flow(mode, tau, j, u, g, m, lam, true);
    j = out[0] ?? 0;
    u = out[1] ?? 0;
    g = out[2] ?? 0;
    if (mode === MODE_O) g = j;
    events.push(mode, tau);
    t += tau;
    if (tau >= remaining) break;
    mode = next;
  }
  evEnd[0] = j;
  evEnd[1] = u;
  evEnd[2] = g;
}

