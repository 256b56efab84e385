#!/usr/bin/env bash
# Schematic redraw at about 10^4 elements: the network workspace at 1400x900 under Xvfb on a
# generated K x K looped grid (default K = 58: 3,365 nodes and 6,613 links; invented benchmark data),
# solved, then 120 zoom and pan steps on the drawing, one per frame (SchematicRedrawProbe in the test
# sources). Prints the machine load, then the redraw (painter call) and frame-interval statistics.
# usage: src/jmh/run-schematic-bench.sh [K] [RUNS]
set -euo pipefail
cd "$(dirname "$0")/../.."
k=${1:-58}
runs=${2:-1}
mvn -B -q test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
for i in $(seq "$runs"); do
  uptime
  xvfb-run -a -s "-screen 0 1400x900x24" java -Xmx2g -Dprobe.k="$k" \
    -cp "target/classes:target/test-classes:$(cat target/cp.txt)" 'org.headway.app.SchematicRedrawProbe$Start' 2>&1 \
    | grep -v -e SLF4J -e 'Unsupported JavaFX'
done
