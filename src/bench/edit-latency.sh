#!/usr/bin/env bash
# Edit-to-worksheet latency of the form (a benchmark, not a test), headless on Monocle like the TestFX tests.
# Run from the repository root: src/bench/edit-latency.sh [edits]
set -eu
cd "$(dirname "$0")/../.."
mvn -q -o test-compile dependency:build-classpath -Dmdep.outputFile=target/bench.classpath
java -Dglass.platform=Monocle -Dmonocle.platform=Headless -Dprism.order=sw -Dprism.text=t2k \
    -cp "target/test-classes:target/classes:$(cat target/bench.classpath)" \
    org.stasissheet.ui.EditLatencyBench "$@"
