/**
 * Runs every `@example` block of the TSDoc in `src/` against the library source, and every
 * standalone example script in `docs/examples/*.ts`.
 *
 * In a TSDoc example, each line `console.log(expr); // expected` is checked: the printed text
 * must equal `expected` exactly, or, when `expected` starts with `≈ `, agree with the number
 * that follows to the significant digits written there. Exits 1 on any failure.
 *
 * Usage: `tsx scripts/run-examples.ts [--only name-substring]`
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, relative, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");
const only = process.argv.includes("--only") ? process.argv[process.argv.indexOf("--only") + 1] : undefined;

function walk(dir: string, ext: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) out.push(...walk(p, ext));
    else if (p.endsWith(ext)) out.push(p);
  }
  return out.sort();
}

interface Example {
  readonly file: string;
  readonly line: number;
  readonly code: string;
}

/** Pulls the ```ts blocks that follow an `@example` tag out of each doc comment. */
function extractExamples(file: string): Example[] {
  const text = readFileSync(file, "utf8");
  const examples: Example[] = [];
  const comment = /\/\*\*[\s\S]*?\*\//gu;
  for (const m of text.matchAll(comment)) {
    const body = m[0];
    const at = body.indexOf("@example");
    if (at < 0) continue;
    const startLine = text.slice(0, (m.index ?? 0) + at).split("\n").length;
    const lines = body.slice(at).split("\n").map((l) => l.replace(/^\s*\*( |$)/u, ""));
    let inside = false;
    let buf: string[] = [];
    let first = 0;
    lines.forEach((l, i) => {
      if (!inside && /^```(ts|typescript|js)\s*$/u.test(l.trim())) {
        inside = true;
        buf = [];
        first = startLine + i + 1;
      } else if (inside && l.trim() === "```") {
        inside = false;
        examples.push({ file, line: first, code: buf.join("\n") });
      } else if (inside) buf.push(l);
    });
  }
  return examples;
}

const srcIndex = pathToFileURL(join(root, "src", "index.ts")).href;
const moduleUrl = (spec: string): string =>
  spec === "fluxwright" ? srcIndex : pathToFileURL(join(root, "src", spec.slice("fluxwright/".length), "index.ts")).href;

/** Turns one example into an async function body: imports become destructuring, logs are checked. */
function transform(example: Example, id: number): string {
  let code = example.code.replace(/import\s+type\s+\{[^}]*\}\s+from\s+["'][^"']+["'];?/gu, "");
  const imports: string[] = [];
  code = code.replace(/import\s+\{([^}]*)\}\s+from\s+["'](fluxwright(?:\/[a-z]+)?)["'];?/gu, (_all, names: string, spec: string) => {
    const list = names.split(",").map((n) => n.trim()).filter((n) => n !== "" && !n.startsWith("type "));
    const bound = list.map((n) => n.replace(/\s+as\s+/u, ": "));
    imports.push(`const { ${bound.join(", ")} } = await import(${JSON.stringify(moduleUrl(spec))});`);
    return "";
  });
  const body = code
    .split("\n")
    .map((line, i) => {
      const c = line.indexOf("console.log(");
      if (c < 0) return line;
      const k = line.lastIndexOf("// ");
      const expected = k > c ? line.slice(k + 3).trim() : null;
      return `${line.slice(0, c)}__log(${id}, ${example.line + i}, ${JSON.stringify(expected)}, ${line.slice(c + "console.log(".length)}`;
    })
    .join("\n");
  return `async function example${id}() {\n${imports.join("\n")}\n${body}\n}`;
}

function harness(examples: Example[]): string {
  const files = examples.map((e) => relative(root, e.file));
  return `import { inspect } from "node:util";
const files = ${JSON.stringify(files)};
const lines = ${JSON.stringify(examples.map((e) => e.line))};
let checks = 0; const failures = [];
function fmt(a) { return typeof a === "string" ? a : inspect(a); }
function __log(id, line, expected, ...args) {
  const printed = args.map(fmt).join(" ");
  if (expected === null) return;
  checks++;
  let ok;
  if (expected.startsWith("≈ ")) {
    const want = expected.slice(2).trim();
    const w = Number(want), p = Number(printed);
    const mant = want.replace(/^[+-]/, "").split(/[eE]/)[0].replace(".", "").replace(/^0+/, "");
    const sig = Math.max(1, mant.length);
    const tol = w === 0 ? 0.5 * 10 ** -(sig) : 0.5 * 10 ** (Math.floor(Math.log10(Math.abs(w))) - sig + 1) * (1 + 1e-9);
    ok = Number.isFinite(w) && Number.isFinite(p) && Math.abs(p - w) <= tol;
  } else ok = printed === expected;
  if (!ok) failures.push(files[id] + ":" + line + ": printed " + JSON.stringify(printed) + ", comment says " + JSON.stringify(expected));
}
${examples.map((e, i) => transform(e, i)).join("\n")}
let errors = 0;
for (let i = 0; i < ${examples.length}; i++) {
  try { await globalThis["example" + i](); }
  catch (e) { errors++; failures.push(files[i] + ":" + lines[i] + ": threw " + (e && e.message ? e.message : String(e))); }
}
for (const f of failures) console.error("FAIL " + f);
console.log(\`doc examples: ${examples.length} run, \${checks} printed values checked, \${failures.length} failed\`);
process.exit(failures.length > 0 ? 1 : 0);
`.replace(/async function example(\d+)\(\)/gu, "globalThis.example$1 = async function ()");
}

const srcFiles = walk(join(root, "src"), ".ts").filter((f) => !only || f.includes(only));
const examples = srcFiles.flatMap(extractExamples);
const dir = mkdtempSync(join(tmpdir(), "fluxwright-examples-"));
const file = join(dir, "examples.mts");
writeFileSync(file, harness(examples));
const tsx = join(root, "node_modules", ".bin", "tsx");
let failed = 0;
const run = spawnSync(tsx, [file], { stdio: "inherit", cwd: root });
if (run.status !== 0) failed++;
rmSync(dir, { recursive: true, force: true });

// Standalone example scripts of the guides.
const scripts = walk(join(root, "docs", "examples"), ".ts").filter((f) => !only || f.includes(only));
for (const s of scripts) {
  const r = spawnSync(tsx, [s], { cwd: root, encoding: "utf8" });
  if (r.status !== 0) {
    failed++;
    console.error(`FAIL ${relative(root, s)} exited ${r.status}\n${r.stderr}`);
  }
}
console.log(`guide example scripts: ${scripts.length} run, ${scripts.length - (failed - (run.status !== 0 ? 1 : 0))} passed`);
process.exit(failed > 0 ? 1 : 0);
