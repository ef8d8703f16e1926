/**
 * The command line's pooled runs, in-process on the calling thread (`--workers 0`, fast):
 * NDJSON and CSV rows, shards and `merge`, progress on standard error, Ctrl-C, and the option
 * parser's edge cases.
 */
import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { runCli } from "../../src/cli/commands.js";
import type { CliIo } from "../../src/cli/commands.js";

const root = fileURLToPath(new URL("../../", import.meta.url));
const race = readFileSync(join(root, "docs/examples/study-bearing-race.json"), "utf8");

function memoryIo(files: Record<string, string> = {}, extra: Partial<CliIo> = {}) {
  const out: string[] = [];
  const err: string[] = [];
  const io: CliIo = {
    stdout: (t) => out.push(t),
    stderr: (t) => err.push(t),
    readFile: (p) => {
      if (p in files) return files[p] as string;
      throw Object.assign(new Error(`no such file ${p}`), { code: "ENOENT" });
    },
    writeFile: () => undefined,
    version: "0.0.0-test",
    ...extra,
  };
  return { io, out: () => out.join(""), err: () => err.join("") };
}

const VALUES = "2.2 µF,2.7 µF,3.3 µF,3.9 µF,4.7 µF,5.6 µF,-1 µF";
const sweep = ["sweep", "race.json", "--field", "capacitor.capacitance", "--values", VALUES, "--no-heat-up", "--workers", "0"];

async function run(args: readonly string[], files: Record<string, string> = { "race.json": race }, extra: Partial<CliIo> = {}) {
  const m = memoryIo(files, extra);
  const status = await runCli(args, m.io);
  return { status, out: m.out(), err: m.err() };
}

describe("fluxwright sweep --ndjson, --shard and merge", () => {
  it("three shards merged are byte for byte the output of one run, in NDJSON and in CSV", async () => {
    const whole = await run([...sweep, "--ndjson"]);
    expect(whole.status, whole.err).toBe(0);
    const lines = whole.out.trim().split("\n");
    expect(lines).toHaveLength(1 + 7);
    expect(JSON.parse(lines[0] as string)).toMatchObject({ format: "fluxwright-sweep-rows", field: "capacitor.capacitance", total: 7, heatUp: false });
    const files: Record<string, string> = {};
    for (const i of [1, 2, 3]) {
      const part = await run([...sweep, "--ndjson", "--shard", `${i}/3`]);
      expect(part.status, part.err).toBe(0);
      files[`part${i}.ndjson`] = part.out;
    }
    const merged = await run(["merge", "part3.ndjson", "part1.ndjson", "part2.ndjson"], files);
    expect(merged.status, merged.err).toBe(0);
    expect(merged.out).toBe(whole.out);
    const csv = await run([...sweep, "--csv"]);
    expect((await run(["merge", "--csv", "part1.ndjson", "part2.ndjson", "part3.ndjson"], files)).out).toBe(csv.out);
  });

  it("merge refuses a missing, repeated, truncated or foreign shard (exit 2)", async () => {
    const files: Record<string, string> = {};
    for (const i of [1, 2]) files[`p${i}`] = (await run([...sweep, "--ndjson", "--shard", `${i}/2`])).out;
    files.other = (await run([...sweep.map((a) => (a === VALUES ? "2.2 µF,2.7 µF" : a)), "--ndjson", "--shard", "1/2"])).out;
    files.cut = (files.p2 as string).split("\n").slice(0, 2).join("\n");
    const missing = await run(["merge", "p1"], files);
    expect([missing.status, missing.err]).toEqual([2, expect.stringContaining("shard 2 of 2 missing") as unknown]);
    expect((await run(["merge", "p1", "p1"], files)).err).toContain("are both shard 1/2");
    expect((await run(["merge", "p1", "other"], files)).err).toContain("from another sweep");
    const cut = await run(["merge", "p1", "cut"], files);
    expect([cut.status, cut.err]).toEqual([2, expect.stringContaining("stops after 1 of its 4 rows") as unknown]);
    expect((await run(["merge", "race.json"], { "race.json": race })).err).toContain("not the NDJSON output of a sharded sweep");
  });

  it("optimise --shard: three shards merged print what one run prints with --json (and --text), any order", async () => {
    const search = ["optimise", "race.json", "--power", "1.5 kW", "--turns", "4,5,6,7,8", "--min-frequency", "20 kHz", "--keep", "3", "--workers", "0", "--quiet"];
    const whole = await run([...search, "--json"]);
    expect(whole.status, whole.err).toBe(0);
    const text = await run(search);
    const files: Record<string, string> = {};
    for (const i of [1, 2, 3]) {
      const part = await run([...search, "--json", "--shard", `${i}/3`]);
      expect(part.status, part.err).toBe(0);
      expect(part.out.trim().split("\n")).toHaveLength(1);
      expect(JSON.parse(part.out)).toMatchObject({ format: "fluxwright-optimisation-shard", shard: { index: i, count: 3 } });
      files[`s${i}.json`] = part.out;
    }
    const merged = await run(["merge", "s2.json", "s3.json", "s1.json"], files);
    expect(merged.status, merged.err).toBe(0);
    expect(merged.out).toBe(whole.out);
    expect((await run(["merge", "--text", "s1.json", "s2.json", "s3.json"], files)).out).toBe(text.out);
    const missing = await run(["merge", "s1.json", "s3.json"], files);
    expect([missing.status, missing.err]).toEqual([2, expect.stringContaining("missing: 2") as unknown]);
    files.other = (await run([...search.map((a) => (a === "3" ? "2" : a)), "--json", "--shard", "2/3"])).out;
    expect((await run(["merge", "s1.json", "other", "s3.json"], files)).err).toContain("other");
    expect((await run(["merge", "--csv", "s1.json", "s2.json", "s3.json"], files)).status).toBe(2);
    expect((await run([...search, "--shard", "1/3"])).status).toBe(2);
  }, 60_000);

  it("refuses bad --workers and --shard values, and --shard without --ndjson (exit 2)", async () => {
    for (const args of [["--workers", "-1"], ["--workers", "two"], ["--workers", "300"], ["--shard", "0/3", "--ndjson"], ["--shard", "4/3", "--ndjson"], ["--shard", "1/3"], ["--ndjson", "--csv"]]) {
      const r = await run([...sweep, ...args]);
      expect(r.status, args.join(" ")).toBe(2);
    }
  });
});

describe("progress and Ctrl-C", () => {
  const many = ["sweep", "race.json", "--field", "capacitor.capacitance", "--values", Array.from({ length: 40 }, (_, i) => `${(2 + i * 0.05).toFixed(2)} µF`).join(","), "--no-heat-up", "--csv", "--workers", "0"];

  it("writes plain progress lines when standard error is not a terminal, a bar when it is, nothing with --quiet", async () => {
    const plain = await run(many);
    expect(plain.err).toMatch(/^ {2}40 \/ 40 designs \(100 %\)/mu);
    const raw: string[] = [];
    const bar = await run(many, undefined, { stderrIsTerminal: true, stderr: (t) => raw.push(t) });
    expect(bar.status).toBe(0);
    expect(raw.join("")).toMatch(/\r\[#{24}\] 100 % {2}40\/40 designs/u);
    const quiet = await run([...many, "--quiet"]);
    expect(quiet.err).toBe("");
    expect(quiet.out).toBe(plain.out);
  });

  it("Ctrl-C stops the sweep, keeps the complete rows written and says how far it got (exit 130)", async () => {
    const controller = new AbortController();
    let rows = 0;
    const r = await run(many, undefined, {
      interrupt: () => ({ signal: controller.signal, stop: () => undefined }),
      stdout: () => {
        if (++rows === 6) controller.abort();
      },
    });
    expect(r.status).toBe(130);
    expect(r.err).toMatch(/interrupted after 5 of 40 designs; the rows written \(values 1–5 of 40\) are complete/u);
  });
});

describe("the option parser (node:util parseArgs) keeps the old rules", () => {
  it("takes --name=value, -h, and refuses a value on a boolean, a lone -- and an unknown option with a suggestion", async () => {
    expect((await run(["sweep", "race.json", "--field=coil.turns", "--values=5,6", "--no-heat-up"])).status).toBe(0);
    expect((await run(["sweep", "-h"])).out).toContain("usage: fluxwright sweep");
    expect((await run([...sweep, "--csv=1"])).err).toContain("unknown option --csv=1 (did you mean --csv?)");
    expect((await run([...sweep, "--"])).err).toContain("unknown option --");
    expect((await run([...sweep, "--worker", "2"])).err).toContain("unknown option --worker (did you mean --workers?)");
    expect((await run(["sweep", "race.json", "--field", "coil.turns", "--values"])).err).toContain("option --values needs a value");
    expect((await run(["sweep", "race.json", "--field", "coil.turns", "--values", "--csv"])).err).toContain("option --values needs a value");
    expect((await run(["study", "race.json", "-5"])).err).toContain("study takes exactly one study file, got 2");
  });
});
