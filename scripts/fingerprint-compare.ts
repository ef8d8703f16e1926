/**
 * The shared half of the fingerprint scripts (`study-fingerprint.ts`, `field-fingerprint.ts`):
 * loads one or two built packages, computes each case's exact JSON with the script's own
 * `cases`, and prints one SHA-256 per case, or compares the two builds case by case (exit
 * status 1 when any case differs).
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
  const [first = new URL("../dist", import.meta.url).pathname, second] = process.argv.slice(2);
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
    }
  }
  if (b !== null) {
    console.log(differ === 0 ? "all cases bit-identical" : `${differ} case(s) differ`);
    if (differ > 0) process.exitCode = 1;
  }
}
