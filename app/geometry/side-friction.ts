/**
 * Maximum side-friction factors by design speed, AASHTO "A Policy on Geometric Design of Highways
 * and Streets" (Green Book) 2018, Table 3-7 "Minimum Radius Using Limiting Values of e and f".
 * The factors are the same for every emax block of the table.
 */
export const SIDE_FRICTION_US: Readonly<Record<number, number>> = {
  10: 0.38,
  15: 0.32,
  20: 0.27,
  25: 0.23,
  30: 0.2,
  35: 0.18,
  40: 0.16,
  45: 0.15,
  50: 0.14,
  55: 0.13,
  60: 0.12,
  65: 0.11,
  70: 0.1,
  75: 0.09,
  80: 0.08,
};

/** Metric block of the same table (km/h). */
export const SIDE_FRICTION_METRIC: Readonly<Record<number, number>> = {
  15: 0.4,
  20: 0.35,
  30: 0.28,
  40: 0.23,
  50: 0.19,
  60: 0.17,
  70: 0.15,
  80: 0.14,
  90: 0.13,
  100: 0.12,
  110: 0.11,
  120: 0.09,
  130: 0.08,
};

/** emax blocks of Table 3-7 (percent). 4, 6 and 8 % were read; 10 and 12 % exist (from memory). */
export const EMAX_OPTIONS_PERCENT = [4, 6, 8, 10, 12] as const;

/** Source string shown beside minimum-radius results. */
export const MIN_RADIUS_SOURCE = "AASHTO Green Book 2018, Table 3-7 (point-mass formula, limiting e and f)";
