/**
 * Writes docs/heater-study.schema.json, the JSON Schema (2020-12) of a study file, from the
 * description types in src/study/description.ts (with its coil and part types beside it, in
 * description-coil.ts and description-part.ts), read with the TypeScript compiler API.
 *
 *   npx tsx scripts/study-schema.ts           write the schema
 *   npx tsx scripts/study-schema.ts --check   exit 1 when the committed schema is stale
 *
 * How the types map to the schema:
 * - an interface is an object with `additionalProperties: false`, its optional members optional,
 *   members of `extends` included, a member typed `never` left out (a field that must be absent);
 * - a union of string literals is an `enum`, one literal a `const`, a union of interfaces a
 *   `oneOf`; a type from another module (a material set given in code) is left out of a union:
 *   study files name materials by id;
 * - `QuantityInput` is text with a unit: the unit is the one in brackets in the member's TSDoc
 *   (`[m]`, `[V]`, `[W/(m²·K)]`), the sign from `> 0` / `≥ 0` there, and the grammar is the
 *   reader's own (src/study/quantity-text.ts), so the two cannot drift apart;
 * - `number` is a count or a ratio: `integer ≥ N`, `in [a, b]` or `in (a, b]` from the TSDoc;
 * - "needs `other`" in an optional member's TSDoc is `dependentRequired` (the member only with
 *   `other`; a value condition such as "> 0" stays the reader's).
 * Anything else stops the script with an error, so a new field cannot slip through unmapped.
 */
import { readFileSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import ts from "typescript";
import { quantityTextPattern } from "../src/study/quantity-text.js";

type Schema = Record<string, unknown>;

const root = fileURLToPath(new URL("..", import.meta.url));
const SOURCES = ["description.ts", "description-coil.ts", "description-part.ts"].map((name) => `${root}src/study/${name}`);
const OUT = `${root}docs/heater-study.schema.json`;
const ROOT_TYPE = "HeaterDescription";

/** Field units (as in the TSDoc brackets) → the name of the quantity in the schema's $defs. */
const QUANTITY_NAMES: Readonly<Record<string, { name: string; example: string }>> = {
  m: { name: "length", example: `"30 mm" or "1.25 in"` },
  "m²": { name: "area", example: `"6 cm²"` },
  "m³": { name: "volume", example: `"30 cm³"` },
  V: { name: "voltage", example: `"48 V"` },
  "Ω": { name: "resistance", example: `"40 mΩ"` },
  A: { name: "current", example: `"60 A"` },
  H: { name: "inductance", example: `"100 µH"` },
  F: { name: "capacitance", example: `"4.7 µF"` },
  Hz: { name: "frequency", example: `"25 kHz"` },
  W: { name: "power", example: `"1.5 kW"` },
  K: { name: "temperature", example: `"20 °C" or "393 K"` },
  "W/(m²·K)": { name: "convection", example: `"10 W/(m²·K)"` },
  "Ω·m": { name: "resistivity", example: `"2e-7 Ω·m"` },
};

const program = ts.createProgram(SOURCES, { strict: true, target: ts.ScriptTarget.ES2022, module: ts.ModuleKind.NodeNext, moduleResolution: ts.ModuleResolutionKind.NodeNext, noEmit: true });
const checker = program.getTypeChecker();
const declarations = new Map<string, ts.InterfaceDeclaration | ts.TypeAliasDeclaration>();
for (const path of SOURCES) {
  const source = program.getSourceFile(path);
  if (source === undefined) throw new Error(`cannot read ${path}`);
  for (const statement of source.statements) {
    if (ts.isInterfaceDeclaration(statement) || ts.isTypeAliasDeclaration(statement)) declarations.set(statement.name.text, statement);
  }
}
const fail = (node: ts.Node | undefined, why: string): never => {
  const file = node?.getSourceFile();
  const where = file === undefined || node === undefined ? "src/study/description.ts" : `${file.fileName.slice(root.length)}:${file.getLineAndCharacterOfPosition(node.getStart(file)).line + 1}`;
  throw new Error(`${where}: ${why}`);
};

/** The TSDoc summary of a declaration, as plain text. */
function docOf(node: ts.Node & { name?: ts.Node }): string {
  const symbol = node.name === undefined ? undefined : checker.getSymbolAtLocation(node.name);
  const text = symbol === undefined ? "" : ts.displayPartsToString(symbol.getDocumentationComment(checker));
  return text.replace(/\s+/gu, " ").trim();
}

const defs: Record<string, Schema> = {};

/** The $defs entry of a quantity in `unit` with `sign`, created on first use. */
function quantityRef(member: ts.Node, unit: string, sign: "positive" | "non-negative" | "any"): Schema {
  const known = QUANTITY_NAMES[unit] ?? fail(member, `no quantity name for the unit [${unit}]`);
  // temperatures are signed in °C and named plainly; another signed quantity (an axial position) is named so
  const name = sign === "non-negative" ? `${known.name}OrZero` : sign === "any" && unit !== "K" ? `${known.name}Signed` : known.name;
  const range = sign === "positive" ? " > 0" : sign === "non-negative" ? " ≥ 0" : unit === "K" ? "" : " (either sign)";
  defs[name] ??= {
    description: `${known.name}${range}: text with its unit, such as ${known.example} (a bare number is refused: it says nothing of its unit)`,
    type: "string",
    pattern: quantityTextPattern(unit, sign),
  };
  return { $ref: `#/$defs/${name}` };
}

/** The schema of a `QuantityInput` member: unit and sign from its TSDoc. */
function quantity(member: ts.PropertySignature, doc: string): Schema {
  const unit = /\[([^\]]+)\]/u.exec(doc)?.[1] ?? fail(member, "a QuantityInput field needs its unit in brackets in the TSDoc, e.g. [m]");
  // temperatures may be negative in °C; the reader checks > 0 K after conversion
  if (unit === "K" || /may be negative/u.test(doc)) return quantityRef(member, unit, "any");
  if (/≥ 0/u.test(doc)) return quantityRef(member, unit, "non-negative");
  if (/> 0|> innerRadius|> start/u.test(doc) || !/≥|</u.test(doc)) return quantityRef(member, unit, "positive");
  return fail(member, `cannot tell the sign of a quantity from its TSDoc: ${doc}`);
}

/** The schema of a `number` member: an integer with a minimum, or a ratio in an interval. */
function plainNumber(member: ts.PropertySignature, doc: string): Schema {
  const integer = /integer ≥ (\d+)/u.exec(doc);
  if (integer !== null) return { type: "integer", minimum: Number(integer[1]) };
  const interval = /in ([[(])([0-9.e-]+), ([0-9.e-]+)\]/u.exec(doc);
  if (interval !== null) {
    const low = Number(interval[2]);
    return interval[1] === "(" ? { type: "number", exclusiveMinimum: low, maximum: Number(interval[3]) } : { type: "number", minimum: low, maximum: Number(interval[3]) };
  }
  return fail(member, `a number field needs "integer ≥ N" or an interval "in [a, b]" in its TSDoc: ${doc}`);
}

/** String literals of a type node (a literal, a union of them, or an alias of either), else undefined. */
function literals(node: ts.TypeNode): string[] | undefined {
  if (ts.isLiteralTypeNode(node) && ts.isStringLiteral(node.literal)) return [node.literal.text];
  if (ts.isUnionTypeNode(node)) {
    const parts = node.types.filter((t) => !isForeign(t)).map(literals);
    return parts.every((p) => p !== undefined) ? parts.flat() : undefined;
  }
  if (ts.isTypeReferenceNode(node) && ts.isIdentifier(node.typeName)) {
    const d = declarations.get(node.typeName.text);
    if (d !== undefined && ts.isTypeAliasDeclaration(d)) return literals(d.type);
  }
  return undefined;
}

/** A reference to a type declared in another module (a material set given in code). */
function isForeign(node: ts.TypeNode): boolean {
  return ts.isTypeReferenceNode(node) && ts.isIdentifier(node.typeName) && !declarations.has(node.typeName.text) && node.typeName.text !== "QuantityInput";
}

/** The members of an interface with those of the interfaces it extends (its own last: they override). */
function members(d: ts.InterfaceDeclaration): ts.PropertySignature[] {
  const inherited = (d.heritageClauses ?? []).flatMap((h) =>
    h.types.flatMap((t) => {
      const base = ts.isIdentifier(t.expression) ? declarations.get(t.expression.text) : undefined;
      return base !== undefined && ts.isInterfaceDeclaration(base) ? members(base) : fail(t, "extends a type the generator cannot see");
    }),
  );
  const own = d.members.map((m) => (ts.isPropertySignature(m) ? m : fail(m, "only property members are supported")));
  const names = new Set(own.map((m) => m.name.getText()));
  return [...inherited.filter((m) => !names.has(m.name.getText())), ...own];
}

function objectSchema(d: ts.InterfaceDeclaration): Schema {
  const properties: Record<string, Schema> = {};
  const required: string[] = [];
  const dependentRequired: Record<string, string[]> = {};
  for (const member of members(d)) {
    const type = member.type ?? fail(member, "a member without a type");
    if (type.kind === ts.SyntaxKind.NeverKeyword) continue;
    const name = member.name.getText();
    const doc = docOf(member);
    const schema = memberSchema(member, type, doc);
    properties[name] = doc === "" ? schema : { description: doc, ...schema };
    if (member.questionToken === undefined) required.push(name);
    // "needs `other`" in an optional member's TSDoc: the member may only appear with `other`
    const needs = /needs `(\w+)`/u.exec(doc)?.[1];
    if (needs !== undefined) dependentRequired[name] = [needs];
  }
  const object: Schema = { type: "object", additionalProperties: false, required, properties };
  return Object.keys(dependentRequired).length === 0 ? object : { ...object, dependentRequired };
}

function memberSchema(member: ts.PropertySignature, type: ts.TypeNode, doc: string): Schema {
  if (ts.isTypeReferenceNode(type) && ts.isIdentifier(type.typeName) && type.typeName.text === "QuantityInput") return quantity(member, doc);
  if (type.kind === ts.SyntaxKind.NumberKeyword) return plainNumber(member, doc);
  if (type.kind === ts.SyntaxKind.StringKeyword) return { type: "string" };
  const schema = typeSchema(type);
  return schema.type === "array" && /at least one/u.test(doc) ? { ...schema, minItems: 1 } : schema;
}

/** The schema of a type node: literals, a named type ($defs), or a union of named types. */
function typeSchema(type: ts.TypeNode): Schema {
  if (ts.isUnionTypeNode(type)) {
    const kept = type.types.filter((t) => !isForeign(t));
    if (kept.length === 1) return typeSchema(kept[0] as ts.TypeNode);
    const values = literals(type);
    if (values !== undefined) return { enum: values };
    return { oneOf: kept.map(typeSchema) };
  }
  if (ts.isLiteralTypeNode(type) && ts.isStringLiteral(type.literal)) return { const: type.literal.text };
  if (ts.isTypeReferenceNode(type) && ts.isIdentifier(type.typeName)) return named(type.typeName.text);
  // readonly T[]: an array of T; "at least one" in the member's TSDoc sets minItems (see memberSchema)
  if (ts.isTypeOperatorNode(type) && type.operator === ts.SyntaxKind.ReadonlyKeyword && ts.isArrayTypeNode(type.type)) return { type: "array", items: typeSchema(type.type.elementType) };
  if (ts.isArrayTypeNode(type)) return { type: "array", items: typeSchema(type.elementType) };
  return fail(type, `a type the generator does not map: ${type.getText()}`);
}

/** A named type as a $defs entry (built once) and a $ref to it. */
function named(name: string): Schema {
  const d = declarations.get(name) ?? fail(undefined, `unknown type ${name}`);
  if (!(name in defs)) {
    defs[name] = {}; // placeholder against cycles
    const doc = docOf(d);
    const body = ts.isInterfaceDeclaration(d) ? objectSchema(d) : typeSchema(d.type);
    defs[name] = { ...(doc === "" ? {} : { description: doc }), ...body };
  }
  return { $ref: `#/$defs/${name}` };
}

const top = declarations.get(ROOT_TYPE);
if (top === undefined || !ts.isInterfaceDeclaration(top)) throw new Error(`${ROOT_TYPE} not found`);
const body = objectSchema(top);
const sortedDefs = Object.fromEntries(Object.entries(defs).sort(([a], [b]) => (a < b ? -1 : 1)));
const schema: Schema = {
  $schema: "https://json-schema.org/draft/2020-12/schema",
  $id: "https://raw.githubusercontent.com/fluxwright/fluxwright/main/docs/heater-study.schema.json",
  title: "fluxwright heater study file",
  description:
    "One induction-heater design for `fluxwright study`. Every quantity with a dimension is text with its unit (\"30 mm\", \"1.25 in\", \"4.7 µF\", \"850 °C\"): a bare number is refused, because it says nothing of its unit. Counts and ratios (turns, strands, dissipation factor, emissivity) are plain numbers. " +
    "Generated from the description types (src/study/description.ts) by scripts/study-schema.ts: do not edit by hand. readHeaterDescription also checks what a schema cannot (overlapping turns, a part that fits the coil, target above start and below melting, temperatures above absolute zero).",
  ...body,
  $defs: sortedDefs,
};
const text = `${JSON.stringify(schema, null, 2)}\n`;

if (process.argv.includes("--check")) {
  const committed = readFileSync(OUT, "utf8");
  if (committed !== text) {
    console.error("docs/heater-study.schema.json is stale: run `npm run schema` and commit the result");
    process.exit(1);
  }
  console.log("docs/heater-study.schema.json is up to date");
} else {
  writeFileSync(OUT, text);
  console.log(`wrote docs/heater-study.schema.json (${Object.keys(sortedDefs).length} definitions)`);
}
