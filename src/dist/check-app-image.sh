#!/bin/sh
# Checks the installable application as a machine without Java or Maven would run it: the image's own launcher,
# started with an empty environment (no PATH, no JAVA_HOME), so that no system JDK can stand in for its runtime.
#   1. `--version` names the program and the shipped rule set;
#   2. `assess` of every demo case prints exactly what the jar prints on the build's JDK (the reference);
#   3. `pdf` of a demo case writes a PDF (fonts and the desktop module are in the trimmed runtime);
#   4. a missing case file is refused with exit code 2 and a message naming the file;
#   5. the runtime is the image's own: it holds the JavaFX modules and no compiler.
#
#   sh src/dist/check-app-image.sh [IMAGE]     (default target/dist/stasis-sheet; `mvn -Pdist package` runs it)
# Exit 0 when every check passes; otherwise each failure is printed and the exit code is 1.
set -u
root=$(CDPATH='' cd -- "$(dirname -- "$0")/../.." && pwd -P)
image=${1:-$root/target/dist/stasis-sheet}
launcher="$image/bin/stasis-sheet"
jar="$root/target/stasis-sheet.jar"
if [ -n "${JAVA_HOME:-}" ]; then java="$JAVA_HOME/bin/java"; else java=java; fi
[ -x "$launcher" ] || { echo "check-app-image: no launcher $launcher (run 'mvn -Pdist package')" >&2; exit 1; }

work=$(mktemp -d "${TMPDIR:-/tmp}/stasis-app-check.XXXXXX") || exit 1
trap 'rm -rf "$work"' EXIT INT TERM
failures=0
fail() { echo "FAIL: $*" >&2; failures=$((failures + 1)); }
pass() { echo "ok:   $*"; }

# the image's launcher with nothing from this machine's environment but a home folder and a UTF-8 locale
clean() { env -i HOME="$work/home" LANG=C.UTF-8 "$launcher" "$@"; }
mkdir "$work/home"

# 1. version
if clean --version > "$work/version" 2> "$work/version.err"; then
    if head -n 1 "$work/version" | grep -q '^stasis-sheet [0-9]' && grep -q 'shipped rule set' "$work/version"; then
        pass "--version: $(head -n 1 "$work/version")"
    else
        fail "--version printed something else: $(cat "$work/version")"
    fi
else
    fail "--version exited non-zero: $(cat "$work/version.err")"
fi

# 2. assess, against the jar on the build's JDK
checked=0
for case_file in "$root"/samples/*.json; do
    base=$(basename "$case_file" .json)
    clean assess "$case_file" > "$work/$base.image" 2> "$work/$base.image.err"
    code=$?
    env LANG=C.UTF-8 "$java" -jar "$jar" assess "$case_file" > "$work/$base.ref" 2>/dev/null
    ref_code=$?
    if [ $code -ne $ref_code ]; then
        fail "assess $base: exit $code from the image, $ref_code from the jar: $(head -n 3 "$work/$base.image.err")"
    elif ! grep -q 'Decision support only' "$work/$base.image"; then
        fail "assess $base: no decision-support line in the output"
    elif ! cmp -s "$work/$base.image" "$work/$base.ref"; then
        fail "assess $base: the image's output differs from the jar's:"
        diff "$work/$base.ref" "$work/$base.image" | head -n 10 >&2
    else
        checked=$((checked + 1))
    fi
done
[ $checked -gt 0 ] && pass "assess: $checked demo cases print exactly what the jar prints"

# 3. pdf
demo=$(ls "$root"/samples/*.json | head -n 1)
if clean pdf "$demo" -o "$work/one.pdf" > /dev/null 2> "$work/pdf.err" && [ "$(head -c 5 "$work/one.pdf")" = "%PDF-" ]; then
    pass "pdf: $(basename "$demo") -> $(wc -c < "$work/one.pdf" | tr -d ' ') bytes"
else
    fail "pdf of $(basename "$demo"): $(cat "$work/pdf.err")"
fi

# 4. bad input: refused, named, nothing else touched
clean assess "$work/no-such-case.json" > /dev/null 2> "$work/bad.err"
code=$?
if [ $code -eq 2 ] && grep -q 'no-such-case.json' "$work/bad.err"; then
    pass "a missing case file: exit 2, '$(head -n 1 "$work/bad.err")'"
else
    fail "a missing case file: exit $code, '$(cat "$work/bad.err")' (expected exit 2 naming the file)"
fi

# 5. the runtime is the image's own
runtime="$image/lib/runtime"
modules=$("$runtime/bin/java" --list-modules 2>/dev/null)
if echo "$modules" | grep -q '^javafx.controls@' && ! echo "$modules" | grep -q '^jdk.compiler@'; then
    pass "runtime: $(echo "$modules" | wc -l | tr -d ' ') modules, JavaFX included, no compiler"
else
    fail "runtime: the image's runtime lacks JavaFX or is a whole JDK"
fi
if [ -f "$image/lib/app/stasis-sheet.jsa" ]; then pass "class-data archive present"; else echo "note: no class-data archive (slower start, same results)"; fi

if [ $failures -gt 0 ]; then
    echo "check-app-image: $failures check(s) failed" >&2
    exit 1
fi
echo "check-app-image: the image runs without a system JDK"
