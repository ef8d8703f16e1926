/**
 * The plain-text report of a heater study: cautions first, then the operating points, losses,
 * heat-up and the validity notes, in aligned tables with engineering units.
 */
import type { HeaterOptimisation, HeaterStudy, HeaterSweep, HeaterSweepRow, HeaterOperatingPoint, HeaterRadialHeatUp } from "../study/index.js";
import { InputError } from "../core/index.js";
import { reasonText } from "./design-error.js";
import { requireStudy } from "./checks.js";
import { area, celsiusText, definitionList, duration, percent, q, textTable, volume, wrap } from "./format.js";

/** Rows comparing operating points side by side. */
export function operatingRows(points: readonly HeaterOperatingPoint[]): string[][] {
  const row = (label: string, f: (p: HeaterOperatingPoint) => string): string[] => [label, ...points.map(f)];
  // the leads' rows only when the design has leads (a study file with a lead cross-section)
  const leads = [
    ...(points.some((p) => p.leadInductance > 0) ? [row("lead inductance", (p) => q(p.leadInductance, "H"))] : []),
    ...(points.some((p) => p.leadResistance > 0) ? [row("lead resistance (AC, part of it)", (p) => q(p.leadResistance, "Ω"))] : []),
  ];
  const leadVoltages = points.some(hasLeads)
    ? [
        row("coil terminal voltage (RMS)", (p) => q(p.coilVoltageRms, "V")),
        row("voltage across the leads (RMS)", (p) => q(p.leadVoltageRms, "V")),
      ]
    : [];
  return [
    row("frequency", (p) => q(p.frequency, "Hz")),
    row("inductance at terminals", (p) => q(p.inductance, "H")),
    row("coil resistance (AC)", (p) => q(p.coilResistance, "Ω")),
    ...leads,
    row("reflected resistance", (p) => (p.withPart ? q(p.reflectedResistance, "Ω") : "—")),
    row("part permeability μr", (p) => (p.withPart ? p.partRelativePermeability.toPrecision(3) : "—")),
    row("quality factor Q", (p) => p.qualityFactor.toPrecision(3)),
    row("tank voltage (peak)", (p) => q(p.tankVoltagePeak, "V")),
    row("coil current (RMS)", (p) => q(p.coilCurrentRms, "A")),
    ...leadVoltages,
    row("capacitor voltage (RMS)", (p) => q(p.capacitorVoltageRms, "V")),
    row("capacitor current (RMS)", (p) => q(p.capacitorCurrentRms, "A")),
    row("capacitor reactive power", (p) => q(p.capacitorReactivePower, "var")),
    row("switch voltage (peak)", (p) => q(p.switchVoltagePeak, "V")),
    row("switch current (peak)", (p) => q(p.switchCurrentPeak, "A")),
    row("supply current", (p) => q(p.supplyCurrent, "A")),
    row("supply terminal voltage", (p) => q(p.supplyTerminalVoltage, "V")),
    row("input power", (p) => q(p.inputPower, "W")),
    row("power into part", (p) => (p.withPart ? q(p.losses.part, "W") : "—")),
    row("efficiency (part / input)", (p) => (p.withPart ? percent(p.efficiency) : "—")),
    row("coil efficiency", (p) => (p.withPart ? percent(p.coilEfficiency) : "—")),
  ];
}

/** Whether an operating point's coil has leads modelled (a lead inductance or resistance). */
function hasLeads(p: HeaterOperatingPoint): boolean {
  return p.leadInductance > 0 || p.leadResistance > 0;
}

/**
 * The loss breakdown as [place, power] pairs; the concentrator only when the design has one.
 * With leads, the coil's loss is split into the coil conductor and the leads
 * (`leadResistance × coilCurrentRms²`); the places still add up to the input power.
 */
export function lossEntries(p: HeaterOperatingPoint, withConcentrator = true): [string, number][] {
  const leadLoss = p.leadResistance * p.coilCurrentRms * p.coilCurrentRms;
  const coil: [string, number][] =
    p.leadResistance > 0
      ? [
          ["coil conductor", p.losses.coil - leadLoss],
          ["leads", leadLoss],
        ]
      : [["coil and leads", p.losses.coil]];
  const entries: [string, number][] = [
    ["part (useful heat)", p.losses.part],
    ...coil,
    ["switches (conduction)", p.losses.switches],
    ["supply internal resistance", p.losses.supply],
    ["capacitor bank", p.losses.capacitors],
  ];
  if (withConcentrator) entries.push(["concentrator core", p.losses.core]);
  return entries;
}

/** The leads of the design, when the description gives a length (both leads together, or a coaxial cable's path out and back). */
function leadRows(length: number, leads: HeaterStudy["description"]["coil"]["leads"]): [string, string][] {
  if (!(length > 0)) return [];
  const shape =
    leads === null
      ? "no cross-section given (resistance only)"
      : leads.shape === "round-pair"
        ? `the coil conductor as a pair at ${q(leads.spacing, "m")} centres`
        : leads.shape === "flat-pair"
          ? `${leads.material.name} bars ${q(leads.width, "m")} × ${q(leads.thickness, "m")}, ${q(leads.gap, "m")} apart`
          : `${leads.material.name} coaxial, inner ${leads.innerWallThickness < leads.innerDiameter / 2 ? `tube ${q(leads.innerDiameter, "m")} × ${q(leads.innerWallThickness, "m")}` : `rod ${q(leads.innerDiameter, "m")}`} in a return tube ${q(leads.returnInnerDiameter, "m")} bore, ${q(leads.returnWallThickness, "m")} wall`;
  return [["leads (both together)", `${q(length, "m")}, ${shape}`]];
}

/** The design as [what, value] rows (the DESIGN section of the text and HTML reports). */
export function designRows(study: HeaterStudy): [string, string][] {
  const d = study.description;
  const coil = d.coil;
  const coilText =
    coil.shape === "solenoid"
      ? `solenoid, ${coil.turns} turns, radius ${q(coil.radius, "m")}, length ${q(coil.length, "m")}`
      : `pancake, ${coil.turns} turns, radii ${q(coil.innerRadius, "m")} to ${q(coil.outerRadius, "m")}, lift-off ${q(coil.liftOff, "m")}`;
  const c = coil.conductor;
  const conductorText =
    c.kind === "tube"
      ? `${c.material.name} tube ${q(c.outerDiameter, "m")} × ${q(c.wallThickness, "m")} wall`
      : c.kind === "litz"
        ? `${c.material.name} litz ${c.strands} × ${q(c.strandDiameter, "m")}`
        : `${c.material.name} wire ${q(c.diameter, "m")}`;
  const p = d.part;
  const partText =
    p.rectangles !== undefined
      ? `${p.rectangles.length} r–z rectangle${p.rectangles.length === 1 ? "" : "s"}: ${p.rectangles.map((x) => `r ${q(x.rMin, "m")}–${q(x.rMax, "m")}, z ${q(x.zMin, "m")}–${q(x.zMax, "m")}`).join("; ")}`
      : p.shape === "ring"
      ? `ring ${q(2 * p.outerRadius, "m")} OD × ${q(2 * p.innerRadius, "m")} ID × ${q(p.height, "m")}`
      : p.shape === "bar"
        ? `bar ${q(2 * p.radius, "m")} diameter × ${q(p.length, "m")}`
        : p.shape === "tube"
          ? `tube ${q(2 * p.outerRadius, "m")} OD, wall ${q(p.wallThickness, "m")}, ${q(p.length, "m")} long`
          : `plate ${q(p.length, "m")} × ${q(p.width, "m")} × ${q(p.thickness, "m")}`;
  const rows: [string, string][] = [
      ["supply", `${d.supply.kind}, ${q(d.supply.voltage, "V")}, internal ${q(d.supply.internalResistance, "Ω")}`],
      ["inverter", d.inverter.kind === "current-fed-parallel" ? "current-fed parallel (self-oscillating push-pull)" : `voltage-fed series, ${d.inverter.bridge} bridge, ${d.inverter.control === "fixed" ? `fixed ${q(d.inverter.frequency, "Hz")}` : `tracking ${q(d.inverter.targetPower, "W")}`}`],
      ["coil", coilText],
      ["conductor", conductorText],
      ...leadRows(coil.leadLength, coil.leads),
      ["coil inductance (empty)", q(study.coil.inductance, "H")],
      ["conductor length, DC resistance", `${q(study.coil.conductorLength, "m")}, ${q(study.coil.dcResistance, "Ω")}`],
      ["capacitor bank", `${q(d.capacitor.capacitance, "F")}, tan δ ${d.capacitor.dissipationFactor}`],
      ["part", `${p.material.name}, ${partText}`],
      ["part mass, surface", `${q(study.part.mass, "kg")}, ${area(study.part.surfaceArea)}`],
      ["heat", `${celsiusText(p.startTemperature)} → ${celsiusText(p.targetTemperature)}${study.part.curieTemperature === null ? "" : ` (Curie point ${celsiusText(study.part.curieTemperature)})`}`],
  ];
  if (d.concentrator !== null) {
    rows.splice(rows.length - 2, 0, ["concentrator", `${d.concentrator.materialId}, ${area(d.concentrator.crossSectionArea)} cross-section, ${volume(d.concentrator.volume)}`]);
  }
  for (const c of d.concentrators ?? []) {
    rows.splice(rows.length - 2, 0, [`concentrator ${c.name}`, `μr ${c.relativePermeability}, ${c.resistivity === null ? "non-conducting" : `ρ ${q(c.resistivity, "Ω·m")}`}, ${c.rectangles.length} r–z rectangle${c.rectangles.length === 1 ? "" : "s"}`]);
  }
  const f = study.field;
  rows.push([
    "coupling model",
    study.model === "field" && f !== null && f !== undefined
      ? `field solver (solveAxisymmetricField): ${f.anchors.length} anchor temperatures, ${f.solves} solutions, ${f.seconds.toFixed(1)} s, largest mesh ${f.largestMesh} nodes`
      : "closed forms and the coil-impedance model",
  ]);
  rows.push(["surroundings", `${celsiusText(d.environment.ambientTemperature)}, convection ${Number(d.environment.convectionCoefficient.toPrecision(3))} W/(m²·K)`]);
  return rows;
}

/**
 * Renders a study as a readable text report (UTF-8, ≤ 100 columns): cautions first, the
 * design, operating points, where the power goes, the heat-up and the validity notes.
 *
 * @param study - a result of `studyHeater`
 * @param source - where it came from (file name), printed under the title (optional)
 * @returns the report as text
 * @throws {@link InputError} when `study` is not a study result
 * @example
 * ```ts
 * import { studyHeater } from "fluxwright";
 * import type { HeaterDescription } from "fluxwright";
 * import { studyTextReport } from "fluxwright/report";
 * const design: HeaterDescription = {
 *   supply: { kind: "battery", voltage: "48 V" },
 *   inverter: { kind: "current-fed-parallel", chokeInductance: "100 µH", switchOnResistance: "8 mΩ" },
 *   coil: { shape: "solenoid", radius: "75 mm", length: "48 mm", turns: 6,
 *     conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm" } },
 *   capacitor: { capacitance: "4 µF" },
 *   part: { shape: "ring", material: "lowCarbonSteel", outerRadius: "62 mm", innerRadius: "50 mm",
 *     height: "30 mm", targetTemperature: "120 °C" },
 * };
 * const text = studyTextReport(studyHeater(design, { heatUp: false }));
 * console.log(text.includes("OPERATING POINTS")); // true
 * ```
 * @category Reports and charts
 */
export function studyTextReport(study: HeaterStudy, source?: string): string {
  requireStudy("studyTextReport", study);
  const d = study.description;
  const out: string[] = [];
  out.push(`fluxwright heater study: ${study.title}`);
  if (source !== undefined) out.push(`study file: ${source}`);
  out.push("");
  if (study.cautions.length > 0) {
    out.push(`CAUTIONS (${study.cautions.length})`);
    for (const c of study.cautions) out.push(wrap(`  [${c.severity}] ${c.code}: ${c.message}`));
    out.push("");
  }
  out.push("DESIGN");
  out.push(definitionList(designRows(study)));
  out.push("");
  out.push("OPERATING POINTS");
  out.push(
    textTable(operatingRows(study.atTarget === null ? [study.emptyCoil, study.operating] : [study.emptyCoil, study.operating, study.atTarget]), [
      "",
      "empty coil",
      `part at ${celsiusText(study.operating.partTemperature)}`,
      ...(study.atTarget === null ? [] : [`part at ${celsiusText(study.atTarget.partTemperature)}`]),
    ]),
  );
  out.push(`  frequency shift by the part: ${q(study.frequencyShift, "Hz")}; drift during heat-up: ${q(study.frequencyDrift, "Hz")}`);
  out.push("");
  out.push(`WHERE THE POWER GOES (part at ${celsiusText(study.operating.partTemperature)})`);
  const entries = lossEntries(study.operating, d.concentrator !== null);
  const total = study.operating.inputPower;
  out.push(
    textTable(
      [...entries.map(([label, w]) => [label, q(w, "W"), percent(total > 0 ? w / total : null)]), ["total = input power", q(total, "W"), percent(total > 0 ? 1 : null)]],
      ["place", "power", "share"],
    ),
  );
  out.push("");
  if (study.heatUp !== null) {
    const h = study.heatUp;
    out.push("HEAT-UP");
    out.push(
      textTable([
        [
          `time to ${celsiusText(d.part.targetTemperature)}${h.targetLocation === "mean" ? "" : ` at the ${h.targetLocation}`}`,
          h.timeToTarget !== null && (h.targetLocation !== "mean" || h.reachable) ? duration(h.timeToTarget) : "not reached",
        ],
        ["temperature the part would settle at", celsiusText(h.steadyStateTemperature)],
        ["Curie point crossed at", h.curieCrossingTime === null ? (study.part.curieTemperature === null ? "no Curie point (non-magnetic)" : "not crossed") : duration(h.curieCrossingTime)],
        ["energy from the supply", q(h.supplyEnergy, "J")],
        ["charge from the supply", `${q(h.supplyCharge, "C")} (${(h.supplyCharge / 3600).toPrecision(3)} A·h)`],
        ["heat into the part", q(h.energy.input, "J")],
        ["heat lost (convection + radiation)", q(h.energy.convection + h.energy.radiation, "J")],
        ["Biot number", h.biotNumber === null ? "—" : h.biotNumber.toPrecision(3)],
        ...radialRows(h.radial, d.part.targetTemperature),
        ["power solved from … to", `${celsiusText(h.powerCurveRange[0])} … ${celsiusText(h.powerCurveRange[1])} (${h.gridTemperatures.length} temperatures)`],
        ...h.unsolvedBands.map((b): [string, string] => [
          "NO OPERATING POINT (no power counted)",
          `${celsiusText(b.from)} … ${celsiusText(b.to)}${b.noOscillation ? " — the tank cannot oscillate" : ""}`,
        ]),
      ]),
    );
    out.push("");
  }
  if (study.validity.length > 0) {
    out.push(`VALIDITY NOTES (${study.validity.length})`);
    for (const v of study.validity) out.push(wrap(`  - ${v.code}: ${v.message}`));
    out.push("");
  }
  return out.join("\n");
}

/** Throws InputError unless `sweep` looks like a result of sweepHeater. */
function requireSweep(where: string, sweep: unknown): void {
  const s = sweep as Partial<HeaterSweep> | null;
  if (typeof s !== "object" || s === null || typeof s.field !== "string" || !Array.isArray(s.rows)) throw new InputError(where, "sweep", sweep, "", "a result of sweepHeater");
}

/** The cells of one sweep row: numbers blank when the row failed; the time "not reached" when it is not. */
function sweepCells(r: HeaterSweepRow, heatUp: boolean, format: "text" | "csv"): string[] {
  const s = r.summary;
  const n = (v: number, unit: string, text: () => string): string => (s === null ? "" : format === "csv" ? String(v) : text());
  const cells = [
    String(r.value),
    n(s?.frequency ?? 0, "Hz", () => q(s?.frequency, "Hz")),
    n(s?.partPower ?? 0, "W", () => q(s?.partPower, "W")),
    n(s?.efficiency ?? 0, "", () => percent(s?.efficiency)),
    n(s?.tankVoltagePeak ?? 0, "V", () => q(s?.tankVoltagePeak, "V")),
    n(s?.coilCurrentRms ?? 0, "A", () => q(s?.coilCurrentRms, "A")),
    n(s?.supplyCurrent ?? 0, "A", () => q(s?.supplyCurrent, "A")),
  ];
  if (heatUp) {
    const t = s?.timeToTarget ?? null;
    cells.push(s === null ? "" : t === null ? "not reached" : format === "csv" ? String(t) : duration(t));
  }
  cells.push(s === null ? "" : String(r.cautionCount));
  cells.push(r.problem === null ? "" : reasonText(r.problem));
  return cells;
}

/**
 * Renders a sweep as a text table: one row per value, failed rows with blank numbers and their
 * reason in the last column, an unreached target as "not reached", no time column without the
 * heat-up.
 *
 * @param sweep - a result of `sweepHeater`
 * @param heatUp - whether the sweep ran the heat-up (default `true`): adds the time column
 * @returns the table as text
 * @throws {@link InputError} when `sweep` is not a sweep result
 * @example
 * ```ts
 * import { sweepTextReport } from "fluxwright/report";
 * const table = sweepTextReport({ field: "coil.turns", rows: [{ value: 0, summary: null, cautionCount: 0,
 *   problem: "readHeaterDescription: coil.turns must be an integer ≥ 1, got 0" }] }, false);
 * console.log(table.split("\n")[0]); // sweep of coil.turns: 0 of 1 values gave a design that runs
 * ```
 * @category Reports and charts
 */
export function sweepTextReport(sweep: HeaterSweep, heatUp = true): string {
  requireSweep("sweepTextReport", sweep);
  const header = [sweep.field, "frequency", "part power", "efficiency", "tank V peak", "coil I rms", "supply I", ...(heatUp ? ["time to target"] : []), "cautions", "reason (when no result)"];
  const rows = sweep.rows.map((r) => sweepCells(r, heatUp, "text"));
  const ok = sweep.rows.filter((r) => r.summary !== null).length;
  return [`sweep of ${sweep.field}: ${ok} of ${sweep.rows.length} values gave a design that runs`, textTable(rows, header), ""].join("\n");
}

/** One CSV field (RFC 4180): quoted when it holds a comma, quote or line break. */
function csvField(text: string): string {
  return /[",\r\n]/u.test(text) ? `"${text.replace(/"/gu, '""')}"` : text;
}

/**
 * Renders a sweep as CSV (RFC 4180, CRLF line ends): a header line with SI units, SI numbers,
 * blank cells where a row has no result, `not reached` for an unreached target, and the reason.
 *
 * @param sweep - a result of `sweepHeater`
 * @param heatUp - whether the sweep ran the heat-up (default `true`): adds `time_to_target_s`
 * @returns the CSV text
 * @throws {@link InputError} when `sweep` is not a sweep result
 * @example
 * ```ts
 * import { sweepCsv } from "fluxwright/report";
 * const csv = sweepCsv({ field: "coil.turns", rows: [] }, false);
 * console.log(csv.startsWith("coil.turns,frequency_Hz,")); // true
 * ```
 * @category Reports and charts
 */
export function sweepCsv(sweep: HeaterSweep, heatUp = true): string {
  requireSweep("sweepCsv", sweep);
  const header = [sweep.field, "frequency_Hz", "part_power_W", "efficiency", "tank_voltage_peak_V", "coil_current_rms_A", "supply_current_A", ...(heatUp ? ["time_to_target_s"] : []), "cautions", "reason"];
  const lines = [header, ...sweep.rows.map((r) => sweepCells(r, heatUp, "csv"))].map((cells) => cells.map(csvField).join(","));
  return `${lines.join("\r\n")}\r\n`;
}

/**
 * Renders an optimisation result as text: the best designs, why the others failed, and the
 * search's warnings.
 *
 * @param r - a result of `optimiseHeater`
 * @returns the report as text
 * @throws {@link InputError} when `r` is not an optimisation result
 * @example
 * ```ts
 * import { optimisationTextReport } from "fluxwright/report";
 * const text = optimisationTextReport({ evaluated: 10, feasible: 0, best: [], rejected: [{ reason: "tank voltage above its limit", count: 10 }], warnings: [] });
 * console.log(text.includes("WHY OTHERS FAILED")); // true
 * ```
 * @category Reports and charts
 */
export function optimisationTextReport(r: HeaterOptimisation): string {
  const given = r as unknown as { best?: unknown; rejected?: unknown } | null;
  if (typeof given !== "object" || given === null || !Array.isArray(given.best) || !Array.isArray(given.rejected)) {
    throw new InputError("optimisationTextReport", "result", r, "", "a result of optimiseHeater");
  }
  const out: string[] = [];
  out.push(`candidates evaluated: ${r.evaluated}, within limits: ${r.feasible}`);
  out.push("");
  out.push("BEST DESIGNS");
  out.push(
    textTable(
      r.best.map((b, i) => [
        String(i + 1),
        String(b.turns),
        q(b.capacitance, "F"),
        b.conductor.kind,
        q(b.summary.frequency, "Hz"),
        q(b.summary.partPower, "W"),
        percent(b.summary.efficiency),
        q(b.summary.tankVoltagePeak, "V"),
        duration(b.summary.timeToTarget),
        b.score.toPrecision(3),
      ]),
      ["#", "turns", "capacitance", "conductor", "frequency", "part power", "efficiency", "tank V peak", "time", "miss"],
    ),
  );
  out.push("");
  if (r.warnings.length > 0) {
    out.push("WARNINGS");
    for (const w of r.warnings) out.push(wrap(`  - ${w}`));
    out.push("");
  }
  if (r.rejected.length > 0) {
    out.push("WHY OTHERS FAILED");
    out.push(textTable(r.rejected.map((x) => [x.reason, String(x.count)]), ["reason", "candidates"]));
    out.push("");
  }
  return out.join("\n");
}

/** Rows of the surface/core (radial) model for the heat-up table. */
function radialRows(r: HeaterRadialHeatUp | null, target: number): [string, string][] {
  if (r === null) return [];
  const end = r.times.length - 1;
  const rows: [string, string][] = [
    [`surface / mean / core reach ${celsiusText(target)} at`, [r.timeToSurfaceTarget, r.timeToMeanTarget, r.timeToCoreTarget].map((t) => (t === null ? "—" : duration(t))).join(" / ")],
    ["surface − core when the heating stops", r.surfaceCoreDifferenceAtTarget === null ? "—" : `${r.surfaceCoreDifferenceAtTarget.toFixed(1)} K`],
    ["surface / core at the end", `${celsiusText(r.surfaceTemperatures[end] ?? null)} / ${celsiusText(r.coreTemperatures[end] ?? null)}`],
  ];
  if (r.soakBand !== null) rows.push([`soak until within ${r.soakBand.toFixed(0)} K`, r.soakTime === null ? "not reached" : duration(r.soakTime)]);
  if (r.hardeningTemperature !== null) rows.push([`depth heated above ${celsiusText(r.hardeningTemperature)}`, r.hardeningDepth === null ? "—" : `${(r.hardeningDepth * 1000).toFixed(2)} mm`]);
  return rows;
}
