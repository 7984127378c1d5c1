#!/bin/sh
# Edit-to-worksheet latency of the form (a benchmark, not a test), headless on Monocle like the TestFX tests:
# EditLatencyBench in src/test/java. Run from anywhere: sh src/bench/edit-latency.sh [EDITS]   (default 1000)
# STASIS_BENCH_PREPEND=DIR puts DIR's classes in front (to time another version of some classes in the same run,
# e.g. the sheet before a change, compiled with javac -d DIR); STASIS_BENCH_JAVA_OPTS adds JVM options (e.g.
# -XX:TieredStopAtLevel=1, the quick compiler only, as the application image runs the form).
set -eu
cd "$(dirname "$0")/../.."
mvn -q -o test-compile dependency:build-classpath -Dmdep.outputFile=target/bench.classpath
echo "load average $(cut -d' ' -f1-3 /proc/loadavg)${STASIS_BENCH_PREPEND:+; classes first from $STASIS_BENCH_PREPEND}"
java ${STASIS_BENCH_JAVA_OPTS:-} -Dglass.platform=Monocle -Dmonocle.platform=Headless -Dprism.order=sw -Dprism.text=t2k \
    -cp "${STASIS_BENCH_PREPEND:+$STASIS_BENCH_PREPEND:}target/test-classes:target/classes:$(cat target/bench.classpath)" \
    org.stasissheet.ui.EditLatencyBench "$@" 2>&1 | grep -v -e 'Unsupported JavaFX configuration' -e 'PlatformImpl startup'
echo "load average $(cut -d' ' -f1-3 /proc/loadavg)"
