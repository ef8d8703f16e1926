/**
 * A sweep of every public function at extreme but finite inputs: each numeric argument or field
 * of each function's robustness example (test/robustness/examples.ts) is scaled by 1e±150 and
 * 1e±300 in turn, and the call is judged as the robustness suite judges bad values: an
 * InputError, or a result whose numbers are all finite, is acceptable; a non-finite number in
 * the result, any other exception, or a call slower than two seconds is listed. The suite itself
 * does not run this check yet; the script shows what it would find.
 *
 * Usage:
 *   npx tsx scripts/extreme-inputs.ts [functionName]
 * Run one function at a time when a call may not return (a shell `timeout` around it).
 */
import * as api from "../src/index.js";
import { InputError } from "../src/index.js";
import { EXAMPLES, OPAQUE, type Example } from "../test/robustness/examples.js";
import { findLeaves, nonFiniteValues, pathKey, replaceAt, resultPathPattern } from "../test/robustness/harness.js";

const only = process.argv[2];
const exported = Object.entries(api as Record<string, unknown>);
for (const [, v] of exported) if (typeof v === "object" && v !== null) OPAQUE.add(v);
for (const m of api.conductiveMaterials) OPAQUE.add(m);

type AnyFunction = (...args: unknown[]) => unknown;
let listed = 0;
for (const [name, fn] of exported) {
  if (typeof fn !== "function" || (only !== undefined && name !== only)) continue;
  const example: Example | undefined = EXAMPLES[name];
  if (example === undefined || (example.kind ?? "checked") !== "checked") continue;
  for (const args of [example.args, ...(example.variants ?? [])]) {
    for (const { path, value } of findLeaves(args(), OPAQUE, example.quantityStrings ?? false).numbers) {
      if (typeof value !== "number" || value === 0) continue;
      for (const scale of [1e300, 1e-300, 1e150, 1e-150]) {
        const started = performance.now();
        let verdict = "";
        try {
          const result = (fn as AnyFunction)(...replaceAt(args(), path, value * scale));
          const bad = nonFiniteValues(result).filter((b) => example.nonFinite?.[resultPathPattern(b.path)] === undefined);
          if (bad.length > 0) verdict = `non-finite ${bad.slice(0, 2).map((b) => `${b.path === "" ? "(result)" : b.path} = ${String(b.value)}`).join(", ")}`;
        } catch (error) {
          if (!(error instanceof InputError)) verdict = `threw ${error instanceof Error ? `${error.constructor.name}: ${error.message.slice(0, 80)}` : String(error)}`;
        }
        const ms = performance.now() - started;
        if (ms > 2000) verdict += `${verdict === "" ? "" : "; "}took ${ms.toFixed(0)} ms`;
        if (verdict !== "") {
          listed++;
          console.log(`${name} ${pathKey(path)} ×${scale}: ${verdict}`);
        }
      }
    }
  }
}
console.log(`${listed} call(s) listed`);
