/**
 * Special functions and numerical kernels: complete elliptic integrals, Bessel and Kelvin
 * functions, complex arithmetic, quadrature, root finding and ODE integration.
 *
 * Import from `fluxwright/special` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/special.md
 * @module fluxwright/special
 */
export { ellipticK, ellipticE, ellipticKFromComplement, ellipticEFromComplement } from "./elliptic.js";
export {
  complex,
  cAdd,
  cSub,
  cMul,
  cDiv,
  cScale,
  cNeg,
  cConj,
  cAbs,
  cArg,
  cSqrt,
  cExp,
  cLog,
  cSinh,
  cCosh,
  cTanh,
  cCoth,
} from "./complex.js";
export type { Complex } from "./complex.js";
export { brentRoot } from "./brent-root.js";
export type { BrentRootOptions } from "./brent-root.js";
export { integrateAdaptive } from "./integrate-adaptive.js";
export type { IntegrateAdaptiveOptions, IntegrationResult } from "./integrate-adaptive.js";
export { integrateToInfinity } from "./integrate-to-infinity.js";
export type { IntegrateToInfinityOptions } from "./integrate-to-infinity.js";
export {
  besselJ0,
  besselJ1,
  besselY0,
  besselY1,
  besselI0,
  besselI1,
  besselK0,
  besselK1,
  besselI0Scaled,
  besselI1Scaled,
  besselK0Scaled,
  besselK1Scaled,
} from "./bessel.js";
export {
  besselJ0Complex,
  besselJ1Complex,
  besselI0Complex,
  besselI1Complex,
  besselK0Complex,
  besselK1Complex,
  besselI0ComplexScaled,
  besselI1ComplexScaled,
  besselK0ComplexScaled,
  besselK1ComplexScaled,
  besselI1OverI0Complex,
  besselIKComplexScaled,
} from "./bessel-complex.js";
export type { ScaledBesselIKComplex } from "./bessel-complex.js";
export {
  kelvinBer,
  kelvinBei,
  kelvinKer,
  kelvinKei,
  kelvinBerPrime,
  kelvinBeiPrime,
  kelvinKerPrime,
  kelvinKeiPrime,
  kelvinFunctions,
  kelvinFunctionsScaled,
} from "./kelvin.js";
export type { KelvinFunctions } from "./kelvin.js";
export * from "./ode.js";
export { solveDense } from "./dense-solve.js";
export { factorComplexSymmetric, latticeNestedDissection } from "./sparse-ldl.js";
export type { ComplexSparseMatrix, ComplexSymmetricFactor, LatticeNestedDissectionOptions } from "./sparse-ldl.js";
