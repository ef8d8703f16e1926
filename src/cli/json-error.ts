/**
 * Where a JSON text stops being JSON (RFC 8259), for error messages with line and column: the
 * JavaScript engine's own message does not always say (Node 20 gives neither for many errors).
 */

/** The first syntax error of a JSON text: character offset and reason, or `null` when it parses. */
export function jsonSyntaxError(text: string): { offset: number; reason: string } | null {
  let i = 0;
  const fail = (reason: string): never => {
    throw new JsonStop(i, reason);
  };
  const space = (): void => {
    while (i < text.length && " \t\n\r".includes(text[i] as string)) i++;
  };
  const describe = (): string => (i >= text.length ? "the end of the text" : JSON.stringify(text[i]));
  const literal = (word: string): void => {
    if (text.startsWith(word, i)) i += word.length;
    else fail(`expected a value, found ${describe()}`);
  };
  const string = (): void => {
    i++; // opening quote
    for (;;) {
      if (i >= text.length) fail("a string is not closed (missing \")");
      const c = text[i] as string;
      if (c === '"') {
        i++;
        return;
      }
      if (c === "\\") {
        const e = text[i + 1];
        if (e === "u") {
          if (!/^[0-9a-fA-F]{4}$/u.test(text.slice(i + 2, i + 6))) fail("a \\u escape needs four hexadecimal digits");
          i += 6;
        } else if (e !== undefined && '"\\/bfnrt'.includes(e)) {
          i += 2;
        } else {
          fail(`unknown escape \\${e ?? ""} in a string`);
        }
        continue;
      }
      if (c < " ") fail("a control character (such as a line break) inside a string; write it as an escape");
      i++;
    }
  };
  const number = (): void => {
    const m = /^-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?/u.exec(text.slice(i));
    if (m === null || m[0] === "" || m[0] === "-") fail(`expected a value, found ${describe()}`);
    i += (m as RegExpExecArray)[0].length;
  };
  const value = (): void => {
    space();
    const c = text[i];
    if (c === "{") {
      i++;
      space();
      if (text[i] === "}") {
        i++;
        return;
      }
      for (;;) {
        space();
        if (text[i] !== '"') fail(`expected a property name in double quotes, found ${describe()}`);
        string();
        space();
        if (text[i] !== ":") fail(`expected ":" after the property name, found ${describe()}`);
        i++;
        value();
        space();
        if (text[i] === ",") {
          i++;
          space();
          if (text[i] === "}") fail('a comma before "}" (trailing commas are not JSON)');
          continue;
        }
        if (text[i] === "}") {
          i++;
          return;
        }
        fail(`expected "," or "}" after a property value, found ${describe()}`);
      }
    }
    if (c === "[") {
      i++;
      space();
      if (text[i] === "]") {
        i++;
        return;
      }
      for (;;) {
        value();
        space();
        if (text[i] === ",") {
          i++;
          space();
          if (text[i] === "]") fail('a comma before "]" (trailing commas are not JSON)');
          continue;
        }
        if (text[i] === "]") {
          i++;
          return;
        }
        fail(`expected "," or "]" after an array element, found ${describe()}`);
      }
    }
    if (c === '"') string();
    else if (c === "t") literal("true");
    else if (c === "f") literal("false");
    else if (c === "n") literal("null");
    else if (c === "-" || (c !== undefined && c >= "0" && c <= "9")) number();
    else if (c === "'") fail("strings need double quotes, not single");
    else fail(`expected a value, found ${describe()}`);
  };
  try {
    value();
    space();
    if (i < text.length) fail(`unexpected ${describe()} after the JSON value`);
    return null;
  } catch (e) {
    if (e instanceof JsonStop) return { offset: e.offset, reason: e.reason };
    throw e;
  }
}

class JsonStop extends Error {
  constructor(
    readonly offset: number,
    readonly reason: string,
  ) {
    super(reason);
  }
}
