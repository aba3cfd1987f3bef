#!/usr/bin/env python3
"""Independent reference for the drop-zone statistics test, solved with SciPy.

Writes tests/unit/physics/fixtures/scipy-drop-zone.json: the landing-distance percentiles of the
project's reference drop zone (bench/reference-drop-zone.ts, REFERENCE_DROP_ZONE: 2 kg, A 0.01 m²,
rho 1.225 kg/m³, 50 m, C_d uniform 0.8-1.3, wind uniform 0-15 m/s, horizontal release speed
uniform 0-2 m/s, 10,000 draws, seed 12345). The draws come from Mulberry32, ported here from
its public-domain definition so the same seed gives the same draws in the same order (C_d,
wind, release speed per case). Each fall is solved with scipy.integrate.solve_ivp DOP853 at
rtol 1e-12 with a ground event; percentiles are NumPy's "linear" method (Hyndman & Fan type 7).
Run: python3 scripts/reference/drop_zone.py (about half a minute).
"""
import json
import math
import os
import sys

import numpy as np
import scipy
from scipy.integrate import solve_ivp

MASK = 0xFFFFFFFF


def mulberry32(seed):
    state = seed & MASK

    def imul(a, b):
        return (a * b) & MASK

    def draw():
        nonlocal state
        state = (state + 0x6D2B79F5) & MASK
        z = state
        z = imul(z ^ (z >> 15), z | 1)
        z = (z ^ ((z + imul(z ^ (z >> 7), z | 61)) & MASK)) & MASK
        return ((z ^ (z >> 14)) & MASK) / 4294967296

    return draw


def landing(cd, wind, push, m=2.0, area=0.01, rho=1.225, h=50.0, g=9.80665):
    k = 0.5 * rho * cd * area / m

    def f(_t, s):
        ux, uy = s[2] - wind, s[3]
        d = k * math.hypot(ux, uy)
        return [s[2], s[3], -d * ux, -g - d * uy]

    def ground(_t, s):
        return s[1]

    ground.terminal = True
    ground.direction = -1
    sol = solve_ivp(f, (0, 60), [0.0, h, push, 0.0], method="DOP853", rtol=1e-12, atol=[1e-12 * h, 1e-12 * h, 1e-12 * 30, 1e-12 * 30], events=ground)
    return float(sol.t_events[0][0]), abs(float(sol.y_events[0][0][0]))


def main():
    draw = mulberry32(12345)
    distances, times = [], []
    for _ in range(10_000):
        cd = 0.8 + 0.5 * draw()
        wind = 15 * draw()
        push = 2 * draw()
        t, x = landing(cd, wind, push)
        distances.append(x)
        times.append(t)
    d = np.array(distances)
    pct = {name: float(np.percentile(d, q, method="linear")) for name, q in [("p50", 50), ("p90", 90), ("p95", 95), ("p99", 99), ("p99_9", 99.9)]}
    doc = {
        "source": f"scripts/reference/drop_zone.py with SciPy {scipy.__version__} (solve_ivp DOP853, rtol 1e-12), NumPy {np.__version__} percentile method 'linear', Python {sys.version.split()[0]}",
        "spec": {"cases": 10_000, "seed": 12345},
        "landing_distance_m": {**pct, "max": float(d.max())},
        "mean_fall_time_s": float(np.mean(times)),
        "first_distances_m": distances[:20],
    }
    root = os.path.dirname(os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
    with open(os.path.join(root, "tests", "unit", "physics", "fixtures", "scipy-drop-zone.json"), "w") as fh:
        json.dump(doc, fh, indent=1)
        fh.write("\n")
    print(json.dumps(doc["landing_distance_m"]), doc["mean_fall_time_s"])


if __name__ == "__main__":
    main()
