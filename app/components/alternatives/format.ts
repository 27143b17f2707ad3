export type Units = "m" | "ft" | "usft";

/** Unit labels as the tables show them. */
export function lengthUnitLabel(units: Units): string {
  return units === "m" ? "m" : units === "ft" ? "ft" : "US ft";
}

export function areaUnitLabel(units: Units): string {
  return units === "m" ? "m²" : units === "ft" ? "ft²" : "US ft²";
}

/** A number with grouping and a fixed number of decimals, or "—" for none. */
export function formatNumber(value: number | null | undefined, digits = 0): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  return value.toLocaleString("en", { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

/** Costs are order-of-magnitude estimates: shown to the nearest thousand, in the project's currency. */
export function formatCost(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  return `≈ ${(Math.round(value / 1000) * 1000).toLocaleString("en")}`;
}
