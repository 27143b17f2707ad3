import { computeAlignmentGeometry, GeometryInputError, type AlignmentInput, type StationEquation } from "../geometry";
import { ExchangeInputError } from "./exchange-errors";
import { readChainElements, type ChainElement, type PointRefs } from "./landxml-elements";
import { rebuildPis } from "./landxml-pis";
import { readFileUnits, type FileUnits } from "./landxml-units";
import { childNamed, childrenNamed, parseXml, type XmlElement } from "./xml-tree";

/** One alignment of a LandXML file: the PI list Takeline stores, or why it could not be read. */
export interface LandXmlAlignmentRead {
  name: string;
  /** Null when `error` says why this alignment cannot be imported. */
  alignment: AlignmentInput | null;
  warnings: string[];
  error?: { code: string; message: string };
  /** The file's `CoordinateSystem`, when it has one. */
  crs: { epsgCode?: number; name?: string } | null;
}

function readCrs(root: XmlElement): LandXmlAlignmentRead["crs"] {
  const el = childNamed(root, "CoordinateSystem");
  if (!el) return null;
  const crs: { epsgCode?: number; name?: string } = {};
  const code = Number(el.attrs.epsgCode);
  if (el.attrs.epsgCode && Number.isInteger(code)) crs.epsgCode = code;
  if (el.attrs.name) crs.name = el.attrs.name;
  return crs;
}

function readPointRefs(root: XmlElement): PointRefs {
  const refs: PointRefs = new Map();
  for (const group of childrenNamed(root, "CgPoints")) {
    for (const p of childrenNamed(group, "CgPoint")) if (p.attrs.name) refs.set(p.attrs.name, p.text.trim());
  }
  return refs;
}

/**
 * StaEquation → {back, ahead}. `staInternal` is start station + distance (XSD `station`);
 * without `staBack` the back station is worked out from the stationing before it.
 */
function readEquations(el: XmlElement, startStation: number, scale: number): StationEquation[] {
  const raw = childrenNamed(el, "StaEquation")
    .map((e) => ({ internal: Number(e.attrs.staInternal) * scale, ahead: Number(e.attrs.staAhead) * scale, back: e.attrs.staBack === undefined ? NaN : Number(e.attrs.staBack) * scale }))
    .filter((e) => Number.isFinite(e.internal) && Number.isFinite(e.ahead))
    .sort((a, b) => a.internal - b.internal);
  let regionInternal = startStation;
  let regionStation = startStation;
  return raw.map((e) => {
    const back = Number.isFinite(e.back) ? e.back : regionStation + (e.internal - regionInternal);
    regionInternal = e.internal;
    regionStation = e.ahead;
    return { back, ahead: e.ahead };
  });
}

/** Notes where the file's own stations or length disagree with its coordinates (which win). */
function stationWarnings(chain: ChainElement[], startStation: number, lengthAttr: number): string[] {
  let station = startStation;
  const notes: string[] = [];
  const off = (a: number, b: number) => Math.abs(a - b) > 1e-6 * Math.max(1, Math.abs(b));
  for (const e of chain) {
    if (e.staStart !== undefined && off(e.staStart, station) && notes.length === 0) {
      notes.push(`Element ${e.index + 1} says it starts at station ${e.staStart}, but the lengths before it put it at ${station}; the lengths were used.`);
    }
    station += e.kind === "arc" ? e.radius * e.deltaRad : Math.hypot(e.end[0] - e.start[0], e.end[1] - e.start[1]);
  }
  if (Number.isFinite(lengthAttr) && off(lengthAttr, station - startStation)) {
    notes.push(`The alignment says it is ${lengthAttr} long, but its elements add up to ${station - startStation}.`);
  }
  return notes;
}

function readAlignment(el: XmlElement, units: FileUnits, refs: PointRefs): Omit<LandXmlAlignmentRead, "crs"> {
  const name = el.attrs.name ?? "";
  const warnings: string[] = units.lengthScale === 1 ? [] : [`Lengths were converted from the file's unit to ${units.units} (× ${units.lengthScale}).`];
  try {
    const coordGeom = childNamed(el, "CoordGeom");
    if (!coordGeom) throw new ExchangeInputError("no_alignment", `Alignment "${name}" has no CoordGeom (horizontal geometry).`);
    const startStation = Number(el.attrs.staStart ?? 0) * units.lengthScale;
    if (!Number.isFinite(startStation)) throw new ExchangeInputError("no_alignment", `Alignment "${name}" has a staStart that is not a number.`);
    const chain = readChainElements(coordGeom, refs, units.lengthScale);
    const rebuilt = rebuildPis(chain);
    warnings.push(...rebuilt.warnings, ...stationWarnings(chain, startStation, Number(el.attrs.length) * units.lengthScale));
    const alignment: AlignmentInput = { units: units.units, startStation, points: rebuilt.points };
    const equations = readEquations(el, startStation, units.lengthScale);
    if (equations.length) alignment.stationEquations = equations;
    computeAlignmentGeometry(alignment);
    return { name, alignment, warnings };
  } catch (e) {
    if (!(e instanceof ExchangeInputError || e instanceof GeometryInputError)) throw e;
    return { name, alignment: null, warnings, error: { code: e.code, message: e.message } };
  }
}

/**
 * Reads every `Alignments/Alignment` of a LandXML 1.x document into Takeline PI lists (see
 * rebuildPis for how Lines and Curves become PIs). Coordinates are authoritative; `dir`,
 * `delta` and similar attributes are not needed. Lengths are converted into m, ft or US survey
 * ft as `Units` says. Throws ExchangeInputError for a file that is not LandXML, has no units
 * or no alignment; an alignment that cannot be represented comes back with `alignment: null`.
 */
export function readLandXmlAlignments(xml: string): LandXmlAlignmentRead[] {
  const root = parseXml(xml);
  if (root.name !== "LandXML") throw new ExchangeInputError("not_landxml", `The file's root element is <${root.name}>, not <LandXML>.`);
  const units = readFileUnits(root);
  const refs = readPointRefs(root);
  const crs = readCrs(root);
  const alignments = childrenNamed(root, "Alignments").flatMap((a) => childrenNamed(a, "Alignment"));
  if (alignments.length === 0) throw new ExchangeInputError("no_alignment", "The LandXML file has no <Alignments>/<Alignment>.");
  return alignments.map((el) => ({ ...readAlignment(el, units, refs), crs }));
}
