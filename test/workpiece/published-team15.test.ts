import { describe, it, expect } from "vitest";
import { coilOverPlate } from "../../src/index.js";

// Published check: the two air-cored coils of TEAM Workshop Problem 15 ("Rectangular slot in a
// thick plate"; Testing Electromagnetic Analysis Methods benchmark series, problems 1 and 2,
// contributed by S. K. Burke — author named from memory), whose coil data include the MEASURED
// inductance of the isolated coil.
//
// Provenance of the figures: the problem data as restated in a public write-up of a
// finite-element solution of the problem (the primary problem definition could not be read
// here). Data used:
// - plate: aluminium alloy, σ = 3.06e7 S/m, μr = 1, 12.22 mm thick;
// - problem 1 coil: inner radius 6.15 mm, outer 12.4 mm, length 6.15 mm, 3790 turns, lift-off
//   0.88 mm, 900 Hz; isolated inductance 221.8 mH (measured);
// - problem 2 coil: inner radius 9.34 mm, outer 18.4 mm, length 9.0 mm, 408 turns, lift-off
//   2.03 mm, 7 kHz; isolated inductance 3.96 mH (measured).
// The same write-up reports an independent 3-D finite-element solution of problem 1:
// isolated coil 225.9 mH, coil over the unflawed plate 178.63 mH and 120.67 Ω; it attributes
// the 1.9 % excess of the computed L0 over the measurement to the nominal dimensions and
// uniform current density of the model coil — the same idealisation as Dodd & Deeds'.
// (The skin depths quoted with the problem, 3.04 mm at 900 Hz and 1.09 mm at 7 kHz, are not
// asserted: with σ = 3.06e7 S/m the first is 3.033 mm, 0.2 % below the quoted figure — a
// small inconsistency between the restated figures, not a property of this module.)
const plate = { thickness: 12.22e-3, resistivity: 1 / 3.06e7, relativePermeability: 1 };
const problem1 = {
  coil: { innerRadius: 6.15e-3, outerRadius: 12.4e-3, length: 6.15e-3, turns: 3790, liftOff: 0.88e-3 },
  plate,
  frequency: 900,
};
const problem2 = {
  coil: { innerRadius: 9.34e-3, outerRadius: 18.4e-3, length: 9.0e-3, turns: 408, liftOff: 2.03e-3 },
  plate,
  frequency: 7000,
};

describe("coilOverPlate against TEAM Workshop Problem 15 (Burke)", () => {
  it("gives the isolated-coil inductance of problem 1 within 2.5 % of the measured 221.8 mH", () => {
    const r = coilOverPlate(problem1);
    // Measured: 225.99 mH, +1.9 %. Tolerance 2.5 %: a nominal-dimension, uniform-current model of
    // a real 3790-turn winding; the independent FEM solution of the same nominal coil is also
    // +1.9 % (225.9 mH), so the gap is the coil's, not the integral's.
    expect(Math.abs(r.emptyCoilInductance / 221.8e-3 - 1)).toBeLessThan(0.025);
  });

  it("gives the isolated-coil inductance of problem 2 within 2.5 % of the measured 3.96 mH", () => {
    const r = coilOverPlate(problem2);
    // Measured: 3.985 mH, +0.63 %; the published value has three digits (±0.13 %). Same 2.5 %
    // allowance as problem 1 for the nominal-dimension model coil.
    expect(Math.abs(r.emptyCoilInductance / 3.96e-3 - 1)).toBeLessThan(0.025);
  });

  it("agrees with the independent 3-D FEM solution of problem 1 to 1e-3 (L0, L and R over the unflawed plate)", () => {
    const r = coilOverPlate(problem1);
    // FEM values printed to 4–5 digits (225.9 mH; 178.63 mH; 120.67 Ω); the write-up states the FEM
    // solution converged to 0.1–0.2 % under refinement, hence 1e-3. Measured: L0 +4.0e-4,
    // L +1.4e-4, R −1.6e-4.
    expect(Math.abs(r.emptyCoilInductance / 225.9e-3 - 1)).toBeLessThan(1e-3);
    expect(Math.abs(r.inductance / 178.63e-3 - 1)).toBeLessThan(1e-3);
    expect(Math.abs(r.reflectedResistance / 120.67 - 1)).toBeLessThan(1e-3);
  });
});
