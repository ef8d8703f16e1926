/**
 * Unchecked kernels of the round-wire eddy-current factors, shared by the public functions of
 * this module (not exported from the package).
 *
 * With $q = \sqrt{2}\, r/\delta = d/(\sqrt{2}\,\delta)$ and the Kelvin functions of order 0:
 *  - skin factor (isolated wire): $F(q) = \tfrac{q}{2}\,(\mathrm{ber}\,\mathrm{bei}' - \mathrm{bei}\,\mathrm{ber}')/(\mathrm{ber}'^2 + \mathrm{bei}'^2)$;
 *  - transverse-field loss factor: $g(q) = 2\pi q\,(\mathrm{ber}\,\mathrm{ber}' + \mathrm{bei}\,\mathrm{bei}')/(\mathrm{ber}^2 + \mathrm{bei}^2)$,
 *    so that a round wire in a uniform transverse field of peak $H_0$ dissipates $g\,\rho H_0^2$ per metre
 *    (derived from the exterior/interior solution of the n = 1 mode; low-frequency limit
 *    $\pi \sigma \omega^2 B_0^2 r^4 / 8$, high-frequency limit the surface loss $2\pi\rho r H_0^2/\delta$).
 *
 * Both ratios are invariant under the exponential scaling of {@link kelvinFunctionsScaled}, so
 * they never overflow. For q ≤ 1 both are summed as power series in t = q⁴ (coefficients
 * computed exactly in rational arithmetic from the ber/bei series by series division, then
 * rounded; the series converge for |q| < 3.83, the first zero of I₁ along the ray, and the
 * truncation error at q = 1 is below 1e-18); for q ≥ 30 both come from the Hankel expansions
 * (DLMF 10.40.1) of $I_0(z)$ and $I_1(z)$ at $z = q e^{i\pi/4}$, whose ratio was expanded once,
 * exactly, in powers of 1/z: 16 terms leave a truncation error below 3e-16 and the neglected
 * second exponential is $e^{-\sqrt{2} q} < 4e-19$. Kelvin functions ({@link kelvinFunctionsScaled})
 * are called for 1 < q < 30 (checked against mpmath, test fixture round-wire.json).
 *
 * @packageDocumentation
 * @internal
 */
import { kelvinFunctionsScaled } from "../special/index.js";

/**
 * Rac/Rdc of an isolated round wire as a function of q = d/(√2 δ) (q > 0, unchecked).
 * @param q - d/(√2 δ)
 * @returns Rac/Rdc
 * @internal
 */
export function wireSkinFactorKernel(q: number): number {
  if (q <= 1) {
    const q2 = q * q;
    const t = q2 * q2;
    return 1 + t * (0.005208333333333333 + t * (-2.170138888888889e-05 + t * (9.990873790922619e-08 + t * (-4.631828705796816e-10 + t * (2.1486165228703757e-12 + t * (-9.967540287822724e-15 + t * (4.624013577261268e-17 + t * (-2.145114015740674e-19 + t * (9.951342556326854e-22)))))))));
  }
  if (q >= 30) {
    const w = 1 / q;
    return q * (0.3535533905932738 + w * (0.25 + w * (0.13258252147247765 + w * (0 + w * (-0.17401455943262692 + w * (-0.421875 + w * (-0.6556620007193622 + w * (0 + w * (5.863960491327033 + w * (31.6669921875 + w * (97.44500946454696 + w * (0 + w * (-2563.62887225254 + w * (-21422.146728515625 + w * (-97238.52532228193 + w * (0))))))))))))))));
  }
  const k = kelvinFunctionsScaled(q);
  const bp = k.berPrime;
  const ip = k.beiPrime;
  return (0.5 * q * (k.ber * ip - k.bei * bp)) / (bp * bp + ip * ip);
}

/**
 * Transverse-field loss factor g(q) = P′/(ρ H₀²) of a round wire (q > 0, unchecked).
 * @param q - d/(√2 δ)
 * @returns g [-]
 * @internal
 */
export function wireProximityFactorKernel(q: number): number {
  if (q <= 1) {
    const q2 = q * q;
    const t = q2 * q2;
    return Math.PI * t * (0.125 + t * (-0.0035807291666666665 + t * (0.00010692455150462962 + t * (-3.1968588551516254e-06 + t * (9.558471323064139e-08 + t * (-2.8579465412572127e-09 + t * (8.545151852163082e-11 + t * (-2.554968025840824e-12 + t * (7.639257588961176e-14 + t * (-2.284109073789652e-15 + t * (6.829399585252332e-17 + t * (-2.0419645992501365e-18 + t * (6.105396781284855e-20)))))))))))));
  }
  if (q >= 30) {
    const w = 1 / q;
    return q * (4.442882938158366 + w * (-3.141592653589793 + w * (-0.5553603672697958 + w * (0 + w * (0.867750573859056 + w * (2.552544031041707 + w * (4.655481828753835 + w * (0 + w * (-50.94414474496635 + w * (-292.03312647451685 + w * (-938.6752009629823 + w * (0 + w * (26177.66937631999 + w * (223234.520720428 + w * (1030236.2927113856 + w * (0))))))))))))))));
  }
  const k = kelvinFunctionsScaled(q);
  const b = k.ber;
  const i = k.bei;
  return (2 * Math.PI * q * (b * k.berPrime + i * k.beiPrime)) / (b * b + i * i);
}
