#!/usr/bin/env bash
# `headway friction --input` on a 1,000,000-row CSV made from the benchmark's pairs: rows/s and peak
# memory (GNU time's maximum resident set size), with the default heap and with -Xmx64m to show the
# file is streamed. Needs target/bench/re.f64 and rr.f64 (run run-friction-bench.sh first).
set -euo pipefail
cd "$(dirname "$0")/../.."
out=target/bench
mvn -B -q -DskipTests package
python3 - "$out" <<'PY'
import sys, numpy as np
folder = sys.argv[1]
re = np.fromfile(folder + "/re.f64", dtype="<f8")
rr = np.fromfile(folder + "/rr.f64", dtype="<f8")
with open(folder + "/points-1m.csv", "w") as f:
    f.write("point,re,relative_roughness\n")
    for i, (a, b) in enumerate(zip(re, rr)):
        f.write("p%d,%r,%r\n" % (i, float(a), float(b)))
PY
for heap in "" "-Xmx64m"; do
  /usr/bin/time -v java $heap -jar target/headway.jar friction --input "$out/points-1m.csv" \
    --output "$out/out-1m.csv" --force 2> "$out/cli-time.txt"
  wall=$(grep 'Elapsed (wall clock)' "$out/cli-time.txt" | awk '{print $NF}')
  user=$(grep 'User time' "$out/cli-time.txt" | awk '{print $NF}')
  rss=$(grep 'Maximum resident' "$out/cli-time.txt" | awk '{print $NF}')
  python3 -c "
import sys
wall, user, rss, heap = sys.argv[1:5]
parts = [float(p) for p in wall.split(':')]
seconds = parts[-1] + 60 * parts[-2] + (3600 * parts[-3] if len(parts) > 2 else 0)
print('heap %-8s wall %6.2f s  %8.0f rows/s  user CPU %5.2f s  peak RSS %6.1f MB' % (
    heap or 'default', seconds, 1e6 / seconds, float(user), int(rss) / 1024))
" "$wall" "$user" "$rss" "$heap"
done
