import { describe, it, expect } from "vitest";
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

const script = fileURLToPath(new URL("../../scripts/check-notebook.mjs", import.meta.url));
const dir = mkdtempSync(join(tmpdir(), "fluxwright-notebook-"));
const notebook = (cells: object[]): string => JSON.stringify({ cells, metadata: {}, nbformat: 4, nbformat_minor: 5 });
const code = (source: string, outputs: object[] = []): object => ({ cell_type: "code", source: source.split(/(?<=\n)/u), outputs, metadata: {}, execution_count: null });
const stream = (text: string): object => ({ output_type: "stream", name: "stdout", text: [text] });
const svg = { output_type: "display_data", data: { "image/svg+xml": "<svg/>" }, metadata: {} };

function check(source: object[], executed: object[]): { status: number | null; stderr: string } {
  writeFileSync(join(dir, "src.ipynb"), notebook(source));
  writeFileSync(join(dir, "out.ipynb"), notebook(executed));
  const r = spawnSync(process.execPath, [script, join(dir, "src.ipynb"), join(dir, "out.ipynb")], { encoding: "utf8" });
  return { status: r.status, stderr: r.stderr };
}

describe("scripts/check-notebook.mjs (the CI check of the executed notebook)", () => {
  const cells = [code('console.log("a");\nconsole.log("b");\n'), code("Deno.jupyter.svg`${x}`;\n")];
  it("passes a notebook whose every output is there", () => {
    expect(check(cells, [code('console.log("a");\nconsole.log("b");\n', [stream("a\nb\n")]), code("Deno.jupyter.svg`${x}`;\n", [svg])]).status).toBe(0);
  });
  it("fails when a cell's last printed line was lost", () => {
    const r = check(cells, [code('console.log("a");\nconsole.log("b");\n', [stream("a\n")]), code("Deno.jupyter.svg`${x}`;\n", [svg])]);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain("2 console.log lines expected, 1 captured");
  });
  it("fails on a missing SVG and on an error output", () => {
    const r = check(cells, [code("", [{ output_type: "error", ename: "Error", evalue: "boom", traceback: [] }]), code("Deno.jupyter.svg`${x}`;\n", [])]);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain("Error: boom");
    expect(r.stderr).toContain("its SVG output is missing");
  });
});
