#!/usr/bin/env python3
"""The general-purpose stiff integrators of the stiff-peer comparison (see README.md beside this file).

Reads the CASE-TARGET.json files written by `Layers.Benchmarks export-system`: each holds one finite-volume system
Cap du/dt = s - A u (A symmetric tridiagonal), u(0), the output times, how the amount received by the right medium
follows from the state, and our own methods' sweeps and timings. Solves the same equations with scipy's solve_ivp
(LSODA with the banded Jacobian, BDF with the sparse Jacobian), sweeps the tolerances, times the cheapest setting that
meets the target accuracy against the integrator's own converged answer, and prints one table for all methods.

    python3 peers.py FOLDER

Uses only numpy and scipy (Debian: apt-get install python3-scipy). Not part of the test suite.
"""

import glob
import json
import os
import sys
import time

import numpy as np
from scipy import sparse
from scipy.integrate import solve_ivp

# Relative tolerances, coarse to fine, and absolute tolerances over (rtol x largest |u|): the ladder of our TR-BDF2.
TOLERANCES = [1e-2, 3e-3, 1e-3, 3e-4, 1e-4, 3e-5, 1e-5, 3e-6, 1e-6, 3e-7, 1e-7, 3e-8, 1e-8, 3e-9, 1e-9, 3e-10, 1e-10]
ABSOLUTE_SCALES = [1e-3, 1e-6, 1e-9]
# The converged answer each setting is judged against.
REFERENCE_TOLERANCE = 1e-12
REFERENCE_ABSOLUTE_SCALE = 1e-9
# How many settings within the target are timed per absolute scale (finer ones are not run).
TIMED_PASSING = 2
METHODS = ["LSODA", "BDF"]


class System:
    """The equations of one file as a linear ODE y' = J y + b, with the integral of the receiving link appended."""

    def __init__(self, data):
        capacity = np.array(data["capacity"])
        diagonal = np.array(data["matrixDiagonal"])
        off = np.array(data["matrixOffDiagonal"])
        source = np.array(data["source"])
        n = len(capacity)
        a = sparse.diags([off, diagonal, off], [-1, 0, 1], shape=(n, n), format="csr")
        jacobian = sparse.diags(1 / capacity) @ (-a)
        offset = source / capacity
        received = data["received"]
        self.state_nodes = np.array(received["stateNodes"], dtype=int)
        self.state_weights = np.array(received["stateWeights"])
        self.state_offset = received["stateOffset"]
        self.integrates = len(received["rateNodes"]) > 0
        y0 = np.array(data["initialState"])
        state_scale = data["stateScale"]
        if self.integrates:
            # q' = sum(w u) + w0: one more unknown, coupled only to the nodes it reads.
            row = sparse.csr_matrix(
                (received["rateWeights"], (np.zeros(len(received["rateNodes"]), dtype=int), received["rateNodes"])),
                shape=(1, n))
            jacobian = sparse.bmat([[jacobian, None], [row, sparse.csr_matrix((1, 1))]], format="csr")
            offset = np.append(offset, received["rateOffset"])
            y0 = np.append(y0, 0.0)
        self.jacobian = jacobian.tocsr()
        self.jacobian_csc = jacobian.tocsc()
        self.offset = offset
        self.y0 = y0
        # Scale of each unknown for the absolute tolerance: the largest |u| for the nodes, the amount for q.
        self.scale = np.full(len(y0), float(state_scale))
        if self.integrates:
            self.scale[-1] = data["errorScale"]
        coo = jacobian.tocoo()
        self.lband = int(max(0, np.max(coo.row - coo.col)))
        self.uband = int(max(0, np.max(coo.col - coo.row)))
        # LAPACK band storage, jac[uband + i - j, j] = J[i, j], with lband more rows of zeros below: the Fortran LSODA
        # keeps its band factors in a (2 lband + uband + 1) x n array, and scipy 1.10 hands it ours without padding.
        packed = np.zeros((2 * self.lband + self.uband + 1, len(y0)), order="F")
        packed[self.uband + coo.row - coo.col, coo.col] = coo.data
        self.packed = packed
        self.times = np.array(data["outputTimesSeconds"])
        self.duration = data["durationSeconds"]

    def fun(self, t, y):
        return self.jacobian @ y + self.offset

    def banded(self, t, y):
        return self.packed

    def solve(self, method, rtol, absolute_scale):
        """Amount received at the output times, and the work (right-hand sides, Jacobians, factorisations)."""
        atol = rtol * absolute_scale * self.scale
        if method == "LSODA":
            solution = solve_ivp(self.fun, (0, self.duration), self.y0, method="LSODA", t_eval=self.times,
                                 rtol=rtol, atol=atol, jac=self.banded, lband=self.lband, uband=self.uband)
        else:
            solution = solve_ivp(self.fun, (0, self.duration), self.y0, method="BDF", t_eval=self.times,
                                 rtol=rtol, atol=atol, jac=self.jacobian_csc)
        if solution.status != 0:
            return None, (solution.nfev, solution.njev, solution.nlu)
        y = solution.y
        amount = self.state_weights @ y[self.state_nodes, :] + self.state_offset
        if self.integrates:
            amount = amount + y[-1, :]
        return amount, (solution.nfev, solution.njev, solution.nlu)


def best_seconds(action):
    """Best wall time after one warm-up run: as many runs as fit in 0.3 s, at least 3 and at most 100."""
    action()
    best, spent, runs = float("inf"), 0.0, 0
    while runs < 100 and (runs < 3 or spent < 0.3):
        start = time.perf_counter()
        action()
        elapsed = time.perf_counter() - start
        best, spent, runs = min(best, elapsed), spent + elapsed, runs + 1
    return best


def error(received, reference, scale):
    if received is None:
        return float("inf")
    return float(np.max(np.abs(np.asarray(received) - np.asarray(reference))) / scale)


def sweep(system, method, target, scale):
    """Every (rtol, atol scale) until TIMED_PASSING settings per scale meet the target; returns points, chosen, reference."""
    reference, _ = system.solve(method, REFERENCE_TOLERANCE, REFERENCE_ABSOLUTE_SCALE)
    points = []
    for absolute_scale in ABSOLUTE_SCALES:
        timed = 0
        for rtol in TOLERANCES:
            if timed >= TIMED_PASSING:
                break
            received, work = system.solve(method, rtol, absolute_scale)
            err = error(received, reference, scale)
            seconds = None
            if err <= target:
                seconds = best_seconds(lambda: system.solve(method, rtol, absolute_scale))
                timed += 1
            points.append({"rtol": rtol, "absoluteScale": absolute_scale, "error": err, "work": work, "bestSeconds": seconds})
    timed_points = [p for p in points if p["bestSeconds"] is not None]
    chosen = min(timed_points, key=lambda p: p["bestSeconds"]) if timed_points else None
    return points, chosen, reference


def row(data, method, setting, chosen, work):
    return {"case": data["case"], "target": data["targetAccuracy"], "cells": data["cells"], "method": method,
            "setting": setting, "error": chosen["error"] if chosen else None, "work": work,
            "seconds": chosen["bestSeconds"] if chosen else None}


def main(folder):
    files = sorted(glob.glob(os.path.join(folder, "*.json")))
    if not files:
        sys.exit(f"no *.json in {folder}: run `Layers.Benchmarks export-system --out {folder}` first")
    rows, checks = [], []
    for path in files:
        data = json.load(open(path))
        system = System(data)
        target, scale = data["targetAccuracy"], data["errorScale"]
        group = []
        ours = data["trBdf2"]
        chosen = next((p for p in ours["ladder"] if p["chosen"]), None)
        group.append(row(data, "TR-BDF2 (ours)",
                         f"rtol {chosen['relativeTolerance']:.0e}, atol scale {chosen['absoluteScale']:.0e}" if chosen else "none",
                         chosen, f"{chosen['work']} steps" if chosen else ""))
        exact = data["laplace"]
        chosen = next((p for p in exact["ladder"] if p["chosen"]), None)
        group.append(row(data, "Laplace (ours)", f"{chosen['contourPoints']:.0f} contour points" if chosen else "none",
                         chosen, f"{chosen['work']} transforms" if chosen else ""))
        references = {"TR-BDF2": ours["reference"]}
        for method in METHODS:
            points, chosen, reference = sweep(system, method, target, scale)
            references[method] = reference
            work = f"{chosen['work'][0]} f, {chosen['work'][2]} LU" if chosen else ""
            group.append(row(data, f"scipy {method}",
                             f"rtol {chosen['rtol']:.0e}, atol scale {chosen['absoluteScale']:.0e}" if chosen else "none",
                             chosen, work))
            print(f"# {data['case']} {target:.0e} {method}: " + "; ".join(
                f"{p['rtol']:.0e}/{p['absoluteScale']:.0e} {p['error']:.1e}"
                + (f" {p['bestSeconds'] * 1e3:.3f} ms" if p["bestSeconds"] is not None else "") for p in points),
                file=sys.stderr)
        fastest = min((r["seconds"] for r in group if r["seconds"] is not None), default=None)
        for r in group:
            r["ratio"] = r["seconds"] / fastest if r["seconds"] is not None and fastest else None
        rows.extend(group)
        checks.append((data["case"], target, data["cells"],
                       ours["referenceAgainstExact"],
                       error(references["LSODA"], references["TR-BDF2"], scale),
                       error(references["BDF"], references["TR-BDF2"], scale)))

    print("| case | target | cells | method | cheapest setting within the target | error | work | best time, ms | x fastest |")
    print("| --- | --- | ---: | --- | --- | ---: | --- | ---: | ---: |")
    for r in rows:
        seconds = f"{r['seconds'] * 1e3:.3f}" if r["seconds"] is not None else "-"
        ratio = f"{r['ratio']:.1f}" if r["ratio"] is not None else "-"
        err = f"{r['error']:.1e}" if r["error"] is not None else "-"
        print(f"| {r['case']} | {r['target']:.0e} | {r['cells']} | {r['method']} | {r['setting']} | {err} | {r['work']} | {seconds} | {ratio} |")
    print()
    print("Converged answers of the same equations, largest difference over the report times / final amount:")
    print("| case | target | cells | TR-BDF2 ref. vs exact (space error) | LSODA ref. vs TR-BDF2 ref. | BDF ref. vs TR-BDF2 ref. |")
    print("| --- | --- | ---: | ---: | ---: | ---: |")
    for case, target, cells, space, lsoda, bdf in checks:
        print(f"| {case} | {target:.0e} | {cells} | {space:.1e} | {lsoda:.1e} | {bdf:.1e} |")


if __name__ == "__main__":
    main(sys.argv[1] if len(sys.argv) > 1 else "stiff-peers-out")
