#!/bin/sh
# Regenerates the report pictures in README.md (docs/report-demo.png, docs/audit-report.png) from the demo
# town: the plan cut into 12 km trips, and the audit of the simulated drive with its mop-up. Needs chromium.
# Usage: docs/screenshots.sh
set -eu
cd "$(dirname "$0")/.."
mvn -q -B package -DskipTests
mvn -q -B test-compile dependency:build-classpath -Dmdep.outputFile=target/shot.classpath >/dev/null
out=target/screenshots
mkdir -p "$out"
./streetcomb plan fixtures/demo/brackenford.geojson --depot=-31.2,44.6 --max-trip-km 12 \
    --report "$out/plan.html" -q > /dev/null
./streetcomb audit fixtures/demo/brackenford.geojson fixtures/demo/brackenford-drive.gpx --depot=-31.2,44.6 \
    --mop-up "$out/mop-up.geojson" --report "$out/audit.html" -q > /dev/null
cp="target/test-classes:target/classes:$(cat target/shot.classpath)"
java -cp "$cp" org.streetcomb.report.ReportScreenshot "$out/plan.html" docs/report-demo.png
java -cp "$cp" org.streetcomb.report.ReportScreenshot "$out/audit.html" docs/audit-report.png
