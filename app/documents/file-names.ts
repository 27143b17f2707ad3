/** A lower-case ASCII slug for file names: "Quillmere Eastern Bypass" → "quillmere-eastern-bypass". */
export function fileSlug(text: string): string {
  const slug = text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "");
  return slug.slice(0, 80) || "export";
}

/**
 * Headers of a file download: its type and a Content-Disposition naming the file, as plain ASCII
 * and as RFC 5987 UTF-8 (RFC 6266 §4.3 recommends both).
 */
export function attachmentHeaders(contentType: string, fileName: string, disposition: "attachment" | "inline" = "attachment"): Headers {
  const ascii = fileName.replace(/[^\x20-\x7e]|["\\]/g, "_");
  return new Headers({
    "Content-Type": contentType,
    "Content-Disposition": `${disposition}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`,
    "Cache-Control": "private, no-store",
  });
}
