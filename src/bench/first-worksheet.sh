#!/bin/sh
# The form's cold start: from starting a fresh JVM to the demo worksheet laid out in a showing window
# (FirstWorksheetBench in src/test/java watches for it; the form itself is started exactly as `stasis-sheet`
# without arguments starts it). Target: <= 2.0 s on this machine class (an absolute figure: a person waits it).
#
#   mvn -q package -DskipTests && target/stasis-sheet --make-archive && mvn -q -o test-compile
#   (--make-archive trains the form's start only where a display is present: run it from a desktop session, or
#   with DISPLAY pointing at an Xvfb server; the "archive:" line below says what the archive was trained on)
#   sh src/bench/first-worksheet.sh [RUNS]      (default 10; each run a fresh JVM and a fresh data folder)
#
# Display: an Xvfb server of its own when Xvfb is installed (the real GTK glass; apt-get install xvfb), else
# Monocle headless from the test class path. Options as the launcher gives the form: the quick compiler only,
# the serial collector and the form's archive (target/stasis-sheet-form.jsa) when present. Every run is interleaved with a `java -version`, so the load the machine
# was under shows in the same table. JAVA_HOME picks the runtime.
set -u
root=$(CDPATH='' cd -- "$(dirname -- "$0")/../.." && pwd -P) || exit 1
runs=${1:-10}
if [ -n "${JAVA_HOME:-}" ]; then java="$JAVA_HOME/bin/java"; jar="$JAVA_HOME/bin/jar"; else java=java; jar=jar; fi
[ -f "$root/target/stasis-sheet.jar" ] || { echo "no target/stasis-sheet.jar: run 'mvn -q package -DskipTests'" >&2; exit 1; }
[ -f "$root/target/test-classes/org/stasissheet/ui/FirstWorksheetBench.class" ] \
    || { echo "no bench class: run 'mvn -q -o test-compile'" >&2; exit 1; }
. "$root/src/bench/timing.sh"

work=$(mktemp -d "${TMPDIR:-/tmp}/stasis-first.XXXXXX") || exit 1
xvfb_pid=""
cleanup() { [ -z "$xvfb_pid" ] || kill "$xvfb_pid" 2>/dev/null; rm -rf "$work"; }
trap cleanup EXIT INT TERM

# the watcher only, in a jar of its own (class-data sharing maps classes from jars, and the launcher's archive
# stays usable: its class path is a prefix of this one)
(cd "$root/target/test-classes" && "$jar" cf "$work/bench.jar" org/stasissheet/ui/FirstWorksheetBench*.class) || exit 1
cp="$root/target/stasis-sheet.jar:$work/bench.jar"
opts="-XX:TieredStopAtLevel=1 -XX:+UseSerialGC -XX:-UsePerfData -Xshare:auto"
# the archive the launcher gives the form: its own, else the command line's
form_archive="$root/target/stasis-sheet-form.jsa"
[ -f "$form_archive" ] || form_archive="$root/target/stasis-sheet.jsa"
if [ -f "$form_archive" ]; then
    opts="$opts -XX:SharedArchiveFile=$form_archive -Xlog:cds=off -Xlog:cds+dynamic=off"
    if [ -f "$form_archive.trained" ]; then
        archive="target/$(basename "$form_archive") ($(cat "$form_archive.trained"))"
    else
        archive="target/$(basename "$form_archive") (training not recorded)"
    fi
else
    archive="none (run target/stasis-sheet --make-archive)"
fi

if command -v Xvfb >/dev/null 2>&1; then
    display=":$(( ($$ % 400) + 100 ))"
    Xvfb "$display" -screen 0 1366x768x24 -nolisten tcp >/dev/null 2>&1 &
    xvfb_pid=$!
    sleep 1
    kill -0 "$xvfb_pid" 2>/dev/null || { echo "Xvfb did not start on $display" >&2; exit 1; }
    how="Xvfb $display, 1366x768, GTK glass, software rendering"
    run_form() { DISPLAY="$display" "$java" $opts -Dprism.order=sw -Dstasis.dataDir="$1" -Dstasis.bench.t0="$(now_ms)" \
        -cp "$cp" org.stasissheet.ui.FirstWorksheetBench; }
else
    (cd "$root" && mvn -q -o dependency:build-classpath -Dmdep.outputFile="$work/test.classpath" >/dev/null) || exit 1
    cp="$cp:$(cat "$work/test.classpath")"
    how="Monocle headless (no Xvfb installed), software rendering"
    run_form() { "$java" $opts -Dglass.platform=Monocle -Dmonocle.platform=Headless -Dprism.order=sw \
        -Dstasis.dataDir="$1" -Dstasis.bench.t0="$(now_ms)" -cp "$cp" org.stasissheet.ui.FirstWorksheetBench; }
fi

: > "$work/form"
: > "$work/bare"
n=0
while [ $n -lt $((runs + 1)) ]; do          # the first run warms the file cache and is not kept
    bare=$(time_ms "$java" -version)
    rm -rf "$work/data" && mkdir "$work/data"
    # shellcheck disable=SC2086
    took=$(run_form "$work/data" 2>"$work/err" | tail -n 1)
    case "$took" in
        ''|*[!0-9]*) echo "a run failed: $took" >&2; cat "$work/err" >&2; exit 1 ;;
    esac
    if [ $n -ge 1 ]; then echo "$bare" >> "$work/bare"; echo "$took" >> "$work/form"; fi
    n=$((n + 1))
done

echo "machine:  $(machine_line)"
echo "java:     $("$java" -version 2>&1 | head -n 1)"
echo "display:  $how"
echo "archive:  $archive"
echo "runs:     $runs fresh JVMs, interleaved with java -version; load average $(load_line)"
echo
echo "java -version                          $(median_of "$work/bare") ms"
echo "form start -> demo worksheet on screen $(median_of "$work/form") ms median, $(p95_of "$work/form") ms p95  (target: median <= 2000 ms)"
