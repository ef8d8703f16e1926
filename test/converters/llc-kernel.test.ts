import { describe, expect, it } from "vitest";
import { MODE_N, MODE_O, MODE_P, sequenceResiduals, sequenceResidualsAndJacobian, setSequence } from "../../src/converters/llc-kernel.js";

// The Newton solve of llcOperatingPoint uses the analytic Jacobian of its sequence residuals;
// here it is checked against central differences of the same residuals (step 1e-6: truncation
// error ~1e-12, rounding ~1e-10 relative), on every mode and sequences of one to four segments.
describe("LLC sequence residuals: analytic Jacobian", () => {
  const sequences = [[MODE_P], [MODE_P, MODE_O], [MODE_N, MODE_P], [MODE_O, MODE_P, MODE_O], [MODE_P, MODE_O, MODE_N], [MODE_N, MODE_O, MODE_P], [MODE_P, MODE_N, MODE_P, MODE_O]];
  for (const lam of [0, 0.1, 0.3]) {
    for (const sequence of sequences) {
      it(`matches central differences (λ = ${lam}, modes ${sequence.join("")})`, () => {
        setSequence(sequence);
        const n = sequence.length + 3;
        const theta = 2.5;
        const kappa = 0.4;
        const y = new Float64Array(n);
        y.set([-0.7, -1.3, -0.4, 0.9]);
        for (let k = 0; k < sequence.length - 1; k++) y[4 + k] = (theta / sequence.length) * (1 + 0.1 * k);
        const r = new Float64Array(n);
        const jac = new Float64Array(n * n);
        const plain = new Float64Array(n);
        expect(sequenceResiduals(y, theta, lam, kappa, plain)).toBe(true);
        expect(sequenceResidualsAndJacobian(y, theta, lam, kappa, r, jac)).toBe(true);
        // the same residual values, bit for bit (the Newton iteration mixes both)
        expect(Array.from(r)).toEqual(Array.from(plain));
        const up = new Float64Array(n);
        const down = new Float64Array(n);
        const h = 1e-6;
        let worst = 0;
        for (let c = 0; c < n; c++) {
          const base = y[c] ?? 0;
          y[c] = base + h;
          sequenceResiduals(y, theta, lam, kappa, up);
          y[c] = base - h;
          sequenceResiduals(y, theta, lam, kappa, down);
          y[c] = base;
          for (let i = 0; i < n; i++) {
            const difference = ((up[i] ?? 0) - (down[i] ?? 0)) / (2 * h);
            worst = Math.max(worst, Math.abs(difference - (jac[i * n + c] ?? 0)) / Math.max(1, Math.abs(difference)));
          }
        }
        expect(worst).toBeLessThan(1e-8);
      });
    }
  }
});
