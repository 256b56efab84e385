#!/usr/bin/env python3
"""Whole-process peer for `headway friction --input`: reads the same CSV, computes the Colebrook-White
friction factor of every row through the closed Lambert-W form (NumPy/SciPy, vectorised), and writes
a CSV with the input columns followed by friction_factor, regime, method, cautions and error -- the
columns Headway writes -- with every factor written round-trippably (Python's repr, shortest digits).

Usage: friction_batch_peer.py IN.csv OUT.csv
Reading uses numpy.loadtxt (C tokeniser) for the two number columns and the raw lines for the echo.
"""
import math
import sys

import numpy as np
from scipy.special import lambertw, wrightomega

C = 2.0 / math.log(10.0)
LOG_MAX = 709.0


def friction_factor(re, rr):
    bc = 2.51 / re * C
    t = rr / 3.7 / bc - np.log(bc)
    w = np.empty_like(t)
    small = t < LOG_MAX
    w[small] = lambertw(np.exp(t[small])).real
    if (~small).any():
        w[~small] = wrightomega(t[~small]).real
    x = -C * np.log(bc * w)
    return 1.0 / (x * x)


def main(source, target):
    with open(source, encoding="utf-8") as f:
        lines = f.read().splitlines()
    header = lines[0].split(",")
    ire, irr = header.index("re"), header.index("relative_roughness")
    data = np.loadtxt(source, delimiter=",", skiprows=1, usecols=(ire, irr), dtype=np.float64)
    re, rr = data[:, 0], data[:, 1]
    f = friction_factor(re, rr)
    regime = np.where(re < 2300.0, "laminar", np.where(re < 4000.0, "transitional", "turbulent"))
    out = [lines[0] + ",friction_factor,regime,method,cautions,error"]
    out.extend(
        line + "," + repr(x) + "," + g + ",colebrook,," for line, x, g in zip(lines[1:], f.tolist(), regime.tolist())
    )
    with open(target, "w", encoding="utf-8") as f:
        f.write("\n".join(out))
        f.write("\n")


if __name__ == "__main__":
    main(sys.argv[1], sys.argv[2])
