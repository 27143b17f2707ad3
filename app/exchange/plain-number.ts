/**
 * Formats a number for a data file: at most `decimals` decimals, trailing zeros dropped, never
 * exponent notation, never localized, never "-0". The default 10 decimals keeps 0.1 nm at
 * coordinates near 10^7, below the doubles' own resolution there.
 */
export function formatPlainNumber(value: number, decimals = 10): string {
  if (!Number.isFinite(value)) throw new Error(`cannot write the non-finite number ${value}`);
  const fixed = value.toFixed(decimals);
  const trimmed = fixed.includes(".") ? fixed.replace(/0+$/, "").replace(/\.$/, "") : fixed;
  return trimmed === "-0" ? "0" : trimmed;
}
