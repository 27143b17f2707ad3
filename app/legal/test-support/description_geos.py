#!/usr/bin/env python3
"""GEOS (Debian python3-shapely) check of legal descriptions. Used only by tests.

Reads a JSON job (argv[1]): elements, corridor, parcels [{id, polygons}], descriptions
{parcelId: [part: [ring: [course]]]}. Rebuilds each description as a polygon by walking its
courses -- arcs from their centre, radius, direction and central angle, densified at 1e-5 units
of sagitta -- and compares it with GEOS's parcel intersected with the right-of-way that
tests/reference/corridor_geos.py builds on its own from the elements and widths.
Prints {parcelId: {area, refArea, symDiff, hausdorff}}.
"""
import json
import math
import os
import sys

sys.path.insert(0, os.path.join(os.path.dirname(__file__), "..", "..", "..", "tests", "reference"))
from corridor_geos import corridor_polygon, parcel_geometry  # noqa: E402
from shapely.geometry import MultiPolygon, Polygon  # noqa: E402

SAGITTA = 1e-5


def ring_points(courses):
    pts = []
    for c in courses:
        pts.append(tuple(c["from"]))
        if c["kind"] == "arc":
            cx, cy = c["center"]
            r = c["radius"]
            sweep = math.radians(c["deltaDeg"]) * (1 if c["direction"] == "left" else -1)
            a0 = math.atan2(c["from"][1] - cy, c["from"][0] - cx)
            step = 2 * math.acos(1 - SAGITTA / r)
            n = max(1, int(math.ceil(abs(sweep) / step)))
            for k in range(1, n):
                a = a0 + sweep * k / n
                pts.append((cx + r * math.cos(a), cy + r * math.sin(a)))
    return pts


def description_polygon(parts):
    polys = [Polygon(ring_points(rings[0]), [ring_points(h) for h in rings[1:]]) for rings in parts]
    return polys[0] if len(polys) == 1 else MultiPolygon(polys)


def main():
    job = json.load(open(sys.argv[1]))
    row = corridor_polygon(job["elements"], job["corridor"], SAGITTA)
    parcels = {p["id"]: parcel_geometry(p) for p in job["parcels"]}
    out = {}
    for pid, parts in job["descriptions"].items():
        ref = parcels[pid].intersection(row)
        mine = description_polygon(parts)
        out[pid] = {
            "area": mine.area,
            "refArea": ref.area,
            "symDiff": mine.symmetric_difference(ref).area,
            "hausdorff": mine.hausdorff_distance(ref),
            "valid": mine.is_valid,
        }
    json.dump(out, sys.stdout)


if __name__ == "__main__":
    main()
