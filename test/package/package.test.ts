import { describe, it, expect } from "vitest";
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { modules } from "../../tsup.config.js";

const root = fileURLToPath(new URL("../../", import.meta.url));
const pkg = JSON.parse(readFileSync(join(root, "package.json"), "utf8")) as Record<string, unknown> & {
  files: string[];
  scripts: Record<string, string>;
  exports: Record<string, unknown>;
  typesVersions: Record<string, Record<string, string[]>>;
  repository: { url: string };
  homepage: string;
  bugs: { url: string };
};
const PROJECT = "https://github.com/fluxwright/fluxwright";
const SCHEMA_ID = "https://raw.githubusercontent.com/fluxwright/fluxwright/main/docs/heater-study.schema.json";

describe("package.json: what users install", () => {
  it("packing builds first (prepack), so a fresh clone never ships without dist/", () => {
    expect(pkg.scripts.prepack).toBe("npm run build");
  });

  it("ships the study-file schema, the output schema and the example study files the help points to", () => {
    for (const f of ["dist", "docs/heater-study.schema.json", "docs/heater-study-result.schema.json", "docs/examples/study-*.json"]) expect(pkg.files).toContain(f);
  });

  it("names repository, homepage and bug tracker at the project URL", () => {
    expect(pkg.repository.url).toBe(`git+${PROJECT}.git`);
    expect(pkg.homepage.startsWith(PROJECT)).toBe(true);
    expect(pkg.bugs.url).toBe(`${PROJECT}/issues`);
  });

  it("has a subpath export for every module, and node10 types through the typesVersions wildcard", () => {
    for (const m of modules) expect(Object.keys(pkg.exports), m).toContain(`./${m}`);
    expect(pkg.typesVersions["*"]?.["*"]).toEqual(["./dist/*/index.d.cts"]);
  });

  it("the README's links and image are absolute, so they work on the registry page", () => {
    const readme = readFileSync(join(root, "README.md"), "utf8");
    const targets = [...readme.matchAll(/\]\(([^)]+)\)/gu)].map((m) => m[1] ?? "");
    expect(targets.length).toBeGreaterThan(10);
    for (const t of targets) expect(t, t).toMatch(/^(https:\/\/|#)/u);
  });

  it("the schema's $id is the project URL, and every shipped example names it as $schema (works after a copy)", () => {
    const schema = JSON.parse(readFileSync(join(root, "docs/heater-study.schema.json"), "utf8")) as { $id: string };
    expect(schema.$id).toBe(SCHEMA_ID);
    const dir = join(root, "docs/examples");
    const examples = readdirSync(dir).filter((f) => f.startsWith("study-") && f.endsWith(".json"));
    expect(examples.length).toBeGreaterThanOrEqual(3);
    for (const f of examples) expect((JSON.parse(readFileSync(join(dir, f), "utf8")) as { $schema: string }).$schema, f).toBe(SCHEMA_ID);
  });
});
