/**
 * The exact periodic steady state of the ideal LCC (series–parallel) and parallel-resonant
 * converters with an inductive output filter, in normalised units. Internal: the public
 * wrappers check the input and scale the result.
 *
 * Units: voltages in the bridge amplitude $V_b$, currents in $V_b/Z_p$ with
 * $Z_p = \sqrt{L_r/C_p}$, time $\theta = t/\sqrt{L_rC_p}$. States: $j$ (resonant current), $u$
 * (series capacitor voltage), $v$ (parallel capacitor voltage, the rectifier's input). The
 * output inductor is stiff: the rectifier sinks the constant current $k = I_\mathrm{out}Z_p/(nV_b)$
 * with the sign of $v$. With $a = C_p/C_s$ (0: parallel resonant, no series capacitor), in the
 * positive half period (bridge $+1$) there are three circuit modes:
 * - P ($v > 0$), N ($v < 0$): $j' = 1 - u - v$, $u' = a j$, $v' = j \mp k$;
 * - Z ($v = 0$, $|j| < k$, all four diodes conduct and clamp $C_p$): $j' = 1 - u$, $u' = aj$.
 *
 * The output is $M = nV_\mathrm{out}/V_b = \langle|v|\rangle$ and $k = \zeta M$,
 * $\zeta = Z_p/(n^2R_\mathrm{load})$. The half-wave antisymmetric steady state
 * $x(\Theta) = -x(0)$, $\Theta = \pi f_p/f_s$, $f_p = 1/(2\pi\sqrt{L_rC_p})$, with
 * $\frac1\Theta\int_0^\Theta|v|\,d\theta = M$ is solved by Newton's method (finite-difference
 * Jacobian, backtracking: the shared {@link StateAndGainSolver}) on $(j_0, u_0, v_0, M)$
 * through an exact event-driven propagation:
 * each mode has a closed-form solution (sinusoid plus ramp) and each mode change is the first
 * crossing of such a function, found by {@link firstDownCrossing}.
 *
 * @packageDocumentation
 */
import { HalfPeriodRecord, StateAndGainSolver, type StateAndGainStart, type StateAndGainSteadyState, type StateAndGainTopology } from "./periodic-newton.js";
import { firstDownCrossing, rampSinusoidPeak, rampSinusoidSquareIntegral, sinusoidPeak, squareIntegral } from "./ramp-sinusoid.js";

const MODE_Z = 0;
const MODE_P = 1;
const MODE_N = 2;
const LETTER = ["Z", "P", "N"] as const;
const MAX_SEGMENTS = 64;

/**
 * The solved steady state, normalised (clampedFraction is the fraction of the period with C_p
 * clamped, mode Z; the sequence reads "NP", "ZP", "NZP", …).
 */
export type LccSteadyState = StateAndGainSteadyState;

const st = new Float64Array(3);
/** The segments of the last propagation. */
const events = new HalfPeriodRecord(MAX_SEGMENTS);

function startMode(j: number, v: number, u: number, k: number): number {
  const tol = 1e-13 * (1 + Math.abs(j) + Math.abs(v));
  if (v > tol) return MODE_P;
  if (v < -tol) return MODE_N;
  if (j > k + tol) return MODE_P;
  if (j < -k - tol) return MODE_N;
  // at |j| = k the slope j' = 1 − u decides
  if (j >= k - tol && 1 - u > 0) return MODE_P;
  if (j <= -k + tol && 1 - u < 0) return MODE_N;
  return MODE_Z;
}

/**
 * Propagates the positive half period from (j, u, v) with gain m; fills the event record and,
 * with `record`, the waveform integrals. End state in `st`.
 */
function propagate(j0: number, u0: number, v0: number, m: number, a: number, zeta: number, theta: number, record: boolean): void {
  const k = zeta * m;
  let j = j0;
  let u = u0;
  let v = v0;
  let t = 0;
  events.clear();
  let mode = startMode(j, v, u, k);
  const w = Math.sqrt(1 + a);
  while (t < theta) {
    if (!events.hasRoom()) break;
    const remaining = theta - t;
    let tau: number;
    let next = mode;
    if (mode === MODE_Z) {
      // j' = 1 − u, u' = a j, v = 0
      let hitUp: number;
      let hitDown: number;
      const wz = Math.sqrt(a);
      const s0 = 1 - u;
      if (a > 0) {
        const al = j;
        const be = s0 / wz;
        hitUp = firstDownCrossing(-al, -be, k, 0, wz, remaining); // k − j
        hitDown = firstDownCrossing(al, be, k, 0, wz, remaining); // j + k
      } else {
        hitUp = firstDownCrossing(0, 0, k - j, -s0, 1, remaining);
        hitDown = firstDownCrossing(0, 0, k + j, s0, 1, remaining);
      }
      tau = Math.min(hitUp, hitDown, remaining);
      if (tau < remaining) next = hitUp <= hitDown ? MODE_P : MODE_N;
      let jEnd: number;
      let uEnd: number;
      if (a > 0) {
        const c = Math.cos(wz * tau);
        const s = Math.sin(wz * tau);
        jEnd = j * c + (s0 / wz) * s;
        uEnd = 1 - s0 * c + j * wz * s;
        if (record) {
          const al = j;
          const be = s0 / wz;
          events.currentIntegral += (al * s + be * (1 - c)) / wz;
          events.currentSquareIntegral += squareIntegral(al, be, wz * tau) / wz;
          events.currentPeak = Math.max(events.currentPeak, sinusoidPeak(0, al, be, wz, tau));
          events.capacitorPeak = Math.max(events.capacitorPeak, sinusoidPeak(1, -s0, j * wz, wz, tau));
        }
      } else {
        jEnd = j + s0 * tau;
        uEnd = u;
        if (record) {
          events.currentIntegral += j * tau + 0.5 * s0 * tau * tau;
          events.currentSquareIntegral += j * j * tau + j * s0 * tau * tau + (s0 * s0 * tau * tau * tau) / 3;
          events.currentPeak = Math.max(events.currentPeak, Math.abs(j), Math.abs(jEnd));
          events.capacitorPeak = Math.max(events.capacitorPeak, Math.abs(u));
        }
      }
      if (record) events.clampedTime += tau;
      if (tau < remaining) jEnd = next === MODE_P ? k : -k;
      j = jEnd;
      u = uEnd;
      v = 0;
    } else {
      const sg = mode === MODE_P ? 1 : -1;
      const c0 = sg * k;
      const jInf = c0 / (1 + a);
      const d0 = 1 - u - v;
      const al = j - jInf;
      const be = d0 / w;
      // v(t) = A cos wt + B sin wt + C + D t
      const A = -d0 / (w * w);
      const B = al / w;
      const C = v + d0 / (w * w);
      const D = jInf - c0;
      const root = firstDownCrossing(sg * A, sg * B, sg * C, sg * D, w, remaining);
      tau = Math.min(root, remaining);
      const c = Math.cos(w * tau);
      const s = Math.sin(w * tau);
      const integ = jInf * tau + (al * s) / w + (d0 * (1 - c)) / (w * w);
      const jEnd = jInf + al * c + be * s;
      const uEnd = u + a * integ;
      let vEnd = v + integ - c0 * tau;
      if (root < remaining) {
        vEnd = 0;
        next = jEnd < -k ? MODE_N : jEnd > k ? MODE_P : MODE_Z;
        if (next === mode) next = MODE_Z;
      }
      // ∫v over the segment
      const intI = 0.5 * jInf * tau * tau + (al * (1 - c)) / (w * w) + (d0 * (tau - s / w)) / (w * w);
      const intV = v * tau + intI - 0.5 * c0 * tau * tau;
      events.loadIntegral += sg * intV;
      if (record) {
        events.currentIntegral += integ;
        events.currentSquareIntegral += jInf * jInf * tau + 2 * jInf * ((al * s) / w + (be * (1 - c)) / w) + squareIntegral(al, be, w * tau) / w;
        events.currentPeak = Math.max(events.currentPeak, sinusoidPeak(jInf, al, be, w, tau));
        // u = u + a I(t) = (u + a d0/w²) + a jInf t + (a al/w) sin − (a d0/w²) cos
        events.capacitorPeak = Math.max(events.capacitorPeak, rampSinusoidPeak((-a * d0) / (w * w), (a * al) / w, u + (a * d0) / (w * w), a * jInf, w, tau));
        events.thirdStatePeak = Math.max(events.thirdStatePeak, rampSinusoidPeak(A, B, C, D, w, tau));
        events.rectifierSquareIntegral += rampSinusoidSquareIntegral(A, B, C, D, w, tau);
      }
      j = jEnd;
      u = uEnd;
      v = vEnd;
    }
    events.push(mode, tau);
    t += tau;
    if (tau >= remaining) break;
    mode = next;
  }
  st[0] = j;
  st[1] = u;
  st[2] = v;
}

const topology: StateAndGainTopology = {
  letters: LETTER,
  events,
  end: st,
  propagate,
  // the rectified mean ⟨|v|⟩ against the gain
  loadResidual: (m, _zeta, theta) => events.loadIntegral / theta / m - 1,
  relaxedGain: (m, _zeta, theta) => {
    const mean = events.loadIntegral / theta;
    return mean > 0 ? 0.5 * m + 0.5 * mean : m;
  },
};
const solver = new StateAndGainSolver(topology);

/**
 * First-harmonic solution (phasors, bridge fundamental (4/π) sin(νθ), ν = π/Θ), normalised:
 * out = [j(0), u(0), v(0), M, |J|, |U|, |V|, j(Θ), phase-free |I_in| …].
 */
export function lccFirstHarmonic(a: number, zeta: number, theta: number, out: Float64Array): void {
  const nu = Math.PI / theta;
  const rac = (Math.PI * Math.PI) / (8 * zeta); // R_ac / Z_p
  // Z_par = R ∥ (−j/ν): admittance 1/R + jν
  const yr = 1 / rac;
  const yi = nu;
  const den = yr * yr + yi * yi;
  const zpr = yr / den;
  const zpi = -yi / den;
  const ztr = zpr;
  const zti = zpi + nu - a / nu;
  const v1 = 4 / Math.PI;
  const zt2 = ztr * ztr + zti * zti;
  const ir = (v1 * ztr) / zt2;
  const ii = (-v1 * zti) / zt2;
  const vr = ir * zpr - ii * zpi;
  const vi = ir * zpi + ii * zpr;
  // U = I · (−j a/ν)
  const ur = (ii * a) / nu;
  const ui = (-ir * a) / nu;
  out[0] = ii;
  out[1] = ui;
  out[2] = vi;
  out[3] = (2 / Math.PI) * Math.hypot(vr, vi);
  out[4] = Math.hypot(ir, ii);
  out[5] = Math.hypot(ur, ui);
  out[6] = Math.hypot(vr, vi);
  out[7] = -ii;
}

const fhaScratch = new Float64Array(8);

/** Residual below which a solution is accepted (normalised; the Newton target is 1e-14). */
export const LCC_TOLERANCE = 1e-10;

/**
 * Solves the steady state for a = C_p/C_s ≥ 0, ζ = Z_p/(n²R) > 0 and half period Θ > 0
 * (normalised), from `start` when given (continuation from a neighbouring solution), else from
 * the first harmonic, else from the first harmonic relaxed over half periods. Returns null
 * when no consistent periodic solution was found.
 */
export function lccSteadyState(a: number, zeta: number, theta: number, start?: StateAndGainStart): LccSteadyState | null {
  lccFirstHarmonic(a, zeta, theta, fhaScratch);
  const res = solver.solveFromStarts(start, fhaScratch, a, zeta, theta, LCC_TOLERANCE);
  if (!(res < LCC_TOLERANCE)) return null;
  return solver.steadyState(a, zeta, theta, solver.x[2] ?? 0, res);
}
