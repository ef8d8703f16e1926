/**
 * Measures the end-effect correction of a part shorter than the coil (the long part's exact
 * coupling times the surface-impedance factor of `prepareShortPartFactor`, corrected towards the
 * part's own cells when non-magnetic) against the library's axisymmetric field solver
 * (`solveAxisymmetricField`, itself checked against scikit-fem in test/fixtures/field-reference
 * and test/fixtures/short-part), on a grid of coils and parts:
 *
 * - four copper-tube solenoids of turn radius 40 mm (tube 6 mm × 1 mm), length/diameter 0.3,
 *   1, 2 and 4 (3, 8, 12 and 20 turns);
 * - a bar of radius 25 mm and a ring 22–32 mm (wall 10 mm), 0.3, 0.6 and 0.9 × the coil's
 *   length, centred;
 * - μr 1 (non-magnetic), 20, 100 and 600; section/δ 3, 20 and 150 (section: bar radius or ring
 *   wall) 3, 10, 30 and 150; resistivity 2e-7 Ω·m (steel) or 4e-8 Ω·m (aluminium), the frequency
 *   following from δ (20 Hz–1 MHz).
 * - offsets (`--offsets`): the centred model against parts moved along the axis by half and all
 *   of the free length (flush with the coil's end), coil ℓ/D = 1, parts 0.6 × its length, μr 1
 *   and 100, 30 skin depths (the models take every part as centred).
 *
 * Both consumers of the correction are measured: `workCoilImpedance` (through
 * `prepareWorkCoil`, refinement 1) and the study's `studyPartCoupling` (coil-impedance tier,
 * refinement 0.5, the capacitor chosen so the empty coil resonates near the frequency).
 * Writes short-part-grid.json beside this file (rows appended as they finish; rerunning skips
 * rows already there, `--fresh` starts over) and prints the summary by tier:
 *
 *     npx tsx scripts/measurements/short-part-grid.ts [--fresh] [--offsets] [--coil 0.3,1] [--reduced] [--out FILE]
 *     npx tsx scripts/measurements/short-part-grid.ts --merge other.json --table   # merge runs, print the docs table
 *
 * The committed table ran the full grid on ℓ/D = 0.3 and 1 and `--reduced` on ℓ/D = 2 and 4.
 *
 * The field solver runs at accuracy 3e-3. Roughly 5 (ℓ/D = 0.3) to 30 (ℓ/D = 4) CPU minutes per coil.
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { prepareWorkCoil, readHeaterDescription, solveAxisymmetricField } from "../../src/index.js";
import type { PreparedWorkCoil } from "../../src/index.js";
import { studyPartCoupling } from "../../src/study/operating-point.js";
import { shortPartSection, shortPartTier } from "../../src/workpiece/work-coil-short-part.js";
import { MU_0 } from "../../src/units/index.js";

const args = process.argv.slice(2);
const output = args.includes("--out") ? new URL(args[args.indexOf("--out") + 1]!, `file://${process.cwd()}/`) : new URL("./short-part-grid.json", import.meta.url);
const accuracy = 3e-3;
const rhoCopper = 1.75e-8; // Ω·m, annealed copper at 20 °C (IEC 60028: 1/58 µΩ·m ≈ 1.724e-8, rounded up for a warm coil)
const coilRadius = 0.04;
const tube = { outerDiameter: 0.006, wallThickness: 0.001 };
const COILS = [
  { aspect: 0.3, turns: 3 },
  { aspect: 1, turns: 8 },
  { aspect: 2, turns: 12 },
  { aspect: 4, turns: 20 },
] as const;
const SHAPES = [
  { shape: "bar", outer: 0.025, inner: 0 },
  { shape: "ring", outer: 0.032, inner: 0.022 },
] as const;
const RATIOS = [0.3, 0.6, 0.9];
const PERMEABILITIES = [1, 20, 100, 600];
const DEPTHS = [3, 10, 30, 150];

/**
 * Tier of the stated bounds (`shortPartTier`) by the part's thinnest section w — radial section
 * or half its length (`shortPartSection`) — against δ and μr·δ; rows outside a metal's
 * resistivity are set apart.
 */
function tierOfRow(aspect: number, s: (typeof SHAPES)[number], lengthRatio: number, relativePermeability: number, depths: number, resistivity: number): string {
  if (resistivity < 1.5e-8 || resistivity > 1.5e-6) return "not-a-metal";
  const delta = (s.outer - s.inner) / depths;
  return shortPartTier(shortPartSection(s.outer, s.inner, lengthRatio * 2 * coilRadius * aspect), delta, relativePermeability);
}

/**
 * Frequency and resistivity for a skin depth: a steel's 2e-7 Ω·m for a magnetic part, an
 * aluminium alloy's 4e-8 Ω·m for a non-magnetic one (both common practice), the frequency
 * following from δ; where that frequency leaves 20 Hz–1 MHz it is clamped and the resistivity
 * moves instead (rows below 1.5e-8 Ω·m or above 1.5e-6 Ω·m are reported apart, not a metal's).
 */
function material(delta: number, relativePermeability: number): { frequency: number; resistivity: number } {
  const nominal = relativePermeability > 1 ? 2e-7 : 4e-8;
  const perHertz = Math.PI * MU_0 * relativePermeability * delta * delta; // ρ = π f μ0 μr δ²
  const frequency = Math.min(1e6, Math.max(20, nominal / perHertz));
  return { frequency, resistivity: frequency * perHertz };
}

interface Row {
  key: string;
  aspect: number;
  turns: number;
  shape: string;
  lengthRatio: number;
  offset: number;
  relativePermeability: number;
  sectionOverSkinDepth: number;
  frequency: number;
  resistivity: number;
  tier: string;
  field: { reflectedResistance: number; partLoss: number; inductanceChange: number; emptyInductance: number };
  coilImpedance: { reflectedResistance: number; partLoss: number; inductanceChange: number } | null;
  /** The study's reflected resistance is the part's loss at 1 A (the copper's change is the coil's). */
  study: { reflectedResistance: number; inductanceChange: number } | null;
}

const fresh = args.includes("--fresh");
const earlier = !fresh && existsSync(output) ? (JSON.parse(readFileSync(output, "utf8")) as { rows: Row[] }).rows : [];
const rows = new Map(earlier.map((r) => [r.key, r]));
const coilFilter = args.includes("--coil") ? args[args.indexOf("--coil") + 1]!.split(",").map(Number) : null;
const base = JSON.parse(readFileSync(new URL("../../docs/examples/study-bearing-race.json", import.meta.url), "utf8")) as Record<string, unknown>;

const emptyField = new Map<string, { resistance: number; inductance: number }>();
const prepared = new Map<string, PreparedWorkCoil>();

function turnsOf(aspect: number, turns: number): { kind: "circle"; r: number; z: number; radius: number; innerRadius: number }[] {
  const length = 2 * coilRadius * aspect;
  return Array.from({ length: turns }, (_, i) => ({ kind: "circle" as const, r: coilRadius, z: -length / 2 + ((i + 0.5) * length) / turns, radius: tube.outerDiameter / 2, innerRadius: tube.outerDiameter / 2 - tube.wallThickness }));
}

function measure(aspect: number, turns: number, s: (typeof SHAPES)[number], lengthRatio: number, offset: number, relativePermeability: number, depths: number): Row {
  const coilLength = 2 * coilRadius * aspect;
  const section = s.outer - s.inner;
  const delta = section / depths;
  const { frequency, resistivity } = material(delta, relativePermeability);
  const partLength = lengthRatio * coilLength;
  const shift = (offset * (coilLength - partLength)) / 2;
  const coil = { name: "coil", current: 1, turns: turnsOf(aspect, turns), resistivity: rhoCopper, model: "solid" as const };
  const emptyKey = `${aspect}|${frequency}`;
  if (![...prepared.keys()].every((k) => k.startsWith(`${aspect}|`))) {
    prepared.clear(); // one coil at a time: the prepared models are large
    emptyField.clear();
  }
  let empty = emptyField.get(emptyKey);
  if (empty === undefined) {
    empty = solveAxisymmetricField({ frequency, coils: [coil], regions: [], accuracy }).coils["coil"]!;
    emptyField.set(emptyKey, empty);
  }
  const region = { name: "part", shape: { kind: "rectangle" as const, rMin: s.inner, rMax: s.outer, zMin: shift - partLength / 2, zMax: shift + partLength / 2 }, resistivity, relativePermeability };
  const solved = solveAxisymmetricField({ frequency, coils: [coil], regions: [region], accuracy });
  const loaded = solved.coils["coil"]!;
  const field = { reflectedResistance: loaded.resistance - empty.resistance, partLoss: solved.regions["part"]!.losses, inductanceChange: loaded.inductance - empty.inductance, emptyInductance: empty.inductance };

  const wcCoil = { shape: "solenoid" as const, radius: coilRadius, length: coilLength, turns, conductor: { kind: "tube" as const, ...tube }, resistivity: rhoCopper };
  let model = prepared.get(emptyKey);
  if (model === undefined) {
    model = prepareWorkCoil({ coil: wcCoil, frequency });
    prepared.set(emptyKey, model);
  }
  const part = s.shape === "bar" ? { shape: "bar" as const, radius: s.outer, length: partLength, resistivity, relativePermeability } : { shape: "tube" as const, radius: s.outer, innerRadius: s.inner, length: partLength, resistivity, relativePermeability };
  const z = model.impedance(frequency, part);
  const coilImpedance = { reflectedResistance: z.reflectedResistance, partLoss: z.resistance - z.copperResistance, inductanceChange: z.inductanceChange };

  const studyPart =
    s.shape === "bar"
      ? { shape: "bar", radius: `${s.outer} m`, length: `${partLength} m`, material: "lowCarbonSteel", startTemperature: "20 °C", targetTemperature: "120 °C" }
      : { shape: "ring", outerRadius: `${s.outer} m`, innerRadius: `${s.inner} m`, height: `${partLength} m`, material: "lowCarbonSteel", startTemperature: "20 °C", targetTemperature: "120 °C" };
  const capacitance = 1 / ((2 * Math.PI * frequency) ** 2 * empty.inductance);
  const studyCoil = { shape: "solenoid", radius: `${coilRadius} m`, length: `${coilLength} m`, turns, conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm", material: "copper" }, leadLength: "300 mm", temperature: "20 °C" };
  const d = readHeaterDescription({ ...base, coil: studyCoil, capacitor: { ...(base["capacitor"] as object), capacitance: `${capacitance} F` }, part: studyPart });
  const st = studyPartCoupling(d, frequency, resistivity, relativePermeability);
  const study = { reflectedResistance: st.reflectedResistance, inductanceChange: st.inductanceChange };
  const key = `${aspect}|${s.shape}|${lengthRatio}|${offset}|${relativePermeability}|${depths}`;
  return { key, aspect, turns, shape: s.shape, lengthRatio, offset, relativePermeability, sectionOverSkinDepth: depths, frequency, resistivity, tier: tierOfRow(aspect, s, lengthRatio, relativePermeability, depths, resistivity), field, coilImpedance, study };
}

function save(): void {
  const all = [...rows.values()];
  const summary: Record<string, Record<string, { rows: number; resistance: number; inductance: number; worst: string }>> = {};
  for (const r of all) {
    const shape = SHAPES.find((x) => x.shape === r.shape)!;
    r.tier = tierOfRow(r.aspect, shape, r.lengthRatio, r.relativePermeability, r.sectionOverSkinDepth, r.resistivity);
    for (const which of ["coilImpedance", "study"] as const) {
      // workCoilImpedance corrects only magnetic parts (a non-magnetic one is solved exactly)
      if (which === "coilImpedance" && r.relativePermeability === 1) continue;
      const m = r[which];
      if (m === null) continue;
      const group = r.offset === 0 ? which : `${which}-offset`;
      const t = ((summary[group] ??= {})[r.tier] ??= { rows: 0, resistance: 0, inductance: 0, worst: "" });
      t.rows++;
      // workCoilImpedance: the terminal resistance change; the study: the part's loss
      const er = Math.abs(m.reflectedResistance / (which === "study" ? r.field.partLoss : r.field.reflectedResistance) - 1);
      if (er > t.resistance) {
        t.resistance = er;
        t.worst = r.key;
      }
      t.inductance = Math.max(t.inductance, Math.abs(m.inductanceChange - r.field.inductanceChange) / r.field.emptyInductance);
    }
  }
  const doc = {
    meta: {
      source: "fluxwright solveAxisymmetricField at accuracy 3e-3 (checked against scikit-fem: test/fixtures/field-reference, test/fixtures/short-part)",
      generator: "scripts/measurements/short-part-grid.ts",
      columns: "key = aspect|shape|lengthRatio|offset|μr|section/δ; errors: workCoilImpedance's reflected resistance against the field's terminal ΔR, the study's (the part's loss) against the field's part loss, both relative; ΔL as a fraction of the empty coil's inductance",
    },
    summary,
    rows: all,
  };
  writeFileSync(output, JSON.stringify(doc, null, 1) + "\n");
}

if (args.includes("--merge")) {
  for (const file of args[args.indexOf("--merge") + 1]!.split(",")) {
    for (const r of (JSON.parse(readFileSync(file, "utf8")) as { rows: Row[] }).rows) rows.set(r.key, r);
  }
  save();
}
if (args.includes("--table")) {
  // the markdown table of docs/workpiece.md
  save();
  const summary = (JSON.parse(readFileSync(output, "utf8")) as { summary: Record<string, Record<string, { rows: number; resistance: number; inductance: number; worst: string }>> }).summary;
  console.log("| tier | rows (wci / study) | workCoilImpedance: reflected R | ΔL / L₀ | study: part loss | ΔL / L₀ |");
  console.log("| --- | --- | --- | --- | --- | --- |");
  for (const tier of ["thick", "general", "thin", "outside", "not-a-metal"]) {
    const w = summary["coilImpedance"]?.[tier];
    const st = summary["study"]?.[tier];
    const pc = (x: number | undefined): string => (x === undefined ? "–" : x >= 1 ? `${x.toFixed(1)} ×` : `${(100 * x).toFixed(1)} %`);
    const pl = (x: number | undefined): string => (x === undefined ? "–" : `${(100 * x).toFixed(2)} %`);
    console.log(`| ${tier} | ${w?.rows ?? 0} / ${st?.rows ?? 0} | ${pc(w?.resistance)} | ${pl(w?.inductance)} | ${pc(st?.resistance)} | ${pl(st?.inductance)} |`);
  }
  for (const group of ["coilImpedance-offset", "study-offset"]) {
    if (summary[group] !== undefined) console.log(group, JSON.stringify(summary[group]));
  }
  process.exit(0);
}
const jobs: [number, number, (typeof SHAPES)[number], number, number, number, number][] = [];
if (args.includes("--offsets")) {
  for (const s of SHAPES) for (const offset of [0.5, 1]) for (const mur of [1, 100]) jobs.push([1, 8, s, 0.6, offset, mur, 30]);
} else {
  for (const c of COILS) {
    if (coilFilter !== null && !coilFilter.includes(c.aspect)) continue;
    // --reduced (the two longer coils, whose field solutions cost most): length ratios 0.3 and
    // 0.9, section/δ 10, 30, 150, frequencies ≤ 100 kHz
    const reduced = args.includes("--reduced");
    for (const s of SHAPES) {
      for (const ratio of reduced ? [0.3, 0.9] : RATIOS) {
        for (const mur of PERMEABILITIES) {
          for (const depths of reduced ? [10, 30, 150] : DEPTHS) {
            if (reduced && material((s.outer - s.inner) / depths, mur).frequency > 1e5) continue;
            jobs.push([c.aspect, c.turns, s, ratio, 0, mur, depths]);
          }
        }
      }
    }
  }
}
const started = process.cpuUsage();
for (const [aspect, turns, s, ratio, offset, mur, depths] of jobs) {
  const key = `${aspect}|${s.shape}|${ratio}|${offset}|${mur}|${depths}`;
  if (rows.has(key)) continue;
  const row = measure(aspect, turns, s, ratio, offset, mur, depths);
  rows.set(key, row);
  save();
  const e = (m: Row["study"], ref: number): string => (m === null ? "-" : (m.reflectedResistance / ref - 1).toFixed(3));
  console.log(`${key} ${row.tier} f=${row.frequency.toPrecision(4)} ρ=${row.resistivity.toExponential(2)} wci ${e(row.coilImpedance, row.field.reflectedResistance)} study ${e(row.study, row.field.partLoss)} cpu ${(process.cpuUsage(started).user / 1e6).toFixed(0)} s`);
}
save();
console.log(JSON.stringify((JSON.parse(readFileSync(output, "utf8")) as { summary: unknown }).summary, null, 1));
