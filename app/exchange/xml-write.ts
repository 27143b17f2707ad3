import { formatPlainNumber } from "./plain-number";

/** An element to serialize: attributes in the given order (undefined ones left out), then text or children. */
export interface XmlNode {
  name: string;
  attrs?: Record<string, string | number | undefined>;
  text?: string;
  children?: XmlNode[];
}

/** Escapes text for an attribute value or character data (XML 1.0 §2.4: `<`, `&`, and quotes in attributes). */
export function escapeXml(value: string): string {
  return value.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

function attrText(attrs: XmlNode["attrs"]): string {
  if (!attrs) return "";
  return Object.entries(attrs)
    .filter((e): e is [string, string | number] => e[1] !== undefined)
    .map(([k, v]) => ` ${k}="${escapeXml(typeof v === "number" ? formatPlainNumber(v) : v)}"`)
    .join("");
}

/** Serializes a node tree with two-space indentation, one element per line. */
export function serializeXml(node: XmlNode, depth = 0): string {
  const pad = "  ".repeat(depth);
  const open = `${pad}<${node.name}${attrText(node.attrs)}`;
  if (node.text !== undefined) return `${open}>${escapeXml(node.text)}</${node.name}>`;
  if (!node.children?.length) return `${open}/>`;
  const inner = node.children.map((c) => serializeXml(c, depth + 1)).join("\n");
  return `${open}>\n${inner}\n${pad}</${node.name}>`;
}
