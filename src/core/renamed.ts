/**
 * Options renamed before 1.0 keep their former name as a deprecated input. This helper reads
 * an option under either name and refuses both at once, so that a caller who half-migrated is
 * told instead of silently getting one of the two values. Internal: not part of the public
 * inventory of `fluxwright/core`.
 *
 * @packageDocumentation
 */
import { InputError } from "./input-error.js";

/**
 * The value of an option given under its current `name` or under its deprecated `formerName`
 * (`undefined` when neither is given).
 *
 * @param where - the public function reading the option
 * @param path - the options object's path in messages (`""` for the top level)
 * @param options - the options object (already checked to be an object)
 * @param name - the current name of the option
 * @param formerName - the deprecated name kept until 1.0
 * @throws {@link InputError} when both names are given
 */
export function renamedOption(where: string, path: string, options: object, name: string, formerName: string): unknown {
  const record = options as Record<string, unknown>;
  const current = record[name];
  const former = record[formerName];
  if (former === undefined) return current;
  if (current !== undefined) {
    throw new InputError(
      where,
      path === "" ? formerName : `${path}.${formerName}`,
      former,
      "",
      `absent when ${name} is given (${formerName} is the deprecated former name of ${name}; give one)`,
    );
  }
  return former;
}

/**
 * The name under which a renamed option was given, for error messages: `formerName` when only
 * the former name carries a value, else `name`.
 *
 * @param options - the options object
 * @param name - the current name of the option
 * @param formerName - the deprecated name kept until 1.0
 */
export function givenName(options: object, name: string, formerName: string): string {
  const record = options as Record<string, unknown>;
  return record[formerName] !== undefined && record[name] === undefined ? formerName : name;
}
