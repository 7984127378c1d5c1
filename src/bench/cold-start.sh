#!/bin/sh
# Side-by-side start-up figures for Stasis Sheet, as ratios (machines differ; ratios travel):
#   1. a cold `pdf` of a demo case through target/stasis-sheet   vs   a bare `java -version`   (target: <= 3x)
#   2. `triage` of 200 cases                                vs   one cold `pdf`           (target: <= 8x)
# Prints both medians and the ratio of each pair. Uses hyperfine when it is installed, a timed loop otherwise.
#
#   mvn -q package -DskipTests && target/stasis-sheet --make-archive     # or: mvn -Pcds package -DskipTests
#   sh src/bench/cold-start.sh [RUNS]                              # RUNS per command, default 15
#
# Environment: STASIS_BENCH_NO_HYPERFINE=1 forces the timed loop; JAVA_HOME picks the runtime for both sides.
set -u
root=$(CDPATH='' cd -- "$(dirname -- "$0")/../.." && pwd -P) || exit 1
runs=${1:-15}
launcher="$root/target/stasis-sheet"
if [ -n "${JAVA_HOME:-}" ]; then java="$JAVA_HOME/bin/java"; else java=java; fi
[ -x "$launcher" ] || { echo "no $launcher: run 'mvn -q package -DskipTests' first" >&2; exit 1; }
demo=$(ls "$root"/samples/*.json 2>/dev/null | head -n 1)
[ -n "$demo" ] || { echo "no demo case in $root/samples" >&2; exit 1; }

work=$(mktemp -d "${TMPDIR:-/tmp}/stasis-bench.XXXXXX") || exit 1
trap 'rm -rf "$work"' EXIT INT TERM
# 200 cases for triage: the demo cases, copied round-robin under new names
mkdir "$work/cases" "$work/triage-out"
i=0
while [ $i -lt 200 ]; do
    for f in "$root"/samples/*.json; do
        [ $i -lt 200 ] || break
        cp "$f" "$work/cases/case-$(printf %03d $i).json"
        i=$((i + 1))
    done
done

bare="$java -version"
pdf="$launcher pdf $demo -o $work/one.pdf"
triage="$launcher triage $work/cases -o $work/triage-out"

# every command must work before it is timed: a failing command times nothing useful
for cmd in "$pdf" "$triage"; do
    # shellcheck disable=SC2086
    if ! $cmd >/dev/null 2>"$work/err"; then
        echo "this command failed, so nothing was measured: $cmd" >&2
        cat "$work/err" >&2
        exit 1
    fi
done

# median_ms CMD: the median wall-clock time of RUNS runs of CMD, in milliseconds (after 2 warm-up runs)
median_ms() {
    if [ -z "${STASIS_BENCH_NO_HYPERFINE:-}" ] && command -v hyperfine >/dev/null 2>&1; then
        hyperfine -N --style none --warmup 2 --runs "$runs" --export-json "$work/h.json" -- "$1" >/dev/null 2>&1 \
            || { echo "hyperfine failed on: $1" >&2; exit 1; }
        awk -F: '/"median"/ { gsub(/[ ,]/, "", $2); printf "%.1f\n", $2 * 1000; exit }' "$work/h.json"
    else
        n=0
        : > "$work/times"
        while [ $n -lt $((runs + 2)) ]; do
            start=$(date +%s%N)
            # shellcheck disable=SC2086
            $1 >/dev/null 2>&1
            end=$(date +%s%N)
            [ $n -lt 2 ] || echo $(((end - start) / 1000)) >> "$work/times"
            n=$((n + 1))
        done
        sort -n "$work/times" | awk '{ t[NR] = $1 } END {
            m = (NR % 2) ? t[(NR + 1) / 2] : (t[NR / 2] + t[NR / 2 + 1]) / 2; printf "%.1f\n", m / 1000 }'
    fi
}

ratio() { awk -v a="$1" -v b="$2" 'BEGIN { printf "%.2f", a / b }'; }

if [ -z "${STASIS_BENCH_NO_HYPERFINE:-}" ] && command -v hyperfine >/dev/null 2>&1; then
    tool="hyperfine $(hyperfine --version | awk '{print $2}')"
else
    tool="timed loop (date +%s%N)"
fi
if [ -f "$root/target/stasis-sheet.jsa" ]; then archive=present; else archive="absent (run target/stasis-sheet --make-archive)"; fi

echo "machine:  $(nproc) cores, $(awk -F: '/model name/ { sub(/^ +/, "", $2); print $2; exit }' /proc/cpuinfo 2>/dev/null), $(awk '/MemTotal/ { printf "%.0f GiB", $2 / 1048576 }' /proc/meminfo 2>/dev/null)"
echo "java:     $("$java" -version 2>&1 | head -n 1)"
echo "timing:   $tool, $runs runs each, median; load average $(cut -d' ' -f1-3 /proc/loadavg 2>/dev/null)"
echo "archive:  $archive"
t_bare=$(median_ms "$bare")
t_pdf=$(median_ms "$pdf")
t_triage=$(median_ms "$triage")
echo
echo "java -version                  ${t_bare} ms"
echo "stasis-sheet pdf (one case)     ${t_pdf} ms"
echo "stasis-sheet triage (200 cases) ${t_triage} ms"
echo
echo "cold pdf / java -version       $(ratio "$t_pdf" "$t_bare")   (target <= 3)"
echo "triage 200 / cold pdf          $(ratio "$t_triage" "$t_pdf")   (target <= 8)"
