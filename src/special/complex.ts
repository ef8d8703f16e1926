/**
 * Complex arithmetic as small pure functions on plain `{ re, im }` records.
 *
 * Every function returns a new object and never mutates its arguments. Branch cuts follow
 * the principal-value conventions of the C99 standard (Annex G) and of mpmath: `cArg` in
 * (−π, π], `cSqrt` with Re ≥ 0, `cLog` with Im in (−π, π].
 *
 * @packageDocumentation
 */

/**
 * A complex number $z = \mathrm{re} + i\,\mathrm{im}$ as a plain record.
 *
 * @category Complex arithmetic
 */
export interface Complex {
  /** Real part. */
  re: number;
  /** Imaginary part. */
  im: number;
}

/**
 * Builds a complex number re + i·im.
 *
 * @param re - real part
 * @param im - imaginary part (default 0)
 * @returns the record `{ re, im }`
 * @example
 * ```ts
 * import { complex } from "fluxwright";
 * console.log(complex(1, -2)); // { re: 1, im: -2 }
 * ```
 * @category Complex arithmetic
 */
export function complex(re: number, im = 0): Complex {
  return { re, im };
}

/**
 * Sum a + b.
 *
 * @param a - first term
 * @param b - second term
 * @returns a + b (exactly rounded per component)
 * @example
 * ```ts
 * import { cAdd, complex } from "fluxwright";
 * console.log(cAdd(complex(1, 2), complex(3, -1))); // { re: 4, im: 1 }
 * ```
 * @category Complex arithmetic
 */
export function cAdd(a: Complex, b: Complex): Complex {
  return { re: a.re + b.re, im: a.im + b.im };
}

/**
 * Difference a − b.
 *
 * @param a - minuend
 * @param b - subtrahend
 * @returns a − b (exactly rounded per component)
 * @example
 * ```ts
 * import { cSub, complex } from "fluxwright";
 * console.log(cSub(complex(1, 2), complex(3, -1))); // { re: -2, im: 3 }
 * ```
 * @category Complex arithmetic
 */
export function cSub(a: Complex, b: Complex): Complex {
  return { re: a.re - b.re, im: a.im - b.im };
}

/**
 * Product $ab = (a_r b_r - a_i b_i) + i(a_r b_i + a_i b_r)$.
 *
 * * Accuracy: ≤ 1e-15 normwise relative vs mpmath (fixture); a single component can lose digits under cancellation
 * of the two partial products (the usual limit of the textbook formula).
 *
 * @param a - first factor
 * @param b - second factor
 * @returns a·b
 * @example
 * ```ts
 * import { cMul, complex } from "fluxwright";
 * console.log(cMul(complex(1, 2), complex(3, 4))); // { re: -5, im: 10 }
 * ```
 * @category Complex arithmetic
 */
export function cMul(a: Complex, b: Complex): Complex {
  return { re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re };
}

/**
 * Quotient a / b by Smith's algorithm (scaled by the larger component of b, so it neither
 * overflows nor underflows for representable results).
 *
 * $$
 * \frac{a}{b} = \frac{a\,\bar b}{|b|^2}
 * $$
 *
 * Division by 0 gives non-finite components (kernel: no throw).
 *
 * @param a - dividend
 * @param b - divisor
 * @returns a / b
 * @see R. L. Smith, "Algorithm 116: Complex division", Commun. ACM 5(8):435 (1962)
 * @example
 * ```ts
 * import { cDiv, complex } from "fluxwright";
 * console.log(cDiv(complex(-5, 10), complex(3, 4))); // { re: 1, im: 2 }
 * ```
 * @category Complex arithmetic
 */
export function cDiv(a: Complex, b: Complex): Complex {
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    const r = b.im / b.re;
    const d = b.re + b.im * r;
    return { re: (a.re + a.im * r) / d, im: (a.im - a.re * r) / d };
  }
  const r = b.re / b.im;
  const d = b.re * r + b.im;
  return { re: (a.re * r + a.im) / d, im: (a.im * r - a.re) / d };
}

/**
 * Product with a real number s·a.
 *
 * @param a - complex factor
 * @param s - real factor
 * @returns s·a
 * @example
 * ```ts
 * import { cScale, complex } from "fluxwright";
 * console.log(cScale(complex(1, -2), 3)); // { re: 3, im: -6 }
 * ```
 * @category Complex arithmetic
 */
export function cScale(a: Complex, s: number): Complex {
  return { re: a.re * s, im: a.im * s };
}

/**
 * Negation −a.
 *
 * @param a - operand
 * @returns −a
 * @example
 * ```ts
 * import { cNeg, complex } from "fluxwright";
 * console.log(cNeg(complex(1, -2))); // { re: -1, im: 2 }
 * ```
 * @category Complex arithmetic
 */
export function cNeg(a: Complex): Complex {
  return { re: -a.re, im: -a.im };
}

/**
 * Complex conjugate $\bar a$.
 *
 * @param a - operand
 * @returns re − i·im
 * @example
 * ```ts
 * import { cConj, complex } from "fluxwright";
 * console.log(cConj(complex(1, -2))); // { re: 1, im: 2 }
 * ```
 * @category Complex arithmetic
 */
export function cConj(a: Complex): Complex {
  return { re: a.re, im: -a.im };
}

/**
 * Modulus |a| = √(re² + im²), computed without intermediate overflow or underflow.
 *
 * @param a - operand
 * @returns |a| ≥ 0
 * @example
 * ```ts
 * import { cAbs, complex } from "fluxwright";
 * console.log(cAbs(complex(3, 4))); // 5
 * ```
 * @category Complex arithmetic
 */
export function cAbs(a: Complex): number {
  return Math.hypot(a.re, a.im);
}

/**
 * Argument (phase) of a in (−π, π], `Math.atan2(im, re)`.
 *
 * @param a - operand
 * @returns arg a [rad]
 * @example
 * ```ts
 * import { cArg, complex } from "fluxwright";
 * console.log(cArg(complex(0, 1)) === Math.PI / 2); // true
 * ```
 * @category Complex arithmetic
 */
export function cArg(a: Complex): number {
  return Math.atan2(a.im, a.re);
}

/**
 * Principal square root (Re ≥ 0; branch cut along the negative real axis, continuous from
 * above as in C99), computed without cancellation.
 *
 * $$
 * \sqrt{z} = t + i\,\frac{\mathrm{im}}{2t}, \qquad t = \sqrt{\tfrac{|z| + \mathrm{re}}{2}}\quad(\mathrm{re} \ge 0)
 * $$
 *
 * Accuracy: ≤ 1e-15 normwise relative (|w − w_ref|/|w_ref|) vs mpmath `sqrt` (test/fixtures/special/complex.json).
 *
 * @param a - operand
 * @returns √a
 * @see W. Kahan, "Branch cuts for complex elementary functions" (1987)
 * @example
 * ```ts
 * import { cSqrt, complex } from "fluxwright";
 * console.log(cSqrt(complex(-4, 0))); // { re: 0, im: 2 }
 * ```
 * @category Complex arithmetic
 */
export function cSqrt(a: Complex): Complex {
  const x = a.re;
  const y = a.im;
  if (x === 0 && y === 0) return { re: 0, im: y };
  // near the top of the double range r ± x would overflow: take √(z/4) and double it
  if (Math.abs(x) > 1e307 || Math.abs(y) > 1e307) {
    const half = cSqrt({ re: x / 4, im: y / 4 });
    return { re: 2 * half.re, im: 2 * half.im };
  }
  const r = Math.hypot(x, y);
  if (x >= 0) {
    const t = Math.sqrt(0.5 * (r + x));
    return { re: t, im: y / (2 * t) };
  }
  const t = Math.sqrt(0.5 * (r - x));
  return { re: Math.abs(y) / (2 * t), im: y < 0 || Object.is(y, -0) ? -t : t };
}

/**
 * Exponential $e^{z} = e^{x}(\cos y + i \sin y)$.
 *
 * Accuracy: ≤ 1e-15 normwise relative (|w − w_ref|/|w_ref|) vs mpmath (test/fixtures/special/complex.json). Overflows
 * to ±Infinity for re > 709.78.
 *
 * @param a - exponent
 * @returns e^a
 * @example
 * ```ts
 * import { cExp, complex } from "fluxwright";
 * console.log(cExp(complex(0, Math.PI)).re); // -1
 * ```
 * @category Complex arithmetic
 */
export function cExp(a: Complex): Complex {
  const e = Math.exp(a.re);
  if (a.im === 0) return { re: e, im: a.im };
  return { re: e * Math.cos(a.im), im: e * Math.sin(a.im) };
}

/**
 * Principal logarithm $\ln z = \ln|z| + i \arg z$, Im in (−π, π]. ln 0 = −Infinity.
 *
 * Accuracy: ≤ 1e-15 normwise relative (|w − w_ref|/|w_ref|) vs mpmath away from |z| = 1 (there the real part is small
 * and accurate to 2e-16 absolute).
 *
 * @param a - operand
 * @returns ln a
 * @example
 * ```ts
 * import { cLog, complex } from "fluxwright";
 * console.log(cLog(complex(-1, 0)).im === Math.PI); // true
 * ```
 * @category Complex arithmetic
 */
export function cLog(a: Complex): Complex {
  return { re: Math.log(Math.hypot(a.re, a.im)), im: Math.atan2(a.im, a.re) };
}

/**
 * Hyperbolic sine $\sinh z = \sinh x \cos y + i \cosh x \sin y$.
 *
 * Accuracy: ≤ 1e-15 normwise relative (|w − w_ref|/|w_ref|) vs mpmath (test/fixtures/special/complex.json); overflows
 * for |re| > 710.
 *
 * @param a - operand
 * @returns sinh a
 * @example
 * ```ts
 * import { cSinh, complex } from "fluxwright";
 * console.log(cSinh(complex(0, Math.PI / 2))); // { re: 0, im: 1 }
 * ```
 * @category Complex arithmetic
 */
export function cSinh(a: Complex): Complex {
  return { re: Math.sinh(a.re) * Math.cos(a.im), im: Math.cosh(a.re) * Math.sin(a.im) };
}

/**
 * Hyperbolic cosine $\cosh z = \cosh x \cos y + i \sinh x \sin y$.
 *
 * Accuracy: ≤ 1e-15 normwise relative (|w − w_ref|/|w_ref|) vs mpmath; overflows for |re| > 710.
 *
 * @param a - operand
 * @returns cosh a
 * @example
 * ```ts
 * import { cCosh, complex } from "fluxwright";
 * console.log(cCosh(complex(0, 0))); // { re: 1, im: 0 }
 * ```
 * @category Complex arithmetic
 */
export function cCosh(a: Complex): Complex {
  return { re: Math.cosh(a.re) * Math.cos(a.im), im: Math.sinh(a.re) * Math.sin(a.im) };
}

/**
 * Hyperbolic tangent, overflow-free for every argument.
 *
 * With $t = e^{-2|x|}$:
 * $$
 * \tanh z = \frac{\operatorname{sgn}(x)\,(1 - t^2) + 2 i\, t \sin 2y}{(1 - t)^2 + 4 t \cos^2 y}
 * $$
 * which tends to ±1 for large |re| instead of ∞/∞.
 *
 * Accuracy: ≤ 1e-15 normwise relative (|w − w_ref|/|w_ref|) vs mpmath away from its poles (test/fixtures/special/complex.json).
 *
 * @param a - operand
 * @returns tanh a
 * @example
 * ```ts
 * import { cTanh, complex } from "fluxwright";
 * console.log(cTanh(complex(1000, 1))); // { re: 1, im: 0 }
 * ```
 * @category Complex arithmetic
 */
export function cTanh(a: Complex): Complex {
  const ax = Math.abs(a.re);
  const t = Math.exp(-2 * ax);
  const oneMinusT2 = -Math.expm1(-4 * ax);
  const c = Math.cos(a.im);
  const omt = -Math.expm1(-2 * ax);
  const d = omt * omt + 4 * t * c * c;
  const re = oneMinusT2 / d;
  return { re: a.re < 0 ? -re : re, im: (2 * t * Math.sin(2 * a.im)) / d };
}

/**
 * Hyperbolic cotangent coth z = 1 / tanh z, overflow-free for every argument.
 *
 * With $t = e^{-2|x|}$:
 * $$
 * \coth z = \frac{\operatorname{sgn}(x)\,(1 - t^2) - 2 i\, t \sin 2y}{(1 - t)^2 + 4 t \sin^2 y}
 * $$
 *
 * Accuracy: ≤ 1e-15 normwise relative (|w − w_ref|/|w_ref|) vs mpmath away from its poles z = iπn.
 *
 * @param a - operand
 * @returns coth a
 * @example
 * ```ts
 * import { cCoth, complex } from "fluxwright";
 * console.log(cCoth(complex(-1000, 2))); // { re: -1, im: 0 }
 * ```
 * @category Complex arithmetic
 */
export function cCoth(a: Complex): Complex {
  const ax = Math.abs(a.re);
  const t = Math.exp(-2 * ax);
  const oneMinusT2 = -Math.expm1(-4 * ax);
  const s = Math.sin(a.im);
  const omt = -Math.expm1(-2 * ax);
  const d = omt * omt + 4 * t * s * s;
  const re = oneMinusT2 / d;
  return { re: a.re < 0 ? -re : re, im: (-2 * t * Math.sin(2 * a.im)) / d };
}
