// Checks an executed notebook against its source: every code cell ran without an error, printed
// one line per console.log call it makes (none is lost), and drew its SVG where it draws one.
// Usage: node scripts/check-notebook.mjs SOURCE.ipynb EXECUTED.ipynb
import { readFileSync } from "node:fs";

const [sourcePath, executedPath] = process.argv.slice(2);
if (sourcePath === undefined || executedPath === undefined) {
  console.error("usage: node scripts/check-notebook.mjs SOURCE.ipynb EXECUTED.ipynb");
  process.exit(2);
}
const source = JSON.parse(readFileSync(sourcePath, "utf8"));
const executed = JSON.parse(readFileSync(executedPath, "utf8"));
const text = (v) => (Array.isArray(v) ? v.join("") : String(v ?? ""));
const codeCells = (nb) => nb.cells.filter((c) => c.cell_type === "code");
const problems = [];
const src = codeCells(source);
const out = codeCells(executed);
if (src.length !== out.length) problems.push(`code cells: ${src.length} in the source, ${out.length} executed`);
src.forEach((cell, i) => {
  const code = text(cell.source);
  const outputs = out[i]?.outputs ?? [];
  const where = `cell ${i + 1} (${code.split("\n")[0].slice(0, 60)})`;
  for (const o of outputs) if (o.output_type === "error") problems.push(`${where}: ${o.ename}: ${o.evalue}`);
  // console.log calls outside loops and callbacks print exactly one line each
  const logs = code.split("\n").filter((l) => /^\s*console\.log\(/u.test(l) && !/^\s{4,}/u.test(l)).length;
  const printed = outputs.filter((o) => o.output_type === "stream" && o.name === "stdout").map((o) => text(o.text)).join("");
  const lines = printed.split("\n").filter((l) => l !== "").length;
  if (lines < logs) problems.push(`${where}: ${logs} console.log lines expected, ${lines} captured`);
  if (/Deno\.jupyter\.svg|image\/svg\+xml/u.test(code) && !outputs.some((o) => o.data?.["image/svg+xml"] !== undefined)) {
    problems.push(`${where}: its SVG output is missing`);
  }
  if (outputs.length === 0 && /\S/u.test(code) && (logs > 0 || /Deno\.jupyter/u.test(code))) problems.push(`${where}: no output at all`);
});
if (problems.length > 0) {
  console.error(`notebook check: ${problems.length} problem(s) in ${executedPath}`);
  for (const p of problems) console.error(`  ${p}`);
  process.exit(1);
}
console.log(`notebook check: ${src.length} code cells ran, every output present`);
