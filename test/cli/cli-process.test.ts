/**
 * The command line as users meet it: each check runs `fluxwright` as a real process (through
 * tsx on src/cli/main.ts) with real files, pipes and exit statuses.
 */
import { describe, it, expect, beforeAll } from "vitest";
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync, existsSync, readdirSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { Ajv2020 } from "ajv/dist/2020.js";
import { mutate } from "../study/cases.js";

const root = fileURLToPath(new URL("../../", import.meta.url));
const tsx = join(root, "node_modules/.bin/tsx");
const main = join(root, "src/cli/main.ts");
const example = (name: string): Record<string, unknown> => JSON.parse(readFileSync(join(root, "docs/examples", name), "utf8")) as Record<string, unknown>;
const version = (JSON.parse(readFileSync(join(root, "package.json"), "utf8")) as { version: string }).version;

let dir = "";
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), "fluxwright-cli-process-"));
});

interface Run {
  status: number | null;
  stdout: string;
  stderr: string;
}
/** Runs the CLI in `dir`; `shell` wraps it in `sh -c` (for ulimit and redirections). */
function cli(args: readonly string[], options: { input?: string; shell?: string } = {}): Run {
  const r =
    options.shell === undefined
      ? spawnSync(tsx, [main, ...args], { cwd: dir, encoding: "utf8", input: options.input })
      : spawnSync("sh", ["-c", `${options.shell}; exec "$0" "$@"`, tsx, main, ...args], { cwd: dir, encoding: "utf8" });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}
const write = (name: string, value: unknown): string => {
  writeFileSync(join(dir, name), typeof value === "string" ? value : JSON.stringify(value, null, 2));
  return name;
};
const T = 60_000;

describe("fluxwright as a process: versions, help, input", () => {
  it("--version prints the package version, and the help lists it", () => {
    const v = cli(["--version"]);
    expect(v.status).toBe(0);
    expect(v.stdout).toBe(`fluxwright ${version}\n`);
    expect(cli(["--help"]).stdout).toContain("-V, --version");
  }, T);

  it("reads the study file from standard input with -", () => {
    const r = cli(["study", "-"], { input: JSON.stringify(example("study-bearing-race.json")) });
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toContain("study file: (standard input)");
  }, T);

  it("accepts a study file that starts with a UTF-8 byte-order mark", () => {
    const r = cli(["study", write("bom.json", `\uFEFF${JSON.stringify(example("study-bearing-race.json"))}`)]);
    expect(r.status, r.stderr).toBe(0);
  }, T);

  it("gives line and column of a JSON syntax error, with the line and a caret", () => {
    const r = cli(["study", write("broken.json", '{\n  "title": "x",\n  "supply" { }\n}\n')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/broken\.json:3:12: not valid JSON/);
    expect(r.stderr).toContain('    "supply" { }\n               ^');
  }, T);

  it("refuses a bare number where a dimension is needed, naming the field and showing the fix (exit 2)", () => {
    const r = cli(["study", write("bare.json", mutate(mutate(example("study-bearing-race.json"), "coil.radius", 32), "capacitor.capacitance", "2.2"))]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('coil.radius: coil.radius must be a quantity with its unit, e.g. "32 mm" or "32 m"');
    expect(r.stderr).toContain('capacitor.capacitance: capacitor.capacitance must be a quantity with its unit, e.g. "2.2 µF" or "2.2 F"');
  }, T);

  it("escapes terminal control characters of a title in the text report", () => {
    const r = cli(["study", write("controls.json", mutate(example("study-bearing-race.json"), "title", "race \u001b[2J\u001b]0;x\u0007 \u009b1m"))]);
    expect(r.status, r.stderr).toBe(0);
    // eslint-disable-next-line no-control-regex -- the check is that none get through
    expect(r.stdout).not.toMatch(/[\u0000-\u0008\u000B-\u001F\u007F-\u009F]/u);
    expect(r.stdout).toContain("race \\x1B[2J\\x1B]0;x\\x07 \\x9B1m");
  }, T);
});

describe("fluxwright as a process: impossible designs", () => {
  it("a valid file whose design cannot run exits 3 with 4-digit prefixed numbers and what to change", () => {
    const r = cli(["study", write("damped.json", mutate(mutate(example("study-bearing-race.json"), "capacitor.capacitance", "1 F"), "coil.turns", 1))]);
    expect(r.status).toBe(3);
    expect(r.stderr).toMatch(/√\(L\/C\) = \d+(\.\d{1,3})? [mµ]Ω \(otherwise the tank has no zero-phase frequency\), but it is \d+(\.\d{1,3})? [mµ]Ω\./);
    expect(r.stderr).toContain("what to change:");
    expect(r.stderr).not.toMatch(/\d{6,}/);
    expect(r.stderr.trim().split("\n")).toHaveLength(2);
  }, T);
});

describe("fluxwright as a process: outputs written safely", () => {
  it("refuses to write the HTML report over the study file, also through another spelling of the path", () => {
    const file = write("same.json", example("study-bearing-race.json"));
    const before = readFileSync(join(dir, file), "utf8");
    for (const out of [file, `./${file}`]) {
      const r = cli(["study", file, "--html", out]);
      expect(r.status).toBe(2);
      expect(r.stderr).toContain("refusing to write the HTML report over the study file");
    }
    expect(readFileSync(join(dir, file), "utf8")).toBe(before);
  }, T);

  it("a missing directory: one line, exit 4, the text report still printed, no stack trace", () => {
    const r = cli(["study", write("race.json", example("study-bearing-race.json")), "--html", "no/such/dir/report.html"]);
    expect(r.status).toBe(4);
    expect(r.stdout).toContain("OPERATING POINTS");
    expect(r.stderr).toBe("fluxwright study: cannot write the HTML report to no/such/dir/report.html: no such file or directory (ENOENT); nothing was changed there\n");
  }, T);

  it("past a file-size limit the old report is kept whole and no temporary file is left (exit 4, EFBIG)", () => {
    write("race.json", example("study-bearing-race.json"));
    writeFileSync(join(dir, "kept.html"), "the old report\n");
    const r = cli(["study", "race.json", "--html", "kept.html", "--quiet"], { shell: "ulimit -f 8" });
    expect(r.status).toBe(4);
    expect(r.stderr).toContain("cannot write the HTML report to kept.html: file too large (file-size limit) (EFBIG)");
    expect(readFileSync(join(dir, "kept.html"), "utf8")).toBe("the old report\n");
    expect(readdirSync(dir).filter((f) => f.endsWith(".tmp"))).toEqual([]);
  }, T);

  it("a full standard output (ENOSPC) is one line on stderr and exit 4", () => {
    if (!existsSync("/dev/full")) return;
    write("race.json", example("study-bearing-race.json"));
    const r = cli(["study", "race.json"], { shell: "exec >/dev/full" });
    expect(r.status).toBe(4);
    expect(r.stderr).toBe("fluxwright: cannot write to standard output: ENOSPC\n");
  }, T);

  it("new writes a starter study file that runs, and never overwrites one", () => {
    const made = cli(["new", "starter.json", "--example", "plate-warmer"]);
    expect(made.status, made.stderr).toBe(0);
    const starter = JSON.parse(readFileSync(join(dir, "starter.json"), "utf8")) as { $schema: string };
    expect(starter.$schema).toBe("https://raw.githubusercontent.com/fluxwright/fluxwright/main/docs/heater-study.schema.json");
    expect(cli(["study", "starter.json"]).status).toBe(0);
    const again = cli(["new", "starter.json"]);
    expect(again.status).toBe(2);
    expect(again.stderr).toContain("already exists");
  }, T);
});

describe("fluxwright as a process: JSON output", () => {
  it("--json carries format, format version and fluxwright version, validates against the shipped output schema, and reads back into study", () => {
    write("race.json", example("study-bearing-race.json"));
    const r = cli(["study", "race.json", "--json"]);
    expect(r.status, r.stderr).toBe(0);
    writeFileSync(join(dir, "result.json"), r.stdout);
    const result = JSON.parse(r.stdout) as Record<string, unknown>;
    expect(result.format).toBe("fluxwright-study");
    expect(result.formatVersion).toBe(1);
    expect(result.fluxwright).toBe(version);
    const ajv = new Ajv2020({ strict: true, allowUnionTypes: true, allErrors: true });
    ajv.addSchema(JSON.parse(readFileSync(join(root, "docs/heater-study.schema.json"), "utf8")) as object);
    const validate = ajv.compile(JSON.parse(readFileSync(join(root, "docs/heater-study-result.schema.json"), "utf8")) as object);
    expect(validate(result), JSON.stringify(validate.errors)).toBe(true);
    // round trip: the output is a study file too, and gives the same numbers
    const again = cli(["study", "result.json", "--json"]);
    expect(again.status, again.stderr).toBe(0);
    const second = JSON.parse(again.stdout) as Record<string, unknown>;
    expect(second.partPower).toBe(result.partPower);
    expect(second.input).toEqual(result.input);
  }, T);
});

describe("fluxwright as a process: sweep and optimise", () => {
  it("sweep refuses a misspelt field with a suggestion (exit 2) and unitless values for a dimensioned field", () => {
    write("race.json", example("study-bearing-race.json"));
    const typo = cli(["sweep", "race.json", "--field", "coil.turn", "--values", "4,5"]);
    expect(typo.status).toBe(2);
    expect(typo.stderr).toContain('did you mean "coil.turns"?');
    const bare = cli(["sweep", "race.json", "--field", "coil.radius", "--values", "70,80"]);
    expect(bare.status).toBe(2);
    expect(bare.stderr).toContain('"70 mm"');
  }, T);

  it("sweep --csv gives RFC 4180 rows with SI numbers, blank cells and the reason for a failed row", () => {
    write("race.json", example("study-bearing-race.json"));
    const r = cli(["sweep", "race.json", "--field", "coil.turns", "--values", "5,6,0", "--no-heat-up", "--csv"]);
    expect(r.status, r.stderr).toBe(0);
    const lines = r.stdout.split("\r\n").filter((l) => l !== "");
    expect(lines[0]).toBe("coil.turns,frequency_Hz,part_power_W,efficiency,tank_voltage_peak_V,coil_current_rms_A,supply_current_A,cautions,reason");
    expect(lines).toHaveLength(4);
    expect(Number(lines[1]?.split(",")[1])).toBeGreaterThan(1000);
    expect(lines[3]).toBe('0,,,,,,,,"coil.turns must be an integer ≥ 1, got 0"');
  }, T);

  it("the text table has a reason column and no dash standing for two things", () => {
    write("race.json", example("study-bearing-race.json"));
    const r = cli(["sweep", "race.json", "--field", "coil.turns", "--values", "6,0", "--no-heat-up"]);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain("reason (when no result)");
    expect(r.stdout).not.toContain("time to target");
    expect(r.stdout).not.toContain("—");
    expect(r.stdout).toContain("1 of 2 values gave a design that runs");
  }, T);

  it("a sweep where every value failed exits 3", () => {
    write("race.json", mutate(example("study-bearing-race.json"), "coil.turns", 1));
    const r = cli(["sweep", "race.json", "--field", "capacitor.capacitance", "--values", "1 F,2 F", "--no-heat-up"]);
    expect(r.status).toBe(3);
    expect(r.stderr).toContain("no value of capacitor.capacitance gave a design that runs");
    expect(r.stdout).toMatch(/√\(L\/C\) = \d+(\.\d{1,3})? [mµ]Ω/);
  }, T);

  it("optimise --power on a power-tracking inverter warns that the goal ranks by inefficiency", () => {
    write("plate.json", example("study-plate-warmer.json"));
    const r = cli(["optimise", "plate.json", "--power", "150 W", "--turns", "12,14", "--keep", "2"]);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stderr).toMatch(/warning: the goal is a part power of 150 W, but the inverter holds the tank power at inverter\.targetPower = 250 W/);
  }, T);
});
