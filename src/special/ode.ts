/**
 * Adaptive ODE integration (placeholder until the integrator lands).
 *
 * @packageDocumentation
 */
export {};
