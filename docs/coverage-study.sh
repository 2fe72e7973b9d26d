#!/bin/sh
# Reruns every simulated-drive study of the coverage audit that docs/quality.md reports and prints its
# tables (rows as target/quality/*.md holds them). Simulated data, seeded: the same figures on any machine.
# About 25 minutes on two cores. Run from the repository root:  sh docs/coverage-study.sh > study.txt
set -eu
run() {
  # LABEL, then Maven properties
  label=$1; shift
  mvn -q -B test -Dsurefire.failIfNoSpecifiedTests=false "$@" > /dev/null 2>&1 || true
  echo "## $label ($*)"
  cat target/quality/coverage-*.md target/quality/legal-*.md 2>/dev/null || true
  echo
  rm -f target/quality/coverage-*.md target/quality/legal-*.md
}
s=-Dtest=SkippedStreetSimulationTest
run "held-out seeds, doubt odds 20" $s -Dcoverage.seeds=11-30
run "tuning seeds, doubt odds 20" $s
run "tuning seeds, doubt odds 1" $s -Dcoverage.odds=1
for odds in 1 3 5 10; do
  run "held-out seeds, doubt odds $odds" $s -Dcoverage.seeds=11-30 -Dcoverage.odds=$odds
done
run "persisting noise, 10 s" $s -Dcoverage.seeds=11-30 -Dcoverage.noise-memory=10
run "persisting noise, 60 s" $s -Dcoverage.seeds=11-30 -Dcoverage.noise-memory=60
run "drift window 60 s" $s -Dcoverage.seeds=11-30 -Dcoverage.drift-window=60
run "drift window 60 s, persisting noise 60 s" $s -Dcoverage.seeds=11-30 -Dcoverage.drift-window=60 -Dcoverage.noise-memory=60
run "legal drives on one-way networks, tuning seeds" -Dtest=LegalSkippedStreetTest -Dcoverage.legal=true
run "legal drives on one-way networks, held-out seeds" -Dtest=LegalSkippedStreetTest -Dcoverage.legal=true -Dcoverage.seeds=11-30
