#!/usr/bin/env bash
# Colebrook–White throughput and accuracy: Headway's Java solver (JMH) against a vectorised
# NumPy/SciPy Lambert-W peer, over the same 1,000,000 (Re, ε/D) pairs, both pinned to one core.
# Usage: src/jmh/run-friction-bench.sh [CPU]   (CPU to pin to, default 1). Results in target/bench/.
set -euo pipefail
cd "$(dirname "$0")/../.."
cpu="${1:-1}"
out=target/bench
mkdir -p "$out"

mvn -B -q -Pjmh test-compile
mvn -B -q -Pjmh dependency:build-classpath -DincludeScope=test -Dmdep.outputFile="$out/cp.txt" >/dev/null
cp="target/test-classes:target/classes:$(cat "$out/cp.txt")"

echo "== writing the pairs and Java's values; CPU-time pass, pinned to CPU $cpu"
taskset -c "$cpu" java -Xmx2g -cp "$cp" org.headway.friction.BenchPairs "$out"

echo "== JMH, one thread, pinned to CPU $cpu"
taskset -c "$cpu" java -Xmx2g -cp "$cp" org.openjdk.jmh.Main 'ColebrookBenchmark' -f 1 -t 1 \
  -rf json -rff "$out/jmh.json" | tee "$out/jmh.txt" | grep -E '^(Benchmark|ColebrookBenchmark)'

echo "== NumPy/SciPy peer, pinned to CPU $cpu"
OMP_NUM_THREADS=1 OPENBLAS_NUM_THREADS=1 MKL_NUM_THREADS=1 \
  taskset -c "$cpu" python3 src/jmh/python/colebrook_peer.py "$out" > "$out/peer.json"

python3 - "$out" <<'PY'
import json, sys, os
folder = sys.argv[1]
jmh = {r["benchmark"].rsplit(".", 1)[1]: r["primaryMetric"] for r in json.load(open(os.path.join(folder, "jmh.json")))}
peer = json.load(open(os.path.join(folder, "peer.json")))
cpu = json.load(open(os.path.join(folder, "java-cpu.json")))
hot = jmh["solveHotPath"]
print()
print("Colebrook-White over %d pairs, one core" % peer["pairs"])
print("%-34s %12s %14s %16s" % ("", "ns/op", "solves/s", "max rel error"))
for name in ("solveHotPath", "evaluateWithCautions", "auto"):
    m = jmh[name]
    err = "%.2e" % peer["java_max_rel_error"] if name == "solveHotPath" else "same solver"
    print("%-34s %12.1f %14.3e %16s" % ("Java " + name + " (±%.1f)" % m["scoreError"], m["score"], 1e9 / m["score"], err))
print("%-34s %12.1f %14.3e %16.2e" % ("NumPy/SciPy Lambert W (best of 5)", peer["peer_ns_per_op"], peer["peer_solves_per_s"], peer["peer_max_rel_error"]))
print("peer median of 5: %.1f ns/op" % peer["peer_ns_per_op_median"])
print("throughput ratio Java hot path / peer: %.2fx" % (peer["peer_ns_per_op"] / hot["score"]))
print("CPU time per solve (thread/process CPU clock, best pass): Java hot path %.1f ns, Java auto %.1f ns,"
      " peer %.1f ns -> ratio %.2fx" % (cpu["hot_cpu_ns_per_op"], cpu["auto_cpu_ns_per_op"], peer["peer_cpu_ns_per_op"],
      peer["peer_cpu_ns_per_op"] / cpu["hot_cpu_ns_per_op"]))
print("variant peer, Wright omega for every pair: CPU %.1f ns/op, max rel error %.2e -> Java hot path ratio %.2fx" % (
      peer["omega_cpu_ns_per_op"], peer["omega_max_rel_error"], peer["omega_cpu_ns_per_op"] / cpu["hot_cpu_ns_per_op"]))
print("errors against: %s (%d points)" % (peer["reference"], peer["reference_points"]))
print("peer vs Java over all pairs: max rel diff %.2e; peer non-finite values: %d; Lambert-W share %.3f" % (
    peer["peer_vs_java_max_rel_diff_all_pairs"], peer["peer_nan_count"], peer["peer_lambertw_share"]))
PY
