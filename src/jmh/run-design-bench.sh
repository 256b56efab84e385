#!/usr/bin/env bash
# Network design timings: balancing and a fire-flow search on a generated looped grid of K x K
# junctions (default K = 100, 10^4 junctions) with balancing valves and design flows on a fraction of
# the pipes (src/jmh/python/network_gen.py --valves; invented benchmark data). Reports the whole
# process wall time (GNU time), the plain solve and the design part alone (Headway's --timings), the
# network solves each took and what they found. The fire flow is drawn at the junction farthest from
# every reservoir in the generator's layout (the grid's last node), at 140 kPa residual.
# usage: src/jmh/run-design-bench.sh [K] [VALVE_FRACTION]
set -euo pipefail
cd "$(dirname "$0")/../.."
out=target/bench/design
mkdir -p "$out"
k=${1:-100}
fraction=${2:-0.02}
mvn -B -q -DskipTests package
python3 src/jmh/python/network_gen.py "$k" "$out/g$k" --valves "$fraction"
fire_node="n$((k * k - 1))"
/usr/bin/time -f "%e %M" -o "$out/balance-time.txt" java -Xmx2g -jar target/headway.jar network \
  --nodes "$out/g$k-nodes.csv" --links "$out/g$k-links.csv" --friction colebrook --balance --format json \
  --timings > "$out/balance.json" 2> "$out/balance-log.txt" || true
/usr/bin/time -f "%e %M" -o "$out/fire-time.txt" java -Xmx2g -jar target/headway.jar network \
  --nodes "$out/g$k-nodes.csv" --links "$out/g$k-links.csv" --friction colebrook --fire-flow "$fire_node" \
  --residual-pressure "140 kPa" --format json --timings > "$out/fire.json" 2> "$out/fire-log.txt" || true
python3 - "$out" "$k" <<'PY'
import json, re, sys
out, k = sys.argv[1], int(sys.argv[2])
def timing(name):
    wall, rss = open("%s/%s-time.txt" % (out, name)).read().split()[-2:]
    log = open("%s/%s-log.txt" % (out, name)).read()
    solve = float(re.search(r"solve ([0-9.]+) s \((\d+) iterations\)", log).group(1))
    design = float(re.search(r"design ([0-9.]+) s", log).group(1))
    return float(wall), int(rss) / 1024, solve, design
b = json.load(open(out + "/balance.json"))
bal = b["balance"]
reached = sum(1 for v in bal["valves"] if v["reached"])
w, rss, solve, design = timing("balance")
print("balancing, %d nodes, %d valves: whole process %.2f s (peak RSS %.0f MB) | plain solve %.3f s | balancing"
      " %.3f s in %d solves | %d reached, %d short; index valve %s, source head needed %s; re-solve check %s"
      % (len(b["nodes"]), len(bal["valves"]), w, rss, solve, design, bal["solves"], reached,
         len(bal["valves"]) - reached, bal["index_valve"],
         "none (no single source)" if bal["source_head_needed_m"] is None else "%.3f m" % bal["source_head_needed_m"],
         "skipped (short branches)" if bal["largest_flow_error"] is None else "%.1e" % bal["largest_flow_error"]))
f = json.load(open(out + "/fire.json"))
ff = f["fire_flow"]
w, rss, solve, design = timing("fire")
print("fire flow at %s, 140 kPa: whole process %.2f s (peak RSS %.0f MB) | plain solve %.3f s | search %.3f s in"
      " %d solves | fire flow %s L/s, limiting junction %s at %.4f kPa"
      % (ff["node"], w, rss, solve, design, ff["solves"],
         "n/a" if f["fire_flow_m3_per_s"] is None else "%.3f" % (f["fire_flow_m3_per_s"] * 1000),
         f["fire_flow_limiting_node"], (ff["residual_pressure_at_limit_pa"] or float("nan")) / 1000))
PY
