/**
 * The asymptotic region of the modified-Bessel engine, |z| ≥ 19: the Hankel expansions (DLMF
 * 10.40.1, 10.40.2, 10.40.5) including the exponentially small second exponential of I.
 *
 * @packageDocumentation
 */
import { EPS, IK_I0I, IK_I0R, IK_I1I, IK_I1R, IK_K0I, IK_K0R, IK_K1I, IK_K1R } from "./bessel-ik-layout.js";

const PI = Math.PI;

/** Scaled I₀, I₁, K₀, K₁ at z = zr + i·zi (Re z ≥ 0), r = |z| ≥ 19, into out[`IK_*`]. */
export function asymptoticRegion(zr: number, zi: number, r: number, out: Float64Array): void {
  // 1/z
  const rz = r * r;
  const ur = zr / rz;
  const ui = -zi / rz;
  // S0± = Σ (∓1)^k a_k(0) z^{−k}, S1± likewise with a_k(1);
  // a_k(ν) = a_{k−1}(ν)·(4ν² − (2k − 1)²)/(8k).
  let p0r = 1; // a_k(0) z^{-k}
  let p0i = 0;
  let p1r = 1;
  let p1i = 0;
  let e0r = 1; // even-k partial sums
  let e0i = 0;
  let o0r = 0; // odd-k partial sums
  let o0i = 0;
  let e1r = 1;
  let e1i = 0;
  let o1r = 0;
  let o1i = 0;
  // Two terms per pass (odd k, then even k); a_k(ν) z^{−k} from the previous term.
  const kmax = Math.min(80, Math.floor(2 * r));
  for (let k = 1; k <= kmax; k += 2) {
    let m = (2 * k - 1) * (2 * k - 1);
    let g0 = -m / (8 * k);
    let g1 = (4 - m) / (8 * k);
    let nr = (p0r * ur - p0i * ui) * g0;
    p0i = (p0r * ui + p0i * ur) * g0;
    p0r = nr;
    nr = (p1r * ur - p1i * ui) * g1;
    p1i = (p1r * ui + p1i * ur) * g1;
    p1r = nr;
    o0r += p0r;
    o0i += p0i;
    o1r += p1r;
    o1i += p1i;
    m = (2 * k + 1) * (2 * k + 1);
    g0 = -m / (8 * (k + 1));
    g1 = (4 - m) / (8 * (k + 1));
    nr = (p0r * ur - p0i * ui) * g0;
    p0i = (p0r * ui + p0i * ur) * g0;
    p0r = nr;
    nr = (p1r * ur - p1i * ui) * g1;
    p1i = (p1r * ui + p1i * ur) * g1;
    p1r = nr;
    e0r += p0r;
    e0i += p0i;
    e1r += p1r;
    e1i += p1i;
    if (Math.abs(p0r) + Math.abs(p0i) + Math.abs(p1r) + Math.abs(p1i) < EPS) break;
  }
  // S+ = even + odd, S− = even − odd
  const s0pr = e0r + o0r;
  const s0pi = e0i + o0i;
  const s0mr = e0r - o0r;
  const s0mi = e0i - o0i;
  const s1pr = e1r + o1r;
  const s1pi = e1i + o1i;
  const s1mr = e1r - o1r;
  const s1mi = e1i - o1i;
  // √z
  const qr = Math.sqrt(0.5 * (r + zr)); // √z, Re z ≥ 0
  const qi = zi / (2 * qr);
  const qm = r;
  // K: √(π/2) / √z · S+
  const kr = (Math.sqrt(PI / 2) * qr) / qm;
  const ki = (-Math.sqrt(PI / 2) * qi) / qm;
  // I: 1/√(2π) / √z · (e^{i Im z} S− + σ i e^{−2 Re z − i Im z}(±) S+)
  const ir = kr / PI;
  const ii = ki / PI;
  const cz = Math.cos(zi);
  const sz = Math.sin(zi);
  let a0r = cz * s0mr - sz * s0mi;
  let a0i = cz * s0mi + sz * s0mr;
  let a1r = cz * s1mr - sz * s1mi;
  let a1i = cz * s1mi + sz * s1mr;
  if (zi !== 0) {
    const sigma = zi > 0 ? 1 : -1;
    const ex = Math.exp(-2 * zr);
    // σ i e^{−i Im z}·ex = σ ex (sin(Im z) + i cos(Im z))
    const tr = sigma * ex * sz;
    const ti = sigma * ex * cz;
    const b0r = tr * s0pr - ti * s0pi;
    const b0i = tr * s0pi + ti * s0pr;
    const b1r = tr * s1pr - ti * s1pi;
    const b1i = tr * s1pi + ti * s1pr;
    a0r += b0r;
    a0i += b0i;
    a1r -= b1r; // ν = 1 carries e^{±iπ} = −1
    a1i -= b1i;
  }
  out[IK_I0R] = ir * a0r - ii * a0i;
  out[IK_I0I] = ir * a0i + ii * a0r;
  out[IK_I1R] = ir * a1r - ii * a1i;
  out[IK_I1I] = ir * a1i + ii * a1r;
  out[IK_K0R] = kr * s0pr - ki * s0pi;
  out[IK_K0I] = kr * s0pi + ki * s0pr;
  out[IK_K1R] = kr * s1pr - ki * s1pi;
  out[IK_K1I] = kr * s1pi + ki * s1pr;
}
