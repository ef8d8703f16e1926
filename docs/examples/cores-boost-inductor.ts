/**
 * The inductor of a 24 V → 48 V, 200 W boost converter that feeds the heating foil of a plate
 * warmer, switching at 100 kHz. From the converter's numbers to the inductance and current
 * waveform, a search over a shelf of E cores, and the design on the chosen one: turns, gap with
 * three gap models, losses, temperature rise and cautions. Core dimensions are INVENTED
 * (scaled from one made-up E core); the ferrite coefficients are INVENTED example numbers.
 *
 * Run: npx tsx docs/examples/cores-boost-inductor.ts
 */
import {
  celsius,
  eCore,
  gapLengthForInductance,
  gappedInductor,
  inductorCoreSearch,
  inductorDesign,
  inventedExampleFerrite,
  toCelsius,
} from "../../src/index.js";

function expectClose(name: string, value: number, expected: number, rtol: number): void {
  console.log(`${name} = ${value.toPrecision(6)}`);
  if (!(Math.abs(value / expected - 1) <= rtol)) throw new Error(`${name}: got ${value}, expected ${expected}`);
}

// The converter: ideal boost in continuous conduction.
const inputVoltage = 24;
const outputVoltage = 48;
const power = 200;
const frequency = 100e3;
const dutyCycle = 1 - inputVoltage / outputVoltage; // 0.5
const average = power / inputVoltage; // 8.33 A
const ripple = 0.3 * average; // 30 % peak-to-peak, a common choice
const inductance = (inputVoltage * dutyCycle) / (frequency * ripple); // V·D/(f·ΔI)
console.log(`duty ${dutyCycle}, average ${average.toFixed(2)} A, ripple ${ripple.toFixed(2)} A, L = ${(inductance * 1e6).toFixed(1)} µH`);

// A shelf of E cores: one invented shape at five scales.
const shelf = [0.6, 0.75, 0.9, 1.0, 1.2].map((scale) => ({
  name: `E${Math.round(42 * scale)}`,
  core: eCore({
    width: 0.042 * scale, height: 0.021 * scale, depth: 0.015 * scale,
    windowWidth: 0.03 * scale, centreLegWidth: 0.012 * scale, windowHeight: 0.015 * scale,
  }),
}));
const specification = {
  inductance,
  frequency,
  material: inventedExampleFerrite,
  current: { kind: "triangular" as const, average, ripple, dutyCycle },
  conductor: { kind: "litz" as const, strands: 200, strandDiameter: 0.1e-3, outerDiameter: 1.9e-3 },
  ambientTemperature: celsius(45),
  maxFluxDensityRatio: 0.75,
  windingClearance: 1.5e-3,
};
const search = inductorCoreSearch({ specification, cores: shelf, maxTemperatureRise: 50 });
for (const r of search.rejected) console.log(`${r.name}: rejected — ${r.reasons.join("; ")}`);
for (const f of search.feasible) {
  console.log(`${f.name}: feasible, ${f.design.turns} turns, ${f.design.totalLoss.toFixed(2)} W, +${f.design.temperatureRise.toFixed(1)} K`);
}
const best = search.feasible[0];
if (best === undefined) throw new Error("no core on the shelf carries the inductor");
const chosen = shelf.find((s) => s.name === best.name)!.core;

// The design on the smallest feasible core.
const d = inductorDesign({ ...specification, core: chosen });
console.log(`${best.name}: ${d.turns} turns, gap ${(d.gapLength * 1e3).toFixed(3)} mm (fringing factor ${d.fringingFactor.toFixed(3)})`);
console.log(`peak flux ${d.peakFluxDensity.toFixed(3)} T, swing ${d.fluxDensitySwing.toFixed(3)} T, saturation at ${d.saturationCurrent.toFixed(1)} A`);
console.log(`core ${d.coreLoss.toFixed(2)} W + winding ${d.windingLoss.toFixed(2)} W (ripple AC factor ${d.rippleAcFactor.toFixed(3)}) = ${d.totalLoss.toFixed(2)} W`);
console.log(`surface ${toCelsius(d.surfaceTemperature).toFixed(1)} °C; cautions: ${d.cautions.map((c) => c.code).join(", ") || "none"}`);

// Checks from outside the design routine.
// 1. The ripple the designed inductance gives back: ΔI = V·D/(f·L).
expectClose("ripple from the design [A]", (inputVoltage * dutyCycle) / (frequency * d.inductance), ripple, 1e-9);
// 2. Faraday: the flux swing times N·A_e is the volt-seconds of the on-time.
expectClose("flux swing [T]", d.fluxDensitySwing, (inputVoltage * dutyCycle) / frequency / (d.turns * chosen.effectiveArea), 1e-9);
// 3. The peak flux stays within 75 % of saturation in the narrowest section.
if (!(d.peakFluxDensity * chosen.effectiveArea / chosen.minimumArea <= 0.75 * inventedExampleFerrite.saturationFluxDensity * (1 + 1e-12))) {
  throw new Error("flux limit not kept");
}

// How much the gap model matters: the gap for the same turns and inductance.
const magnetic = {
  effectiveArea: chosen.effectiveArea, effectivePathLength: chosen.effectivePathLength,
  relativePermeability: inventedExampleFerrite.relativePermeability, gapArea: chosen.legArea,
  legShape: chosen.legShape, legWidth: chosen.legWidth, legDepth: chosen.legDepth, windowHeight: chosen.windowHeight,
};
for (const fringing of ["none", "mclyman", "muhlethaler"] as const) {
  const gap = gapLengthForInductance({ core: magnetic, turns: d.turns, inductance, fringing });
  const withMuhlethaler = gappedInductor({ core: magnetic, turns: d.turns, gapLength: gap, fringing: "muhlethaler" }).inductance;
  console.log(`${fringing.padEnd(11)} gap ${(gap * 1e3).toFixed(3)} mm → inductance by the Schwarz–Christoffel model ${(withMuhlethaler * 1e6).toFixed(1)} µH`);
}
