#!/usr/bin/env python3
"""Independent reference falls for the physics tests, solved with SciPy.

Writes tests/unit/physics/fixtures/scipy-falls.json: drop cases in the project's drop-case
JSON (custom media and explicit coefficients only, so nothing here depends on the project's
media or shape code) with the fall time, impact velocity and drift at the bottom and at
every layer boundary. The equations are written out here from the textbook form

    (m + m_a) dv/dt = -(m - rho V) g y_hat - (b + c |u|) u,   u = v - (w, 0),  c = rho Cd A / 2

and solved with scipy.integrate.solve_ivp: DOP853 (rtol 1e-12) for ordinary cases and Radau
(rtol 1e-12, exact Jacobian) for stiff ones (relaxation times far below the fall time), with
the ground or layer boundary found as a terminal event. Run: python3 scripts/reference/falls.py
"""
import json
import math
import os
import sys

import numpy as np
import scipy
from scipy.integrate import solve_ivp

G0 = 9.80665
AIR = {"density_kg_m3": 1.225, "viscosity_pa_s": 1.789e-5, "phase": "gas"}
SEA = {"density_kg_m3": 1025.0, "viscosity_pa_s": 1.22e-3, "phase": "liquid"}


def sphere(d, rho_p, medium):
    """A sphere with Stokes' linear coefficient 3 pi mu d and Cd 0.47 on its frontal area."""
    return {
        "mass_kg": rho_p * math.pi * d**3 / 6,
        "cd": 0.47,
        "area_m2": math.pi * d * d / 4,
        "linear_coeff_kg_s": 3 * math.pi * medium["viscosity_pa_s"] * d,
    }


NEAR_NEUTRAL = {"mass_kg": 1.0, "cd": 1.0, "area_m2": 0.01, "volume_m3": 0.000975, "added_mass_coeff": 0.5}

# (name, drop case). Heights and flows are single-medium unless the case has layers.
CASES = [
    ("1 um sphere in 20 m/s wind", {"object": sphere(1e-6, 2650, AIR), "drag_model": "linear_quadratic", "medium": AIR, "release": {"height_m": 2}, "wind_m_s": 20}),
    ("1 um sphere in 30 m/s wind", {"object": sphere(1e-6, 2650, AIR), "drag_model": "linear_quadratic", "medium": AIR, "release": {"height_m": 1.5}, "wind_m_s": -30}),
    ("0.5 um sphere in 10 m/s wind", {"object": sphere(0.5e-6, 2650, AIR), "drag_model": "linear_quadratic", "medium": AIR, "release": {"height_m": 1}, "wind_m_s": 10}),
    ("5 um sphere thrown up at 30 m/s", {"object": sphere(5e-6, 2650, AIR), "drag_model": "linear_quadratic", "medium": AIR, "release": {"height_m": 2, "velocity_m_s": [0, 30]}}),
    ("5 um sphere thrown up and sideways in wind", {"object": sphere(5e-6, 2650, AIR), "drag_model": "linear_quadratic", "medium": AIR, "release": {"height_m": 3, "velocity_m_s": [4, 25]}, "wind_m_s": 7}),
    ("near-neutral object thrown in water", {"object": NEAR_NEUTRAL, "drag_model": "quadratic", "medium": SEA, "release": {"height_m": 10, "velocity_m_s": [3, 2]}}),
    ("near-neutral object in a current", {"object": NEAR_NEUTRAL, "drag_model": "quadratic", "medium": SEA, "release": {"height_m": 10}, "wind_m_s": 1.5}),
    ("near-neutral object thrown up in water", {"object": NEAR_NEUTRAL, "drag_model": "quadratic", "medium": SEA, "release": {"height_m": 10, "velocity_m_s": [0, 5]}}),
    ("near-neutral object thrown up, linear and quadratic drag", {"object": {**NEAR_NEUTRAL, "linear_coeff_kg_s": 0.01}, "drag_model": "linear_quadratic", "medium": SEA, "release": {"height_m": 10, "velocity_m_s": [0, 5]}}),
    ("light sheet thrown down into a head wind", {"object": {"mass_kg": 12.9e-6, "cd": 0.6, "area_m2": 3.5}, "drag_model": "quadratic", "medium": AIR, "release": {"height_m": 6.4e-3, "velocity_m_s": [0, -39.6]}, "wind_m_s": -27.7}),
    ("light sheet thrown sideways into a head wind", {"object": {"mass_kg": 12.9e-6, "cd": 0.6, "area_m2": 3.5}, "drag_model": "quadratic", "medium": AIR, "release": {"height_m": 6.4e-3, "velocity_m_s": [-39.6, 0]}, "wind_m_s": -27.7}),
    ("light sheet, low drag coefficient, thrown sideways", {"object": {"mass_kg": 12.9e-6, "cd": 0.1, "area_m2": 3.5}, "drag_model": "quadratic", "medium": AIR, "release": {"height_m": 6.4e-3, "velocity_m_s": [-39.6, 0]}, "wind_m_s": -27.7}),
    ("2 kg object, 50 m, wind", {"object": {"mass_kg": 2, "cd": 1.0, "area_m2": 0.01}, "drag_model": "quadratic", "medium": AIR, "release": {"height_m": 50, "velocity_m_s": [1, 0]}, "wind_m_s": 10}),
    ("5 kg tool thrown up into wind", {"object": {"mass_kg": 5, "cd": 0.9, "area_m2": 0.02, "linear_coeff_kg_s": 0.05}, "drag_model": "linear_quadratic", "medium": AIR, "release": {"height_m": 30, "velocity_m_s": [2, 5]}, "wind_m_s": -8}),
    ("30 kg box, air over seawater", {
        "object": {"mass_kg": 30, "cd": 1.05, "area_m2": 0.12, "volume_m3": 0.012, "added_mass_coeff": 0.6},
        "drag_model": "quadratic",
        "layers": [{"medium": AIR, "thickness_m": 25, "flow_m_s": 12}, {"medium": SEA, "thickness_m": 60, "flow_m_s": 0.8}],
        "release": {"velocity_m_s": [0, 0]},
    }),
    ("steel bar through three layers", {
        "object": {"mass_kg": 2.4, "cd": 1.2, "area_m2": 0.024, "volume_m3": 0.000306, "added_mass_coeff": 1.0},
        "drag_model": "quadratic",
        "layers": [
            {"medium": AIR, "thickness_m": 40, "flow_m_s": 15},
            {"medium": SEA, "thickness_m": 30, "flow_m_s": 1.2},
            {"medium": SEA, "thickness_m": 70, "flow_m_s": -0.4},
        ],
        "release": {"velocity_m_s": [1.5, 3]},
    }),
]


def layer_params(case):
    """Inertial mass, net weight, linear and quadratic coefficients and flow of each layer, top first."""
    o = case["object"]
    g = case.get("gravity_m_s2", G0)
    if "layers" in case:
        specs = [(l["medium"], l["thickness_m"], l.get("flow_m_s", 0.0)) for l in case["layers"]]
    else:
        specs = [(case["medium"], case["release"]["height_m"], case.get("wind_m_s", 0.0))]
    model = case["drag_model"]
    out = []
    for medium, thickness, flow in specs:
        rho = medium["density_kg_m3"]
        volume = o.get("volume_m3", 0.0)
        added = rho * o.get("added_mass_coeff", 0.0) * volume if medium["phase"] == "liquid" else 0.0
        b = o.get("linear_coeff_kg_s", 0.0) if model in ("linear", "linear_quadratic") else 0.0
        c = 0.5 * rho * o["cd"] * o["area_m2"] if model in ("quadratic", "linear_quadratic") else 0.0
        out.append({"M": o["mass_kg"] + added, "W": (o["mass_kg"] - rho * volume) * g, "b": b, "c": c, "w": flow, "thickness": thickness})
    return out


def solve_layer(p, t0, state, bottom):
    M, W, b, c, w = p["M"], p["W"], p["b"], p["c"], p["w"]

    def f(_t, s):
        ux, uy = s[2] - w, s[3]
        k = (b + c * math.hypot(ux, uy)) / M
        return [s[2], s[3], -k * ux, -W / M - k * uy]

    def jac(_t, s):
        ux, uy = s[2] - w, s[3]
        sp = math.hypot(ux, uy)
        k = (b + c * sp) / M
        dk = c / M / sp if sp > 0 else 0.0
        return [[0, 0, 1, 0], [0, 0, 0, 1], [0, 0, -k - dk * ux * ux, -dk * ux * uy], [0, 0, -dk * ux * uy, -k - dk * uy * uy]]

    def ground(_t, s):
        return s[1] - bottom

    ground.terminal = True
    ground.direction = -1
    vt_guess = (2 * W) / (b + math.sqrt(b * b + 4 * c * W)) if c > 0 else (W / b if b > 0 else math.inf)
    relax = min(vt_guess * M / W if math.isfinite(vt_guess) else math.inf, M / b if b > 0 else math.inf)
    fall = (state[1] - bottom + max(state[3], 0) ** 2 / (2 * W / M)) / max(vt_guess, 1e-300) if math.isfinite(vt_guess) else 1.0
    stiff = fall > 1e4 * relax
    span = 100 * (fall + math.sqrt(2 * (state[1] - bottom + 1e-9) * M / W) + (abs(state[3]) + abs(state[2] - w)) * M / W) + 10
    # Absolute tolerances far below every quantity that matters: lengths to 1e-13 of the layer,
    # speeds to 1e-13 of the terminal or release speed.
    vscale = min(vt_guess, 1e3) if math.isfinite(vt_guess) else max(1.0, abs(state[3]))
    lscale = max(state[1] - bottom, 1e-9)
    atol = [1e-14 * lscale, 1e-14 * lscale, 1e-14 * vscale, 1e-14 * vscale]
    if stiff:
        sol = solve_ivp(f, (t0, t0 + span), state, method="Radau", jac=jac, rtol=1e-12, atol=atol, events=ground)
    else:
        sol = solve_ivp(f, (t0, t0 + span), state, method="DOP853", rtol=1e-12, atol=atol, events=ground)
    if sol.status != 1:
        raise RuntimeError(f"no ground event: {sol.message}")
    return float(sol.t_events[0][0]), [float(v) for v in sol.y_events[0][0]], "Radau" if stiff else "DOP853"


def reference(case):
    layers = layer_params(case)
    v0 = case.get("release", {}).get("velocity_m_s", [0.0, 0.0])
    top = sum(l["thickness"] for l in layers)
    t, state = 0.0, [0.0, top, float(v0[0]), float(v0[1])]
    arrivals, methods = [], []
    for p in layers:
        arrivals.append({"time_s": t, "velocity_m_s": [state[2], state[3]], "x_m": state[0]})
        bottom = top - p["thickness"]
        t, state, method = solve_layer(p, t, state, bottom)
        state[1] = bottom
        methods.append(method)
        top = bottom
    return {"fall_time_s": t, "impact_velocity_m_s": [state[2], state[3]], "drift_m": state[0], "layer_entries": arrivals, "methods": methods}


def main():
    root = os.path.dirname(os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
    out = os.path.join(root, "tests", "unit", "physics", "fixtures", "scipy-falls.json")
    cases = [{"name": name, "case": case, "reference": reference(case)} for name, case in CASES]
    doc = {
        "source": f"scripts/reference/falls.py with SciPy {scipy.__version__} (solve_ivp DOP853 or Radau, rtol 1e-12), NumPy {np.__version__}, Python {sys.version.split()[0]}",
        "cases": cases,
    }
    with open(out, "w") as fh:
        json.dump(doc, fh, indent=1)
        fh.write("\n")
    for c in cases:
        r = c["reference"]
        print(f'{c["name"]:60s} t={r["fall_time_s"]:.12g} v={r["impact_velocity_m_s"]} {r["methods"]}')


if __name__ == "__main__":
    main()
