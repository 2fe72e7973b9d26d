#!/bin/sh
# Benchmark of the audit command's HTML report and PNG quick look: see docs/report.md. Needs chromium.
# Usage: docs/audit-report-bench.sh [OUTPUT-FOLDER] [LAYER...]   (default target/audit-report-bench, demo town and a 70x70 grid)
set -eu
cd "$(dirname "$0")/.."
mvn -q -B test-compile dependency:build-classpath -Dmdep.outputFile=target/bench.classpath >/dev/null
exec java -Xmx4g -cp "target/test-classes:target/classes:$(cat target/bench.classpath)" org.streetcomb.report.AuditReportBench "$@"
