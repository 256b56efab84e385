#!/usr/bin/env python3
"""Peer of FitBenchmark: the same model and data fitted with scipy.optimize.least_squares.

  fit_peer.py --generate FILE [N]     write N (default 100,000) points of y = 2.5 exp(-1.3 x) + 0.5 + noise
  fit_peer.py --compare FILE JSON     time SciPy on FILE and score SciPy and Headway (its JSON
                                      output) against a high-accuracy reference fit

Reference: Gauss-Newton iterations in numpy long double (x86 80-bit, 64-bit mantissa) from the
SciPy solution; the printed condition number of J tells how many digits the reference carries.
"""
import json
import math
import sys
import time

import numpy as np
from scipy.optimize import least_squares

N = 100_000
SEED = 20261201
TRUE = (2.5, 1.3, 0.5)
START = np.array([1.0, 1.0, 0.0])


def generate(path, n=N):
    rng = np.random.default_rng(SEED)
    x = np.linspace(0.0, 5.0, n)
    y = TRUE[0] * np.exp(-TRUE[1] * x) + TRUE[2] + 0.02 * rng.standard_normal(n)
    with open(path, "w") as f:
        f.write("x,y\n")
        for xi, yi in zip(x, y):
            f.write(f"{float(xi)!r},{float(yi)!r}\n")


def load(path):
    data = np.loadtxt(path, delimiter=",", skiprows=1)
    return data[:, 0].copy(), data[:, 1].copy()


def residuals(p, x, y):
    return p[0] * np.exp(-p[1] * x) + p[2] - y


def jacobian(p, x, y):
    e = np.exp(-p[1] * x)
    return np.column_stack((e, -p[0] * x * e, np.ones_like(x)))


def reference(p0, x, y):
    xl = x.astype(np.longdouble)
    yl = y.astype(np.longdouble)
    p = np.array(p0, dtype=np.longdouble)
    for _ in range(8):
        e = np.exp(-p[1] * xl)
        r = yl - (p[0] * e + p[2])
        j = np.column_stack((e, -p[0] * xl * e, np.ones_like(xl)))
        # 3x3 system in long double; adequate for a reference when cond(J)^2 * 1e-19 is small
        a = j.T @ j
        g = j.T @ r
        p = p + solve3(a, g)
    cond = np.linalg.cond(jacobian(np.array(p, dtype=float), x, y))
    return p, cond


def solve3(a, b):
    a = [list(row) for row in a]
    b = list(b)
    n = 3
    for k in range(n):
        piv = max(range(k, n), key=lambda i: abs(a[i][k]))
        a[k], a[piv] = a[piv], a[k]
        b[k], b[piv] = b[piv], b[k]
        for i in range(k + 1, n):
            f = a[i][k] / a[k][k]
            for c in range(k, n):
                a[i][c] -= f * a[k][c]
            b[i] -= f * b[k]
    out = [np.longdouble(0)] * n
    for k in reversed(range(n)):
        s = b[k] - sum(a[k][c] * out[c] for c in range(k + 1, n))
        out[k] = s / a[k][k]
    return np.array(out, dtype=np.longdouble)


def digits(estimate, ref):
    err = abs(np.longdouble(estimate) - ref) / abs(ref)
    return 17.0 if err == 0 else float(-np.log10(err))


def compare(path, headway_json):
    x, y = load(path)
    runs = {}
    for method in ("lm", "trf"):
        times = []
        result = None
        for _ in range(7 if len(x) <= 200_000 else 3):
            t0 = time.perf_counter()
            result = least_squares(residuals, START, jac=jacobian, args=(x, y), method=method,
                                   ftol=1e-15, xtol=1e-15, gtol=1e-15, max_nfev=10000)
            times.append(time.perf_counter() - t0)
        runs[method] = (sorted(times), result)
    ref, cond = reference(runs["lm"][1].x, x, y)
    print(f"reference (long double Gauss-Newton): a={ref[0]!r} b={ref[1]!r} c={ref[2]!r}; cond(J)={cond:.3g}")
    for method, (times, result) in runs.items():
        d = min(digits(result.x[k], ref[k]) for k in range(3))
        print(f"scipy least_squares method={method}: median {1000 * times[len(times) // 2]:.1f} ms,"
              f" best {1000 * times[0]:.1f} ms over {len(times)} runs; nfev={result.nfev};"
              f" min correct digits {d:.1f}")
    with open(headway_json) as f:
        fit = json.load(f)
    values = [p["value"] for p in fit["parameters"]]
    d = min(digits(values[k], ref[k]) for k in range(3))
    print(f"headway fit (same data, same start): min correct digits {d:.1f}; iterations {fit['iterations']}")


if __name__ == "__main__":
    if len(sys.argv) in (3, 4) and sys.argv[1] == "--generate":
        generate(sys.argv[2], int(sys.argv[3]) if len(sys.argv) == 4 else N)
    elif len(sys.argv) == 4 and sys.argv[1] == "--compare":
        compare(sys.argv[2], sys.argv[3])
    else:
        sys.exit(__doc__)
