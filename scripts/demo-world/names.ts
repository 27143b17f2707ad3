/**
 * Invented names built from syllables, so no owner is a real person and no
 * street copies a real address. Each draw is taken from a seeded Rng.
 */
import type { Rng } from "./prng";

const GIVEN_START = ["Mar", "Tes", "Cor", "Ili", "Bren", "Ossi", "Fen", "Lio", "Thal", "Quen", "Rho", "Sev", "Ambr", "Del", "Wyn", "Ela", "Jor", "Nim", "Pell", "Cal"];
const GIVEN_END = ["adel", "saly", "wen", "ric", "ora", "an", "ette", "ias", "wyn", "ira", "om", "elle", "o", "ard", "issa", "en"];
const SUR_START = ["Quon", "Vor", "Tamb", "Harl", "Merr", "Osk", "Brin", "Dal", "Fenn", "Gorr", "Lask", "Penn", "Rask", "Strom", "Wick", "Yarr", "Cald", "Thorn", "Ember", "Ashv"];
const SUR_END = ["sey", "ne", "erly", "wick", "ow", "ald", "ett", "ing", "mere", "by", "aker", "ander", "ridge", "ell", "oway", "ick"];
const STREET_START = ["Fenn", "Brind", "Wex", "Tally", "Quill", "Harrow", "Marl", "Osk", "Linden", "Copp", "Sorrel", "Ember", "Thistle", "Mallow", "Rook", "Teasel", "Alder", "Plover", "Cress", "Vetch", "Larch", "Bram", "Hazel", "Sedge"];
const STREET_END = ["wick", "ley", "more", "ton", "ford", "stead", "holm", "by", "well", "combe", ""];
const COMPANY = ["Holdings LLC", "Land Company", "Properties LLC", "Farms Inc", "Partners"];

const cap = (s: string): string => s.charAt(0).toUpperCase() + s.slice(1);

export function givenName(rng: Rng): string {
  return rng.pick(GIVEN_START) + rng.pick(GIVEN_END);
}

export function surname(rng: Rng): string {
  return rng.pick(SUR_START) + rng.pick(SUR_END);
}

/** An owner of a private parcel: a person, a couple, a trust or a company. */
export function ownerName(rng: Rng, kind: "person" | "business" | "farm"): string {
  const last = surname(rng);
  if (kind === "business") return `${cap(last)} ${rng.pick(COMPANY.slice(0, 3))}`;
  const roll = rng.next();
  if (kind === "farm" && roll < 0.35) return `${last} ${rng.pick(["Family Farms Inc", "Land Company", "Partners"])}`;
  if (roll < 0.15) return `${givenName(rng)} ${last} Trust`;
  if (roll < 0.4) return `${givenName(rng)} & ${givenName(rng)} ${last}`;
  if (roll < 0.47) return `${givenName(rng)} ${givenName(rng).charAt(0)}. ${last}`;
  return `${givenName(rng)} ${last}`;
}

/** Distinct street stems (e.g. "Tallywick"), as many as asked, in draw order. */
export function streetStems(rng: Rng, count: number): string[] {
  const seen = new Set<string>();
  const out: string[] = [];
  for (let tries = 0; out.length < count && tries < 10_000; tries++) {
    const stem = rng.pick(STREET_START) + rng.pick(STREET_END);
    if (!seen.has(stem)) {
      seen.add(stem);
      out.push(stem);
    }
  }
  return out;
}
