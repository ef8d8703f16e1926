/**
 * Real polynomials with ascending coefficients (`p[i]` multiplies $x^i$): evaluation,
 * derivative, products, and all real roots in an interval by derivative-root isolation.
 *
 * Root isolation: between consecutive real roots of $p'$ the polynomial is monotone, so each
 * such interval holds at most one root of $p$, found by Brent's method on a sign change; the
 * roots of $p'$ come from the same procedure one degree down (recursively to degree 1). No root
 * with a sign change is missed; a root of even multiplicity (a tangency, no sign change) is
 * reported only when $p$ is exactly zero at a critical point. Accuracy: each root to the
 * rounding of $p$ near it (the Brent tolerance is 0); well-separated simple roots of
 * well-scaled polynomials to ≤ 1e-14 relative (tested against polynomials built from known
 * roots and against mpmath through the splitting fixture of the links module).
 *
 * @packageDocumentation
 */
import { brentBracketed } from "./brent-root.js";

/** p(x) by Horner's rule. */
export function polynomialValue(p: ArrayLike<number>, x: number): number {
  let s = 0;
  for (let i = p.length - 1; i >= 0; i--) s = s * x + (p[i] ?? 0);
  return s;
}

/** Coefficients of p'. */
export function polynomialDerivative(p: ArrayLike<number>): number[] {
  const out: number[] = [];
  for (let i = 1; i < p.length; i++) out.push(i * (p[i] ?? 0));
  return out;
}

/** Coefficients of p·q. */
export function polynomialProduct(p: ArrayLike<number>, q: ArrayLike<number>): number[] {
  if (p.length === 0 || q.length === 0) return [];
  const out = new Array<number>(p.length + q.length - 1).fill(0);
  for (let i = 0; i < p.length; i++) for (let j = 0; j < q.length; j++) out[i + j] = (out[i + j] ?? 0) + (p[i] ?? 0) * (q[j] ?? 0);
  return out;
}

/** Coefficients of a·p + b·q. */
export function polynomialCombination(a: number, p: ArrayLike<number>, b: number, q: ArrayLike<number>): number[] {
  const n = Math.max(p.length, q.length);
  const out = new Array<number>(n).fill(0);
  for (let i = 0; i < n; i++) out[i] = a * (p[i] ?? 0) + b * (q[i] ?? 0);
  return out;
}

/** Drops trailing coefficients whose magnitude is below `relative` × the largest. */
export function polynomialTrim(p: ArrayLike<number>, relative = 0): number[] {
  let big = 0;
  for (let i = 0; i < p.length; i++) big = Math.max(big, Math.abs(p[i] ?? 0));
  let n = p.length;
  while (n > 0 && Math.abs(p[n - 1] ?? 0) <= relative * big) n--;
  return Array.from({ length: n }, (_, i) => p[i] ?? 0);
}

/**
 * All real roots of p in the open interval (lower, upper), ascending (see the file header for
 * the method). p must have a non-zero leading coefficient (trim it first).
 */
export function polynomialRealRoots(p: ArrayLike<number>, lower: number, upper: number): number[] {
  const degree = p.length - 1;
  if (degree < 1) return [];
  if (degree === 1) {
    const r = -(p[0] ?? 0) / (p[1] ?? 1);
    return r > lower && r < upper ? [r] : [];
  }
  const critical = polynomialRealRoots(polynomialDerivative(p), lower, upper);
  const roots: number[] = [];
  let a = lower;
  let fa = polynomialValue(p, a);
  const f = (x: number): number => polynomialValue(p, x);
  for (let i = 0; i <= critical.length; i++) {
    const b = i < critical.length ? (critical[i] ?? upper) : upper;
    const fb = polynomialValue(p, b);
    if (fa === 0 && a > lower) roots.push(a);
    else if (fa !== 0 && fb !== 0 && (fa < 0) !== (fb < 0)) {
      const r = brentBracketed(f, a, b, fa, fb, 0, 200, false);
      if (Number.isFinite(r)) roots.push(r);
    }
    a = b;
    fa = fb;
  }
  return roots;
}

/** Cauchy's bound: every root has |x| < 1 + max |p_i / p_n|. */
export function polynomialRootBound(p: ArrayLike<number>): number {
  const n = p.length - 1;
  const lead = Math.abs(p[n] ?? 0);
  let m = 0;
  for (let i = 0; i < n; i++) m = Math.max(m, Math.abs(p[i] ?? 0) / lead);
  return 1 + m;
}
