#!/bin/sh
# Stasis Sheet, installed: runs the program on the Java runtime inside this folder (never a system Java; PATH and
# JAVA_HOME are not used), with the start-up options of src/main/dist/stasis-sheet and the class-data archives
# lib/app/stasis-sheet*.jsa once lib/app/make-archive.sh has made them in place. Without arguments the form opens.
# It replaces jpackage's native launcher, which asks rpm and dpkg which package owns it at every start (about
# 0.3 s here, src/bench/RESULTS.md). STASIS_JAVA_OPTS adds JVM options (make-archive.sh trains through it).
# Decision support only: it supports, and never replaces, clinical judgement, local protocols and licensed practice.
self=$(readlink -f -- "$0" 2>/dev/null) || self=$0
root=$(CDPATH='' cd -- "$(dirname -- "$self")/.." && pwd -P) || exit 1
app="$root/lib/app"
# one archive per way of starting, as src/main/dist/stasis-sheet explains: the form (no arguments, or one file to
# open), pdf, the rest; the form takes the command line's while it has none of its own
# (and, as there, a command-line run gets one compiler thread, the form the default)
compilers=-XX:CICompilerCount=1
if [ $# -eq 0 ] || { [ $# -eq 1 ] && [ -f "$1" ]; }; then own=stasis-sheet-form.jsa; compilers=""
elif [ "${1:-}" = pdf ]; then own=stasis-sheet-pdf.jsa
else own=stasis-sheet.jsa
fi
[ -f "$app/$own" ] || own=stasis-sheet.jsa
set -- -cp "@CLASSPATH@" org.stasissheet.Main "$@"
# STASIS_JAVA_OPTS is split into words on purpose
# shellcheck disable=SC2086
[ -z "${STASIS_JAVA_OPTS:-}" ] || set -- $STASIS_JAVA_OPTS "$@"
# an archive is named only when it exists: named and missing, the JVM would take it for a base to build on
[ ! -f "$app/$own" ] || set -- -XX:SharedArchiveFile="$app/$own" "$@"
[ -z "$compilers" ] || set -- "$compilers" "$@"
exec "$root/lib/runtime/bin/java" -XX:TieredStopAtLevel=1 -XX:+UseSerialGC -XX:-UsePerfData -Xshare:auto \
    -Xlog:cds=off -Xlog:cds+dynamic=off "$@"
