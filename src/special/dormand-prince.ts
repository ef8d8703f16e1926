/**
 * One step of the Dormand–Prince 5(4) pair: the tableau, the six stages with the FSAL seventh
 * derivative, the embedded error norm and the order-4 dense-output coefficients. Internal to
 * {@link solveOde}; allocation-free (every array is the caller's).
 *
 * @packageDocumentation
 */

// Dormand–Prince 5(4) coefficients (Dormand & Prince 1980, Table 2; Hairer, Nørsett & Wanner,
// Solving ODEs I, 2nd ed., Table II.5.2).
const C2 = 1 / 5;
const C3 = 3 / 10;
const C4 = 4 / 5;
const C5 = 8 / 9;
const A21 = 1 / 5;
const A31 = 3 / 40;
const A32 = 9 / 40;
const A41 = 44 / 45;
const A42 = -56 / 15;
const A43 = 32 / 9;
const A51 = 19372 / 6561;
const A52 = -25360 / 2187;
const A53 = 64448 / 6561;
const A54 = -212 / 729;
const A61 = 9017 / 3168;
const A62 = -355 / 33;
const A63 = 46732 / 5247;
const A64 = 49 / 176;
const A65 = -5103 / 18656;
const B1 = 35 / 384;
const B3 = 500 / 1113;
const B4 = 125 / 192;
const B5 = -2187 / 6784;
const B6 = 11 / 84;
// Error coefficients: 5th-order weights minus the embedded 4th-order weights.
const E1 = 71 / 57600;
const E3 = -71 / 16695;
const E4 = 71 / 1920;
const E5 = -17253 / 339200;
const E6 = 22 / 525;
const E7 = -1 / 40;
// Continuous extension of order 4 (Hairer, Nørsett & Wanner, Solving ODEs I, §II.6, the
// coefficients used in their DOPRI5 code).
const D1 = -12715105075 / 11282082432;
const D3 = 87487479700 / 32700410799;
const D4 = -10690763975 / 1880347072;
const D5 = 701980252875 / 199316789632;
const D6 = -1453857185 / 822651844;
const D7 = 69997945 / 29380423;

/** Evaluates the derivative into `out` and counts the call; false when a component is not finite. */
export type StageEvaluate = (t: number, state: Float64Array, out: Float64Array) => boolean;

/** The stage derivatives and scratch state of one step (length n each). */
export interface DormandPrinceWork {
  readonly k1: Float64Array;
  readonly k2: Float64Array;
  readonly k3: Float64Array;
  readonly k4: Float64Array;
  readonly k5: Float64Array;
  readonly k6: Float64Array;
  readonly k7: Float64Array;
  readonly yStage: Float64Array;
  readonly yNew: Float64Array;
}

/**
 * The stages of a step of signed size `hs` from (`t`, `y`) with `k1` = f(t, y): fills k2…k7
 * and the 5th-order solution `yNew` (k7 = f(tEnd, yNew), first same as last). `tEnd` is the
 * step's end as the caller rounds it. False when a derivative was not finite.
 */
export function dormandPrinceStages(evaluate: StageEvaluate, n: number, t: number, hs: number, tEnd: number, y: Float64Array, w: DormandPrinceWork): boolean {
  const { k1, k2, k3, k4, k5, k6, k7, yStage, yNew } = w;
    for (let i = 0; i < n; i++) yStage[i] = y[i]! + hs * A21 * k1[i]!;
    let ok = evaluate(t + C2 * hs, yStage, k2);
    if (ok) {
      for (let i = 0; i < n; i++) yStage[i] = y[i]! + hs * (A31 * k1[i]! + A32 * k2[i]!);
      ok = evaluate(t + C3 * hs, yStage, k3);
    }
    if (ok) {
      for (let i = 0; i < n; i++) yStage[i] = y[i]! + hs * (A41 * k1[i]! + A42 * k2[i]! + A43 * k3[i]!);
      ok = evaluate(t + C4 * hs, yStage, k4);
    }
    if (ok) {
      for (let i = 0; i < n; i++) {
        yStage[i] = y[i]! + hs * (A51 * k1[i]! + A52 * k2[i]! + A53 * k3[i]! + A54 * k4[i]!);
      }
      ok = evaluate(t + C5 * hs, yStage, k5);
    }
    if (ok) {
      for (let i = 0; i < n; i++) {
        yStage[i] = y[i]! + hs * (A61 * k1[i]! + A62 * k2[i]! + A63 * k3[i]! + A64 * k4[i]! + A65 * k5[i]!);
      }
      ok = evaluate(tEnd, yStage, k6);
    }
    if (ok) {
      for (let i = 0; i < n; i++) {
        yNew[i] = y[i]! + hs * (B1 * k1[i]! + B3 * k3[i]! + B4 * k4[i]! + B5 * k5[i]! + B6 * k6[i]!);
      }
      ok = evaluate(tEnd, yNew, k7);
    }
    return ok;
}

/** The RMS of the embedded error estimate scaled by `atol` + `rtol`·max(|y|, |yNew|) (≤ 1: accept). */
export function dormandPrinceError(n: number, hs: number, y: Float64Array, atol: Float64Array, rtol: number, w: DormandPrinceWork): number {
  const { k1, k3, k4, k5, k6, k7, yNew } = w;
    let errSum = 0;
    for (let i = 0; i < n; i++) {
      const e = hs * (E1 * k1[i]! + E3 * k3[i]! + E4 * k4[i]! + E5 * k5[i]! + E6 * k6[i]! + E7 * k7[i]!);
      const sc = atol[i]! + rtol * Math.max(Math.abs(y[i]!), Math.abs(yNew[i]!));
      const ratio = sc > 0 ? e / sc : e === 0 ? 0 : Infinity;
      errSum += ratio * ratio;
    }
    return Math.sqrt(errSum / n);
}

/**
 * The dense-output coefficients of an accepted step:
 * y(t + θh) = r1 + θ(r2 + (1−θ)(r3 + θ(r4 + (1−θ) r5))) (Hairer, Nørsett & Wanner, §II.6).
 */
export function dormandPrinceDense(n: number, hs: number, y: Float64Array, w: DormandPrinceWork, r1: Float64Array, r2: Float64Array, r3: Float64Array, r4: Float64Array, r5: Float64Array): void {
  const { k1, k3, k4, k5, k6, k7, yNew } = w;
    for (let i = 0; i < n; i++) {
      const ydiff = yNew[i]! - y[i]!;
      const bspl = hs * k1[i]! - ydiff;
      r1[i] = y[i]!;
      r2[i] = ydiff;
      r3[i] = bspl;
      r4[i] = ydiff - hs * k7[i]! - bspl;
      r5[i] = hs * (D1 * k1[i]! + D3 * k3[i]! + D4 * k4[i]! + D5 * k5[i]! + D6 * k6[i]! + D7 * k7[i]!);
    }
}
