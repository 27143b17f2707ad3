/**
 * Reads a land value as found in assessor data: numbers as they are; text
 * with currency signs ($ € £ ¥, "USD"), spaces and thousands commas
 * ("$1,250,000.00"). A comma is always a thousands separator here, so
 * "1.234,56" is refused rather than guessed. Empty means null. Accounting
 * negatives "(1,200)" come back negative so validation can refuse them.
 */
export function parseLandValue(value: unknown): { value: number | null } | { error: string } {
  if (value === null || value === undefined) return { value: null };
  if (typeof value === "number") return Number.isFinite(value) ? { value } : { error: "land value is not a finite number" };
  const text = String(value).trim();
  if (text === "") return { value: null };
  const negative = /^\(.*\)$/.test(text) || /^-/.test(text);
  const bare = text.replace(/^\((.*)\)$/, "$1").replace(/^-/, "").replace(/USD|[$€£¥\s]/gi, "");
  if (!/^(\d{1,3}(,\d{3})+|\d+)(\.\d+)?$/.test(bare)) return { error: `land value "${text}" is not a number` };
  const n = Number(bare.replace(/,/g, ""));
  return { value: negative ? -n : n };
}
