/**
 * Lists the functions of `src/` longer than 120 lines and the files longer than 400 lines whose
 * opening comment gives no reason (a line starting with `Size:`), longest first. Exit status 0
 * always: the list is for planning, not a gate.
 *
 * Run: `npx tsx scripts/long-code.ts [--function-lines 120] [--file-lines 400] [paths…]`
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import ts from "typescript";

const args = process.argv.slice(2);
function option(name: string, fallback: number): number {
  const at = args.indexOf(name);
  if (at < 0) return fallback;
  const value = Number(args[at + 1]);
  args.splice(at, 2);
  if (!Number.isInteger(value) || value < 1) throw new Error(`${name} takes a whole number ≥ 1`);
  return value;
}
const functionLimit = option("--function-lines", 120);
const fileLimit = option("--file-lines", 400);
const roots = args.length > 0 ? args : ["src"];

function tsFiles(path: string): string[] {
  if (statSync(path).isFile()) return path.endsWith(".ts") ? [path] : [];
  return readdirSync(path).flatMap((name) => tsFiles(join(path, name)));
}

/** A function-like node's name for the report. */
function nameOf(node: ts.Node): string {
  if ((ts.isFunctionDeclaration(node) || ts.isMethodDeclaration(node)) && node.name !== undefined) return node.name.getText();
  if (ts.isVariableDeclaration(node.parent)) return node.parent.name.getText();
  if (ts.isPropertyAssignment(node.parent) || ts.isPropertyDeclaration(node.parent)) return node.parent.name.getText();
  return "(anonymous)";
}

const functions: { lines: number; where: string; name: string }[] = [];
const files: { lines: number; where: string }[] = [];
for (const file of roots.flatMap(tsFiles)) {
  const text = readFileSync(file, "utf8");
  const where = relative(process.cwd(), file);
  const lineCount = text.split("\n").length;
  const opening = /^\/\*\*[\s\S]*?\*\//.exec(text)?.[0] ?? "";
  if (lineCount > fileLimit && !/^\s*\*\s*Size:/m.test(opening)) files.push({ lines: lineCount, where });
  const source = ts.createSourceFile(file, text, ts.ScriptTarget.ES2022, true);
  const visit = (node: ts.Node): void => {
    const body =
      ts.isFunctionDeclaration(node) || ts.isMethodDeclaration(node) || ts.isArrowFunction(node) || ts.isFunctionExpression(node) || ts.isConstructorDeclaration(node)
        ? node.body
        : undefined;
    if (body !== undefined) {
      const first = source.getLineAndCharacterOfPosition(body.getStart(source)).line;
      const last = source.getLineAndCharacterOfPosition(body.getEnd()).line;
      if (last - first + 1 > functionLimit) functions.push({ lines: last - first + 1, where: `${where}:${first + 1}`, name: nameOf(node) });
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
}
functions.sort((a, b) => b.lines - a.lines);
files.sort((a, b) => b.lines - a.lines);
console.log(`${functions.length} functions over ${functionLimit} lines:`);
for (const f of functions) console.log(`  ${String(f.lines).padStart(5)}  ${f.name}  ${f.where}`);
console.log(`${files.length} files over ${fileLimit} lines without a "Size:" reason at the top:`);
for (const f of files) console.log(`  ${String(f.lines).padStart(5)}  ${f.where}`);
