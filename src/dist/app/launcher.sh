#!/bin/sh
# Stasis Sheet, installed: runs the program on the Java runtime inside this folder (never a system Java; PATH and
# JAVA_HOME are not used), with the start-up options of src/main/dist/stasis-sheet and the class-data archive
# lib/app/stasis-sheet.jsa once lib/app/make-archive.sh has made it in place. Without arguments the form opens.
# It replaces jpackage's native launcher, which asks rpm and dpkg which package owns it at every start (about
# 0.3 s here, src/bench/RESULTS.md). STASIS_JAVA_OPTS adds JVM options (make-archive.sh trains through it).
# Decision support only: it supports, and never replaces, clinical judgement, local protocols and licensed practice.
self=$(readlink -f -- "$0" 2>/dev/null) || self=$0
root=$(CDPATH='' cd -- "$(dirname -- "$self")/.." && pwd -P) || exit 1
app="$root/lib/app"
set -- -cp "@CLASSPATH@" org.stasissheet.Main "$@"
# STASIS_JAVA_OPTS is split into words on purpose
# shellcheck disable=SC2086
[ -z "${STASIS_JAVA_OPTS:-}" ] || set -- $STASIS_JAVA_OPTS "$@"
# an archive is named only when it exists: named and missing, the JVM would take it for a base to build on
[ ! -f "$app/stasis-sheet.jsa" ] || set -- -XX:SharedArchiveFile="$app/stasis-sheet.jsa" "$@"
exec "$root/lib/runtime/bin/java" -XX:TieredStopAtLevel=1 -XX:+UseSerialGC -Xshare:auto -Xlog:cds=off \
    -Xlog:cds+dynamic=off "$@"
