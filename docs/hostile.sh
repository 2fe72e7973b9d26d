#!/bin/sh
# Runs the hostile-input corpus (bad layers, option files and tracks; output clashes; text that travels;
# pathological geometry; reproducible reports) and the reader fuzzing, then prints the counts: cases per
# test class from the surefire reports, and the fuzzing's runs per reader and how each ended.
#   sh docs/hostile.sh [FUZZ_SECONDS]        (default 40, as in CI)
set -eu
cd "$(dirname "$0")/.."
classes='ShapefileBadInputTest,OsmBadInputTest,GpxTrackReaderTest,GeoPackageReaderTest,OutputGuardTest,HostileTextTest,StandardStreamsTest,CrossingLimitTest,LastResortTest,AtomicFileTest,AuditCommandTest,PlanCommandTest,ReportOptionsTest,ReaderFuzzTest'
mvn -q -B test -Dtest="$classes" -Dstreetcomb.fuzz.seconds="${1:-40}"
python3 - "$classes" <<'PY'
import re, sys, glob
total = [0, 0]
print("%-26s %6s %9s" % ("class", "cases", "failures"))
for c in sys.argv[1].split(","):
    head = open(glob.glob("target/surefire-reports/TEST-*." + c + ".xml")[0]).read(2000)
    tests = int(re.search(r' tests="(\d+)"', head).group(1))
    bad = int(re.search(r' failures="(\d+)"', head).group(1)) + int(re.search(r' errors="(\d+)"', head).group(1))
    total[0] += tests; total[1] += bad
    print("%-26s %6d %9d" % (c, tests, bad))
print("%-26s %6d %9d" % ("all", total[0], total[1]))
PY
cat target/hostile/fuzz.txt
