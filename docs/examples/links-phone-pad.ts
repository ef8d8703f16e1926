/**
 * A 5 W phone-pad-class link: two flat spirals 5 mm apart at 140 kHz, series–series
 * compensated. Inductances and mutual inductance come from the inductance module (air cores,
 * no ferrite), the link from the phasor solve, and the efficiency is set against the kQ limit.
 *
 * Run: npx tsx docs/examples/links-phone-pad.ts
 */
import {
  coaxialCoilMutualInductance,
  couplingCoefficient,
  inductiveLink,
  maximumLinkEfficiency,
  optimalLoadResistance,
  spiralCoilInductance,
} from "../../src/index.js";

const f = 140e3;
const w = 2 * Math.PI * f;
const tx = { innerRadius: 0.008, outerRadius: 0.02, turns: 16, wireDiameter: 0.7e-3 };
const rx = { innerRadius: 0.007, outerRadius: 0.016, turns: 12, wireDiameter: 0.6e-3 };
const l1 = spiralCoilInductance(tx);
const l2 = spiralCoilInductance(rx);
const m = coaxialCoilMutualInductance({ kind: "flatSpiral", innerTurnRadius: tx.innerRadius, outerTurnRadius: tx.outerRadius, turns: tx.turns }, { kind: "flatSpiral", innerTurnRadius: rx.innerRadius, outerTurnRadius: rx.outerRadius, turns: rx.turns }, 0.005);
const k = couplingCoefficient({ mutualInductance: m, selfInductance1: l1, selfInductance2: l2 });
// coil resistances at 140 kHz (litz assumed; values of the kind a datasheet gives)
const r1 = 0.09;
const r2 = 0.08;
console.log(`L1 ${(l1 * 1e6).toFixed(2)} µH, L2 ${(l2 * 1e6).toFixed(2)} µH, M ${(m * 1e6).toFixed(3)} µH, k ${k.toFixed(3)}`);

const q1 = (w * l1) / r1;
const q2 = (w * l2) / r2;
const limit = maximumLinkEfficiency({ couplingCoefficient: k, primaryQuality: q1, secondaryQuality: q2 });
const rOpt = optimalLoadResistance({ couplingCoefficient: k, primaryQuality: q1, secondaryQuality: q2, secondaryResistance: r2 });
console.log(`Q1 ${q1.toFixed(0)}, Q2 ${q2.toFixed(0)}: kQ limit ${(100 * limit).toFixed(1)} % at R_L = ${rOpt.toFixed(2)} Ω`);

for (const rl of [rOpt, 5, 10]) {
  // pick the source voltage for 5 W, then solve again (the link is linear: P ∝ V²)
  const base = { primaryInductance: l1, secondaryInductance: l2, mutualInductance: m, primaryResistance: r1, secondaryResistance: r2, frequency: f, compensation: "series-series" as const, loadResistance: rl };
  const unit = inductiveLink({ ...base, sourceVoltage: 1 });
  const link = inductiveLink({ ...base, sourceVoltage: Math.sqrt(5 / unit.outputPower) });
  console.log(`R_L ${rl.toFixed(2)} Ω: efficiency ${(100 * link.efficiency).toFixed(2)} %, source ${link.inputCurrentRms.toFixed(3)} A rms, capacitor C1 ${(link.capacitors[0]!.capacitance * 1e9).toFixed(1)} nF at ${link.capacitors[0]!.voltageRms.toFixed(1)} V rms`);
  if (link.efficiency > limit * (1 + 1e-12)) throw new Error("above the kQ limit");
}
