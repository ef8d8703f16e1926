/**
 * The shared half of the fingerprint scripts (`study-fingerprint.ts`, `field-fingerprint.ts`):
 * loads one or two built packages, computes each case's exact JSON with the script's own
 * `cases`, and prints one SHA-256 per case, or compares the two builds case by case (exit
 * status 1 when any case differs). With `--by-field` after the two builds, a differing case is
 * also compared number by number: the largest relative difference of each field (array indices
 * left out of the path) and every difference that is not a number (texts, shapes).
 */
import { createHash } from "node:crypto";
import { resolve } from "node:path";
import { pathToFileURL } from "node:url";

type Lib = typeof import("../src/index.js");

async function load(dir: string): Promise<Lib> {
  return (await import(pathToFileURL(resolve(dir, "index.js")).href)) as Lib;
}

/** Runs `cases` on the build(s) named on the command line (default `dist`) and reports. */
export async function fingerprintBuilds(cases: (lib: Lib) => Map<string, string>): Promise<void> {
  const args = process.argv.slice(2).filter((a) => !a.startsWith("--"));
  const byField = process.argv.includes("--by-field");
  const [first = new URL("../dist", import.meta.url).pathname, second] = args;
  const a = cases(await load(first));
  const b = second === undefined ? null : cases(await load(second));
  let differ = 0;
  for (const [name, text] of a) {
    const hash = createHash("sha256").update(text).digest("hex").slice(0, 16);
    if (b === null) {
      console.log(`${hash}  ${name} (${text.length} characters)`);
      continue;
    }
    const other = b.get(name) ?? "";
    if (other === text) {
      console.log(`same       ${name} (${hash}, ${text.length} characters)`);
    } else {
      differ++;
      let i = 0;
      while (i < text.length && text[i] === other[i]) i++;
      console.log(`DIFFERENT  ${name}: first difference at character ${i}: …${text.slice(Math.max(0, i - 60), i + 40)}… vs …${other.slice(Math.max(0, i - 60), i + 40)}…`);
      if (byField) reportByField(JSON.parse(text) as unknown, JSON.parse(other) as unknown);
    }
  }
  if (b !== null) {
    console.log(differ === 0 ? "all cases bit-identical" : `${differ} case(s) differ`);
    if (differ > 0) process.exitCode = 1;
  }
}

/** Largest relative difference per field path, and the differences that are not numbers. */
function reportByField(a: unknown, b: unknown): void {
  const largest = new Map<string, { relative: number; a: number; b: number }>();
  const other: string[] = [];
  const walk = (x: unknown, y: unknown, path: string): void => {
    if (typeof x === "number" && typeof y === "number") {
      if (x === y) return;
      const relative = Math.abs(x - y) / Math.max(Math.abs(x), Math.abs(y));
      const known = largest.get(path);
      if (known === undefined || relative > known.relative) largest.set(path, { relative, a: x, b: y });
      return;
    }
    if (Array.isArray(x) && Array.isArray(y) && x.length === y.length) {
      x.forEach((item, k) => {
        walk(item, y[k], `${path}[]`);
      });
      return;
    }
    if (x !== null && y !== null && typeof x === "object" && typeof y === "object" && !Array.isArray(x) && !Array.isArray(y)) {
      const keys = Object.keys(x);
      if (keys.join() !== Object.keys(y).join()) {
        other.push(`${path}: fields ${keys.join()} vs ${Object.keys(y).join()}`);
        return;
      }
      for (const key of keys) walk((x as Record<string, unknown>)[key], (y as Record<string, unknown>)[key], `${path}.${key}`);
      return;
    }
    if (x !== y) other.push(`${path}: ${JSON.stringify(x)} vs ${JSON.stringify(y)}`);
  };
  walk(a, b, "");
  for (const [path, d] of [...largest].sort((p, q) => q[1].relative - p[1].relative)) {
    console.log(`    ${d.relative.toExponential(2)}  ${path} (${d.a} vs ${d.b})`);
  }
  console.log(`    ${other.length} difference(s) that are not numbers${other.length === 0 ? "" : `, first: ${other.slice(0, 3).join("; ")}`}`);
}
