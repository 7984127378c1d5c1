#!/bin/sh
# Cold command-line runs as ratios, every command interleaved round by round so that the machine's load falls on
# all of them alike:
#   assess of a demo case      / java -version                        target <= 2.5
#   pdf of a demo case         / the PDF stack floor (PdfStackFloor)  target <= 1.5
# The stack floor is a fresh JVM with the launcher's options and class-data archive writing a one-page PDF with the
# worksheet's embedded fonts through OpenPDF and nothing else (src/bench/java/org/stasissheet/bench).
# When the application image exists (mvn -Pdist package), its launcher's assess and pdf are timed as well.
#
#   mvn -q package -DskipTests && target/stasis-sheet --make-archive && mvn -q -o -Pbench test-compile
#   sh src/bench/cold-ratios.sh [RUNS]       (default 20 rounds, after 2 that are not kept)
# JAVA_HOME picks the runtime (of java -version, the launcher and the probe).
set -u
root=$(CDPATH='' cd -- "$(dirname -- "$0")/../.." && pwd -P) || exit 1
runs=${1:-20}
if [ -n "${JAVA_HOME:-}" ]; then java="$JAVA_HOME/bin/java"; jar="$JAVA_HOME/bin/jar"; else java=java; jar=jar; fi
launcher="$root/target/stasis-sheet"
# the floor runs with the archive the launcher gives `pdf` (src/main/dist/stasis-sheet keeps one per way of starting)
archive="$root/target/stasis-sheet-pdf.jsa"
image="$root/target/dist/stasis-sheet/bin/stasis-sheet"
[ -x "$launcher" ] || { echo "no $launcher: run 'mvn -q package -DskipTests'" >&2; exit 1; }
[ -f "$archive" ] || { echo "no $archive: run 'target/stasis-sheet --make-archive' (pdf and the floor use it)" >&2; exit 1; }
[ -f "$root/target/bench-classes/org/stasissheet/bench/PdfStackFloor.class" ] \
    || { echo "no stack-floor probe: run 'mvn -q -o -Pbench test-compile'" >&2; exit 1; }
. "$root/src/bench/timing.sh"
demo="$root/samples/igm-symptomatic.json"

work=$(mktemp -d "${TMPDIR:-/tmp}/stasis-ratios.XXXXXX") || exit 1
trap 'rm -rf "$work"' EXIT INT TERM
# the probe in a jar of its own after the application jar: the launcher's archive stays usable (its class path is
# a prefix of this one) and OpenPDF comes from the application jar's manifest class path, as in a real run
(cd "$root/target/bench-classes" && "$jar" cf "$work/probe.jar" org/stasissheet/bench/PdfStackFloor.class) || exit 1
# the options the launcher gives a command-line run (src/main/dist/stasis-sheet), the pdf's archive
floor_opts="-XX:TieredStopAtLevel=1 -XX:+UseSerialGC -XX:-UsePerfData -XX:CICompilerCount=1 -Xshare:auto -XX:SharedArchiveFile=$archive -Xlog:cds=off -Xlog:cds+dynamic=off"

# assess-full and pdf-full: the same commands through the whole command-line library (`--` keeps them off the quick
# path, cli.QuickPath), to show in the same run what the quick path saves
names="bare assess assess-full floor pdf pdf-full"
[ -x "$image" ] && names="$names image-assess image-pdf"
run_one() {
    case "$1" in
        bare) time_ms "$java" -version ;;
        assess) time_ms "$launcher" assess "$demo" ;;
        assess-full) time_ms "$launcher" assess -- "$demo" ;;
        pdf) time_ms "$launcher" pdf "$demo" -o "$work/one.pdf" ;;
        pdf-full) time_ms "$launcher" pdf -o "$work/one.pdf" -- "$demo" ;;
        # shellcheck disable=SC2086
        floor) time_ms "$java" $floor_opts -cp "$root/target/stasis-sheet.jar:$work/probe.jar" \
            org.stasissheet.bench.PdfStackFloor "$work/floor.pdf" ;;
        image-assess) time_ms "$image" assess "$demo" ;;
        image-pdf) time_ms "$image" pdf "$demo" -o "$work/image.pdf" ;;
    esac
}
for name in $names; do : > "$work/$name"; done
load_before=$(load_line)
n=0
while [ $n -lt $((runs + 2)) ]; do
    for name in $names; do
        t=$(run_one "$name") || exit 1
        [ $n -lt 2 ] || echo "$t" >> "$work/$name"
    done
    n=$((n + 1))
done
[ "$(head -c 5 "$work/floor.pdf")" = "%PDF-" ] || { echo "the probe wrote no PDF" >&2; exit 1; }

echo "machine:  $(machine_line)"
echo "java:     $("$java" -version 2>&1 | head -n 1)"
echo "runs:     $runs interleaved rounds (after 2 not kept); load average before $load_before, after $(load_line)"
echo "case:     $(basename "$demo")"
echo
for name in $names; do
    printf '%-14s median %8s ms   p95 %8s ms\n' "$name" "$(median_of "$work/$name")" "$(p95_of "$work/$name")"
done
echo
bare=$(median_of "$work/bare")
floor=$(median_of "$work/floor")
echo "assess / java -version        $(ratio_of "$(median_of "$work/assess")" "$bare")   (target <= 2.5)"
echo "pdf / stack floor             $(ratio_of "$(median_of "$work/pdf")" "$floor")   (target <= 1.5)"
echo "without the quick path:        assess $(ratio_of "$(median_of "$work/assess-full")" "$bare") x java -version, pdf $(ratio_of "$(median_of "$work/pdf-full")" "$floor") x the floor"
if [ -x "$image" ]; then
    echo "image assess / java -version  $(ratio_of "$(median_of "$work/image-assess")" "$bare")"
    echo "image pdf / stack floor       $(ratio_of "$(median_of "$work/image-pdf")" "$floor")"
fi
