import type { LengthUnit } from "../geometry";
import { ExchangeInputError } from "./exchange-errors";
import type { XmlNode } from "./xml-write";
import { childNamed, type XmlElement } from "./xml-tree";

/**
 * The `<Units>` element Takeline writes. Every attribute the LandXML 1.2 schema requires of
 * `Metric`/`Imperial` is present (areaUnit, linearUnit, volumeUnit, temperatureUnit,
 * pressureUnit); angles and directions are decimal degrees, since the schema's default is radians.
 * Source: LandXML-1.2.xsd (posted 7/29/2008), elements Units, Metric, Imperial.
 */
export function unitsNode(units: LengthUnit): XmlNode {
  const angles = { angularUnit: "decimal degrees", directionUnit: "decimal degrees" };
  if (units === "m") {
    return {
      name: "Units",
      children: [{ name: "Metric", attrs: { areaUnit: "squareMeter", linearUnit: "meter", volumeUnit: "cubicMeter", temperatureUnit: "celsius", pressureUnit: "HPA", ...angles } }],
    };
  }
  return {
    name: "Units",
    children: [
      {
        name: "Imperial",
        attrs: {
          areaUnit: "squareFoot",
          linearUnit: units === "ft" ? "foot" : "USSurveyFoot",
          volumeUnit: "cubicFeet",
          temperatureUnit: "fahrenheit",
          pressureUnit: "inHG",
          ...angles,
        },
      },
    ],
  };
}

/** A file's units as read: Takeline's unit, the factor that turns file lengths into it, and angle units. */
export interface FileUnits {
  units: LengthUnit;
  /** Multiply a length written in the file by this to get `units`. */
  lengthScale: number;
  angularUnit: string;
  directionUnit: string;
}

// LandXML linearUnit values (XSD metLinear, impLinear) → Takeline unit and scale.
const LINEAR: Record<string, [LengthUnit, number]> = {
  meter: ["m", 1],
  millimeter: ["m", 0.001],
  centimeter: ["m", 0.01],
  kilometer: ["m", 1000],
  foot: ["ft", 1],
  USSurveyFoot: ["usft", 1],
  inch: ["ft", 1 / 12],
  mile: ["ft", 5280],
};

/**
 * Reads `<Units>` of a LandXML root. Without it the file's lengths cannot be trusted, so it is
 * refused. "inch" and "mile" are taken as international (the schema does not say which foot);
 * the caller adds a warning when the scale is not 1.
 */
export function readFileUnits(root: XmlElement): FileUnits {
  const units = childNamed(root, "Units");
  const system = units && (childNamed(units, "Metric") ?? childNamed(units, "Imperial"));
  if (!system) throw new ExchangeInputError("unsupported_unit", "The LandXML file has no <Units> (Metric or Imperial), so its lengths cannot be read.");
  const linear = system.attrs.linearUnit ?? "";
  const found = LINEAR[linear];
  if (!found) throw new ExchangeInputError("unsupported_unit", `The LandXML linear unit "${linear}" is not one Takeline reads.`, { linearUnit: linear });
  return {
    units: found[0],
    lengthScale: found[1],
    angularUnit: system.attrs.angularUnit ?? "radians",
    directionUnit: system.attrs.directionUnit ?? "radians",
  };
}

/**
 * An angle written in a LandXML angular unit, in decimal degrees. Units (XSD angularType):
 * radians (the default), grads (400 to a turn), "decimal degrees", and "decimal dd.mm.ss" where
 * "45.3025" is 45°30'25". Returns NaN for text that is not a number.
 */
export function angleToDegrees(text: string, unit: string): number {
  const v = Number(text);
  if (text.trim() === "" || !Number.isFinite(v)) return NaN;
  if (unit === "decimal degrees") return v;
  if (unit === "grads") return v * 0.9;
  if (unit === "decimal dd.mm.ss") {
    const sign = v < 0 ? -1 : 1;
    const [d = "0", frac = ""] = text.trim().replace(/^[-+]/, "").split(".");
    const digits = frac.padEnd(4, "0");
    const minutes = Number(digits.slice(0, 2));
    const seconds = Number(`${digits.slice(2, 4)}.${digits.slice(4)}`);
    return sign * (Number(d) + minutes / 60 + seconds / 3600);
  }
  return (v * 180) / Math.PI;
}
