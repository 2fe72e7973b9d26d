#!/usr/bin/env python3
"""Writes an invented grid layer for the health-check benchmark: N x N nodes, 80 m blocks, every block side
its own line (about 2 N^2 edges), with seeded defects sprinkled in: one-way block sides, dead ends that stop
short, duplicated sides and crossing footbridges. Set in the open Atlantic; matches no real place.

    python3 docs/bench/make_grid.py 224 /tmp/grid-100k.geojson
    python3 docs/bench/make_grid.py 224 /tmp/grid-100k-mixed.geojson 0.2   # a fifth of the sides one-way

The optional third argument is the share of block sides made one-way (default 0.01); their directions are
drawn from a second seeded generator (half along the side, half against); without it the layer is as before.
"""
import json
import math
import random
import sys

n, target = int(sys.argv[1]), sys.argv[2]
rng = random.Random(5)
one_way_share = float(sys.argv[3]) if len(sys.argv) > 3 else 0.01
directions = random.Random(7) if len(sys.argv) > 3 else None
LON0, LAT0 = -29.0, 43.0
M_LAT = 111_132.0
M_LON = M_LAT * math.cos(math.radians(LAT0))


def ll(x, y):
    return [round(LON0 + x / M_LON, 7), round(LAT0 + y / M_LAT, 7)]


features = []


def add(points, **props):
    features.append({"type": "Feature", "id": f"g{len(features)}", "properties": props,
                     "geometry": {"type": "LineString", "coordinates": [ll(x, y) for x, y in points]}})


for j in range(n):
    for i in range(n):
        for dx, dy in ((1, 0), (0, 1)):
            if i + dx >= n or j + dy >= n:
                continue
            a, b = (80 * i, 80 * j), (80 * (i + dx), 80 * (j + dy))
            r = rng.random()
            if r < 0.002:          # a side that stops 1.5 m short of its junction
                b = (b[0] - 1.5 * dx, b[1] - 1.5 * dy)
            if r > 0.998:          # a side drawn twice
                add([a, b])
            one_way = rng.random() < one_way_share
            add([a, b], **({"oneway": directions.choice(("yes", "-1")) if directions else "yes"} if one_way else {}))
for _ in range(n * n // 500):  # footbridges across a block side, no shared vertex
    i, j = rng.randrange(n - 1), rng.randrange(1, n - 1)
    add([(80 * i + 40, 80 * j - 20), (80 * i + 40, 80 * j + 20)], bridge="yes")
with open(target, "w") as out:
    json.dump({"type": "FeatureCollection", "features": features}, out, separators=(",", ":"))
print(len(features), "lines written to", target)
