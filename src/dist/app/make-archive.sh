#!/bin/sh
# Writes the application class-data archive of an installed Stasis Sheet (lib/app/stasis-sheet.jsa) by one
# training run through its own launcher: a pdf of a demo case. The JVM uses such an archive only where it was made
# (it records the class path), so it is made in place: by the image build, and again by the .deb after installing
# into /opt. A missing or refused archive makes a run slower, never wrong.
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
rm -f "$archive" "$partial"
STASIS_JAVA_OPTS="-XX:ArchiveClassesAtExit=$partial" "$launcher" pdf "$demo" -o "$out/training.pdf" >/dev/null 2>&1 \
    || { rm -f "$partial"; echo "make-archive: the training run failed; no archive (runs are slower, not wrong)" >&2; exit 1; }
[ -s "$partial" ] || { echo "make-archive: the training run wrote no archive" >&2; exit 1; }
chmod 644 "$partial"
mv -f "$partial" "$archive"
echo "make-archive: wrote $archive"
