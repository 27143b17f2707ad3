#!/usr/bin/env python3
"""GEOS (shapely) reference for Takeline's corridor and take overlay. Used only by tests and benchmarks.

Reads a JSON job (path in argv[1]) and prints JSON. It rebuilds the right-of-way on its own from
the alignment elements and widths -- tangents offset along their normals, arcs concentric
(radius R + w outside, R - w inside), angle points mitred by intersecting the offset lines, tapers
sampled from the width function -- and densifies every curved edge so finely (chord sagitta
`sagitta`, default 1e-5 units) that chord error is negligible. Nothing here comes from the engine's
corridor pieces.

Job keys: elements, corridor {left, right, easement?, ranges?}, parcels [{id, polygons}] or
parcelsFile (JSON array of the same, written by the caller), sagitta, unparcelled (bool), pieces
(bool: areas of parcel - corridor per taken parcel),
geosSagitta (optional coarser corridor timed as well), repeat (timing runs), buffered (bool: the
right-of-way is instead GEOS's own buffer of the densified centreline, flat caps and mitred joins,
for equal constant half-widths -- a buffer is the union of the ground within the half-width, so
it stays valid where the corridor comes back over itself and covers ground twice). Measured here,
GEOS's buffer of a 1.8 km line is within a few hundredths of a square metre of the closed-form
area (it does not converge further with finer chords), so compare lot-sized parcels with it.
"""
import json
import math
import sys
import time
import warnings

# shapely 1.8 warns that STRtree changes in 2.0; the Index class below handles both.
warnings.filterwarnings("ignore", message="STRtree will be changed")

try:
    from shapely.geometry import LineString, MultiPolygon, Polygon, box
    from shapely.ops import unary_union
    from shapely.prepared import prep
    from shapely.strtree import STRtree
except ImportError:  # pragma: no cover - reported to the caller
    sys.stderr.write("python3-shapely is required (Debian: apt-get install python3-shapely)\n")
    sys.exit(3)


def width_at(corridor, s, side):
    base = corridor[side]
    for r in corridor.get("ranges") or []:
        inside = r.get(side, base)
        a, b, t = r["fromStation"], r["toStation"], r["transition"]
        if a <= s <= b:
            return inside
        if t > 0 and a - t < s < a:
            return base + (inside - base) * (s - (a - t)) / t
        if t > 0 and b < s < b + t:
            return inside + (base - inside) * (s - b) / t
    return base


def breakpoints(corridor, s0, s1):
    pts = []
    for r in corridor.get("ranges") or []:
        t = r["transition"]
        pts += [r["fromStation"] - t, r["fromStation"], r["toStation"], r["toStation"] + t]
    return sorted(p for p in set(pts) if s0 < p < s1)


def tangent_side(e, corridor, sign):
    (x0, y0), (x1, y1) = e["start"], e["end"]
    length = math.hypot(x1 - x0, y1 - y0)
    ux, uy = (x1 - x0) / length, (y1 - y0) / length
    nx, ny = uy, -ux  # right normal
    s0, s1 = e["startStation"], e["endStation"]
    side = "right" if sign > 0 else "left"
    out = []
    for s in [s0] + breakpoints(corridor, s0, s1) + [s1]:
        t = (s - s0) / (s1 - s0) * length
        w = width_at(corridor, s, side)
        out.append((x0 + ux * t + sign * nx * w, y0 + uy * t + sign * ny * w))
    return out


def arc_side(e, corridor, sign, sagitta):
    cx, cy = e["center"]
    radius = e["radius"]
    delta = math.radians(e["deltaDeg"])
    turn = 1 if delta > 0 else -1
    a0 = math.atan2(e["start"][1] - cy, e["start"][0] - cx)
    s0, s1 = e["startStation"], e["endStation"]
    side = "right" if sign > 0 else "left"
    rmax = radius + max(width_at(corridor, s, side) for s in [s0, s1] + breakpoints(corridor, s0, s1)) + 1
    step = 2 * math.acos(1 - sagitta / rmax)
    n = max(2, int(math.ceil(abs(delta) / step)))
    thetas = sorted(set([abs(delta) * k / n for k in range(n + 1)] + [(b - s0) / radius for b in breakpoints(corridor, s0, s1)]))
    out = []
    for th in thetas:
        s = s0 + radius * th
        rho = radius + turn * sign * width_at(corridor, s, side)
        a = a0 + turn * th
        out.append((cx + rho * math.cos(a), cy + rho * math.sin(a)))
    return out


def line_meet(p1, p2, q1, q2):
    dx1, dy1 = p2[0] - p1[0], p2[1] - p1[1]
    dx2, dy2 = q2[0] - q1[0], q2[1] - q1[1]
    den = dx1 * dy2 - dy1 * dx2
    t = ((q1[0] - p1[0]) * dy2 - (q1[1] - p1[1]) * dx2) / den
    return (p1[0] + t * dx1, p1[1] + t * dy1)


def side_line(elements, corridor, sign, sagitta):
    pts = []
    prev = None
    for e in elements:
        seg = tangent_side(e, corridor, sign) if e["type"] == "tangent" else arc_side(e, corridor, sign, sagitta)
        if prev is not None and prev["type"] == "tangent" and e["type"] == "tangent":
            meet = line_meet(pts[-2], pts[-1], seg[0], seg[1])
            pts[-1] = meet
            seg = seg[1:]
        elif pts:
            seg = seg[1:]
        pts += seg
        prev = e
    return pts


def corridor_polygon(elements, corridor, sagitta):
    right = side_line(elements, corridor, 1, sagitta)
    left = side_line(elements, corridor, -1, sagitta)
    poly = Polygon(right + left[::-1])
    if not poly.is_valid:
        sys.stderr.write("reference corridor polygon is not valid\n")
        sys.exit(4)
    return poly


def centreline(elements, sagitta):
    """The centreline as points: tangent ends, and arcs sampled so that each chord's sagitta is below `sagitta`."""
    pts = [tuple(elements[0]["start"])]
    for e in elements:
        if e["type"] == "tangent":
            pts.append(tuple(e["end"]))
            continue
        cx, cy = e["center"]
        radius = e["radius"]
        delta = math.radians(e["deltaDeg"])
        a0 = math.atan2(e["start"][1] - cy, e["start"][0] - cx)
        n = max(2, int(math.ceil(abs(delta) / (2 * math.acos(1 - sagitta / radius)))))
        pts += [(cx + radius * math.cos(a0 + delta * k / n), cy + radius * math.sin(a0 + delta * k / n)) for k in range(1, n + 1)]
    return pts


def buffered_corridor(elements, corridor, sagitta):
    if corridor["left"] != corridor["right"] or corridor.get("ranges"):
        sys.stderr.write("a buffered reference corridor needs equal constant half-widths\n")
        sys.exit(5)
    # cap_style 2 = flat, join_style 2 = mitre (shapely 1.8 and 2.x); a mitre limit of 100 keeps every angle point's corner.
    return LineString(centreline(elements, sagitta)).buffer(corridor["left"], cap_style=2, join_style=2, mitre_limit=100.0)


def widened(corridor, extra):
    out = {"left": corridor["left"] + extra, "right": corridor["right"] + extra}
    if corridor.get("ranges"):
        out["ranges"] = [dict(r, left=r.get("left", corridor["left"]) + extra, right=r.get("right", corridor["right"]) + extra) for r in corridor["ranges"]]
    return out


def parcel_geometry(p):
    polys = [Polygon(rings[0], rings[1:]) for rings in p["polygons"]]
    return polys[0] if len(polys) == 1 else MultiPolygon(polys)


class Index:
    """STRtree over the parcels giving indices, on shapely 1.8 (returns geometries) and 2.x (indices)."""

    def __init__(self, geoms):
        self.tree = STRtree(geoms)
        self.where = {id(g): i for i, g in enumerate(geoms)}

    def query_items(self, geom):
        return [int(h) if not hasattr(h, "geom_type") else self.where[id(h)] for h in self.tree.query(geom)]


def centreline_boxes(elements, reach, step=100.0):
    """Boxes around the centreline every `step` units, grown by `reach`: STRtree queries as tight as
    the engine's pieces (querying with the whole corridor's envelope would return every parcel in
    a 10 km square)."""
    pts = []
    for e in elements:
        n = max(1, int(math.ceil(e["length"] / step)))
        for k in range(n + 1):
            f = k / n
            if e["type"] == "tangent":
                pts.append((e["start"][0] + f * (e["end"][0] - e["start"][0]), e["start"][1] + f * (e["end"][1] - e["start"][1])))
            else:
                cx, cy = e["center"]
                a0 = math.atan2(e["start"][1] - cy, e["start"][0] - cx)
                a = a0 + math.radians(e["deltaDeg"]) * f
                pts.append((cx + e["radius"] * math.cos(a), cy + e["radius"] * math.sin(a)))
    boxes = []
    for (x0, y0), (x1, y1) in zip(pts, pts[1:]):
        boxes.append(box(min(x0, x1) - reach, min(y0, y1) - reach, max(x0, x1) + reach, max(y0, y1) + reach))
    return boxes


def overlay(row, ids, geoms, tree, boxes):
    """Per-parcel intersection areas: STRtree candidates near the line, prepared corridor, GEOS intersection."""
    pr = prep(row)
    areas = {}
    candidates = set()
    for b in boxes:
        candidates.update(tree.query_items(b))
    for i in candidates:
        g = geoms[i]
        if pr.intersects(g):
            a = row.intersection(g).area
            if a > 0:
                areas[ids[i]] = a
    return areas


def main():
    job = json.load(open(sys.argv[1]))
    if "parcelsFile" in job:
        job["parcels"] = json.load(open(job["parcelsFile"]))
    sag = job.get("sagitta", 1e-5)
    t_build = time.perf_counter()
    ids = [p["id"] for p in job["parcels"]]
    geoms = [parcel_geometry(p) for p in job["parcels"]]
    tree = Index(geoms)
    built = time.perf_counter() - t_build
    build = buffered_corridor if job.get("buffered") else corridor_polygon
    row = build(job["elements"], job["corridor"], sag)
    out = {"corridorArea": row.area, "fabricSeconds": built}
    c = job["corridor"]
    widest = max([c["left"], c["right"]] + [r.get(k, 0) for r in c.get("ranges") or [] for k in ("left", "right")]) + (c.get("easement") or 0)
    boxes = centreline_boxes(job["elements"], widest * 1.5 + 1)
    repeat = job.get("repeat", 1)
    times = []
    for _ in range(repeat):
        t0 = time.perf_counter()
        takes = overlay(row, ids, geoms, tree, boxes)
        times.append(time.perf_counter() - t0)
    out["takes"] = takes
    out["overlaySeconds"] = sorted(times)[len(times) // 2]
    out["candidates"] = len(set(i for b in boxes for i in tree.query_items(b)))
    e = job["corridor"].get("easement") or 0
    if e > 0:
        wide = build(job["elements"], widened(job["corridor"], e), sag)
        out["wideArea"] = wide.area
        out["wideTakes"] = overlay(wide, ids, geoms, tree, boxes)
    if job.get("geosSagitta"):
        coarse = corridor_polygon(job["elements"], job["corridor"], job["geosSagitta"])
        times = []
        for _ in range(repeat):
            t0 = time.perf_counter()
            coarse_takes = overlay(coarse, ids, geoms, tree, boxes)
            times.append(time.perf_counter() - t0)
        out["coarseOverlaySeconds"] = sorted(times)[len(times) // 2]
        out["coarseMaxDiff"] = max(abs(coarse_takes.get(k, 0) - takes.get(k, 0)) for k in set(takes) | set(coarse_takes))
        out["coarseVertices"] = len(coarse.exterior.coords)
    out["vertices"] = len(row.exterior.coords) if hasattr(row, "exterior") else sum(len(g.exterior.coords) for g in row.geoms)
    if job.get("pieces"):
        index = {pid: i for i, pid in enumerate(ids)}
        out["pieces"] = {}
        for pid in takes:
            rest = geoms[index[pid]].difference(row)
            parts = list(rest.geoms) if hasattr(rest, "geoms") else [rest]
            out["pieces"][pid] = sorted((g.area for g in parts if g.area >= 0.01), reverse=True)
    if job.get("unparcelled"):
        near = [geoms[i] for i in tree.query_items(row)]
        out["unparcelledArea"] = row.difference(unary_union(near)).area if near else row.area
    json.dump(out, sys.stdout)


if __name__ == "__main__":
    main()
