/**
 * The library's own numerical toolkit: kernels that several modules share but that are not
 * part of the public API (no input validation beyond what their callers guarantee; they may
 * return NaN outside their domain). Modules import them from here, never from a private copy.
 * Each has a fixture from an outside reference in `test/fixtures/toolkit/` and its accuracy in
 * its file's header.
 *
 * @packageDocumentation
 */
export {
  gaussLegendreRule,
  gaussLegendrePanel,
  gaussLegendreAdaptive,
  gaussLegendreAdaptiveAbsolute,
  gaussLegendreAdaptiveSingularAtStart,
} from "./gauss-legendre.js";
export type { GaussLegendreRule } from "./gauss-legendre.js";
export { logGamma } from "./log-gamma.js";
export { leastSquaresQr } from "./least-squares.js";
export { exponentialIntegralE5 } from "./exponential-integral.js";
export { solveTridiagonal } from "./tridiagonal.js";
export { andersonStep } from "./anderson.js";
export { splitmix32, Xoshiro128, NormalDeviates } from "./random.js";
export {
  polynomialValue,
  polynomialDerivative,
  polynomialProduct,
  polynomialCombination,
  polynomialTrim,
  polynomialRealRoots,
  polynomialRootBound,
} from "./polynomial.js";
export { factorDense, solveFactored } from "./dense-solve.js";
export { factorComplexDense, solveComplexFactored } from "./complex-dense-lu.js";
export { brentBracketed } from "./brent-root.js";
export { besselIKRatiosComplex } from "./bessel-orders.js";
export { besselIKScaledInto, IK_I0R, IK_I0I, IK_I1R, IK_I1I, IK_K0R, IK_K0I, IK_K1R, IK_K1I } from "./bessel-core.js";
export { besselI1OverI0ComplexInto } from "./bessel-complex.js";
