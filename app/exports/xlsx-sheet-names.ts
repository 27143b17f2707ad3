/** Names Excel will not take for a sheet besides the character rules: "History" is reserved (from memory). */
const RESERVED = new Set(["history"]);
const MAX_CHARS = 31;

/**
 * A valid, unique worksheet name: at most 31 characters (UTF-16 units, never splitting a character), none of : \ / ? * [ ], not starting or
 * ending with an apostrophe, not blank, not "History", and unique ignoring case (Excel's rules for
 * sheet names, from memory of its rename dialog). Clashes get " (2)", " (3)"… within 31 characters.
 * `used` holds the lower-cased names already taken and is updated.
 */
export function sanitizeSheetName(name: string, used: Set<string>): string {
  let base = name.replace(/[:\\/?*[\]]/g, "_").replace(/[\u0000-\u001f]/g, " ").trim().replace(/^'+|'+$/g, "").trim();
  if (base === "" || RESERVED.has(base.toLowerCase())) base = base === "" ? "Alternative" : `${base}_`;
  const cut = (text: string, max: number) => {
    let out = "";
    for (const ch of text) {
      if (out.length + ch.length > max) break;
      out += ch;
    }
    return out.replace(/'+$/, "").trimEnd();
  };
  let candidate = cut(base, MAX_CHARS);
  for (let n = 2; used.has(candidate.toLowerCase()); n++) {
    const suffix = ` (${n})`;
    candidate = cut(base, MAX_CHARS - suffix.length) + suffix;
  }
  used.add(candidate.toLowerCase());
  return candidate;
}

/** A sheet name as it must appear in a formula: in apostrophes, inner apostrophes doubled. */
export function quoteSheetName(name: string): string {
  return `'${name.replace(/'/g, "''")}'`;
}

/** Spreadsheet column letters of a 0-based index: 0 → A, 25 → Z, 26 → AA. */
export function columnLetter(index: number): string {
  let n = index + 1;
  let out = "";
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}
