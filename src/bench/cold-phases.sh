#!/bin/sh
# Where a cold `pdf` spends its time, step by step (ColdStartPhases in src/bench/java), beside the time of a
# bare `java -version`: it shows which steps a faster start-up would have to remove, and whether the
# cold-start target (a cold `pdf` <= 3 x `java -version`) is within reach at all.
#
#   mvn -q package -DskipTests && mvn -q -Pbench test-compile     # the jar, its libraries, the bench classes
#   sh src/bench/cold-phases.sh [RUNS]                              # RUNS fresh JVMs, default 15
#
# Each run is a fresh JVM with the launcher's start-up options and a class-data archive trained on this program
# (made first, in a temporary folder), so the figures are the launcher's conditions. Prints the median of
# every step in milliseconds. JAVA_HOME picks the runtime.
set -u
root=$(CDPATH='' cd -- "$(dirname -- "$0")/../.." && pwd -P) || exit 1
runs=${1:-15}
if [ -n "${JAVA_HOME:-}" ]; then java="$JAVA_HOME/bin/java"; jar="$JAVA_HOME/bin/jar"; else java=java; jar=jar; fi
[ -f "$root/target/stasis-sheet.jar" ] || { echo "no target/stasis-sheet.jar: run 'mvn -q package -DskipTests'" >&2; exit 1; }
[ -d "$root/target/bench-classes" ] || { echo "no target/bench-classes: run 'mvn -q -Pbench test-compile'" >&2; exit 1; }
demo=$(ls "$root"/samples/*.json 2>/dev/null | head -n 1)
[ -n "$demo" ] || { echo "no demo case in $root/samples" >&2; exit 1; }

work=$(mktemp -d "${TMPDIR:-/tmp}/stasis-phases.XXXXXX") || exit 1
trap 'rm -rf "$work"' EXIT INT TERM
# class-data sharing archives classes from jars only, so the bench classes go into one
"$jar" cf "$work/bench.jar" -C "$root/target/bench-classes" . || exit 1
cp="$work/bench.jar:$root/target/stasis-sheet.jar"
for lib in "$root"/target/lib/*.jar; do cp="$cp:$lib"; done
opts="-XX:TieredStopAtLevel=1 -XX:+UseSerialGC -Djava.awt.headless=true"
main=org.stasissheet.bench.ColdStartPhases

# shellcheck disable=SC2086
"$java" $opts -XX:ArchiveClassesAtExit="$work/phases.jsa" -Xlog:cds=off -Xlog:cds+dynamic=off \
    -cp "$cp" "$main" "$demo" >/dev/null 2>&1 || { echo "the training run failed" >&2; exit 1; }

: > "$work/steps"
: > "$work/bare"
n=0
while [ $n -lt $((runs + 2)) ]; do      # the first two runs warm the file cache and are not kept
    start=$(date +%s%N)
    "$java" -version >/dev/null 2>&1
    end=$(date +%s%N)
    # shellcheck disable=SC2086
    line=$("$java" $opts -XX:SharedArchiveFile="$work/phases.jsa" -Xshare:auto -Xlog:cds=off -Xlog:cds+dynamic=off \
        -cp "$cp" "$main" "$demo") || { echo "a timed run failed" >&2; exit 1; }
    if [ $n -ge 2 ]; then
        echo $(((end - start) / 1000000)) >> "$work/bare"
        echo "$line" >> "$work/steps"
    fi
    n=$((n + 1))
done

# median of column C of a file of tab-separated numbers
median() {
    cut -f "$2" "$1" | sort -n | awk '{ t[NR] = $1 } END {
        m = (NR % 2) ? t[(NR + 1) / 2] : (t[NR / 2] + t[NR / 2 + 1]) / 2; printf "%.0f", m }'
}

echo "machine:  $(nproc) cores, $(awk -F: '/model name/ { sub(/^ +/, "", $2); print $2; exit }' /proc/cpuinfo 2>/dev/null)"
echo "java:     $("$java" -version 2>&1 | head -n 1)"
echo "runs:     $runs fresh JVMs, medians in ms; load average $(cut -d' ' -f1-3 /proc/loadavg 2>/dev/null)"
echo
printf '%-34s %6s ms\n' "java -version (whole process)" "$(median "$work/bare" 1)"
i=1
for step in "command line: picocli model + parse" "case: read and validate" "shipped rule set: read + validate" \
            "assessment" "first PDF render (fonts, classes)" "same PDF again, same JVM"; do
    printf '%-34s %6s ms\n' "$step" "$(median "$work/steps" $i)"
    i=$((i + 1))
done
