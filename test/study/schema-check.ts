/**
 * A small JSON Schema (2020-12 subset) checker for the hand-kept study-file schema: type
 * (incl. integer), enum, const, properties, required, additionalProperties: false, minimum,
 * exclusiveMinimum, maximum, pattern, minLength, items, minItems, oneOf, anyOf, allOf and local $ref. It throws on any
 * keyword it does not know, so the schema cannot silently use one it ignores.
 */
type Schema = Record<string, unknown>;

const KNOWN = new Set([
  "$schema", "$id", "$defs", "title", "description", "type", "enum", "const", "properties", "required",
  "additionalProperties", "minimum", "exclusiveMinimum", "maximum", "pattern", "oneOf", "anyOf", "allOf", "$ref",
  "items", "minItems", "minLength",
]);

/** Returns the list of problems (empty when `value` conforms to `schema`). */
export function checkSchema(root: Schema, value: unknown): string[] {
  const problems: string[] = [];
  const resolve = (ref: string): Schema => {
    if (!ref.startsWith("#/")) throw new Error(`only local $ref supported: ${ref}`);
    let node: unknown = root;
    for (const part of ref.slice(2).split("/")) node = (node as Record<string, unknown>)[part];
    if (node === undefined) throw new Error(`dangling $ref ${ref}`);
    return node as Schema;
  };
  const typeOf = (v: unknown): string => (v === null ? "null" : Array.isArray(v) ? "array" : typeof v);
  const check = (s: Schema, v: unknown, path: string, out: string[]): void => {
    for (const key of Object.keys(s)) if (!KNOWN.has(key)) throw new Error(`schema keyword not supported by the checker: ${key}`);
    if (typeof s.$ref === "string") check(resolve(s.$ref), v, path, out);
    if (s.type !== undefined) {
      const t = s.type as string;
      const ok = t === "integer" ? typeof v === "number" && Number.isInteger(v) : typeOf(v) === t;
      if (!ok) {
        out.push(`${path}: expected ${t}`);
        return;
      }
    }
    if (s.enum !== undefined && !(s.enum as unknown[]).includes(v)) out.push(`${path}: not in enum`);
    if (s.const !== undefined && s.const !== v) out.push(`${path}: expected ${JSON.stringify(s.const)}`);
    if (typeof v === "number") {
      if (typeof s.minimum === "number" && v < s.minimum) out.push(`${path}: below minimum`);
      if (typeof s.exclusiveMinimum === "number" && v <= s.exclusiveMinimum) out.push(`${path}: not above exclusiveMinimum`);
      if (typeof s.maximum === "number" && v > s.maximum) out.push(`${path}: above maximum`);
    }
    if (typeof v === "string" && typeof s.pattern === "string" && !new RegExp(s.pattern, "u").test(v)) out.push(`${path}: pattern mismatch`);
    if (typeof v === "string" && typeof s.minLength === "number" && v.length < s.minLength) out.push(`${path}: shorter than minLength`);
    if (Array.isArray(v)) {
      if (typeof s.minItems === "number" && v.length < s.minItems) out.push(`${path}: fewer than minItems`);
      if (typeof s.items === "object" && s.items !== null) v.forEach((item, k) => {
        check(s.items as Schema, item, `${path}[${k}]`, out);
      });
    }
    if (typeOf(v) === "object") {
      const o = v as Record<string, unknown>;
      const props = (s.properties ?? {}) as Record<string, Schema>;
      for (const r of (s.required ?? []) as string[]) if (!(r in o)) out.push(`${path}.${r}: required`);
      for (const [k, val] of Object.entries(o)) {
        if (props[k] !== undefined) check(props[k], val, `${path}.${k}`, out);
        else if (s.additionalProperties === false) out.push(`${path}.${k}: not allowed`);
      }
    }
    if (Array.isArray(s.allOf)) for (const sub of s.allOf as Schema[]) check(sub, v, path, out);
    for (const key of ["oneOf", "anyOf"] as const) {
      if (!Array.isArray(s[key])) continue;
      const passing = (s[key] as Schema[]).filter((sub) => {
        const o: string[] = [];
        check(sub, v, path, o);
        return o.length === 0;
      }).length;
      if (key === "oneOf" ? passing !== 1 : passing === 0) out.push(`${path}: ${key} matched ${passing}`);
    }
  };
  check(root, value, "$", problems);
  return problems;
}
