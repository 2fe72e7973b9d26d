#!/bin/sh
# Plans and audits the demo town and three real layers with one streetcomb jar and prints a SHA-256 of
# every output, stage times masked (the --json summaries carry them; they differ run to run; reports no longer do).
# Run it with the jar before and after a change that should not alter outputs, and compare the lists:
#
#   docs/identical-outputs.sh BASE.jar > before.txt; docs/identical-outputs.sh target/streetcomb.jar > after.txt
#   diff before.txt after.txt
#
# plan: trips (--max-trip-km), real layers with --leave-out-cut-off (one-way data cuts some streets off)
# and --depot-part-only (trips start at the depot), GeoJSON, GPX, direction sheet, HTML report, --json summary.
# audit, with the same options: a drive made from every other trip of that plan (its GPX track points, one
# fix every 2 s), with the mop-up tour (GeoJSON, GPX, sheet), the street and missed layers, report and --json
# summary. Monaco is run twice: walking (undirected) and driving with its one-way streets (mixed).
# Real layers are read from ../shared/realdata (REALDATA to override); outputs go to a scratch folder that
# has the same path on every run, since summaries name their files.
set -eu
jar=$(cd "$(dirname "$1")" && pwd)/$(basename "$1")
here=$(cd "$(dirname "$0")/.." && pwd)
real=${REALDATA:-$here/../shared/realdata}
run=${SCRATCH:-/tmp/streetcomb-identical}
rm -rf "$run"
mkdir -p "$run"
sc() { java -Xmx6g -jar "$jar" "$@"; }

mask() {
  # JSON summaries: every "seconds" object; HTML: the cells keyed seconds.*
  for f in "$@"; do
    case "$f" in
      *.json) python3 - "$f" <<'PY'
import json, sys
path = sys.argv[1]
def drop(x):
    if isinstance(x, dict):
        return {k: drop(v) for k, v in x.items() if k != "seconds"}
    if isinstance(x, list):
        return [drop(v) for v in x]
    return x
data = json.load(open(path))
open(path, "w").write(json.dumps(drop(data), indent=1, sort_keys=False))
PY
      ;;
      *.html) sed -i -E 's/(data-key="seconds\.[^"]+"[^>]*>)[^<]*</\1#</g' "$f" ;;
    esac
  done
}

drive() {
  # every other <trk> of a plan GPX as a timed drive
  python3 - "$1" "$2" <<'PY'
import re, sys
text = open(sys.argv[1]).read()
tracks = re.findall(r"<trk>.*?</trk>", text, re.S)
out = ['<?xml version="1.0" encoding="UTF-8"?>',
       '<gpx version="1.1" creator="identical-outputs.sh" xmlns="http://www.topografix.com/GPX/1/1">']
second = 0
for i, trk in enumerate(tracks):
    if i % 2 == 1 and len(tracks) > 1:
        continue
    out.append("<trk><trkseg>")
    for lat, lon in re.findall(r'<trkpt lat="([^"]+)" lon="([^"]+)"', trk):
        h, m, s = second // 3600, second // 60 % 60, second % 60
        out.append(f'<trkpt lat="{lat}" lon="{lon}"><time>2026-03-02T{7 + h:02d}:{m:02d}:{s:02d}Z</time></trkpt>')
        second += 2
    out.append("</trkseg></trk>")
out.append("</gpx>")
open(sys.argv[2], "w").write("\n".join(out) + "\n")
PY
}

one() {
  # NAME LAYER TRIP_KM OPTIONS... (the options go to both plan and audit)
  name=$1; layer=$2; trip_km=$3; shift 3
  d="$run/$name"
  mkdir -p "$d"
  cd "$d"
  sc plan "$layer" "$@" --max-trip-km "$trip_km" --out plan.geojson --gpx plan.gpx --directions plan-sheet.html \
    --report plan-report.html --json > plan.json
  drive plan.gpx drive.gpx
  sc audit "$layer" drive.gpx "$@" --streets-out streets.geojson --missed-out missed.geojson \
    --mop-up mop-up.geojson --gpx mop-up.gpx --directions mop-up-sheet.html --report audit-report.html \
    --json > audit.json
  mask plan.json audit.json plan-report.html audit-report.html
  cd "$run"
}

p="--leave-out-cut-off --depot-part-only"
one demo "$here/fixtures/demo/brackenford.geojson" 10 --depot=-31.2,44.6
one vienna "$real/geojson-vienna-streets/vienna-streets.geojson" 40 $p --oneway-field=no_such_field
one monaco "$real/osm-monaco-2021/monaco-latest.osm.pbf" 40 $p --mode=walk
one monaco-drive "$real/osm-monaco-2021/monaco-latest.osm.pbf" 20 $p
one aurich "$real/shp-aurich-osm-roads-dhdn-gk2/roads.shp" 40 $p --oneway-field=no_such_field --drop=type=footway,cycleway,track,path
cd "$run"
find . -type f | LC_ALL=C sort | xargs sha256sum
