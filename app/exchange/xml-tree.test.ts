import { expect, test } from "vitest";
import { parseXml } from "./xml-tree";
import { formatPlainNumber } from "./plain-number";
import { escapeXml, serializeXml } from "./xml-write";

test("entities, character references, CDATA, comments and prefixes are read as XML 1.0 defines them", () => {
  // XML 1.0 (5th ed.) §4.6 predefined entities, §4.1 character references, §2.7 CDATA sections.
  const root = parseXml(`\uFEFF<?xml version="1.0"?>
<!DOCTYPE x>
<!-- a comment with <tags> -->
<lx:Root xmlns:lx="urn:x" lx:a='1 &amp; 2' b="&#x3C;&#60;&quot;">
  <lx:Kid>Å &lt;b&gt; <![CDATA[<raw> & ]]></lx:Kid><Empty c="&apos;"/>
</lx:Root>`);
  expect(root.name).toBe("Root");
  expect(root.attrs).toEqual({ a: "1 & 2", b: '<<"' });
  expect(root.children.map((c) => c.name)).toEqual(["Kid", "Empty"]);
  expect(root.children[0]!.text).toBe("Å <b> <raw> & ");
  expect(root.children[1]!.attrs.c).toBe("'");
});

test("mismatched, unclosed or missing elements are refused as malformed", () => {
  expect(() => parseXml("<a><b></a>")).toThrow(/does not match/);
  expect(() => parseXml("<a>")).toThrow(/never closed/);
  expect(() => parseXml("<!-- only a comment -->")).toThrow(/no root/);
  expect(() => parseXml('<a b="1></a>')).toThrow(/unterminated tag/);
});

test("written text and attributes come back unchanged through the reader", () => {
  const tricky = `Quillmere "north" <bypass> & 'spur'`;
  const back = parseXml(serializeXml({ name: "A", attrs: { name: tricky, n: 0.1 + 0.2 }, children: [{ name: "B", text: tricky }] }));
  expect(back.attrs.name).toBe(tricky);
  expect(back.attrs.n).toBe("0.3");
  expect(back.children[0]!.text).toBe(tricky);
  expect(escapeXml("<&>")).toBe("&lt;&amp;&gt;");
  expect(formatPlainNumber(-0.00000000001)).toBe("0");
  expect(formatPlainNumber(6487000.125)).toBe("6487000.125");
  expect(formatPlainNumber(1e-7)).toBe("0.0000001");
});
