import { execFileSync } from "node:child_process";
import { beforeAll, expect, test } from "vitest";
import { baseUrl } from "./support/browser";
import { get, postJson } from "./support/http";
import { bearer, newProject, postLayer, shapefileZip } from "./support/layer-uploads";
import { demoProject } from "./exports-support";

type Element = { type: string; start: number[]; end: number[]; radius?: number; deltaDeg?: number; startStation: number; endStation: number };

// A project of its own to import into, so the demo project keeps its three alternatives:
// one invented 100 m lot (EPSG:32617) fixes the working CRS.
const LOT = "POLYGON ((561800 4418400, 561900 4418400, 561900 4418500, 561800 4418500, 561800 4418400))";
let demo: Awaited<ReturnType<typeof demoProject>>;
let target: number;
beforeAll(async () => {
  demo = await demoProject();
  target = await newProject(demo.auth, { name: "Quillmere import test", units: "m", crs: "EPSG:32617" });
  expect((await postLayer(target, demo.auth, shapefileZip([{ wkt: LOT, APN: "QM-IMP-1", OWNER_NM: "Invented Owner" }], "EPSG:32617"), "lot.zip")).status).toBe(201);
});

function postFile(projectId: number, file: string, fileName: string, fields: Record<string, string>, auth = demo.auth): Promise<Response> {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  form.set("file", new Blob([file]), fileName);
  return fetch(`${baseUrl()}/api/v1/projects/${projectId}/alternatives/import`, { method: "POST", headers: auth, body: form });
}

async function elementsOf(alternativeId: number): Promise<Element[]> {
  const alt = (await (await get(`/api/v1/alternatives/${alternativeId}`, demo.auth)).json()) as { alignment: unknown };
  const res = await postJson("/api/v1/alignments/geometry", { alignment: alt.alignment }, demo.auth);
  expect(res.status).toBe(200);
  return ((await res.json()) as { elements: Element[] }).elements;
}

/** Python's ElementTree reads the file on its own: each Line/Curve's type, Start/End (northing easting) and staStart. */
function readWithElementTree(xml: string): { kind: string; start: number[]; end: number[]; sta: number; radius: number | null }[] {
  const script = [
    "import json, sys, xml.etree.ElementTree as ET",
    "ns = {'l': 'http://www.landxml.org/schema/LandXML-1.2'}",
    "root = ET.fromstring(sys.stdin.read())",
    "pt = lambda e, n: [float(v) for v in e.find('l:' + n, ns).text.split()][::-1]",
    "out = [{'kind': e.tag.split('}')[1], 'start': pt(e, 'Start'), 'end': pt(e, 'End'), 'sta': float(e.get('staStart')), 'radius': float(e.get('radius')) if e.get('radius') else None}",
    "       for e in root.find('l:Alignments/l:Alignment/l:CoordGeom', ns)]",
    "print(json.dumps(out))",
  ].join("\n");
  return JSON.parse(execFileSync("python3", ["-c", script], { input: xml, encoding: "utf8" }));
}

test("each demo alternative exported as LandXML 1.2 and imported again gives the same elements and stations", async () => {
  for (const alt of demo.alternatives.slice(0, 3)) {
    const res = await get(`/api/v1/alternatives/${alt.id}/landxml`, demo.auth);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^application\/xml/);
    expect(res.headers.get("content-disposition")).toMatch(/filename=".+\.xml"/);
    const xml = await res.text();
    expect(xml).toMatch(/^<\?xml version="1.0" encoding="UTF-8"\?>/);
    expect(xml).toContain('<CoordinateSystem name="EPSG:32617" epsgCode="32617"');
    const original = await elementsOf(alt.id);
    // ElementTree sees one Line or Curve per element, at its coordinates and station.
    const read = readWithElementTree(xml);
    expect(read.map((e) => e.kind)).toEqual(original.map((e) => (e.type === "tangent" ? "Line" : "Curve")));
    read.forEach((e, i) => {
      expect(e.start[0]).toBeCloseTo(original[i]!.start[0]!, 6);
      expect(e.end[1]).toBeCloseTo(original[i]!.end[1]!, 6);
      expect(e.sta).toBeCloseTo(original[i]!.startStation, 6);
      if (e.radius !== null) expect(e.radius).toBeCloseTo(original[i]!.radius!, 9);
    });
    const imported = await postFile(target, xml, "alignment.xml", { corridor: JSON.stringify({ left: 20, right: 20, easement: 5 }) });
    expect(imported.status).toBe(201);
    const body = (await imported.json()) as { format: string; alternatives: { id: number; name: string; corridor: unknown }[]; skipped: unknown[] };
    expect(body.format).toBe("landxml");
    expect(body.skipped).toEqual([]);
    expect(body.alternatives).toHaveLength(1);
    expect(body.alternatives[0]!.name.startsWith(alt.name)).toBe(true);
    expect(body.alternatives[0]!.corridor).toEqual({ left: 20, right: 20, easement: 5 });
    const again = await elementsOf(body.alternatives[0]!.id);
    expect(again.map((e) => e.type)).toEqual(original.map((e) => e.type));
    again.forEach((e, i) => {
      const o = original[i]!;
      for (const k of [0, 1]) {
        expect(e.start[k]).toBeCloseTo(o.start[k]!, 6);
        expect(e.end[k]).toBeCloseTo(o.end[k]!, 6);
      }
      expect(e.startStation).toBeCloseTo(o.startStation, 6);
      expect(e.endStation).toBeCloseTo(o.endStation, 6);
      if (o.type === "arc") {
        expect(e.radius).toBeCloseTo(o.radius!, 6);
        expect(e.deltaDeg).toBeCloseTo(o.deltaDeg!, 8);
      }
    });
  }
}, 120_000);

test("a PI list CSV imports as one alternative named after the file, with the curve it gives", async () => {
  const csv = "x,y,curve_type,radius\r\n561700,4418300,,\r\n561850,4418450,simple,300\r\n562100,4418450,,\r\n";
  const res = await postFile(target, csv, "Quarry bend.csv", { corridor: JSON.stringify({ left: 15, right: 15 }) });
  expect(res.status).toBe(201);
  const body = (await res.json()) as { format: string; alternatives: { id: number; name: string; alignment: { points: { x: number; y: number; curve?: { type: string; radius: number } }[] }; summary: { curveCount: number } }[] };
  expect(body.format).toBe("pi-csv");
  expect(body.alternatives[0]!.name).toBe("Quarry bend");
  expect(body.alternatives[0]!.alignment.points[1]).toEqual({ x: 561850, y: 4418450, curve: { type: "simple", radius: 300 } });
  expect(body.alternatives[0]!.summary.curveCount).toBe(1);
  // The same name again gets a suffix; the corridor defaults to the project's first alternative's.
  const twice = await postFile(target, csv, "Quarry bend.csv", {});
  expect(twice.status).toBe(201);
  expect(((await twice.json()) as { alternatives: { name: string }[] }).alternatives[0]!.name).toBe("Quarry bend (2)");
});

test("bad files and other roles are refused, and nothing is created", async () => {
  const before = ((await (await get(`/api/v1/projects/${target}/alternatives`, demo.auth)).json()) as { alternatives: unknown[] }).alternatives.length;
  const notXml = await postFile(target, "<Other/>", "x.xml", {});
  expect(notXml.status).toBe(422);
  expect(await notXml.json()).toMatchObject({ error: { code: "unprocessable", details: { code: "not_landxml" } } });
  const badRow = await postFile(target, "x,y\r\n1,2\r\nthree,4\r\n", "bad.csv", {});
  expect(badRow.status).toBe(422);
  expect(((await badRow.json()) as { error: { details: { rows: { row: number }[] } } }).error.details.rows[0]!.row).toBe(3);
  const badCorridor = await postFile(target, "x,y\r\n561700,4418300\r\n562100,4418450\r\n", "ok.csv", { corridor: '{"left": -3, "right": 10}' });
  expect(badCorridor.status).toBe(422);
  const noFile = await fetch(`${baseUrl()}/api/v1/projects/${target}/alternatives/import`, { method: "POST", headers: demo.auth, body: new FormData() });
  expect(noFile.status).toBe(400);
  expect((await postFile(target, "x,y\r\n0,0\r\n10,10\r\n", "a.csv", {}, await bearer("analyst@demo.test"))).status).toBe(403);
  const after = ((await (await get(`/api/v1/projects/${target}/alternatives`, demo.auth)).json()) as { alternatives: unknown[] }).alternatives.length;
  expect(after).toBe(before);
});
