"""Generates looped grid networks as Headway line lists (invented benchmark data, not a real system).

k x k junctions on a square grid, pipes between neighbours (random bore 100-250 mm, length 50-200 m,
roughness 0.045 mm), elevations 0-20 m, a demand of 0.05 L/s at every junction, and a fixed-head
reservoir (80 m) joined by a 300 mm pipe to one junction in every 50 x 50 block, so that supply
scales with the network. Seeded: the same size gives the same files.

With --valves FRACTION (for the design benchmark, src/jmh/run-design-bench.sh), that fraction of the
grid pipes gets a balancing valve in series (Kv 40 m3/h fully open) with a design flow of 0.02 L/s,
pointed away from the nearest reservoir (where heads generally fall), through a new junction vN
between pipe and valve. The valves are drawn from their own seeded stream, so the grid itself is the
same with or without them.

usage: network_gen.py K OUT_PREFIX [--valves FRACTION]
"""
import sys
import numpy as np

k = int(sys.argv[1])
prefix = sys.argv[2]
valve_fraction = 0.0
if len(sys.argv) > 3:
    if len(sys.argv) != 5 or sys.argv[3] != "--valves":
        sys.exit("usage: network_gen.py K OUT_PREFIX [--valves FRACTION]")
    valve_fraction = float(sys.argv[4])
    if not 0 <= valve_fraction <= 1:
        sys.exit("--valves takes a fraction from 0 to 1")
rng = np.random.default_rng(20261202 + k)
n = k * k
elev = rng.uniform(0, 20, n)
with open(prefix + "-nodes.csv", "w") as f:
    f.write("id,elevation [m],demand [L/s],fixed_head [m]\n")
    ids = ["n%d" % i for i in range(n)]
    lines = ["%s,%.3f,0.05,\n" % (ids[i], elev[i]) for i in range(n)]
    f.writelines(lines)
    res = []
    for r in range(25 % k if k < 50 else 25, k, 50):
        for c in range(25 % k if k < 50 else 25, k, 50):
            res.append(r * k + c)
    if not res:
        res = [0]
    for j, i in enumerate(res):
        f.write("R%d,80,,80\n" % j)
bores = np.array([100, 125, 150, 200, 250])
valve_rng = np.random.default_rng(20270101 + k)
rows = np.arange(n) // k
cols = np.arange(n) % k
nearest = np.full(n, np.iinfo(np.int64).max)
for i in res:
    nearest = np.minimum(nearest, np.abs(rows - i // k) + np.abs(cols - i % k))
valves = []
with open(prefix + "-links.csv", "w") as f:
    f.write("id,from,to,kind,length [m],diameter [mm],roughness [mm],kv,design_flow [L/s]\n")
    out = []
    m = 0
    for r in range(k):
        base = r * k
        for c in range(k):
            i = base + c
            for other in ([i + 1] if c + 1 < k else []) + ([i + k] if r + 1 < k else []):
                length, bore = rng.uniform(50, 200), bores[rng.integers(5)]
                if valve_fraction > 0 and valve_rng.uniform() < valve_fraction:
                    a, b = (i, other) if nearest[i] <= nearest[other] else (other, i)
                    v = len(valves)
                    valves.append(v)
                    out.append("p%d,n%d,v%d,pipe,%.2f,%d,0.045,,\n" % (m, a, v, length, bore))
                    out.append("bv%d,v%d,n%d,valve,,,,40,0.02\n" % (v, v, b))
                else:
                    out.append("p%d,n%d,n%d,pipe,%.2f,%d,0.045,,\n" % (m, i, other, length, bore))
                m += 1
    for j, i in enumerate(res):
        out.append("s%d,R%d,n%d,pipe,100,300,0.045,,\n" % (j, j, i))
    f.writelines(out)
if valves:
    with open(prefix + "-nodes.csv", "a") as f:
        f.writelines("v%d,%.3f,0,\n" % (v, 10.0) for v in valves)
print("%d junctions, %d reservoirs, %d links, %d balancing valves" % (n + len(valves), len(res), m + len(res) + len(valves), len(valves)))
