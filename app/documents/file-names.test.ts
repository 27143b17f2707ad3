import { expect, test } from "vitest";
import { attachmentHeaders, fileSlug } from "./file-names";

test("file names are ASCII slugs of the project and alternative names", () => {
  expect(fileSlug("Quillmere Eastern Bypass")).toBe("quillmere-eastern-bypass");
  expect(fileSlug("  Ørnvik / Süd: option 2 ")).toBe("rnvik-sud-option-2");
  expect(fileSlug("***")).toBe("export");
});

test("Content-Disposition carries a plain filename and the RFC 5987 UTF-8 form (RFC 6266 §4.3)", () => {
  const h = attachmentHeaders("application/pdf", "Süd exhibit.pdf", "inline");
  expect(h.get("content-type")).toBe("application/pdf");
  expect(h.get("content-disposition")).toBe(`inline; filename="S_d exhibit.pdf"; filename*=UTF-8''S%C3%BCd%20exhibit.pdf`);
});
