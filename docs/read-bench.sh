#!/usr/bin/env bash
# Reads road layers, one JVM per layer, and prints a Markdown table (docs/readers.md explains the
# columns). Usage: docs/read-bench.sh LAYER GDAL-LAYER [layer options] [-- LAYER GDAL-LAYER [options] ...]
# GDAL-LAYER is the layer name ogrinfo uses (the shapefile's base name, "lines" for OSM), or - to skip it.
set -euo pipefail
cd "$(dirname "$0")/.."
mvn -q -B test-compile dependency:build-classpath -Dmdep.outputFile=target/bench.classpath >/dev/null
cp="target/classes:target/test-classes:$(cat target/bench.classpath)"
echo "| layer | features | lines | edges | one-way edges | network km | read s | network s | peak heap MiB | ogrinfo read s | ours / ogrinfo |"
echo "|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|"
args=()
for arg in "$@" --; do
  if [ "$arg" = "--" ]; then
    [ ${#args[@]} -gt 0 ] && java -Xmx2g -cp "$cp" org.streetcomb.bench.ReadBenchmark "${args[@]}"
    args=()
  else
    args+=("$arg")
  fi
done
