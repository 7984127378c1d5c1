#!/bin/sh
# Writes the application class-data archives of an installed Stasis Sheet (lib/app/stasis-sheet.jsa for the
# command line, stasis-sheet-pdf.jsa for pdf, stasis-sheet-form.jsa for the form), one training run each through
# its own launcher: the hidden training entry (org.stasissheet.ArchiveTraining) runs assess and assess --json, then
# pdf, of a demo case, then, where a display is present (DISPLAY set), opens the form on its demo case until the
# first worksheet is laid out and closes it (a window opens and closes by itself); without a display there is no
# form archive. What each trained is written beside it (.trained). The JVM uses such an archive only where it was made (it records the class
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
# every archive goes first: the launcher names an existing one, and a training run must not start on one
rm -f "$app"/stasis-sheet*.jsa "$app"/stasis-sheet*.jsa.trained "$app"/stasis-sheet*.jsa.partial.*

# train PART FILE: one training run of that part into $out/FILE, moved into lib/app when all have run (an archive
# in lib/app would be named by the launcher during the next training run); exit 4 means nothing to train (the form
# without a display), which leaves no archive and is no failure
train() {
    partial="$out/$2"
    code=0
    STASIS_JAVA_OPTS="-XX:ArchiveClassesAtExit=$partial -Dstasis.archiveTraining=$1" "$launcher" "$demo" \
        >/dev/null 2>"$out/said" || code=$?
    summary=$(grep "^archive training:" "$out/said" | tail -n 1 || true)
    if [ $code -eq 4 ]; then
        rm -f "$partial"
        echo "make-archive: no $2: $summary"
        return 0
    fi
    if [ $code -ne 0 ] || [ ! -s "$partial" ]; then
        rm -f "$partial"; cat "$out/said" >&2
        echo "make-archive: the $1 training run failed; no $2 (runs are slower, not wrong)" >&2
        return 1
    fi
    chmod 644 "$partial"
    echo "$summary" > "$partial.trained" && chmod 644 "$partial.trained"
}
train commands stasis-sheet.jsa
train pdf stasis-sheet-pdf.jsa
train form stasis-sheet-form.jsa
for made in "$out"/*.jsa; do
    [ -f "$made" ] || continue
    name=$(basename "$made")
    mv -f "$made.trained" "$app/$name.trained"
    mv -f "$made" "$app/$name"
    echo "make-archive: wrote $app/$name ($(cat "$app/$name.trained"))"
done
