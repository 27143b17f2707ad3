import { stationingOf, type AlignmentElement, type AlignmentGeometry, type AlignmentInput, type LengthUnit, type Vec2 } from "../geometry";
import { unitsNode } from "./landxml-units";
import { formatPlainNumber } from "./plain-number";
import { serializeXml, type XmlNode } from "./xml-write";

/** The LandXML 1.2 namespace (LandXML-1.2.xsd targetNamespace). */
export const LANDXML_NAMESPACE = "http://www.landxml.org/schema/LandXML-1.2";

/** What {@link writeLandXmlAlignment} needs. */
export interface LandXmlAlignmentExport {
  /** Alignment name (LandXML `Alignment@name`, required by the schema). */
  name: string;
  /** The alignment as stored; kept for callers' symmetry with the reader, geometry is written from `geometry`. */
  alignment: AlignmentInput;
  /** `computeAlignmentGeometry(alignment)`: its elements are written exactly. */
  geometry: AlignmentGeometry;
  /** Must equal the alignment's units when given. */
  units?: LengthUnit;
  /** Working CRS, written as `<CoordinateSystem>` when known. */
  crsName?: string;
  epsgCode?: number;
  projectName: string;
  /** Time stamp of the file; default now. Written in UTC. */
  generatedAt?: Date;
}

/** LandXML point text is "northing easting" (XSD PointType: "north east"), i.e. y before x. */
function pointText(p: Vec2): string {
  return `${formatPlainNumber(p[1])} ${formatPlainNumber(p[0])}`;
}

/**
 * A direction in decimal degrees as the LandXML 1.2 schema defines it: "measured
 * counter-clockwise from 0 degrees = north" (Units annotation), i.e. 360° − azimuth.
 */
function directionOf(azimuthDeg: number): number {
  const d = (360 - azimuthDeg) % 360;
  return d < 0 ? d + 360 : d;
}

function elementNode(e: AlignmentElement): XmlNode {
  if (e.type === "tangent") {
    return {
      name: "Line",
      attrs: { staStart: e.startStation, length: e.length, dir: directionOf(e.azimuthDeg) },
      children: [
        { name: "Start", text: pointText(e.start) },
        { name: "End", text: pointText(e.end) },
      ],
    };
  }
  const points: XmlNode[] = [
    { name: "Start", text: pointText(e.start) },
    { name: "Center", text: pointText(e.center) },
    { name: "End", text: pointText(e.end) },
  ];
  if (e.pi) points.push({ name: "PI", text: pointText(e.pi) });
  return {
    name: "Curve",
    attrs: {
      rot: e.direction === "left" ? "ccw" : "cw",
      crvType: "arc",
      staStart: e.startStation,
      radius: e.radius,
      length: e.length,
      delta: Math.abs(e.deltaDeg),
      chord: e.chord,
      dirStart: directionOf(e.startAzimuthDeg),
      dirEnd: directionOf(e.endAzimuthDeg),
    },
    children: points,
  };
}

/** `StaEquation` per station equation: `staInternal` is start station + distance (XSD `station`). */
function equationNodes(geometry: AlignmentGeometry): XmlNode[] {
  const regions = stationingOf(geometry).regions;
  return geometry.stationEquations.map((eq, i) => ({
    name: "StaEquation",
    attrs: {
      staInternal: geometry.startStation + regions[i + 1]!.startDistance,
      staBack: eq.back,
      staAhead: eq.ahead,
      staIncrement: "increasing",
    },
  }));
}

const two = (n: number) => String(n).padStart(2, "0");

/**
 * Writes one alignment as a LandXML 1.2 document: `Units` (all attributes the schema requires),
 * `CoordinateSystem` when known, `Project`, and `Alignments/Alignment` with a `CoordGeom` of
 * `Line` and `Curve` elements (Start, Center, End and the arc's own PI) and a `StaEquation` per
 * station equation. Stations are internal (no equations applied), lengths in the alignment's
 * units, angles and directions in decimal degrees. Source: LandXML-1.2.xsd (posted 7/29/2008).
 */
export function writeLandXmlAlignment(input: LandXmlAlignmentExport): string {
  const g = input.geometry;
  if (input.units !== undefined && input.units !== g.units) {
    throw new Error(`writeLandXmlAlignment: units "${input.units}" differ from the geometry's "${g.units}"`);
  }
  const at = input.generatedAt ?? new Date();
  const date = `${at.getUTCFullYear()}-${two(at.getUTCMonth() + 1)}-${two(at.getUTCDate())}`;
  const time = `${two(at.getUTCHours())}:${two(at.getUTCMinutes())}:${two(at.getUTCSeconds())}Z`;
  const children: XmlNode[] = [unitsNode(g.units)];
  if (input.crsName !== undefined || input.epsgCode !== undefined) {
    children.push({ name: "CoordinateSystem", attrs: { name: input.crsName, epsgCode: input.epsgCode === undefined ? undefined : String(input.epsgCode) } });
  }
  children.push({ name: "Project", attrs: { name: input.projectName } });
  const alignment: XmlNode = {
    name: "Alignment",
    attrs: { name: input.name, length: g.length, staStart: g.startStation },
    children: [{ name: "CoordGeom", children: g.elements.map(elementNode) }, ...equationNodes(g)],
  };
  children.push({ name: "Alignments", children: [alignment] });
  const root: XmlNode = { name: "LandXML", attrs: { xmlns: LANDXML_NAMESPACE, version: "1.2", date, time }, children };
  return `<?xml version="1.0" encoding="UTF-8"?>\n${serializeXml(root)}\n`;
}
