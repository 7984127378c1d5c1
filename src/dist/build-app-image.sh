#!/bin/sh
# Builds the installable application: target/dist/stasis-sheet/ (bin/stasis-sheet runs it, no JDK or Maven needed)
# and, with dpkg-deb and fakeroot present (and STASIS_NO_DEB unset), target/dist/stasis-sheet_VERSION-1_ARCH.deb.
# Linux only so far.
#
#   mvn -Pdist package        (calls this script after the jar and target/lib are built, then check-app-image.sh)
#   sh src/dist/build-app-image.sh VERSION    (by hand, after `mvn -q package -DskipTests`)
#
# What goes in:
#   - a runtime trimmed by jlink to the JDK modules the jars use (found by jdeps at build time, plus the few that
#     are reached only by name at run time) and the JavaFX modules, taken from the platform jars in target/lib
#     (javafx-base/graphics/controls-VERSION-PLATFORM.jar); its base class-data archive is made by jlink;
#   - stasis-sheet.jar and every other runtime library from target/lib (not the JavaFX jars: they are in the runtime);
#   - bin/stasis-sheet from src/dist/app/launcher.sh: the options of src/main/dist/stasis-sheet (quick compiler,
#     serial collector) on the image's own runtime, and an application
#     class-data archive made in place by lib/app/make-archive.sh (the hidden training run: the common commands on
#     a demo case, and the form's first worksheet where a display is present); the .deb makes its own after
#     installing, since an archive is valid only where it was made.
# Decision support only: it supports, and never replaces, clinical judgement, local protocols and licensed practice.
set -eu
root=$(CDPATH='' cd -- "$(dirname -- "$0")/../.." && pwd -P)
version=${1:-0.1.0}
target="$root/target"
name=stasis-sheet
dist="$target/dist"
work="$target/dist-work"
image="$dist/$name"

die() { echo "build-app-image: $*" >&2; exit 1; }

# The launcher, the archive and the check are written for the Linux layout of an image (bin/, lib/app/, lib/runtime/);
# macOS and Windows lay theirs out differently and have not been tried.
[ "$(uname -s)" = Linux ] || die "the application image is built and checked on Linux only so far (this is $(uname -s))"

# jpackage and jlink of the JDK that runs the build (JAVA_HOME when set)
if [ -n "${JAVA_HOME:-}" ] && [ -x "$JAVA_HOME/bin/jpackage" ]; then bin="$JAVA_HOME/bin/"; else bin=""; fi
for tool in jdeps jlink jpackage; do
    command -v "${bin}$tool" >/dev/null 2>&1 || die "${bin}$tool not found: a full JDK 17 or newer is needed"
done
[ -f "$target/$name.jar" ] && [ -d "$target/lib" ] || die "no $target/$name.jar or $target/lib: run 'mvn -q package' first"

# the JavaFX platform jars (with a classifier such as -linux); the plain javafx-*.jar beside them are empty shells
fx_path=""
for module in base graphics controls; do
    jar=$(ls "$target/lib/javafx-$module-"*-*.jar 2>/dev/null | head -n 1)
    [ -n "$jar" ] || die "no JavaFX platform jar for javafx.$module in $target/lib"
    fx_path="${fx_path:+$fx_path:}$jar"
done

rm -rf "$work" "$dist"
mkdir -p "$work/input/lib" "$dist"
cp "$target/$name.jar" "$work/input/"
for jar in "$target"/lib/*.jar; do
    case "$(basename "$jar")" in javafx-*) ;; *) cp "$jar" "$work/input/lib/" ;; esac
done
# the invented demo cases (to try the program, and to train the class-data archive) and the archive maker
mkdir "$work/input/samples"
cp "$root"/samples/*.json "$work/input/samples/"
cp "$root/src/dist/app/make-archive.sh" "$work/input/"

# JDK modules: what jdeps finds in the code, plus modules only ever looked up by name (providers and charsets):
#   jdk.crypto.ec  elliptic-curve TLS to a shared PostgreSQL register
#   jdk.charsets   HL7 v2 messages and lab reports in legacy encodings
#   jdk.zipfs      the zip file system some libraries open jars with
echo "build-app-image: finding the JDK modules the jars use (jdeps)"
jdk_modules=$("${bin}jdeps" --ignore-missing-deps --multi-release 17 --print-module-deps \
    --class-path "$work/input/lib/*" "$work/input/$name.jar" 2>/dev/null | tail -n 1)
case "$jdk_modules" in java.base*) ;; *) die "jdeps gave no module list (got: $jdk_modules)" ;; esac
modules="$jdk_modules,jdk.crypto.ec,jdk.charsets,jdk.zipfs,javafx.controls"

echo "build-app-image: linking the runtime ($modules)"
"${bin}jlink" --module-path "$fx_path" --add-modules "$modules" \
    --strip-debug --no-header-files --no-man-pages --generate-cds-archive --output "$work/runtime" >/dev/null

# jpackage lays out the image; its native launcher is then replaced by src/dist/app/launcher.sh (the native one
# asks rpm and dpkg which package owns it at every start), with the class path written in, relative to the image.
echo "build-app-image: packaging the application image"
"${bin}jpackage" --type app-image --name "$name" --app-version "$version" \
    --description "Hyperviscosity and leukostasis worksheet (decision support only)" \
    --vendor "Stasis Sheet contributors" \
    --input "$work/input" --main-jar "$name.jar" --main-class org.stasissheet.Main \
    --runtime-image "$work/runtime" --dest "$dist"
cfg="$image/lib/app/$name.cfg"
[ -x "$image/bin/$name" ] && [ -f "$cfg" ] || die "jpackage wrote no launcher in $image/bin"
classpath=$(sed -n 's/^app\.classpath=//p' "$cfg" | sed 's#^\$APPDIR#$app#' | paste -sd: -)
[ -n "$classpath" ] || die "no class path in $cfg"
sed "s#@CLASSPATH@#$classpath#" "$root/src/dist/app/launcher.sh" > "$work/launcher"
grep -q '@CLASSPATH@' "$work/launcher" && die "the class path was not written into the launcher"
rm -f "$image/bin/$name"
cp "$work/launcher" "$image/bin/$name"
chmod 755 "$image/bin/$name" "$image/lib/app/make-archive.sh"
sh "$image/lib/app/make-archive.sh" || echo "build-app-image: the image has no class-data archive" >&2
echo "build-app-image: wrote $image ($(du -sh "$image" | cut -f1))"

# The Debian package, only where it can be built; its absence is not an error.
if [ -n "${STASIS_NO_DEB:-}" ]; then
    echo "build-app-image: no .deb (STASIS_NO_DEB is set); the application image is complete"
elif command -v dpkg-deb >/dev/null 2>&1 && command -v fakeroot >/dev/null 2>&1; then
    # the archive made here is valid only here: the package's post-install makes its own under /opt
    echo "build-app-image: building the .deb"
    mkdir "$work/held"
    for f in "$image/lib/app/$name"*.jsa "$image/lib/app/$name"*.jsa.trained; do
        [ ! -f "$f" ] || mv "$f" "$work/held/"
    done
    "${bin}jpackage" --type deb --app-image "$image" --name "$name" --app-version "$version" \
        --description "Hyperviscosity and leukostasis worksheet (decision support only)" \
        --vendor "Stasis Sheet contributors" --linux-package-name "$name" --linux-app-category science \
        --linux-package-deps libgtk-3-0 --linux-shortcut --resource-dir "$root/src/dist/deb" --dest "$dist" >/dev/null
    for f in "$work/held/"*; do
        [ ! -f "$f" ] || mv "$f" "$image/lib/app/"
    done
    echo "build-app-image: wrote $(ls "$dist"/*.deb)"
else
    echo "build-app-image: no .deb (dpkg-deb or fakeroot is not installed); the application image is complete"
fi
