#!/bin/sh
# Writes the application class-data archive of an installed Stasis Sheet (lib/app/stasis-sheet.jsa) by one
# training run through its own launcher: the hidden training entry (org.stasissheet.ArchiveTraining), which runs
# assess, assess --json, note and pdf of a demo case in one JVM and, where a display is present (DISPLAY set), opens
# the form on its demo case until the first worksheet is laid out, then closes it (a window opens and closes by
# itself); without a display it trains the command line only. What it trained is written to
# lib/app/stasis-sheet.jsa.trained. The JVM uses such an archive only where it was made (it records the class
# path), so it is made in place: by the image build, and again by the .deb after installing into /opt (without a
# display there: a package install runs as root). A missing or refused archive makes a run slower, never wrong.
# Decision support only: it supports, and never replaces, clinical judgement, local protocols and licensed practice.
set -eu
app=$(CDPATH='' cd -- "$(dirname -- "$0")" && pwd -P)
launcher="$app/../../bin/stasis-sheet"
archive="$app/stasis-sheet.jsa"
demo=$(ls "$app"/samples/*.json 2>/dev/null | head -n 1)
[ -x "$launcher" ] && [ -n "$demo" ] || { echo "make-archive: not an installed Stasis Sheet: $app" >&2; exit 1; }

out=$(mktemp -d "${TMPDIR:-/tmp}/stasis-sheet-training.XXXXXX")
trap 'rm -rf "$out"' EXIT INT TERM
partial="$archive.partial.$$"
rm -f "$archive" "$archive.trained" "$partial"
STASIS_JAVA_OPTS="-XX:ArchiveClassesAtExit=$partial -Dstasis.archiveTraining=true" "$launcher" "$demo" \
    >/dev/null 2>"$out/said" \
    || { rm -f "$partial"; cat "$out/said" >&2
         echo "make-archive: the training run failed; no archive (runs are slower, not wrong)" >&2; exit 1; }
[ -s "$partial" ] || { echo "make-archive: the training run wrote no archive" >&2; exit 1; }
summary=$(grep "^archive training:" "$out/said" | tail -n 1 || true)
chmod 644 "$partial"
mv -f "$partial" "$archive"
echo "$summary" > "$archive.trained" && chmod 644 "$archive.trained"
echo "make-archive: wrote $archive ($summary)"
