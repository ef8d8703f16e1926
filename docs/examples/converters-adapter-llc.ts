/**
 * A 65 W adapter-class LLC stage: 390 V DC bus, half bridge, 19.5 V output at 3.33 A. The exact
 * steady state at three switching frequencies, with the first-harmonic values beside it, and
 * the switching-frequency window that holds the output at 19.5 V from a 370 V to a 410 V bus;
 * then the same stage designed from its specification with `llcDesign` (a 340–410 V bus after
 * hold-up, 100 kHz resonance). The bus is mains-derived and lethal: see the cautions.
 *
 * Run: npx tsx docs/examples/converters-adapter-llc.ts
 */
import { brentRoot, llcDesign, llcGain, llcOperatingPoint } from "../../src/index.js";

const stage = {
  bridge: "half" as const,
  inputVoltage: 390,
  turnsRatio: 10,
  resonantInductance: 300e-6,
  resonantCapacitance: 8.2e-9,
  magnetisingInductance: 1.2e-3,
  loadResistance: 19.5 / 3.33,
  deadTime: 250e-9,
  switchCapacitance: 120e-12,
};

const fr = 1 / (2 * Math.PI * Math.sqrt(stage.resonantInductance * stage.resonantCapacitance));
console.log(`resonant frequency ${(fr / 1e3).toFixed(2)} kHz`);
for (const fn of [0.85, 1, 1.2]) {
  const op = llcOperatingPoint({ ...stage, switchingFrequency: fn * fr });
  console.log(
    `f_n ${fn.toFixed(2)}: mode ${op.conductionMode.padEnd(4)} V_out ${op.outputVoltage.toFixed(3)} V (FHA ${op.firstHarmonic.outputVoltage.toFixed(3)} V), ` +
      `I_r ${op.resonantCurrentRms.toFixed(3)} A rms, V_Cr peak ${op.capacitorVoltagePeak.toFixed(1)} V, ZVS ${op.zeroVoltageSwitching}`,
  );
  // a lossless circuit: what the bus delivers reaches the load
  if (Math.abs(op.inputPower / op.outputPower - 1) > 1e-9) throw new Error("power not conserved");
  if (fn === 1 && Math.abs(op.gain - 1) > 1e-9) throw new Error("gain at resonance should be 1");
}

// The frequency that gives 19.5 V at each bus voltage (the gain falls with frequency above the peak).
for (const bus of [370, 390, 410]) {
  const error = (f: number): number => llcOperatingPoint({ ...stage, inputVoltage: bus, switchingFrequency: f }).outputVoltage - 19.5;
  const f = brentRoot(error, 0.7 * fr, 1.6 * fr, { tolerance: 1 });
  const op = llcOperatingPoint({ ...stage, inputVoltage: bus, switchingFrequency: f });
  const fha = llcGain({ inductanceRatio: op.inductanceRatio, qualityFactor: op.qualityFactor, normalisedFrequency: op.normalisedFrequency });
  console.log(`bus ${bus} V: f_s ${(f / 1e3).toFixed(2)} kHz, gain ${op.gain.toFixed(4)} (FHA ${fha.toFixed(4)} at this frequency), ZVS ${op.zeroVoltageSwitching}`);
}
console.log(llcOperatingPoint({ ...stage, switchingFrequency: fr }).cautions.map((c) => c.code).join(", "));

// Designed from the specification: turns ratio, tank and magnetising inductance, every corner solved exactly.
const design = llcDesign({
  inputVoltage: { min: 340, nominal: 390, max: 410 }, outputVoltage: 19.5, outputPower: 65, resonantFrequency: 100e3,
  bridge: "half", deadTime: 250e-9, switchCapacitance: 120e-12,
});
console.log(
  `design: n ${design.turnsRatio.toFixed(2)}, L_r ${(design.resonantInductance * 1e6).toFixed(1)} µH, C_r ${(design.resonantCapacitance * 1e9).toFixed(1)} nF, ` +
    `L_m ${(design.magnetisingInductance * 1e6).toFixed(0)} µH, Q ${design.qualityFactor.toFixed(3)}, FHA gain margin ${design.gainMargin.toFixed(3)}`,
);
for (const c of design.corners) {
  console.log(`  ${c.inputVoltage} V, ${(c.loadFraction * 100).toFixed(0)} % load: f_s ${(c.switchingFrequency / 1e3).toFixed(2)} kHz (${c.method}), ZVS ${c.zeroVoltageSwitching}`);
  if (c.operatingPoint !== null && Math.abs(c.operatingPoint.outputVoltage / 19.5 - 1) > 1e-9) throw new Error("corner misses the output voltage");
}
console.log(`frequency range ${(design.frequencyRange.min / 1e3).toFixed(1)}–${(design.frequencyRange.max / 1e3).toFixed(1)} kHz; cautions: ${design.cautions.map((c) => c.code).join(", ")}`);
// L_n = 6 leaves too little magnetising current to swing 2 × 120 pF in 250 ns; L_n = 4 with a 400 ns dead time does it at every corner.
const zvsDesign = llcDesign({
  inputVoltage: { min: 340, nominal: 390, max: 410 }, outputVoltage: 19.5, outputPower: 65, resonantFrequency: 100e3,
  bridge: "half", deadTime: 400e-9, switchCapacitance: 120e-12, inductanceRatio: 4,
});
console.log(`L_n 4, 400 ns: L_m ${(zvsDesign.magnetisingInductance * 1e6).toFixed(0)} µH, ${(zvsDesign.frequencyRange.min / 1e3).toFixed(1)}–${(zvsDesign.frequencyRange.max / 1e3).toFixed(1)} kHz, ZVS at every corner ${zvsDesign.zeroVoltageSwitching}`);
if (!zvsDesign.zeroVoltageSwitching) throw new Error("the L_n = 4 design should switch softly everywhere");
