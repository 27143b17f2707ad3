import { ExchangeInputError } from "./exchange-errors";

/** An XML element: local name (namespace prefix dropped), attributes, child elements, text. */
export interface XmlElement {
  name: string;
  attrs: Record<string, string>;
  children: XmlElement[];
  /** Concatenated character data directly inside this element (CDATA included), entities decoded. */
  text: string;
}

const NAME = /^[A-Za-z_:][-\w.:]*/;
const ATTR = /\s*([A-Za-z_:][-\w.:]*)\s*=\s*("([^"]*)"|'([^']*)')/y;
const ENTITIES: Record<string, string> = { lt: "<", gt: ">", amp: "&", quot: '"', apos: "'" };

/** Decodes the five predefined entities and numeric character references (XML 1.0 §4.6, §4.1). */
export function decodeXmlText(raw: string): string {
  return raw.replace(/&(#x[0-9a-fA-F]+|#\d+|\w+);/g, (whole, ref: string) => {
    if (ref.startsWith("#x")) return String.fromCodePoint(parseInt(ref.slice(2), 16));
    if (ref.startsWith("#")) return String.fromCodePoint(parseInt(ref.slice(1), 10));
    return ENTITIES[ref] ?? whole;
  });
}

const localName = (qname: string) => qname.slice(qname.indexOf(":") + 1);

function fail(message: string, at: number): never {
  throw new ExchangeInputError("malformed_xml", `The file is not well-formed XML: ${message} (at character ${at}).`, { at });
}

function readAttributes(src: string, from: number, to: number): Record<string, string> {
  const attrs: Record<string, string> = {};
  ATTR.lastIndex = from;
  while (ATTR.lastIndex < to) {
    const m = ATTR.exec(src);
    if (!m || m.index + m[0].length > to) {
      if (src.slice(ATTR.lastIndex, to).trim() === "") break;
      fail("bad attribute", ATTR.lastIndex);
    }
    const name = m[1]!;
    if (name.startsWith("xmlns")) continue;
    attrs[localName(name)] = decodeXmlText(m[3] ?? m[4] ?? "");
  }
  return attrs;
}

/** Index just past the end of a markup construct that starts at `i` and ends with `close`. */
function skipPast(src: string, i: number, close: string): number {
  const end = src.indexOf(close, i);
  if (end < 0) fail(`unterminated ${src.slice(i, i + 9)}`, i);
  return end + close.length;
}

/** Finds the `>` that ends a tag, skipping quoted attribute values. */
function tagEnd(src: string, i: number): number {
  let quote = "";
  for (let j = i; j < src.length; j++) {
    const c = src[j]!;
    if (quote) {
      if (c === quote) quote = "";
    } else if (c === '"' || c === "'") quote = c;
    else if (c === ">") return j;
  }
  return fail("unterminated tag", i);
}

/**
 * Parses an XML document into its root element. A small non-validating parser for data files:
 * elements, attributes, text, CDATA, comments, processing instructions and a DOCTYPE without an
 * internal subset. Namespace prefixes are dropped (LandXML uses a default namespace). Throws
 * ExchangeInputError `malformed_xml` for mismatched or unterminated markup.
 */
export function parseXml(src: string): XmlElement {
  const stack: XmlElement[] = [{ name: "#document", attrs: {}, children: [], text: "" }];
  let i = src.charCodeAt(0) === 0xfeff ? 1 : 0;
  while (i < src.length) {
    const lt = src.indexOf("<", i);
    const top = stack[stack.length - 1]!;
    const textEnd = lt < 0 ? src.length : lt;
    if (textEnd > i) top.text += decodeXmlText(src.slice(i, textEnd));
    if (lt < 0) break;
    if (src.startsWith("<!--", lt)) i = skipPast(src, lt, "-->");
    else if (src.startsWith("<![CDATA[", lt)) {
      const end = skipPast(src, lt, "]]>");
      top.text += src.slice(lt + 9, end - 3);
      i = end;
    } else if (src.startsWith("<?", lt)) i = skipPast(src, lt, "?>");
    else if (src.startsWith("<!", lt)) i = skipPast(src, lt, ">");
    else if (src[lt + 1] === "/") {
      const end = tagEnd(src, lt);
      const name = localName(src.slice(lt + 2, end).trim());
      if (stack.length < 2 || top.name !== name) fail(`closing </${name}> does not match <${top.name}>`, lt);
      stack.pop();
      i = end + 1;
    } else {
      const end = tagEnd(src, lt);
      const m = NAME.exec(src.slice(lt + 1, end));
      if (!m) fail("bad tag name", lt);
      const selfClosing = src[end - 1] === "/";
      const el: XmlElement = { name: localName(m[0]), attrs: readAttributes(src, lt + 1 + m[0].length, selfClosing ? end - 1 : end), children: [], text: "" };
      top.children.push(el);
      if (!selfClosing) stack.push(el);
      i = end + 1;
    }
  }
  if (stack.length !== 1) fail(`<${stack[stack.length - 1]!.name}> is never closed`, src.length);
  const root = stack[0]!.children[0];
  if (!root) fail("no root element", 0);
  return root;
}

/** Child elements of `el` with the given local name. */
export function childrenNamed(el: XmlElement, name: string): XmlElement[] {
  return el.children.filter((c) => c.name === name);
}

/** The first child element with the given local name, if any. */
export function childNamed(el: XmlElement, name: string): XmlElement | undefined {
  return el.children.find((c) => c.name === name);
}
