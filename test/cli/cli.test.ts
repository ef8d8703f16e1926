import { describe, it, expect } from "vitest";
import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, existsSync, readdirSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { runCli } from "../../src/cli/commands.js";
import type { CliIo } from "../../src/cli/commands.js";
import { studyHeater } from "../../src/index.js";
import type { HeaterDescription } from "../../src/index.js";
import { mutate } from "../study/cases.js";
import { findAll, parseXml } from "./xml.js";

const root = fileURLToPath(new URL("../../", import.meta.url));
const examplesDir = join(root, "docs/examples");
const exampleFiles = readdirSync(examplesDir).filter((f) => f.startsWith("study-") && f.endsWith(".json"));

/** An in-memory I/O for runCli: files in a map, outputs captured. */
function memoryIo(files: Record<string, string> = {}) {
  const out: string[] = [];
  const err: string[] = [];
  const written = new Map<string, string>();
  const io: CliIo = {
    stdout: (t) => out.push(t),
    stderr: (t) => err.push(t),
    readFile: (p) => {
      if (p in files) return files[p] as string;
      const e = new Error(`no such file ${p}`) as Error & { code: string };
      e.code = "ENOENT";
      throw e;
    },
    writeFile: (p, t) => written.set(p, t),
  };
  return { io, out: () => out.join(""), err: () => err.join(""), written };
}

const read = (name: string): string => readFileSync(join(examplesDir, name), "utf8");

describe("fluxwright study", () => {
  it("--json prints exactly what studyHeater returns for the same file", () => {
    const text = read("study-bearing-race.json");
    const m = memoryIo({ "race.json": text });
    expect(runCli(["study", "race.json", "--json"], m.io)).toBe(0);
    const printed = JSON.parse(m.out()) as Record<string, unknown>;
    const { format, formatVersion, fluxwright, input, ...study } = printed;
    expect([format, formatVersion, fluxwright]).toEqual(["fluxwright-study", 1, "unknown"]);
    expect(input).toEqual(JSON.parse(text));
    expect(study).toEqual(JSON.parse(JSON.stringify(studyHeater(JSON.parse(text) as HeaterDescription))));
  });

  it("runs every example study file (exit 0, a text report with the key sections)", () => {
    expect(exampleFiles.length).toBeGreaterThanOrEqual(2);
    for (const f of exampleFiles) {
      const m = memoryIo({ [f]: read(f) });
      expect(runCli(["study", f], m.io), `${f}: ${m.err()}`).toBe(0);
      for (const section of ["OPERATING POINTS", "WHERE THE POWER GOES", "HEAT-UP", "VALIDITY NOTES"]) expect(m.out()).toContain(section);
    }
  });

  it("prints cautions first when there are any", () => {
    const m = memoryIo({ "race.json": read("study-bearing-race.json") });
    runCli(["study", "race.json"], m.io);
    const text = m.out();
    expect(text.indexOf("CAUTIONS")).toBeGreaterThan(-1);
    expect(text.indexOf("CAUTIONS")).toBeLessThan(text.indexOf("DESIGN"));
  });

  it("--html writes a self-contained report that parses, with at least three non-empty SVG plots", () => {
    const m = memoryIo({ "race.json": read("study-bearing-race.json") });
    expect(runCli(["study", "race.json", "--html", "out/report.html"], m.io)).toBe(0);
    expect(m.out()).toContain("HTML report written to out/report.html");
    const html = m.written.get("out/report.html") ?? "";
    const doc = parseXml(html, true);
    expect(doc.name).toBe("html");
    const svgs = findAll(doc, "svg");
    expect(svgs.length).toBeGreaterThanOrEqual(3);
    for (const svg of svgs) {
      const drawn = findAll(svg, "path").filter((p) => p.attributes.class === "series").length + findAll(svg, "rect").filter((r) => r.attributes.class === "bar").length;
      expect(drawn).toBeGreaterThan(0);
    }
    // no scripts, no external resources
    expect(findAll(doc, "script")).toHaveLength(0);
    expect(html).not.toMatch(/(src|href)="(https?:)?\/\//);
    // element ids unique across the page
    const ids = findAll(doc, "clipPath").map((c) => c.attributes.id);
    expect(new Set(ids).size).toBe(ids.length);
  });

  it("a malformed file exits 2, names the field path, and writes no report", () => {
    const bad = JSON.stringify(mutate(JSON.parse(read("study-bearing-race.json")), "coil.turns", 0));
    const m = memoryIo({ "bad.json": bad });
    expect(runCli(["study", "bad.json", "--html", "out.html"], m.io)).toBe(2);
    expect(m.err()).toContain("coil.turns");
    expect(m.err()).toContain("must be an integer ≥ 1, got 0");
    expect(m.written.size).toBe(0);
    expect(m.out()).toBe("");
  });

  it("lists every problem of a malformed file", () => {
    let bad = mutate(JSON.parse(read("study-plate-warmer.json")), "coil.turns", -1);
    bad = mutate(bad, "part.thickness", "6 mF");
    const m = memoryIo({ "bad.json": JSON.stringify(bad) });
    expect(runCli(["study", "bad.json"], m.io)).toBe(2);
    expect(m.err()).toContain("coil.turns");
    expect(m.err()).toContain("part.thickness");
  });

  it("a valid file whose design cannot run exits 3 with the limit formatted and what to change, writing no report", () => {
    const damped = mutate(mutate(JSON.parse(read("study-bearing-race.json")), "capacitor.capacitance", "1 F"), "coil.turns", 1);
    const m = memoryIo({ "damped.json": JSON.stringify(damped) });
    expect(runCli(["study", "damped.json", "--html", "out.html"], m.io)).toBe(3);
    const err = m.err();
    expect(err).toContain("the file is valid but the design cannot run");
    // prefixes and at most 4 significant digits, the unit right after the number
    expect(err).toMatch(/< √\(L\/C\) = \d+(\.\d{1,3})? [mµ]Ω \(otherwise/);
    expect(err).not.toMatch(/\d{6,}/);
    expect(err).toMatch(/what to change: .*capacitor\.capacitance, now "1 F": fewer µF/);
    expect(m.written.size).toBe(0);
  });

  it("a power the bridge cannot deliver exits 3, quoting the target as written and the limit in W", () => {
    const greedy = mutate(JSON.parse(read("study-plate-warmer.json")), "inverter.targetPower", "5 kW");
    const m = memoryIo({ "greedy.json": JSON.stringify(greedy) });
    expect(runCli(["study", "greedy.json"], m.io)).toBe(3);
    expect(m.err()).toMatch(/≤ \d+(\.\d+)? k?W \(the tank's power at resonance with \d+(\.\d+)? V at the inverter input\), but it is 5 kW/);
    expect(m.err()).toContain('Lower inverter.targetPower, now "5 kW"');
    expect(m.err()).not.toMatch(/\d{6,}/);
  });

  it("a missing file, invalid JSON, or a wrong argument count exit 2", () => {
    const m = memoryIo({ "broken.json": "{ \"supply\": " });
    expect(runCli(["study", "nope.json"], m.io)).toBe(2);
    expect(m.err()).toContain("cannot read nope.json");
    expect(runCli(["study", "broken.json"], m.io)).toBe(2);
    expect(m.err()).toContain("not valid JSON");
    expect(runCli(["study"], m.io)).toBe(2);
    expect(runCli(["study", "a.json", "b.json"], m.io)).toBe(2);
    expect(runCli(["study", "a.json", "--frobnicate"], m.io)).toBe(2);
  });
});

describe("fluxwright help and usage", () => {
  it("--help works for the program and for every subcommand (exit 0, usage text on stdout)", () => {
    for (const args of [["--help"], ["study", "--help"], ["sweep", "--help"], ["optimise", "--help"], ["help", "sweep"], ["optimize", "-h"]]) {
      const m = memoryIo();
      expect(runCli(args, m.io), args.join(" ")).toBe(0);
      expect(m.out()).toMatch(/^usage: fluxwright/);
    }
  });
  it("no command or an unknown command exits 2 with usage on stderr", () => {
    const m = memoryIo();
    expect(runCli([], m.io)).toBe(2);
    expect(m.err()).toContain("usage:");
    expect(runCli(["frobnicate"], m.io)).toBe(2);
    expect(m.err()).toContain("unknown command");
  });
});

describe("fluxwright sweep and optimise", () => {
  it("sweep prints one row per value and reports progress on stderr", () => {
    const m = memoryIo({ "race.json": read("study-bearing-race.json") });
    expect(runCli(["sweep", "race.json", "--field", "coil.turns", "--values", "5,6,0", "--no-heat-up"], m.io)).toBe(0);
    expect(m.err()).toContain("sweeping coil.turns");
    const lines = m.out().trim().split("\n");
    expect(lines.length).toBe(1 + 2 + 3);
    expect(m.out()).toContain("coil.turns must be an integer ≥ 1, got 0");
  });
  it("sweep --json parses, and a bad field path exits 2", () => {
    const m = memoryIo({ "race.json": read("study-bearing-race.json") });
    expect(runCli(["sweep", "race.json", "--field", "capacitor.capacitance", "--values", "3.3 µF,4.7 µF", "--no-heat-up", "--json"], m.io)).toBe(0);
    expect((JSON.parse(m.out()) as { rows: unknown[] }).rows).toHaveLength(2);
    expect(runCli(["sweep", "race.json", "--field", "coil.conductor", "--values", "1"], m.io)).toBe(2);
    expect(runCli(["sweep", "race.json", "--values", "1"], m.io)).toBe(2);
  });
  it("optimise reports best designs and why others failed", () => {
    const m = memoryIo({ "race.json": read("study-bearing-race.json") });
    expect(runCli(["optimise", "race.json", "--power", "1.5 kW", "--turns", "4,5,6,7", "--min-frequency", "20 kHz", "--max-tank-voltage", "200 V", "--keep", "3"], m.io)).toBe(0);
    expect(m.out()).toContain("BEST DESIGNS");
    expect(m.err()).toMatch(/evaluated \d+ candidates/);
    expect(runCli(["optimise", "race.json"], m.io)).toBe(2);
    expect(runCli(["optimise", "race.json", "--power", "1 kW", "--time", "60 s"], m.io)).toBe(2);
  });
});

describe("the installed command (a real process)", () => {
  const tsx = join(root, "node_modules/.bin/tsx");
  const main = join(root, "src/cli/main.ts");
  it("exits 0 on an example and 2 on a malformed file, writing no report", () => {
    const dir = mkdtempSync(join(tmpdir(), "fluxwright-cli-"));
    const ok = spawnSync(tsx, [main, "study", join(examplesDir, "study-bearing-race.json"), "--html", join(dir, "ok.html"), "--quiet"], { encoding: "utf8" });
    expect(ok.status, ok.stderr).toBe(0);
    expect(existsSync(join(dir, "ok.html"))).toBe(true);
    const badFile = join(dir, "bad.json");
    execFileSync(process.execPath, ["-e", `require("fs").writeFileSync(${JSON.stringify(badFile)}, JSON.stringify({ supply: { kind: "battery", voltage: "-5 V" } }))`]);
    const bad = spawnSync(tsx, [main, "study", badFile, "--html", join(dir, "bad.html")], { encoding: "utf8" });
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain("supply.voltage");
    expect(existsSync(join(dir, "bad.html"))).toBe(false);
  }, 60_000);
});
