/**
 * A forging-bar heater whose bar is shorter than its coil — a case no closed form covers —
 * solved with the field solver: four copper tube turns around a 30 mm steel slug above Curie
 * (μr 1), then the same coil around a long bar checked against the Dodd, Deeds & Luquire
 * closed form. Sizes are invented for the example.
 *
 * Run: npx tsx docs/examples/field-forging-bar.ts
 */
import { encirclingCoilOverRod, solveAxisymmetricField } from "../../src/index.js";
import type { FieldRegion, FieldShape } from "../../src/index.js";

function check(name: string, ok: boolean): void {
  console.log(`${ok ? "ok  " : "FAIL"} ${name}`);
  if (!ok) throw new Error(name);
}

const frequency = 10e3;
const current = 800; // A RMS
const tube = (z: number): FieldShape => ({ kind: "circle", r: 0.03, z, radius: 0.003, innerRadius: 0.002 });
const coil = {
  name: "coil",
  current,
  resistivity: 1.9e-8, // copper at about 60 °C
  model: "solid" as const,
  turns: [-0.012, -0.004, 0.004, 0.012].map(tube),
};
const slug = (length: number): FieldRegion => ({
  name: "bar",
  shape: { kind: "rectangle", rMin: 0, rMax: 0.018, zMin: -length / 2, zMax: length / 2 },
  resistivity: 1.2e-6, // hot steel
  relativePermeability: 1,
});

// 1. The short slug (30 mm, shorter than the 32 mm coil)
const short = solveAxisymmetricField({ frequency, coils: [coil], regions: [slug(0.03)], accuracy: 3e-3 });
const c = short.coils.coil!;
const into = short.regions.bar!.losses;
console.log(`coil R ${(c.resistance * 1e3).toFixed(3)} mΩ, L ${(c.inductance * 1e9).toFixed(1)} nH`);
console.log(`power into the slug ${(into / 1e3).toFixed(2)} kW, in the copper ${(c.losses / 1e3).toFixed(2)} kW`);
console.log(`efficiency ${((100 * into) / (into + c.losses)).toFixed(1)} %, estimated error ${short.estimatedError.toExponential(1)}`);
check("power balance: I²R = losses in copper and slug", Math.abs(current * current * c.resistance - (into + c.losses)) < 1e-9 * into);
check("estimated error below the accuracy asked for", short.estimatedError < 3e-3);
const surface = short.powerDensityAt({ r: 0.0179, z: 0 });
const nearEnd = short.powerDensityAt({ r: 0.0179, z: 0.0149 });
console.log(`surface power density: mid-plane ${(surface / 1e6).toFixed(1)} MW/m³, near the end ${(nearEnd / 1e6).toFixed(1)} MW/m³`);

// 2. The same coil around a long bar: the field solution against the closed form (with stranded
//    turns, uniform current density over the winding's rectangle, the closed form's idealisation)
const block = { ...coil, model: "stranded" as const, turns: { shape: { kind: "rectangle" as const, rMin: 0.027, rMax: 0.033, zMin: -0.016, zMax: 0.016 }, count: 4 } };
const long = solveAxisymmetricField({ frequency, coils: [block], regions: [slug(1)], accuracy: 1e-3 });
const empty = solveAxisymmetricField({ frequency, coils: [block], accuracy: 1e-3 });
const ref = encirclingCoilOverRod({
  coil: { innerRadius: 0.027, outerRadius: 0.033, length: 0.032, turns: 4 },
  rod: { radius: 0.018, resistivity: 1.2e-6, relativePermeability: 1 },
  frequency,
});
const dR = long.coils.coil!.resistance - empty.coils.coil!.resistance;
console.log(`long bar: ΔR ${(dR * 1e3).toFixed(4)} mΩ, closed form ${(ref.reflectedResistance * 1e3).toFixed(4)} mΩ`);
check("field solution within 0.5 % of Dodd, Deeds & Luquire", Math.abs(dR / ref.reflectedResistance - 1) < 5e-3);
