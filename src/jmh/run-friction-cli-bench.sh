#!/usr/bin/env bash
# `headway friction --input` on a 1,000,000-row CSV, whole process, side by side with a NumPy/SciPy
# peer that reads the same file, solves Colebrook-White in closed form (Lambert W) and writes the same
# columns (src/jmh/python/friction_batch_peer.py). Runs alternate, RUNS of each (default 5); prints
# wall time, CPU, peak RSS (GNU time) and the ratio peer/Headway per round, then the output check
# (friction factors of both files agree) and a run with -Xmx64m to show the file is streamed.
# Usage: src/jmh/run-friction-cli-bench.sh [RUNS]
set -euo pipefail
cd "$(dirname "$0")/../.."
runs=${1:-5}
out=target/bench
mkdir -p "$out"
mvn -B -q -DskipTests package
if [ ! -f "$out/points-1m.csv" ]; then
  python3 - "$out" <<'PY'
import sys, numpy as np
folder = sys.argv[1]
g = np.random.default_rng(20261201)
n = 1_000_000
re = 10 ** g.uniform(np.log10(4e3), np.log10(1e8), n)
rr = 10 ** g.uniform(np.log10(1e-6), np.log10(5e-2), n)
with open(folder + "/points-1m.csv", "w") as f:
    f.write("point,re,relative_roughness\n")
    f.write("".join("p%d,%r,%r\n" % (i, a, b) for i, (a, b) in enumerate(zip(re.tolist(), rr.tolist()))))
PY
fi
measure() {  # label, command...
  local label=$1; shift
  /usr/bin/time -f "%e %U %S %M" -o "$out/time.txt" "$@" > /dev/null
  read -r wall user sys rss < "$out/time.txt"
  printf '%-26s wall %5.2f s  user %5.2f s  sys %4.2f s  peak RSS %6.1f MB\n' "$label" "$wall" "$user" "$sys" \
    "$(echo "$rss / 1024" | bc -l)" >&2
  echo "$wall"
}
echo "load average: $(cut -d' ' -f1-3 /proc/loadavg)" >&2
for i in $(seq "$runs"); do
  p=$(measure "peer (NumPy/SciPy)" python3 src/jmh/python/friction_batch_peer.py "$out/points-1m.csv" "$out/peer-out.csv")
  h=$(measure "headway (launcher)" ./headway friction --method colebrook --input "$out/points-1m.csv" \
        --output "$out/hw-out.csv" --force)
  j=$(measure "java -jar (JVM defaults)" java -jar target/headway.jar friction --method colebrook \
        --input "$out/points-1m.csv" --output "$out/jar-out.csv" --force)
  printf 'round %d: peer/headway %.2f, peer/(java -jar) %.2f\n' "$i" "$(echo "$p / $h" | bc -l)" \
    "$(echo "$p / $j" | bc -l)" >&2
done
echo "load average: $(cut -d' ' -f1-3 /proc/loadavg)" >&2
python3 - "$out" <<'PY'
import csv, sys
folder = sys.argv[1]
a = csv.reader(open(folder + "/hw-out.csv", newline=""))
b = csv.reader(open(folder + "/peer-out.csv", newline=""))
next(a); next(b)
n = 0; worst = 0.0
for x, y in zip(a, b):
    n += 1
    worst = max(worst, abs(float(x[3]) - float(y[3])) / float(y[3]))
print("rows compared: %d, largest relative difference in f, Headway vs peer: %.2e" % (n, worst), file=sys.stderr)
PY
measure "java -Xmx64m -jar" java -Xmx64m -jar target/headway.jar friction --method colebrook \
  --input "$out/points-1m.csv" --output "$out/jar-out.csv" --force > /dev/null
