#!/usr/bin/env bash
# Plans tours of generated street grids of increasing size, one JVM per size, and prints a Markdown
# table (docs/benchmarks.md explains the columns). Usage: docs/bench.sh [EDGES ...]
set -euo pipefail
cd "$(dirname "$0")/.."
mvn -q -B test-compile dependency:build-classpath -Dmdep.outputFile=target/bench.classpath >/dev/null
cp="target/classes:target/test-classes:$(cat target/bench.classpath)"
echo "| edges | odd nodes | read s | network s | solve s | order s | turns s | total s | peak heap MiB | JGraphT ChinesePostman time / ours |"
echo "|---:|---:|---:|---:|---:|---:|---:|---:|---:|---|"
for edges in ${@:-10000 100000 1000000}; do
  # JGraphT's ChinesePostman is cubic in the odd nodes: compare only where it can finish
  limit=$([ "$edges" -le 20000 ] && echo 300 || echo 0)
  java -Xmx16g -cp "$cp" org.streetcomb.bench.PlanBenchmark "$edges" "$limit"
done
