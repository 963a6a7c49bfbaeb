#!/usr/bin/env bash
# Coverage-guided fuzzing of the JCAMP-DX reader with Jazzer for a bounded time (the maxDuration of the
# @FuzzTest, 60 s). Exit status 0: no finding. A finding fails the test; Jazzer stores the input in
# src/test/resources/.../JcampReaderFuzzTestInputs/readArbitraryText/, from where it is rerun as a regression
# test; after the fix, copy it to bundles/org.tracegas.importer.tests/src/org/tracegas/importer/jcamp/
# fuzz-regressions/ and list it in index.txt there.
# Usage: releng/fuzz/run.sh            fuzz for the bounded time
#        FUZZ=0 releng/fuzz/run.sh     only rerun the seeds and earlier findings
set -euo pipefail
cd "$(dirname "$0")"
export JAZZER_FUZZ="${FUZZ:-1}"
exec ../mvnw -B -q -f pom.xml test -Dtest=JcampReaderFuzzTest -Dsurefire.failIfNoSpecifiedTests=false
