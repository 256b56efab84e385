#!/usr/bin/env python3
"""Peer for ColebrookBenchmark: the Colebrook-White friction factor over the same 1,000,000 pairs,
vectorised with NumPy/SciPy through its closed Lambert-W form, timed on one core, and the accuracy of
both the peer and Headway's Java solver against a high-precision reference.

Closed form (exact rearrangement of 1/sqrt(f) = -2 log10(rr/3.7 + 2.51/(Re sqrt(f)))):
  a = rr/3.7, b = 2.51/Re, c = 2/ln 10, t = a/(b c) - ln(b c)
  w = W(e^t)      (scipy.special.lambertw; where e^t overflows a double, the Wright omega function
                   scipy.special.wrightomega(t), which is W(e^t) by definition)
  x = 1/sqrt(f) = -c ln(b c w)   (this form avoids the cancellation of x = c w - a/b)

Usage: colebrook_peer.py FOLDER   (FOLDER holds re.f64, rr.f64, java-f.f64 from BenchPairs)
Prints one JSON object on stdout.
"""
import json
import math
import os
import sys
import time

import numpy as np
from scipy.special import lambertw, wrightomega

C = 2.0 / math.log(10.0)
LOG_MAX = 709.0  # e^t stays finite in float64 below this
REFERENCE_STRIDE = 200  # every 200th pair -> 5,000 high-precision reference points


def peer_friction_factor(re, rr):
    a = rr / 3.7
    b = 2.51 / re
    bc = b * C
    t = a / bc - np.log(bc)
    w = np.empty_like(t)
    small = t < LOG_MAX
    w[small] = lambertw(np.exp(t[small])).real
    large = ~small
    if large.any():
        w[large] = wrightomega(t[large]).real
    x = -C * np.log(bc * w)
    return 1.0 / (x * x)


def omega_friction_factor(re, rr):
    """The same closed form with the Wright omega function for every pair (omega(t) = W(e^t)):
    a faster NumPy/SciPy variant, measured for comparison."""
    a = rr / 3.7
    bc = 2.51 / re * C
    w = wrightomega(a / bc - np.log(bc)).real
    x = -C * np.log(bc * w)
    return 1.0 / (x * x)


def reference_friction_factor(re, rr):
    """60-digit Colebrook-White through mpmath's Lambert W; None if mpmath is missing."""
    try:
        import mpmath
    except ImportError:
        return None
    mpmath.mp.dps = 60
    out = np.empty(len(re))
    c = 2 / mpmath.log(10)
    for i, (r, e) in enumerate(zip(re, rr)):
        a = mpmath.mpf(float(e)) / mpmath.mpf("3.7")
        b = mpmath.mpf("2.51") / mpmath.mpf(float(r))
        bc = b * c
        w = mpmath.lambertw(mpmath.exp(a / bc) / bc).real
        x = -c * mpmath.log(bc * w)
        out[i] = float(1 / (x * x))
    return out


def main():
    folder = sys.argv[1] if len(sys.argv) > 1 else "target/bench"
    re = np.fromfile(os.path.join(folder, "re.f64"), dtype="<f8")
    rr = np.fromfile(os.path.join(folder, "rr.f64"), dtype="<f8")
    java = np.fromfile(os.path.join(folder, "java-f.f64"), dtype="<f8")
    n = len(re)

    peer_friction_factor(re[:10000], rr[:10000])  # warm caches and imports
    times = []
    for _ in range(5):
        start = time.perf_counter()
        f = peer_friction_factor(re, rr)
        times.append(time.perf_counter() - start)
    cpu_times = []
    for _ in range(5):
        start = time.process_time()
        peer_friction_factor(re, rr)
        cpu_times.append(time.process_time() - start)
    omega_cpu = []
    for _ in range(5):
        start = time.process_time()
        f_omega = omega_friction_factor(re, rr)
        omega_cpu.append(time.process_time() - start)
    best = min(times)
    median = sorted(times)[len(times) // 2]

    index = np.arange(0, n, REFERENCE_STRIDE)
    reference = reference_friction_factor(re[index], rr[index])
    if reference is None:
        reference_name = "Headway Java values (mpmath not importable)"
        reference = java[index]
    else:
        reference_name = "mpmath 60-digit Lambert W, every %dth pair" % REFERENCE_STRIDE

    def max_rel(values):
        return float(np.max(np.abs(values / reference - 1.0)))

    result = {
        "pairs": n,
        "numpy": np.__version__,
        "peer_seconds_best": best,
        "peer_seconds_median": median,
        "peer_ns_per_op": best / n * 1e9,
        "peer_ns_per_op_median": median / n * 1e9,
        "peer_solves_per_s": n / best,
        "peer_cpu_ns_per_op": min(cpu_times) / n * 1e9,
        "peer_lambertw_share": float(np.mean((rr / 3.7) / (2.51 / re * C) - np.log(2.51 / re * C) < LOG_MAX)),
        "reference": reference_name,
        "reference_points": int(len(index)),
        "peer_max_rel_error": max_rel(f[index]),
        "omega_cpu_ns_per_op": min(omega_cpu) / n * 1e9,
        "omega_max_rel_error": max_rel(f_omega[index]),
        "java_max_rel_error": max_rel(java[index]),
        "peer_vs_java_max_rel_diff_all_pairs": float(np.max(np.abs(f / java - 1.0))),
        "peer_nan_count": int(np.count_nonzero(~np.isfinite(f))),
    }
    print(json.dumps(result))


if __name__ == "__main__":
    main()
