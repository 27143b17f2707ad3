import { request as httpRequest } from "node:http";
import { beforeAll, expect, test } from "vitest";
import { baseUrl } from "./support/browser";
import { get } from "./support/http";
import { lyingBomb, zeroBomb, zipWithNames } from "./support/crafted-zips";
import { bearer, layerList, newProject, postLayer, shapefileZip } from "./support/layer-uploads";

// Invented Quillmere rows (Ostrand County), in NAD83 / California zone 5 (ftUS).
const sq = (x: number, y: number) => `POLYGON ((${x} ${y}, ${x + 90} ${y}, ${x + 90} ${y + 60}, ${x} ${y + 60}, ${x} ${y}))`;
const ROWS = [
  { wkt: sq(6487000, 1840000), APN: "QM-201", OWNER_NM: "Fenna Drulby" },
  { wkt: sq(6487200, 1840000), APN: "QM-202", OWNER_NM: "Calder Ostwin" },
];

let planner: Record<string, string>;
let projectId: number;
let good: Buffer;
let bomb: Buffer;
beforeAll(async () => {
  // Built first: a few seconds of blocking work between requests could meet an idle keep-alive socket as the server closes it.
  bomb = zeroBomb(1100);
  planner = await bearer("planner@demo.test");
  projectId = await newProject(planner, { name: "Quillmere refusals", units: "m" });
  good = shapefileZip(ROWS, "EPSG:2229");
});

/** Uploads, expects the refusal, and checks that the project is exactly as it was: no layer, no working CRS. */
async function expectRefused(file: Uint8Array | null, name: string, status: number, code: string, message: RegExp, fileCode?: string) {
  const res = await postLayer(projectId, planner, file, name);
  expect(res.status).toBe(status);
  const body = (await res.json()) as { error: { code: string; message: string; details?: { code?: string }[] } };
  expect(body.error.code).toBe(code);
  expect(body.error.message).toMatch(message);
  if (fileCode) expect(body.error.details?.[0]?.code).toBe(fileCode);
  expect(await layerList(projectId, planner)).toEqual([]);
  expect(((await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as { crs: string | null }).crs).toBeNull();
}

test("a zip cut short has no end-of-central-directory record (PKWARE APPNOTE.TXT 4.3.16)", async () => {
  await expectRefused(good.subarray(0, good.length - 30), "cut.zip", 422, "unprocessable", /zip archive is damaged/, "corrupt_file");
});

test("a zip with no .shp, and one with a .shp but no .dbf (ESRI Shapefile Technical Description 1998: main file + dBASE table)", async () => {
  await expectRefused(zipWithNames({ "readme.txt": "Quillmere parcels" }), "notes.zip", 422, "unprocessable", /no Shapefile \(\.shp\)/, "no_polygon_layer");
  await expectRefused(shapefileZip(ROWS, "EPSG:2229", { drop: [".dbf"] }), "nodbf.zip", 422, "unprocessable", /no parcels\.dbf/, "missing_dbf");
});

test("entry paths with ../ or a leading slash are refused (APPNOTE.TXT 4.4.17.1: no drive letter or leading slash)", async () => {
  await expectRefused(zipWithNames({ "../parcels.shp": "x", "../parcels.dbf": "x" }), "slip.zip", 422, "unprocessable", /climbs out of the archive/, "unsafe_zip_entry");
  await expectRefused(zipWithNames({ "/tmp/parcels.shp": "x", "/tmp/parcels.dbf": "x" }), "abs.zip", 422, "unprocessable", /absolute path/, "unsafe_zip_entry");
  await expectRefused(zipWithNames({ "C:\\gis\\parcels.shp": "x" }), "drive.zip", 422, "unprocessable", /absolute path/, "unsafe_zip_entry");
});

test("a zip bomb stops at the 1024 MiB unpacked limit, whether its sizes are declared honestly or not", async () => {
  expect(bomb.length).toBeLessThan(2 * 2 ** 20);
  await expectRefused(bomb, "bomb.zip", 422, "unprocessable", /unpacks to more than 1024 MB/, "zip_too_large_unzipped");
  await expectRefused(lyingBomb(bomb), "liar.zip", 422, "unprocessable", /unpacks to more than 1024 MB/, "zip_too_large_unzipped");
}, 120_000);

test("point and line layers are refused: parcels are polygons (shape types 1 and 3, ESRI 1998 table 1)", async () => {
  const points = [{ wkt: "POINT (6487000 1840000)", APN: "QM-301" }];
  const lines = [{ wkt: "LINESTRING (6487000 1840000, 6487100 1840050)", APN: "QM-302" }];
  await expectRefused(shapefileZip(points, "EPSG:2229"), "points.zip", 422, "unprocessable", /points, not polygons/, "no_polygon_layer");
  await expectRefused(shapefileZip(lines, "EPSG:2229"), "lines.zip", 422, "unprocessable", /lines, not polygons/, "no_polygon_layer");
});

test("an unreadable .prj, a missing .prj and a 0-byte file are refused with what to do", async () => {
  await expectRefused(shapefileZip(ROWS, "EPSG:2229", { prj: "this is not a coordinate system" }), "badprj.zip", 422, "unprocessable", /could not be read; pick the CRS/, "unknown_crs");
  await expectRefused(shapefileZip(ROWS, "EPSG:2229", { drop: [".prj"] }), "noprj.zip", 422, "unprocessable", /does not say which coordinate system/, "missing_crs");
  await expectRefused(new Uint8Array(0), "empty.zip", 422, "unprocessable", /is empty \(0 bytes\)/, "empty_file");
  await expectRefused(null, "", 422, "unprocessable", /Attach the layer file/, "missing_file");
});

test("invalid text fields are 422 with their paths", async () => {
  const res = await postLayer(projectId, planner, good, "q.zip", { kind: "roads", fields: "{not json", name: "" });
  expect(res.status).toBe(422);
  const body = (await res.json()) as { error: { details: { path: string }[] } };
  expect(body.error.details.map((d) => d.path).sort()).toEqual(["fields", "kind", "name"]);
  expect(await layerList(projectId, planner)).toEqual([]);
});

/** Sends a multipart head, then (unless the length is declared) `totalBytes` zeros of file content; resolves with the answer. */
function sendOversized(totalBytes: number, declareLength: boolean): Promise<{ status: number; connection: string | undefined; body: string }> {
  const boundary = "quillmereboundary";
  const head = Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="name"\r\n\r\nBig\r\n--${boundary}\r\nContent-Disposition: form-data; name="kind"\r\n\r\nparcels\r\n--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="big.zip"\r\n\r\n`);
  return new Promise((resolve, reject) => {
    const url = new URL(`${baseUrl()}/api/v1/projects/${projectId}/layers`);
    const headers: Record<string, string | number> = { ...planner, "content-type": `multipart/form-data; boundary=${boundary}` };
    if (declareLength) headers["content-length"] = totalBytes + head.length;
    const req = httpRequest(url, { method: "POST", headers }, (res) => {
      let body = "";
      res.on("data", (c: Buffer) => (body += c.toString()));
      res.on("end", () => {
        resolve({ status: res.statusCode!, connection: res.headers.connection, body });
        req.destroy();
      });
    });
    // The server may close while bytes are still going out; the answer has arrived by then.
    req.on("error", (e) => (e as NodeJS.ErrnoException).code === "EPIPE" || (e as NodeJS.ErrnoException).code === "ECONNRESET" ? undefined : reject(e));
    req.write(head);
    // With a declared length the answer must come from the headers alone, before any file byte is sent.
    if (declareLength) return;
    const chunk = Buffer.alloc(1 << 20);
    let sent = 0;
    const pump = () => {
      while (sent < totalBytes && !req.destroyed) {
        sent += chunk.length;
        if (!req.write(chunk)) return void req.once("drain", pump);
      }
      if (!req.destroyed) req.end();
    };
    pump();
  });
}

test("a body over UPLOAD_MAX_MB (200) is 413 in the envelope with Connection: close, declared or streamed (RFC 9110 §15.5.14)", async () => {
  const declared = await sendOversized(201 * 2 ** 20, true);
  expect(declared.status).toBe(413);
  expect(declared.connection).toBe("close");
  expect(JSON.parse(declared.body)).toMatchObject({ error: { code: "payload_too_large" } });
  const streamed = await sendOversized(201 * 2 ** 20, false);
  expect(streamed.status).toBe(413);
  expect(streamed.connection).toBe("close");
  expect(JSON.parse(streamed.body)).toMatchObject({ error: { code: "payload_too_large", details: { maxBytes: 200 * 2 ** 20 } } });
  expect(await layerList(projectId, planner)).toEqual([]);
}, 120_000);
