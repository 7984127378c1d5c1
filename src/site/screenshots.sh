#!/usr/bin/env bash
# Takes the README's screenshots of the form on a virtual display (Xvfb), with invented demo data only.
# Needs: xvfb, imagemagick (import, convert), a JDK 17+, Maven. Run from the repository root:
#   src/site/screenshots.sh
set -euo pipefail
cd "$(dirname "$0")/../.."
mvn -q -o test-compile dependency:build-classpath -Dmdep.outputFile=target/tour.classpath
Xvfb :98 -screen 0 1366x860x24 >/dev/null 2>&1 &
xvfb=$!
trap 'kill $xvfb' EXIT
sleep 2
DISPLAY=:98 java -cp "target/test-classes:target/classes:$(cat target/tour.classpath)" \
    'org.stasissheet.ui.ScreenshotTour$Run' | while read -r word n name; do
  if [ "$word" = "STEP" ]; then
    sleep 4
    DISPLAY=:98 import -window root "target/form-$name.png"
    # keep each picture small: fewer colours, same size
    convert "target/form-$name.png" -colors 128 -strip "src/site/form-$name.png"
    echo "src/site/form-$name.png"
  fi
done
