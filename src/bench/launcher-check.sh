#!/bin/sh
# Checks that the launcher never lets a class-data archive break a run: a stale, truncated, garbage or missing
# archive must give the same output as no archive, with nothing from the JVM on standard output.
#   mvn -q package -DskipTests && sh src/bench/launcher-check.sh
# Works on a copy of target/ in a temporary folder (with a space in its name, on purpose).
set -u
root=$(CDPATH='' cd -- "$(dirname -- "$0")/../.." && pwd -P) || exit 1
work=$(mktemp -d "${TMPDIR:-/tmp}/stasis launcher.XXXXXX") || exit 1
trap 'rm -rf "$work"' EXIT INT TERM
cp -R "$root/target/stasis-sheet" "$root/target/stasis-sheet.jar" "$root/target/lib" "$work/" || exit 1
demo=$(ls "$root"/samples/*.json | head -n 1)
failed=0

check() {  # check NAME: the JSON worksheet must equal the reference, and the run must exit 0
    out=$("$work/stasis-sheet" assess --json "$demo" 2>"$work/err"); code=$?
    if [ $code -ne 0 ] || [ "$out" != "$reference" ]; then
        echo "FAIL $1: exit $code"; head -n 3 "$work/err"; failed=1
    else
        echo "ok   $1"
    fi
}

rm -f "$work/stasis-sheet.jsa" "$work/stasis-sheet.jsa.size"
reference=$("$work/stasis-sheet" assess --json "$demo") || { echo "FAIL: no reference output"; exit 1; }
check "no archive"
"$work/stasis-sheet" --make-archive assess "$demo" >/dev/null || { echo "FAIL: --make-archive"; exit 1; }
check "fresh archive"
sleep 1; touch "$work/stasis-sheet.jar"
check "archive older than the jar"
"$work/stasis-sheet" --make-archive assess "$demo" >/dev/null
# a half-written archive (an interrupted --make-archive by hand): the JVM itself would crash on it
chmod u+w "$work/stasis-sheet.jsa"
head -c 100000 "$work/stasis-sheet.jsa" > "$work/partial" && mv -f "$work/partial" "$work/stasis-sheet.jsa"
check "truncated archive"
printf 'not an archive at all' > "$work/stasis-sheet.jsa"; wc -c < "$work/stasis-sheet.jsa" | tr -d ' ' > "$work/stasis-sheet.jsa.size"
check "garbage archive of the recorded size"
rm -f "$work/stasis-sheet.jsa.size"; "$work/stasis-sheet" --make-archive assess "$demo" >/dev/null; rm -f "$work/stasis-sheet.jsa.size"
check "archive without its size record"
# pdf takes an archive of its own: a garbage one of the recorded size must not break it either
printf 'not an archive at all' > "$work/stasis-sheet-pdf.jsa"
wc -c < "$work/stasis-sheet-pdf.jsa" | tr -d ' ' > "$work/stasis-sheet-pdf.jsa.size"
if "$work/stasis-sheet" pdf "$demo" -o "$work/out.pdf" >/dev/null 2>"$work/err" && [ "$(head -c 5 "$work/out.pdf")" = "%PDF-" ]; then
    echo "ok   garbage pdf archive"
else
    echo "FAIL garbage pdf archive"; head -n 3 "$work/err"; failed=1
fi
exit $failed
