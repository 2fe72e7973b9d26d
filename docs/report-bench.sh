#!/bin/sh
# Benchmark of the HTML report and PNG quick look: see docs/report.md. Needs chromium.
# Usage: docs/report-bench.sh [OUTPUT-FOLDER] [GRID-SIDE]   (default target/report-bench 224, about 100 000 edges)
set -eu
cd "$(dirname "$0")/.."
mvn -q -B test-compile dependency:build-classpath -Dmdep.outputFile=target/bench.classpath >/dev/null
exec java -Xmx8g -cp "target/test-classes:target/classes:$(cat target/bench.classpath)" org.streetcomb.report.ReportBench "$@"
