/**
 * The exact periodic steady state of the ideal LCC (series–parallel) and parallel-resonant
 * converters with a capacitive output filter (the rectifier feeds a stiff output capacitor
 * directly), in normalised units. Internal: the public wrappers check the input and scale the
 * result.
 *
 * Units: voltages in the bridge amplitude $V_b$, currents in $V_b/Z_p$ with
 * $Z_p = \sqrt{L_r/C_p}$, time $\theta = t/\sqrt{L_rC_p}$. States: $j$ (resonant current), $u$
 * (series capacitor voltage), $v$ (parallel capacitor voltage, the rectifier's input). While
 * the rectifier conducts, it holds $v$ at $\pm m$ ($m = nV_\mathrm{out}/V_b$, the gain) and
 * takes the whole resonant current. With $a = C_p/C_s$ (0: parallel resonant), in the positive
 * half period (bridge $+1$) there are three circuit modes:
 * - O (rectifier off, $|v| < m$): $j' = 1 - u - v$, $u' = aj$, $v' = j$;
 * - P ($v = +m$, $j \ge 0$) and N ($v = -m$, $j \le 0$): $j' = 1 \mp m - u$, $u' = aj$.
 *
 * O ends when $v$ reaches $\pm m$, P and N when $j$ returns to zero. The load balance is
 * $\frac1\Theta\int_{P,N}|j|\,d\theta = \zeta m$ with $\zeta = Z_p/(n^2R_\mathrm{load})$. The
 * half-wave antisymmetric steady state $x(\Theta) = -x(0)$, $\Theta = \pi f_p/f_s$, is solved
 * by Newton's method on $(j_0, u_0, v_0, m)$ (the shared {@link StateAndGainSolver}) through an
 * exact event-driven propagation recorded in a {@link HalfPeriodRecord}: each
 * mode has a closed-form solution (a sinusoid, or a ramp for $a = 0$) and each mode change is
 * the first crossing of such a function ({@link firstDownCrossing}).
 *
 * @packageDocumentation
 */
import { HalfPeriodRecord, StateAndGainSolver, type StateAndGainStart, type StateAndGainSteadyState, type StateAndGainTopology } from "./periodic-newton.js";
import { firstDownCrossing, rampSinusoidSquareIntegral, sinusoidPeak, squareIntegral } from "./ramp-sinusoid.js";

const MODE_O = 0;
const MODE_P = 1;
const MODE_N = 2;
const LETTER = ["O", "P", "N"] as const;
const MAX_SEGMENTS = 64;

/** The solved steady state, normalised: the shared figures and the rectifier current's. */
export interface CapacitiveSteadyState {
  /**
   * The figures every state-and-gain kernel reports (here clampedFraction is the fraction of
   * the period with the rectifier conducting, modes P and N; the sequence reads "NOP", "OPO", …).
   */
  readonly state: StateAndGainSteadyState;
  /** RMS over the period of the rectifier current (primary side, units V_b/Z_p). */
  readonly rectifierRms: number;
  /** Peak of the rectifier current (primary side). */
  readonly rectifierPeak: number;
}

const st = new Float64Array(3);
/**
 * The segments and totals of the last propagation: loadIntegral = ∫|j| over P and N (the
 * rectified charge), currentIntegral = ∫j, currentSquareIntegral = ∫j², rectifierSquareIntegral
 * = ∫v², capacitorPeak = peak |u|, thirdStatePeak = peak |v|, clampedTime = time in P and N.
 */
const events = new HalfPeriodRecord(MAX_SEGMENTS);
/** ∫j² over P and N (the rectifier current's square) and the peak |j| there: not in the shared record. */
let evRect2 = 0;
let evPeakRect = 0;

function startMode(j: number, u: number, v: number, m: number): number {
  const tol = 1e-13 * (1 + Math.abs(j) + m);
  if (v >= m - tol) {
    if (j > tol) return MODE_P;
    if (j >= -tol && 1 - m - u > 0) return MODE_P;
  } else if (v <= -m + tol) {
    if (j < -tol) return MODE_N;
    if (j <= tol && 1 + m - u < 0) return MODE_N;
  }
  return MODE_O;
}

/**
 * Propagates the positive half period from (j, u, v) with gain m; fills the event record and,
 * with `record`, the waveform integrals. End state in `st`. The start voltage is clamped to the
 * rectifier's band |v| ≤ m (a Newton trial may step outside it). ζ is not read (the load
 * enters through the balance only); it keeps the shared signature of {@link StateAndGainTopology}.
 */
function propagate(j0: number, u0: number, v0: number, m: number, a: number, _zeta: number, theta: number, record: boolean): void {
  let j = j0;
  let u = u0;
  let v = Math.min(m, Math.max(-m, v0));
  let t = 0;
  events.clear();
  evRect2 = 0;
  evPeakRect = 0;
  let mode = startMode(j, u, v, m);
  const w = Math.sqrt(1 + a);
  const wz = Math.sqrt(a);
  while (t < theta) {
    if (!events.hasRoom()) break;
    const remaining = theta - t;
    let tau: number;
    let next = mode;
    if (mode === MODE_O) {
      // j = j cos wt + (d0/w) sin wt; v = v + I(t), u = u + a I(t), I = ∫j
      const d0 = 1 - u - v;
      const q = d0 / (w * w);
      const b = j / w;
      // up: m − v(t) = (m − v − q) + q cos − b sin; down: v(t) + m = (v + m + q) − q cos + b sin
      const up = firstDownCrossing(q, -b, m - v - q, 0, w, remaining);
      const down = firstDownCrossing(-q, b, v + m + q, 0, w, remaining);
      tau = Math.min(up, down, remaining);
      if (tau < remaining) next = up <= down ? MODE_P : MODE_N;
      const c = Math.cos(w * tau);
      const s = Math.sin(w * tau);
      const integ = b * s + q * (1 - c);
      if (record) {
        events.currentIntegral += integ;
        events.currentSquareIntegral += squareIntegral(j, d0 / w, w * tau) / w;
        events.currentPeak = Math.max(events.currentPeak, sinusoidPeak(0, j, d0 / w, w, tau));
        events.capacitorPeak = Math.max(events.capacitorPeak, sinusoidPeak(u + a * q, -a * q, a * b, w, tau));
        events.thirdStatePeak = Math.max(events.thirdStatePeak, sinusoidPeak(v + q, -q, b, w, tau));
        events.rectifierSquareIntegral += rampSinusoidSquareIntegral(-q, b, v + q, 0, w, tau);
      }
      const jEnd = j * c + (d0 / w) * s;
      u += a * integ;
      v += integ;
      j = jEnd;
      if (tau < remaining) v = next === MODE_P ? m : -m;
    } else {
      const sg = mode === MODE_P ? 1 : -1;
      const e = 1 - sg * m;
      let jEnd: number;
      let uEnd: number;
      let integ: number;
      if (a > 0) {
        const b = (e - u) / wz;
        const root = firstDownCrossing(sg * j, sg * b, 0, 0, wz, remaining);
        tau = Math.min(root, remaining);
        const c = Math.cos(wz * tau);
        const s = Math.sin(wz * tau);
        jEnd = j * c + b * s;
        uEnd = e + (u - e) * c + j * wz * s;
        integ = (j * s + b * (1 - c)) / wz;
        if (record) {
          const j2 = squareIntegral(j, b, wz * tau) / wz;
          events.currentSquareIntegral += j2;
          evRect2 += j2;
          const pk = sinusoidPeak(0, j, b, wz, tau);
          events.currentPeak = Math.max(events.currentPeak, pk);
          evPeakRect = Math.max(evPeakRect, pk);
          events.capacitorPeak = Math.max(events.capacitorPeak, sinusoidPeak(e, u - e, j * wz, wz, tau));
        }
      } else {
        const root = firstDownCrossing(0, 0, sg * j, sg * e, 1, remaining);
        tau = Math.min(root, remaining);
        jEnd = j + e * tau;
        uEnd = u;
        integ = j * tau + 0.5 * e * tau * tau;
        if (record) {
          const j2 = rampSinusoidSquareIntegral(0, 0, j, e, 1, tau);
          events.currentSquareIntegral += j2;
          evRect2 += j2;
          const pk = Math.max(Math.abs(j), Math.abs(jEnd));
          events.currentPeak = Math.max(events.currentPeak, pk);
          evPeakRect = Math.max(evPeakRect, pk);
          events.capacitorPeak = Math.max(events.capacitorPeak, Math.abs(u));
        }
      }
      events.loadIntegral += sg * integ;
      if (record) {
        events.currentIntegral += integ;
        events.rectifierSquareIntegral += m * m * tau;
        events.thirdStatePeak = Math.max(events.thirdStatePeak, m);
        events.clampedTime += tau;
      }
      j = jEnd;
      u = uEnd;
      v = sg * m;
      if (tau < remaining) {
        j = 0;
        next = MODE_O;
      }
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

// ---------------------------------------------------------------------------------------------
// Newton on (j0, u0, v0, m), with the shared solver.

const topology: StateAndGainTopology = {
  letters: LETTER,
  events,
  end: st,
  propagate,
  // the rectified charge per half period against the load's ζm
  loadResidual: (m, zeta, theta) => events.loadIntegral / (theta * zeta * m) - 1,
  relaxedGain: (m, zeta, theta) => {
    const delivered = events.loadIntegral / (theta * zeta);
    return delivered > 0 ? 0.7 * m + 0.3 * delivered : m;
  },
};
const solver = new StateAndGainSolver(topology);
/** The unknowns (j0, u0, v0, M): the starting point, then the solution. */
const y = solver.x;

// ---------------------------------------------------------------------------------------------
// First harmonic with the RC load model of the rectifier and C_p.

/**
 * First-harmonic solution with the rectifier and C_p replaced by their equivalent series R–C at
 * the fundamental (sinusoidal current into C_p and the clamping rectifier), normalised:
 * out = [j(0), u(0), v(0), M, |J|, |U|, φ (non-conduction angle), R_e/Z_p, X_e/Z_p].
 *
 * With $\beta = 2\nu/(\pi\zeta)$ ($\nu = \pi/\Theta$): $\tan^2(\varphi/2) = \beta$,
 * $R_e = \frac{2}{\pi^2}(1+\cos\varphi)^2 n^2R_\mathrm{load}$,
 * $X_e = -(2\varphi - \sin 2\varphi)/(2\pi\omega C_p)$, and $M = (1+\cos\varphi)|I|/(\pi\zeta)$.
 */
export function capacitiveFirstHarmonic(a: number, zeta: number, theta: number, out: Float64Array): void {
  const nu = Math.PI / theta;
  const beta = (2 * nu) / (Math.PI * zeta);
  const phi = 2 * Math.atan(Math.sqrt(beta));
  const onePlusCos = 2 / (1 + beta);
  const re = (2 / (Math.PI * Math.PI)) * onePlusCos * onePlusCos / zeta;
  const xe = -(2 * phi - Math.sin(2 * phi)) / (2 * Math.PI * nu);
  const zr = re;
  const zi = nu - a / nu + xe;
  const v1 = 4 / Math.PI;
  const z2 = zr * zr + zi * zi;
  const ir = (v1 * zr) / z2;
  const ii = (-v1 * zi) / z2;
  const im = Math.hypot(ir, ii);
  const m = (onePlusCos * im) / (Math.PI * zeta);
  // U = I · (−j a/ν)
  const ur = (ii * a) / nu;
  const ui = (-ir * a) / nu;
  // v at θ = 0: the current is im·sin(x) with x = ψ at θ = 0 (ψ the phase of I); the model's
  // v(x) = −m + (im/ν)(1 − cos x) for 0 ≤ x ≤ φ, +m for φ ≤ x ≤ π, and −v(x − π) after
  let x = Math.atan2(ii, ir);
  x -= Math.floor(x / (2 * Math.PI)) * 2 * Math.PI;
  let sign = 1;
  if (x >= Math.PI) {
    x -= Math.PI;
    sign = -1;
  }
  const vModel = x <= phi ? -m + (im / nu) * (1 - Math.cos(x)) : m;
  out[0] = ii;
  out[1] = ui;
  out[2] = sign * Math.max(-m, Math.min(m, vModel));
  out[3] = m;
  out[4] = im;
  out[5] = Math.hypot(ur, ui);
  out[6] = phi;
  out[7] = re;
  out[8] = xe;
}

const fhaScratch = new Float64Array(9);

/** Residual below which a solution is accepted (normalised; the Newton target is 1e-14). */
export const CAPACITIVE_TOLERANCE = 1e-10;

/**
 * Continuation in frequency from the free tank's resonance ν = √(1 + a), where the first
 * harmonic is a good start, to the target half period; each step starts from the previous
 * solution. Leaves the solution in `y`; returns the final residual.
 */
function continuation(a: number, zeta: number, theta: number): number {
  const theta0 = Math.PI / Math.sqrt(1 + a);
  for (const steps of [16, 64]) {
    capacitiveFirstHarmonic(a, zeta, theta0, fhaScratch);
    let res = solver.solveFrom(fhaScratch[0] ?? 0, fhaScratch[1] ?? 0, fhaScratch[2] ?? 0, fhaScratch[3] ?? 1, a, zeta, theta0);
    for (let s = 1; s <= steps && res < CAPACITIVE_TOLERANCE; s++) {
      const th = theta0 * Math.pow(theta / theta0, s / steps);
      res = solver.solveFrom(y[0] ?? 0, y[1] ?? 0, Math.min(y[3] ?? 0, Math.max(-(y[3] ?? 0), y[2] ?? 0)), y[3] ?? 1, a, zeta, th);
    }
    if (res < CAPACITIVE_TOLERANCE) return res;
  }
  return Infinity;
}

/**
 * Solves the steady state for a = C_p/C_s ≥ 0, ζ = Z_p/(n²R) > 0 and half period Θ > 0
 * (normalised), from `start` when given (continuation), else from the first harmonic; falls
 * back to relaxation over half periods, then to continuation in frequency. Returns null when
 * no consistent periodic solution was found.
 */
export function capacitiveSteadyState(a: number, zeta: number, theta: number, start?: StateAndGainStart): CapacitiveSteadyState | null {
  capacitiveFirstHarmonic(a, zeta, theta, fhaScratch);
  let res = solver.solveFromStarts(start, fhaScratch, a, zeta, theta, CAPACITIVE_TOLERANCE);
  if (!(res < CAPACITIVE_TOLERANCE)) res = continuation(a, zeta, theta);
  if (!(res < CAPACITIVE_TOLERANCE)) return null;
  const m = y[3] ?? 0;
  const state = solver.steadyState(a, zeta, theta, Math.min(m, Math.max(-m, y[2] ?? 0)), res);
  return { state, rectifierRms: Math.sqrt(evRect2 / theta), rectifierPeak: evPeakRect };
}
