import { GeometryInputError } from "./errors";
import type { LengthUnit } from "./units";

/**
 * Station text. US style: 1 station = 100 ft, "12+34.56" (Mahun OASL, Curves A.2 "Stationing";
 * FM 5-233 ch. 3). Metric style: km + metres, "3+415.250" (common practice; Mahun notes 1000 m stations).
 */
export type StationStyle = "us" | "metric";

interface StyleSpec {
  perStation: number;
  digits: number;
  decimals: number;
}

const STYLES: Readonly<Record<StationStyle, StyleSpec>> = {
  us: { perStation: 100, digits: 2, decimals: 2 },
  metric: { perStation: 1000, digits: 3, decimals: 3 },
};

/** Metres use metric stationing; both feet use US 100-ft stations. */
export function stationStyleForUnits(units: LengthUnit): StationStyle {
  return units === "m" ? "metric" : "us";
}

/** Options for {@link formatStation}. */
export interface FormatStationOptions {
  /** Decimal places; default 2 for US style, 3 for metric. */
  decimals?: number;
}

/**
 * Formats a station value (length units from the origin) as text: 1234.567 → "12+34.57" (US) or
 * "1+234.567" (metric). Rounds before splitting so 12+99.999 carries to "13+00.00". Negative
 * stations keep the sign in front: −12.34 → "-0+12.34".
 */
export function formatStation(value: number, style: StationStyle, options: FormatStationOptions = {}): string {
  if (!Number.isFinite(value)) {
    throw new GeometryInputError("invalid_station", `cannot format station ${value}`, { field: "station" });
  }
  const spec = STYLES[style];
  const decimals = options.decimals ?? spec.decimals;
  const scale = 10 ** decimals;
  const units = Math.round(Math.abs(value) * scale);
  const perStationUnits = spec.perStation * scale;
  const whole = Math.floor(units / perStationUnits);
  const rest = (units - whole * perStationUnits) / scale;
  const restText = rest.toFixed(decimals).padStart(spec.digits + (decimals > 0 ? decimals + 1 : 0), "0");
  return `${units > 0 && value < 0 ? "-" : ""}${whole}+${restText}`;
}

const STATION_TEXT = /^([+-])?\s*(\d+)\+(\d+)(\.\d*)?$/;
const PLAIN_NUMBER = /^[+-]?\d+(\.\d+)?$/;

/**
 * Parses station text to a number of length units. Accepts "12+34.56" (US), "3+415.250" (metric),
 * negative "-0+12.34", and a plain number "1234.56". The style is taken from the digits after
 * "+" (2 → US, 3 → metric) unless `style` is given, in which case they must match it.
 */
export function parseStation(text: string, style?: StationStyle, field = "station"): number {
  const t = String(text).trim();
  if (PLAIN_NUMBER.test(t)) return Number(t);
  const m = STATION_TEXT.exec(t);
  if (!m) throw badStation(field, t, 'expected e.g. "12+34.56" or "3+415.250"');
  const restDigits = m[3]!.length;
  const inferred: StationStyle | undefined = restDigits === 2 ? "us" : restDigits === 3 ? "metric" : undefined;
  const used = style ?? inferred;
  if (used === undefined || STYLES[used].digits !== restDigits) {
    throw badStation(field, t, style ? `expected ${STYLES[style].digits} digits after "+"` : "expected 2 or 3 digits after \"+\"");
  }
  const value = Number(m[2]) * STYLES[used].perStation + Number(m[3]! + (m[4] ?? ""));
  return m[1] === "-" ? -value : value;
}

function badStation(field: string, text: string, why: string): GeometryInputError {
  return new GeometryInputError("invalid_station", `${field} is not a station: "${text}" (${why})`, { field });
}
