#!/usr/bin/env bash
# Window start-up: time from JVM start to the first drawn frame of Headway's window (new project)
# against a plain JavaFX window with a menu bar, a form, a table and tabs at the same size
# (org.headway.app.tools.PlainWindowPeer in the test sources, packed into its own jar here so that
# both can use a class-data archive). Builds once, then under one Xvfb display alternates RUNS
# (default 7) of four starts, same classpath and JVM flags for both windows:
#   Headway and peer with the JVM defaults, then Headway and peer each with its own class-data
#   archive (AppCDS, -XX:SharedArchiveFile; each archive written by one unrecorded start of that
#   program with -XX:ArchiveClassesAtExit, as the launcher does for the window, decision 0056).
# Each process prints its first frame (second pulse after show, ms since JVM start) and the CPU
# split so far (JavaFX thread, JIT, GC, other) and ends there (-Dheadway.exitAfterFirstFrame=true).
# Prints per-run times, the medians and ranges and the ratio Headway/peer of the medians for both
# pairs, with the load average before and after; the CPU lines go to target/bench/window-start/.
# Usage: src/jmh/run-window-start-bench.sh [RUNS]
set -euo pipefail
cd "$(dirname "$0")/../.."
runs=${1:-7}
out=target/bench/window-start
if [ "${2:-}" != "--on-display" ]; then
  command -v xvfb-run > /dev/null || { echo "xvfb-run not found (Debian/Ubuntu: apt-get install xvfb)" >&2; exit 2; }
  mvn -B -q -DskipTests package
  mvn -B -q test-compile
  mkdir -p "$out"
  (cd target/test-classes && jar cf ../../"$out"/peer.jar org/headway/app/tools/PlainWindowPeer*.class)
  exec xvfb-run -a -s "-screen 0 1600x1000x24" bash "$0" "$runs" --on-display
fi
# A fresh data folder, so no recent-projects list or autosaved copy changes what the window does.
data=$(mktemp -d)
trap 'rm -rf "$data"' EXIT
flags=(-Dheadway.reportStartup=true -Dheadway.exitAfterFirstFrame=true -Dheadway.dataDir="$data"
  -Djavafx.cachedir="${TMPDIR:-/tmp}/headway-javafx")
cp="target/headway.jar:$out/peer.jar"
H=org.headway.Launcher
P='org.headway.app.tools.PlainWindowPeer$Start'
first_frame() {  # label, main class, extra JVM flags…; prints the ms, appends the CPU split to $out/label.cpu
  local label=$1 main=$2 line
  shift 2
  line=$(timeout 180 java "$@" "${flags[@]}" -cp "$cp" "$main" 2>&1 | grep -m1 ': first frame ' || true)
  [ -n "$line" ] || { echo "$label: no first frame reported" >&2; exit 1; }
  echo "$line" | sed 's/.*; //' >> "$out/$label.cpu"
  echo "$line" | sed 's/.*first frame \([0-9]*\) ms.*/\1/'
}
median() { sort -n | awk '{a[NR]=$1} END {print (NR % 2) ? a[(NR+1)/2] : (a[NR/2] + a[NR/2+1]) / 2}'; }
echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg)" >&2
rm -f "$out"/*.jsa "$out"/*.cpu
# One unrecorded start of each first, so the file cache and the JavaFX native cache are warm for
# both; the second writes each program's class-data archive.
first_frame warm $H > /dev/null
first_frame warm "$P" > /dev/null
first_frame warm $H -XX:ArchiveClassesAtExit="$out/headway.jsa" > /dev/null
first_frame warm "$P" -XX:ArchiveClassesAtExit="$out/peer.jsa" > /dev/null
for f in headway peer headway-cds peer-cds; do : > "$out/$f.txt"; : > "$out/$f.cpu"; done
for i in $(seq "$runs"); do
  h=$(first_frame headway $H)
  p=$(first_frame peer "$P")
  hc=$(first_frame headway-cds $H -XX:SharedArchiveFile="$out/headway.jsa")
  pc=$(first_frame peer-cds "$P" -XX:SharedArchiveFile="$out/peer.jsa")
  echo "$h" >> "$out/headway.txt"; echo "$p" >> "$out/peer.txt"
  echo "$hc" >> "$out/headway-cds.txt"; echo "$pc" >> "$out/peer-cds.txt"
  printf 'run %2d: defaults: Headway %5d ms  peer %5d ms  ratio %.2f | archives: Headway %5d ms  peer %5d ms  ratio %.2f\n' \
    "$i" "$h" "$p" "$(echo "$h / $p" | bc -l)" "$hc" "$pc" "$(echo "$hc / $pc" | bc -l)" >&2
done
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)" >&2
summary() {  # label file
  printf '%-30s median %s ms (%s-%s)\n' "$1" "$(median < "$2")" "$(sort -n "$2" | head -1)" "$(sort -n "$2" | tail -1)"
}
summary "Headway, JVM defaults:" "$out/headway.txt"
summary "peer, JVM defaults:" "$out/peer.txt"
printf 'ratio Headway/peer of the medians, JVM defaults: %.2f\n' \
  "$(echo "$(median < "$out/headway.txt") / $(median < "$out/peer.txt")" | bc -l)"
summary "Headway, own class archive:" "$out/headway-cds.txt"
summary "peer, own class archive:" "$out/peer-cds.txt"
printf 'ratio Headway/peer of the medians, each with its archive: %.2f\n' \
  "$(echo "$(median < "$out/headway-cds.txt") / $(median < "$out/peer-cds.txt")" | bc -l)"
echo "CPU split at the first frame (last run of each): " >&2
for f in headway peer headway-cds peer-cds; do echo "  $f: $(tail -1 "$out/$f.cpu")" >&2; done
