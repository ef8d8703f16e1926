/**
 * Special functions and numerical kernels: complete elliptic integrals, Bessel and Kelvin
 * functions, complex arithmetic, quadrature, root finding and ODE integration.
 *
 * @module special
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
export * from "./ode.js";
