#!/usr/bin/env python3
"""Writes an invented grid layer for benchmarks: N x N junctions, 80 m blocks, every block side its own
line (about 2 N^2 edges), with seeded defects sprinkled in: one-way block sides, dead ends that stop short,
duplicated sides and crossing footbridges. Set in the open Atlantic; matches no real place.

    python3 docs/bench/make_grid.py 224 /tmp/grid-100k.geojson
    python3 docs/bench/make_grid.py 224 /tmp/grid-100k-mixed.geojson 0.2   # a fifth of the sides one-way
    python3 docs/bench/make_grid.py 172 /tmp/town-100k.geojson --town      # real-town density

The optional third argument is the share of block sides made one-way (default 0.01); their directions are
drawn from a second seeded generator (half along the side, half against); without it the layer is as before.

The easy grid has about one odd node in a hundred; real street layers have half or more (docs/benchmarks.md,
"Town-like grids", measured with NetworkCensus). The town knobs below bring the grid to that density. Each
draws from its own seeded generator, so turning one knob changes nothing the others drew, and the one-way
share stays the third argument's alone:

    --missing P   share of block sides left out (a junction losing one of four sides becomes odd)
    --lanes P     share of blocks crossed by a lane joining the middles of two opposite sides (two T-junctions)
    --cul-de-sacs P  share of block sides with an 18 m dead-end stub off their side (a T-junction and a dead end)
    --through P   share of east-west rows drawn as one long line through every junction (the noder splits them)
    --jitter M    junctions moved by up to M metres each way (perturbed blocks)
    --town        the defaults measured from the shared real layers: missing 0.12, lanes 0.25, cul-de-sacs
                  0.12, through 0.3, jitter 8 (explicit knobs override it)
"""
import argparse
import json
import math
import random

TOWN = {"missing": 0.12, "lanes": 0.25, "cul_de_sacs": 0.12, "through": 0.3, "jitter": 8.0}
parser = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
parser.add_argument("n", type=int)
parser.add_argument("target")
parser.add_argument("one_way_share", type=float, nargs="?")
parser.add_argument("--town", action="store_true")
for knob in TOWN:
    parser.add_argument("--" + knob.replace("_", "-"), type=float)
args = parser.parse_args()
knobs = {k: (getattr(args, k) if getattr(args, k) is not None else (v if args.town else 0.0)) for k, v in TOWN.items()}

n, target = args.n, args.target
rng = random.Random(5)
one_way_share = args.one_way_share if args.one_way_share is not None else 0.01
directions = random.Random(7) if args.one_way_share is not None else None
missing_rng, lane_rng, stub_rng, through_rng, jitter_rng = (random.Random(s) for s in (11, 13, 17, 19, 23))
LON0, LAT0 = -29.0, 43.0
M_LAT = 111_132.0
M_LON = M_LAT * math.cos(math.radians(LAT0))
STUB = 18.0


def ll(x, y):
    return [round(LON0 + x / M_LON, 7), round(LAT0 + y / M_LAT, 7)]


features = []


def add(points, **props):
    features.append({"type": "Feature", "id": f"g{len(features)}", "properties": props,
                     "geometry": {"type": "LineString", "coordinates": [ll(x, y) for x, y in points]}})


jit = knobs["jitter"]
corner = {(i, j): (80 * i + jitter_rng.uniform(-jit, jit) if jit else 80 * i,
                   80 * j + jitter_rng.uniform(-jit, jit) if jit else 80 * j)
          for j in range(n) for i in range(n)}


def at(a, b, f):
    return (a[0] + (b[0] - a[0]) * f, a[1] + (b[1] - a[1]) * f)


present = {}
for j in range(n):
    for i in range(n):
        for dx, dy in ((1, 0), (0, 1)):
            if i + dx < n and j + dy < n:
                present[(i, j, dx, dy)] = not (knobs["missing"] and missing_rng.random() < knobs["missing"])
cuts = {side: [] for side in present}  # fractions along a side where a lane or stub meets it
extra = []
for j in range(n - 1):
    for i in range(n - 1):
        west, east = (i, j, 0, 1), (i + 1, j, 0, 1)
        if knobs["lanes"] and lane_rng.random() < knobs["lanes"] and present[west] and present[east]:
            cuts[west].append(0.5)
            cuts[east].append(0.5)
            extra.append((at(corner[(i, j)], corner[(i, j + 1)], 0.5), at(corner[(i + 1, j)], corner[(i + 1, j + 1)], 0.5)))
for side in sorted(present):
    if knobs["cul_de_sacs"] and stub_rng.random() < knobs["cul_de_sacs"] and present[side]:
        i, j, dx, dy = side
        f, sign = stub_rng.choice((0.3, 0.7)), stub_rng.choice((-1, 1))
        a, b = corner[(i, j)], corner[(i + dx, j + dy)]
        m = at(a, b, f)
        cuts[side].append(f)
        extra.append((m, (m[0] + sign * STUB * dy, m[1] + sign * STUB * dx)))

through_rows = {j for j in range(n) if knobs["through"] and through_rng.random() < knobs["through"]}
row_run = []  # pieces of the current east-west row waiting to be joined into one line


def flush():
    if row_run:
        add([row_run[0][0]] + [p[1] for p in row_run])
        row_run.clear()


for j in range(n):
    for i in range(n):
        for dx, dy in ((1, 0), (0, 1)):
            if i + dx >= n or j + dy >= n:
                continue
            side = (i, j, dx, dy)
            a, b = corner[(i, j)], corner[(i + dx, j + dy)]
            r = rng.random()
            if r < 0.002:          # a side that stops 1.5 m short of its junction
                b = (b[0] - 1.5 * dx, b[1] - 1.5 * dy)
            if r > 0.998 and present[side]:  # a side drawn twice
                add([a, b])
            one_way = rng.random() < one_way_share
            if not present[side]:
                if dx:
                    flush()
                continue
            props = {"oneway": directions.choice(("yes", "-1")) if directions else "yes"} if one_way else {}
            stops = [0.0] + sorted(cuts[side]) + [1.0]
            pieces = [(at(a, b, f), at(a, b, g)) for f, g in zip(stops, stops[1:])]
            if dx and j in through_rows and not props and r >= 0.002:
                row_run.extend(pieces)
                continue
            if dx:
                flush()
            for p, q in pieces:
                add([p, q], **props)
    flush()
for p, q in extra:
    add([p, q])
for _ in range(n * n // 500):  # footbridges across a block side, no shared vertex
    i, j = rng.randrange(n - 1), rng.randrange(1, n - 1)
    add([(80 * i + 40, 80 * j - 20), (80 * i + 40, 80 * j + 20)], bridge="yes")
with open(target, "w") as out:
    json.dump({"type": "FeatureCollection", "features": features}, out, separators=(",", ":"))
print(len(features), "lines written to", target)
