export type Units = "m" | "ft" | "usft";

export function areaLabel(units: Units): string {
  return units === "m" ? "m²" : units === "ft" ? "ft²" : "US ft²";
}

/** An area with one decimal and grouping, e.g. "1,234.5". */
export function formatArea(value: number): string {
  return value.toLocaleString("en", { minimumFractionDigits: 1, maximumFractionDigits: 1 });
}

/** An estimated cost to the nearest whole unit of the project's currency, marked as approximate. */
export function formatEstimate(value: number): string {
  return `≈ ${Math.round(value).toLocaleString("en")}`;
}

/** A date as YYYY-MM-DD (UTC), the same on server and browser so hydration agrees. */
export function formatDay(iso: string | null | undefined): string {
  return iso ? iso.slice(0, 10) : "—";
}

/** Date and time to the minute (UTC). */
export function formatMoment(iso: string): string {
  return `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;
}
