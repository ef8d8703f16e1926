/**
 * A small strict XML well-formedness checker for the SVG and (XHTML-style) HTML the CLI writes:
 * balanced and properly nested elements, quoted attributes without duplicates, known entity
 * references only, nothing after the root. It builds a light tree so tests can query it.
 */

/** An element of the parsed tree. */
export interface XmlElement {
  name: string;
  attributes: Record<string, string>;
  children: XmlElement[];
  text: string;
}

const VOID_HTML = new Set(["area", "base", "br", "col", "embed", "hr", "img", "input", "link", "meta", "source", "track", "wbr"]);
const ENTITY = /&(amp|lt|gt|quot|apos|#[0-9]+|#x[0-9a-fA-F]+);/y;

/**
 * Parses `text` as XML (or as HTML written in XML style when `html` is set: a doctype and HTML
 * void elements without a closing slash are allowed, and raw text in script/style). Throws an
 * Error naming the offset on the first fault.
 */
export function parseXml(text: string, html = false): XmlElement {
  let i = 0;
  const root: XmlElement = { name: "#document", attributes: {}, children: [], text: "" };
  const stack: XmlElement[] = [root];
  const fail = (why: string): never => {
    throw new Error(`not well-formed at offset ${i}: ${why} near ${JSON.stringify(text.slice(Math.max(0, i - 30), i + 30))}`);
  };
  const top = (): XmlElement => stack[stack.length - 1] as XmlElement;
  while (i < text.length) {
    const c = text[i];
    if (c === "<") {
      if (text.startsWith("<!--", i)) {
        const end = text.indexOf("-->", i + 4);
        if (end < 0) fail("unclosed comment");
        i = end + 3;
      } else if (text.startsWith("<?", i)) {
        const end = text.indexOf("?>", i);
        if (end < 0) fail("unclosed processing instruction");
        i = end + 2;
      } else if (text.startsWith("<!DOCTYPE", i) || text.startsWith("<!doctype", i)) {
        const end = text.indexOf(">", i);
        if (end < 0) fail("unclosed doctype");
        i = end + 1;
      } else if (text.startsWith("<![CDATA[", i)) {
        const end = text.indexOf("]]>", i);
        if (end < 0) fail("unclosed CDATA");
        top().text += text.slice(i + 9, end);
        i = end + 3;
      } else if (text[i + 1] === "/") {
        const m = /^<\/([A-Za-z_][\w:.-]*)\s*>/.exec(text.slice(i));
        if (m === null) fail("bad end tag");
        const name = (m as RegExpExecArray)[1] as string;
        const open = top();
        if (open.name !== name) fail(`end tag </${name}> does not match <${open.name}>`);
        stack.pop();
        i += (m as RegExpExecArray)[0].length;
      } else {
        const m = /^<([A-Za-z_][\w:.-]*)/.exec(text.slice(i));
        if (m === null) fail("bad start tag");
        const name = (m as RegExpExecArray)[1] as string;
        i += (m as RegExpExecArray)[0].length;
        const attributes: Record<string, string> = {};
        for (;;) {
          const ws = /^\s*/.exec(text.slice(i)) as RegExpExecArray;
          i += ws[0].length;
          if (text.startsWith("/>", i)) {
            i += 2;
            top().children.push({ name, attributes, children: [], text: "" });
            break;
          }
          if (text[i] === ">") {
            i += 1;
            const el: XmlElement = { name, attributes, children: [], text: "" };
            top().children.push(el);
            if (html && VOID_HTML.has(name.toLowerCase())) break;
            if (html && (name === "script" || name === "style")) {
              const end = text.indexOf(`</${name}>`, i);
              if (end < 0) fail(`unclosed <${name}>`);
              el.text = text.slice(i, end);
              i = end + name.length + 3;
              break;
            }
            stack.push(el);
            break;
          }
          if (ws[0].length === 0) fail("attributes must be separated by white space");
          const a = /^([A-Za-z_:][\w:.-]*)\s*=\s*("([^"<]*)"|'([^'<]*)')/.exec(text.slice(i));
          if (a === null) fail("bad attribute (must be name=\"value\")");
          const an = (a as RegExpExecArray)[1] as string;
          if (an in attributes) fail(`duplicate attribute ${an}`);
          const value = (a as RegExpExecArray)[3] ?? (a as RegExpExecArray)[4] ?? "";
          checkEntities(value, fail);
          attributes[an] = value;
          i += (a as RegExpExecArray)[0].length;
        }
      }
    } else {
      const next = text.indexOf("<", i);
      const chunk = text.slice(i, next < 0 ? text.length : next);
      checkEntities(chunk, fail);
      if (stack.length === 1 && chunk.trim() !== "") fail("text outside the root element");
      top().text += chunk;
      i = next < 0 ? text.length : next;
    }
  }
  if (stack.length !== 1) throw new Error(`not well-formed: <${top().name}> never closed`);
  const elements = root.children;
  if (elements.length !== 1) throw new Error(`not well-formed: ${elements.length} root elements`);
  return elements[0] as XmlElement;
}

function checkEntities(s: string, fail: (why: string) => never): void {
  for (let k = s.indexOf("&"); k >= 0; k = s.indexOf("&", k + 1)) {
    ENTITY.lastIndex = k;
    if (!ENTITY.test(s)) fail("bare & or unknown entity");
  }
}

/** All elements named `name` in document order. */
export function findAll(el: XmlElement, name: string): XmlElement[] {
  const found: XmlElement[] = [];
  const walk = (e: XmlElement): void => {
    if (e.name === name) found.push(e);
    for (const c of e.children) walk(c);
  };
  walk(el);
  return found;
}

/** All text inside an element (own and descendants'), concatenated. */
export function allText(el: XmlElement): string {
  return el.text + el.children.map(allText).join("");
}
