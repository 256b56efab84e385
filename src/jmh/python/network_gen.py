"""Generates looped grid networks as Headway line lists (invented benchmark data, not a real system).

k x k junctions on a square grid, pipes between neighbours (random bore 100-250 mm, length 50-200 m,
roughness 0.045 mm), elevations 0-20 m, a demand of 0.05 L/s at every junction, and a fixed-head
reservoir (80 m) joined by a 300 mm pipe to one junction in every 50 x 50 block, so that supply
scales with the network. Seeded: the same size gives the same files.

usage: network_gen.py K OUT_PREFIX
"""
import sys
import numpy as np

k = int(sys.argv[1])
prefix = sys.argv[2]
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
with open(prefix + "-links.csv", "w") as f:
    f.write("id,from,to,length [m],diameter [mm],roughness [mm]\n")
    out = []
    m = 0
    for r in range(k):
        base = r * k
        for c in range(k):
            i = base + c
            if c + 1 < k:
                out.append("p%d,n%d,n%d,%.2f,%d,0.045\n" % (m, i, i + 1, rng.uniform(50, 200), bores[rng.integers(5)]))
                m += 1
            if r + 1 < k:
                out.append("p%d,n%d,n%d,%.2f,%d,0.045\n" % (m, i, i + k, rng.uniform(50, 200), bores[rng.integers(5)]))
                m += 1
    for j, i in enumerate(res):
        out.append("s%d,R%d,n%d,100,300,0.045\n" % (j, j, i))
    f.writelines(out)
print("%d junctions, %d reservoirs, %d links" % (n, len(res), m + len(res)))
