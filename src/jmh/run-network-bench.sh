#!/usr/bin/env bash
# Network solve, Headway against the NumPy/SciPy peer (src/jmh/python/network_peer.py), side by side
# on the same generated looped grids (src/jmh/python/network_gen.py): whole process wall time (GNU
# time) and the solve alone (each program's own timer), and the largest head difference between the
# two answers. Sizes: K x K junctions for each K given (default 32 100 317; 1000 for 10^6).
# Headway runs with -Xmx2g so that the 2 GB heap goal is checked at 10^6.
set -euo pipefail
cd "$(dirname "$0")/../.."
out=target/bench/network
mkdir -p "$out"
mvn -B -q -DskipTests package
sizes=("${@:-32 100 317}")
for k in ${sizes[@]}; do
  python3 src/jmh/python/network_gen.py "$k" "$out/g$k" > /dev/null
  # The peer uses the same water state as Headway's default (15 °C), read from Headway itself.
  java -jar target/headway.jar fluid water --temperature "15 degC" --format json > "$out/water.json"
  props=$(python3 -c "import json,sys; d=json.load(open(sys.argv[1])); print(d['density_kg_per_m3'], d['dynamic_viscosity_pa_s'])" "$out/water.json")
  /usr/bin/time -f "%e %M" -o "$out/peer-time.txt" python3 src/jmh/python/network_peer.py \
    "$out/g$k-nodes.csv" "$out/g$k-links.csv" "$out/g$k-peer.csv" $props 2> "$out/peer-log.txt"
  /usr/bin/time -f "%e %M" -o "$out/hw-time.txt" java -Xmx2g -jar target/headway.jar network \
    --nodes "$out/g$k-nodes.csv" --links "$out/g$k-links.csv" --friction colebrook --format csv --timings \
    > "$out/g$k-hw.csv" 2> "$out/hw-log.txt"
  python3 - "$k" "$out" <<'PY'
import sys, re
k, out = sys.argv[1], sys.argv[2]
pw, prss = open(out + "/peer-time.txt").read().split()[-2:]
hw, hrss = open(out + "/hw-time.txt").read().split()[-2:]
plog = open(out + "/peer-log.txt").read()
hlog = open(out + "/hw-log.txt").read()
psolve = float(re.search(r"solve ([0-9.]+) s", plog).group(1))
hsolve = float(re.search(r"solve ([0-9.]+) s", hlog).group(1))
def heads(path, skip_prefix):
    d = {}
    for line in open(path):
        p = line.strip().split(",")
        if len(p) >= 2 and p[0].startswith("n") and p[0][1:].isdigit():
            try:
                d.setdefault(p[0], float(p[1]))
            except ValueError:
                pass
    return d
a, b = heads(out + "/g%s-hw.csv" % k, ""), heads(out + "/g%s-peer.csv" % k, "")
diff = max(abs(a[n] - b[n]) for n in a)
print("%8d junctions  whole process: Headway %7.2f s  peer %7.2f s  peer/Headway %5.2f | solve: Headway %7.3f s"
      "  peer %7.3f s  ratio %5.2f | peak RSS Headway %5.0f MB peer %5.0f MB | max |ΔH| %.1e m"
      % (int(k) ** 2, float(hw), float(pw), float(pw) / float(hw), hsolve, psolve, psolve / hsolve,
         int(hrss) / 1024, int(prss) / 1024, diff))
PY
done
