#!/usr/bin/env bash
# Mixed postman at scale: generated grids with a fifth of the block sides one-way (docs/bench/make_grid.py
# with a one-way share of 0.2), planned by the command line twice in the same run: as they are (mixed
# postman) and with the one-way flags ignored (--oneway-field naming no field: the undirected postman on the
# same streets). Prints a Markdown table; docs/benchmarks.md explains the columns.
# Usage: docs/mixed-bench.sh [SIDE ...]   (nodes per grid side; 71 ~ 10,000 streets, 224 ~ 100,000)
# Heavy sizes: run as  flock /tmp/heavy.lock timeout 900 docs/mixed-bench.sh 224
set -euo pipefail
cd "$(dirname "$0")/.."
[ -f target/streetcomb.jar ] || mvn -q -B package -DskipTests
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
echo "| streets | one-way | mixed solve s | undirected solve s | ratio | mixed peak RSS MiB | tour km | bound km | certified gap | bound used |"
echo "|---:|---:|---:|---:|---:|---:|---:|---:|---:|---|"
for side in ${@:-71 122}; do
  python3 docs/bench/make_grid.py "$side" "$tmp/grid.geojson" 0.2 >/dev/null
  run() {  # $1: output stem, rest: extra options
    local stem=$1; shift
    STREETCOMB_JAVA_OPTS=-Xmx2g /usr/bin/time -f "%M" -o "$tmp/$stem.rss" ./streetcomb plan "$tmp/grid.geojson" \
      --leave-out-cut-off --quiet --json -o "$tmp/$stem.tour.geojson" "$@" > "$tmp/$stem.json" 2>/dev/null
  }
  run mixed
  run undirected --oneway-field=no_such_field
  python3 - "$tmp" <<'PY'
import json, re, sys
d = sys.argv[1]
mixed = json.load(open(f"{d}/mixed.json"))
und = json.load(open(f"{d}/undirected.json"))
rss = int(open(f"{d}/mixed.rss").read().split()[-1]) / 1024
one_way = sum(1 for f in json.load(open(f"{d}/grid.geojson"))["features"] if f["properties"].get("oneway"))
t = mixed["totals"]
bound = re.search(r"bound: ([^)]*)\)", mixed["method"])
print(f"| {mixed['network']['edges']:,} | {one_way:,} | {mixed['seconds']['solve']:.2f} | {und['seconds']['solve']:.2f} | "
      f"{mixed['seconds']['solve'] / und['seconds']['solve']:.1f} | {rss:,.0f} | {t['tour_m'] / 1000:,.3f} | "
      f"{t['lower_bound_m'] / 1000:,.3f} | {100 * t['gap']:.2f} % | {bound.group(1) if bound else 'undirected and flow relaxations'} |")
PY
done
