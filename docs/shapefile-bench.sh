#!/usr/bin/env bash
# Whole-command time of `streetcomb health` on each shapefile given, against the same layer converted to
# GeoJSON (WGS 84, by GDAL's ogr2ogr) and against ogrinfo reading every geometry, all in the same run.
# The first shapefile run starts with an empty CRS cache (cold: the EPSG database is searched once); the
# second finds the stored transformation (warm, as every later run). Prints a Markdown table
# (docs/readers.md explains it). Usage: docs/shapefile-bench.sh SHP [SHP ...]; build the jar first.
set -euo pipefail
cd "$(dirname "$0")/.."
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
export STREETCOMB_JAVA_OPTS="-Xmx2g -Dstreetcomb.crs.cache=$work/crs"
seconds() { local t0 t1; t0=$(date +%s.%N); "$@" >/dev/null 2>&1 || true; t1=$(date +%s.%N); echo "$t1 - $t0" | bc -l; }
echo "| shapefile | features | cold s | warm s | GeoJSON twin s | warm / GeoJSON | ogrinfo s | warm / ogrinfo |"
echo "|---|---:|---:|---:|---:|---:|---:|---:|"
for shp in "$@"; do
  name=$(basename "$shp" .shp)
  twin="$work/$(basename "$(dirname "$shp")")-$name.geojson"
  ogr2ogr -f GeoJSON -t_srs EPSG:4326 -lco COORDINATE_PRECISION=9 "$twin" "$shp"
  features=$(ogrinfo -ro -so "$shp" "$name" | sed -n 's/^Feature Count: //p')
  cold=$(seconds ./streetcomb health "$shp" -q)
  warm=$(seconds ./streetcomb health "$shp" -q)
  json=$(seconds ./streetcomb health "$twin" -q)
  ogr=$(seconds ogrinfo -ro -q -dialect SQLite -sql "SELECT SUM(ST_NPoints(geometry)) FROM \"$name\"" "$shp")
  printf '| %s | %s | %.2f | %.2f | %.2f | %.2f | %.2f | %.2f |\n' "$(basename "$(dirname "$shp")")/$name.shp" "$features" \
    "$cold" "$warm" "$json" "$(echo "$warm / $json" | bc -l)" "$ogr" "$(echo "$warm / $ogr" | bc -l)"
done
