"""Peer for the network benchmark: the global gradient algorithm (Todini & Pilati 1988) in NumPy/SciPy.

Reads the same line lists Headway reads (units in the column names as network_gen.py writes them),
Darcy-Weisbach with Colebrook-White solved by Newton iteration on x = 1/sqrt(f) for every pipe, the
exact slope including df/dRe by implicit differentiation, laminar-free like Headway's "colebrook";
below 1e-6 m3/s a pipe's law is its secant line (as Headway). Each iteration assembles
A = B G^-1 B^T with scipy.sparse and solves it with scipy.sparse.linalg.splu using the
MMD_AT_PLUS_A minimum-degree ordering. Writes node heads and link flows as CSV.

usage: network_peer.py NODES.csv LINKS.csv OUT.csv   (prints timings to stderr)
"""
import sys
import time
import numpy as np
import scipy.sparse as sp
import scipy.sparse.linalg as spla

t0 = time.perf_counter()
RHO, MU, G = 999.1011141871878, 1.1375e-3, 9.80665  # overwritten by argv[4:6] when given
if len(sys.argv) > 5:
    RHO, MU = float(sys.argv[4]), float(sys.argv[5])
Q_EPS = 1e-6


def read(path):
    with open(path) as f:
        header = f.readline().strip().split(",")
        rows = [line.rstrip("\n").split(",") for line in f if line.strip()]
    return header, rows


nh, nrows = read(sys.argv[1])
lh, lrows = read(sys.argv[2])
ids = [r[0] for r in nrows]
index = {k: i for i, k in enumerate(ids)}
n = len(ids)
zcol, dcol, hcol = nh.index("elevation [m]"), nh.index("demand [L/s]"), nh.index("fixed_head [m]")
fixed = np.array([r[hcol] != "" for r in nrows])
head = np.array([float(r[hcol]) if r[hcol] else 0.0 for r in nrows])
demand = np.array([float(r[dcol]) * 1e-3 if r[dcol] else 0.0 for r in nrows])
fcol, tcol = lh.index("from"), lh.index("to")
Lc, Dc, Ec = lh.index("length [m]"), lh.index("diameter [mm]"), lh.index("roughness [mm]")
frm = np.array([index[r[fcol]] for r in lrows])
to = np.array([index[r[tcol]] for r in lrows])
L = np.array([float(r[Lc]) for r in lrows])
D = np.array([float(r[Dc]) for r in lrows]) * 1e-3
eps = np.array([float(r[Ec]) for r in lrows]) * 1e-3
m = len(lrows)
t_read = time.perf_counter()

area = np.pi * D * D / 4
rr = eps / D
A_ = rr / 3.7
LN = 2 / np.log(10)


def colebrook(re):
    """x = 1/sqrt(f) and dx/dRe from Colebrook-White, Newton on F(x) = x + 2 log10(a + b x)."""
    b = 2.51 / re
    # Swamee-Jain start, then safeguarded Newton steps.
    x = -2 * np.log10(A_ + 5.74 / re ** 0.9)
    x = np.maximum(x, 0.1)
    for _ in range(50):
        u = A_ + b * x
        F = x + LN * np.log(u)
        dF = 1 + LN * b / u
        dx = F / dF
        x = np.maximum(x - dx, 0.5 * x)
        if np.max(np.abs(dx) / x) < 1e-15:
            break
    u = A_ + b * x
    dFdx = 1 + LN * b / u
    dFdre = LN * (-b / re) * x / u
    return x, -dFdre / dFdx


def law(q):
    """Head loss and slope of every pipe at flows q (secant line below Q_EPS)."""
    aq = np.maximum(np.abs(q), Q_EPS)
    v = aq / area
    re = RHO * v * D / MU
    x, dxdre = colebrook(re)
    f = 1 / (x * x)
    dfdre = -2 * dxdre / (x ** 3)
    hv = v * v / (2 * G)
    h = f * L / D * hv
    g = (2 * f + dfdre * re) * (L / D) * hv / aq
    small = np.abs(q) < Q_EPS
    secant = h / aq  # at Q_EPS for the small ones
    h = np.where(small, secant * q, np.sign(q) * h)
    g = np.where(small, secant, g)
    return h, np.maximum(g, 1e-10)


junction = ~fixed
jidx = -np.ones(n, dtype=np.int64)
jidx[junction] = np.arange(junction.sum())
nj = int(junction.sum())
head[junction] = head[fixed].mean()
q = 0.3 * area
jf, jt = jidx[frm], jidx[to]
both = (jf >= 0) & (jt >= 0)
iterations = 0
lu_time = 0.0
perm_spec = "MMD_AT_PLUS_A"
for it in range(200):
    iterations += 1
    h, g = law(q)
    e = h - (head[frm] - head[to])
    w = 1 / g
    c = -demand.copy()
    np.add.at(c, to, q)
    np.subtract.at(c, frm, q)
    rhs = np.zeros(nj)
    np.add.at(rhs, jt[jt >= 0], (-e * w)[jt >= 0])
    np.add.at(rhs, jf[jf >= 0], (e * w)[jf >= 0])
    rhs += c[junction]
    diag = np.zeros(nj)
    np.add.at(diag, jt[jt >= 0], w[jt >= 0])
    np.add.at(diag, jf[jf >= 0], w[jf >= 0])
    rows = np.concatenate([np.arange(nj), jf[both], jt[both]])
    cols = np.concatenate([np.arange(nj), jt[both], jf[both]])
    vals = np.concatenate([diag, -w[both], -w[both]])
    A = sp.csc_matrix((vals, (rows, cols)), shape=(nj, nj))
    tl = time.perf_counter()
    dH = spla.splu(A, permc_spec=perm_spec).solve(rhs)
    lu_time += time.perf_counter() - tl
    dHn = np.zeros(n)
    dHn[junction] = dH
    dq = (-e - (dHn[to] - dHn[frm])) / g
    head += dHn
    q += dq
    h, _ = law(q)
    energy = np.max(np.abs(h - (head[frm] - head[to])))
    c = -demand.copy()
    np.add.at(c, to, q)
    np.subtract.at(c, frm, q)
    cont = np.max(np.abs(c[junction]))
    if np.max(np.abs(dH)) <= 1e-6 and energy <= 1e-9 and cont <= 1e-10 + 1e-12 * np.abs(demand).sum():
        break
t_solve = time.perf_counter()
with open(sys.argv[3], "w") as f:
    f.write("id,head [m]\n")
    f.writelines("%s,%r\n" % (ids[i], float(head[i])) for i in range(n))
    f.write("\nid,flow [m3/s]\n")
    f.writelines("%s,%r\n" % (lrows[k][0], float(q[k])) for k in range(m))
t_end = time.perf_counter()
sys.stderr.write(
    "peer: %d junctions, %d links, %d iterations; read %.3f s, solve %.3f s (LU %.3f s), write %.3f s\n"
    % (nj, m, iterations, t_read - t0, t_solve - t_read, lu_time, t_end - t_solve))
