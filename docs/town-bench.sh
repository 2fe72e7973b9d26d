#!/usr/bin/env bash
# Town-like grids: the undirected postman at the odd-node density of real street layers. Generates
# docs/bench/make_grid.py SIDE --town (invented: perturbed 80 m blocks, missing sides, lanes, cul-de-sacs,
# long through streets) and plans each end to end through the command line in a fresh JVM with a heap of $HEAP
# (default 3g),
# one-way flags ignored (--oneway-field=none) and the generator's footbridges kept apart (--grade-separated).
# Prints a Markdown table; docs/benchmarks.md explains the columns.
# Usage: [HEAP=16g] docs/town-bench.sh [SIDE ...]   (nodes per grid side; 192 ~ 100,000 streets, 608 ~ 1,000,000)
# Heavy sizes: run alone on the machine, e.g.  flock /tmp/heavy.lock docs/town-bench.sh 192 333 608
set -euo pipefail
cd "$(dirname "$0")/.."
[ -f target/streetcomb.jar ] || mvn -q -B package -DskipTests
heap=${HEAP:-3g}
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
echo "| heap | streets | nodes | odd nodes | odd share | read s | network s | solve s | solve / network | wall s | peak RSS MiB | tour km |"
echo "|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|"
for side in ${@:-192}; do
  python3 docs/bench/make_grid.py "$side" "$tmp/grid.geojson" --town >/dev/null
  STREETCOMB_JAVA_OPTS=-Xmx$heap /usr/bin/time -f "%e %M" -o "$tmp/time" ./streetcomb plan "$tmp/grid.geojson" \
    --grade-separated --oneway-field=none --quiet --json -o "$tmp/tour.geojson" > "$tmp/plan.json" 2>/dev/null
  python3 - "$tmp" "$heap" <<'PY'
import json, sys
d = sys.argv[1]
plan = json.load(open(f"{d}/plan.json"))
wall, rss = open(f"{d}/time").read().split()[-2:]
n, s = plan["network"], plan["seconds"]
print(f"| {sys.argv[2]} | {n['edges']:,} | {n['nodes']:,} | {n['odd_nodes']:,} | {n['odd_nodes'] / n['nodes']:.2f} | {s['read']:.2f} | "
      f"{s['network']:.2f} | {s['solve']:.2f} | {s['solve'] / s['network']:.1f} | {float(wall):.1f} | "
      f"{int(rss) / 1024:,.0f} | {plan['totals']['tour_m'] / 1000:,.3f} |")
PY
done
