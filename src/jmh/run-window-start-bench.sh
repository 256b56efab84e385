#!/usr/bin/env bash
# Window start-up: time from JVM start to the first drawn frame of Headway's window (new project)
# against a plain JavaFX window with a menu bar, a form, a table and tabs at the same size
# (org.headway.app.tools.PlainWindowPeer in the test sources). Builds once, then under one Xvfb
# display alternates RUNS of each (default 7), same classpath and JVM flags; each process prints
# its first frame (second pulse after show, ms since JVM start) and ends there
# (-Dheadway.exitAfterFirstFrame=true). Prints per-run times, the medians and ranges, and the
# ratio Headway/peer of the medians, with the load average before and after.
# Usage: src/jmh/run-window-start-bench.sh [RUNS]
set -euo pipefail
cd "$(dirname "$0")/../.."
runs=${1:-7}
out=target/bench/window-start
if [ "${2:-}" != "--on-display" ]; then
  command -v xvfb-run > /dev/null || { echo "xvfb-run not found (Debian/Ubuntu: apt-get install xvfb)" >&2; exit 2; }
  mvn -B -q -DskipTests package
  mkdir -p "$out"
  exec xvfb-run -a -s "-screen 0 1600x1000x24" bash "$0" "$runs" --on-display
fi
# A fresh data folder, so no recent-projects list or autosaved copy changes what the window does.
data=$(mktemp -d)
trap 'rm -rf "$data"' EXIT
flags=(-Dheadway.reportStartup=true -Dheadway.exitAfterFirstFrame=true -Dheadway.dataDir="$data"
  -Djavafx.cachedir="${TMPDIR:-/tmp}/headway-javafx")
cp="target/headway.jar:target/test-classes"
first_frame() {  # label, main class; prints the ms
  local line
  line=$(timeout 180 java "${flags[@]}" -cp "$cp" "$2" 2>&1 | grep -m1 ': first frame ' || true)
  [ -n "$line" ] || { echo "$1: no first frame reported" >&2; exit 1; }
  echo "$line" | sed 's/.*first frame \([0-9]*\) ms.*/\1/'
}
median() { sort -n | awk '{a[NR]=$1} END {print (NR % 2) ? a[(NR+1)/2] : (a[NR/2] + a[NR/2+1]) / 2}'; }
echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg)" >&2
# One unrecorded start of each first, so the file cache and the JavaFX native cache are warm for both.
first_frame headway org.headway.Launcher > /dev/null
first_frame peer 'org.headway.app.tools.PlainWindowPeer$Start' > /dev/null
: > "$out/headway.txt"
: > "$out/peer.txt"
for i in $(seq "$runs"); do
  h=$(first_frame headway org.headway.Launcher)
  p=$(first_frame peer 'org.headway.app.tools.PlainWindowPeer$Start')
  echo "$h" >> "$out/headway.txt"
  echo "$p" >> "$out/peer.txt"
  printf 'run %2d: Headway %5d ms  peer %5d ms  ratio %.2f\n' "$i" "$h" "$p" "$(echo "$h / $p" | bc -l)" >&2
done
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)" >&2
hm=$(median < "$out/headway.txt")
pm=$(median < "$out/peer.txt")
printf 'Headway first frame: median %s ms (%s-%s)\n' "$hm" "$(sort -n "$out/headway.txt" | head -1)" \
  "$(sort -n "$out/headway.txt" | tail -1)"
printf 'peer first frame:    median %s ms (%s-%s)\n' "$pm" "$(sort -n "$out/peer.txt" | head -1)" \
  "$(sort -n "$out/peer.txt" | tail -1)"
printf 'ratio Headway/peer of the medians: %.2f\n' "$(echo "$hm / $pm" | bc -l)"
