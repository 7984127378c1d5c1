#!/bin/sh
# Writes the application class-data archive of an installed Stasis Sheet image (lib/app/stasis-sheet.jsa) by one
# training run: a pdf of a demo case. The JVM uses such an archive only where it was made (it records the class
# path), so it is made in place: by the image build, and again by the .deb after installing into /opt.
# The launcher's options ask for it with -Xshare:auto: a missing or refused archive makes a run slower, never wrong.
# Decision support only: it supports, and never replaces, clinical judgement, local protocols and licensed practice.
set -eu
app=$(CDPATH='' cd -- "$(dirname -- "$0")" && pwd -P)
name=stasis-sheet
cfg="$app/$name.cfg"
java="$app/../runtime/bin/java"
archive="$app/$name.jsa"
demo=$(ls "$app"/samples/*.json 2>/dev/null | head -n 1)
[ -f "$cfg" ] && [ -x "$java" ] && [ -n "$demo" ] || { echo "make-archive: not an installed $name image: $app" >&2; exit 1; }

# the class path exactly as the launcher builds it from the configuration ($APPDIR is this folder)
classpath=$(sed -n 's/^app\.classpath=//p' "$cfg" | sed "s#\\\$APPDIR#$app#" | paste -sd: -)
main=$(sed -n 's/^app\.mainclass=//p' "$cfg")
[ -n "$classpath" ] && [ -n "$main" ] || { echo "make-archive: no class path in $cfg" >&2; exit 1; }

out=$(mktemp -d "${TMPDIR:-/tmp}/$name-training.XXXXXX")
trap 'rm -rf "$out"' EXIT INT TERM
partial="$archive.partial.$$"
rm -f "$archive" "$partial"
"$java" -XX:TieredStopAtLevel=1 -XX:+UseSerialGC -XX:ArchiveClassesAtExit="$partial" \
    -Xlog:cds=off -Xlog:cds+dynamic=off -cp "$classpath" "$main" pdf "$demo" -o "$out/training.pdf" >/dev/null 2>&1 \
    || { rm -f "$partial"; echo "make-archive: the training run failed; no archive (runs are slower, not wrong)" >&2; exit 1; }
[ -s "$partial" ] || { echo "make-archive: the training run wrote no archive" >&2; exit 1; }
chmod 644 "$partial"
mv -f "$partial" "$archive"
echo "make-archive: wrote $archive"
