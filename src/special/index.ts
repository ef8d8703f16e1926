/**
 * Special functions and numerical kernels: complete elliptic integrals, Bessel and Kelvin
 * functions, complex arithmetic, quadrature, root finding and ODE integration.
 *
 * @module special
 */
export { ellipticK, ellipticE, ellipticKFromComplement, ellipticEFromComplement } from "./elliptic.js";
export * from "./ode.js";
