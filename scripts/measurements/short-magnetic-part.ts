/**
 * Measures the study's coupling of a magnetic part shorter than the coil (coil-impedance tier:
 * the infinitely long magnetic part scaled by the non-magnetic part's end-effect factors) against
 * the library's axisymmetric field solver (`solveAxisymmetricField`, itself checked against
 * scikit-fem in test/fixtures/field-reference), over a grid of length ratios, μr and a/δ, for a
 * solid bar and a ring in the bearing-race example's coil (6 tube turns, 75 mm radius, 48 mm
 * long, 37 kHz). Writes short-magnetic-part.json beside this file.
 *
 *     npx tsx scripts/measurements/short-magnetic-part.ts
 *
 * The resistivity is chosen for each μr and a/δ (a: the part's outer radius); the field solver's
 * own accuracy is set to 3e-3. With `--reuse-field` the field solutions are read back from the
 * JSON of an earlier run (same grid) and only the study's side is recomputed.
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { readHeaterDescription, solveAxisymmetricField } from "../../src/index.js";
import { studyPartCoupling } from "../../src/study/operating-point.js";
import { shortPartSection, shortPartTier } from "../../src/workpiece/work-coil-short-part.js";
import { MU_0 } from "../../src/units/index.js";

const frequency = 37_000;
const base = JSON.parse(readFileSync(new URL("../../docs/examples/study-bearing-race.json", import.meta.url), "utf8")) as Record<string, unknown>;
const rhoCopper = 1.75e-8 * (1 + 0.0039 * 15); // copper at 35 °C (handbook coefficient, from memory), as the example's coil
const turns = Array.from({ length: 6 }, (_, i) => ({ kind: "circle" as const, r: 0.075, z: -0.024 + (i + 0.5) * 0.008, radius: 0.003, innerRadius: 0.002 }));
const coil = { name: "coil", current: 1, turns, resistivity: rhoCopper, model: "solid" as const };
const accuracy = 3e-3;
const output = new URL("./short-magnetic-part.json", import.meta.url);
interface Earlier { meta: { emptyInductance: number; emptyResistance?: number }; rows: { shape: string; lengthRatio: number; relativePermeability: number; radiusOverSkinDepth: number; field: { reflectedResistance: number; inductanceChange: number } }[] }
const earlier = process.argv.includes("--reuse-field") && existsSync(output) ? (JSON.parse(readFileSync(output, "utf8")) as Earlier) : null;
const empty = earlier !== null ? { inductance: earlier.meta.emptyInductance } : solveAxisymmetricField({ frequency, coils: [coil], regions: [], accuracy }).coils["coil"]!;
const emptyResistance = "resistance" in empty ? empty.resistance : (earlier?.meta.emptyResistance ?? Number.NaN);
const rows: unknown[] = [];
for (const shape of ["bar", "ring"] as const) {
  for (const ratio of [0.35, 0.65, 0.9]) {
    for (const relativePermeability of [3, 8, 20, 80, 300]) {
      for (const radiusOverSkinDepth of [10, 40, 160, 640]) {
        const outer = shape === "bar" ? 0.03 : 0.062;
        const inner = shape === "bar" ? 0 : 0.05;
        const length = ratio * 0.048;
        const delta = outer / radiusOverSkinDepth;
        const resistivity = (2 * Math.PI * frequency * MU_0 * relativePermeability * delta * delta) / 2;
        const part =
          shape === "bar"
            ? { shape: "bar", radius: `${outer} m`, length: `${length} m`, material: "lowCarbonSteel", startTemperature: "20 °C", targetTemperature: "120 °C" }
            : { shape: "ring", outerRadius: `${outer} m`, innerRadius: `${inner} m`, height: `${length} m`, material: "lowCarbonSteel", startTemperature: "20 °C", targetTemperature: "120 °C" };
        const d = readHeaterDescription({ ...base, part });
        const study = studyPartCoupling(d, frequency, resistivity, relativePermeability);
        const region = { name: "part", shape: { kind: "rectangle" as const, rMin: inner, rMax: outer, zMin: -length / 2, zMax: length / 2 }, resistivity, relativePermeability };
        const reused = earlier?.rows.find((r) => r.shape === shape && r.lengthRatio === ratio && r.relativePermeability === relativePermeability && r.radiusOverSkinDepth === radiusOverSkinDepth);
        let field: { reflectedResistance: number; inductanceChange: number };
        if (reused !== undefined) field = reused.field;
        else {
          const loaded = solveAxisymmetricField({ frequency, coils: [coil], regions: [region], accuracy }).coils["coil"]!;
          field = { reflectedResistance: loaded.resistance - emptyResistance, inductanceChange: loaded.inductance - empty.inductance };
        }
        rows.push({
          shape,
          lengthRatio: ratio,
          relativePermeability,
          radiusOverSkinDepth,
          beta: relativePermeability / radiusOverSkinDepth,
          resistivity,
          study: { reflectedResistance: study.reflectedResistance, inductanceChange: study.inductanceChange },
          field,
          resistanceRatio: study.reflectedResistance / field.reflectedResistance,
          inductanceErrorOfEmpty: (study.inductanceChange - field.inductanceChange) / empty.inductance,
        });
        process.stdout.write(".");
      }
    }
  }
}
// the largest errors by tier (`shortPartTier` of `shortPartSection`: the radial section or half
// the part's length, whichever is smaller; metal resistivities only)
const summary: Record<string, { rows: number; resistance: number; inductance: number }> = {};
for (const row of rows as { shape: string; lengthRatio: number; relativePermeability: number; radiusOverSkinDepth: number; resistivity: number; resistanceRatio: number; inductanceErrorOfEmpty: number }[]) {
  const outer = row.shape === "bar" ? 0.03 : 0.062;
  const inner = row.shape === "bar" ? 0 : 0.05;
  const delta = outer / row.radiusOverSkinDepth;
  const tier = row.resistivity < 1.5e-8 ? "below-metal-resistivity" : shortPartTier(shortPartSection(outer, inner, row.lengthRatio * 0.048), delta, row.relativePermeability);
  const t = (summary[tier] ??= { rows: 0, resistance: 0, inductance: 0 });
  t.rows++;
  t.resistance = Math.max(t.resistance, Math.abs(row.resistanceRatio - 1));
  t.inductance = Math.max(t.inductance, Math.abs(row.inductanceErrorOfEmpty));
}
const out = {
  summary,
  meta: {
    source: "fluxwright solveAxisymmetricField (checked against scikit-fem, test/fixtures/field-reference), accuracy 3e-3",
    generator: "scripts/measurements/short-magnetic-part.ts",
    frequency,
    emptyInductance: empty.inductance,
    ...(Number.isFinite(emptyResistance) ? { emptyResistance } : {}),
  },
  rows,
};
writeFileSync(output, JSON.stringify(out, null, 1) + "\n");
