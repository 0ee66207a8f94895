#!/usr/bin/env python3
"""The vectorised peer of `pinproof batch` (the benchmark's yardstick, docs/performance.md).

What an engineer's short numpy script computes for a schedule of uniformly loaded beams
with a catalogue of stiffness ranges: for each combination, the four corners of the two
joints' stiffness ranges on the condensed 2x2 system of the beam with end springs, and the
envelopes the summary CSV reports (largest end reaction and end moment under the strength
combinations, largest end rotation under every combination).

    numpy_peer.py SCHEDULE.csv DETAILS.json SECTIONS.csv OUT.csv
    numpy_peer.py --compare OUT.csv PINPROOF.csv|PINPROOF.json|FLOOR.csv [REL]

The first form writes one line per beam (SI: N, N*m, rad). The second compares it with
pinproof's summary CSV (to its printed rounding: 4 decimals in kN, kN*m, mrad) or, with a
JSON result or another output of this form (the C++ floor's), to the relative tolerance REL
(default 1e-9) on every row.

Closed form (slope-deflection, common practice; the simply supported end rotation as in
Roark's Formulas for Stress and Strain, Table 8.1, from memory, and the batch tests' [R8.1]):
simply supported end rotation theta0 = w L^3 / (24 EI); end flexibilities
a = L/(3EI), b = L/(6EI); with joint flexibility c = 1/k the hogging end moments solve
(c1 + a) M1 + b M2 = theta0, b M1 + (c2 + a) M2 = theta0; the end rotation is c M; the
reactions w L/2 +- (M1 - M2)/L.
"""
import csv
import json
import math
import sys

import numpy as np

UNITS = {"m": 1.0, "mm": 1e-3, "kN/m": 1e3, "N/m": 1.0, "kN*m/rad": 1e3, "MN*m/rad": 1e6, "N*m/rad": 1.0}
# Combinations (EN 1990 6.10 / 6.14b; ASCE 7-16 2.3.1-1, -2 and service), factors on (G, Q),
# and whether each is a strength combination.
COMBINATIONS = {"EN1990": [(1.35, 1.5, True), (1.0, 1.0, False)],
                "ASCE7": [(1.4, 0.0, True), (1.2, 1.6, True), (1.0, 1.0, False)]}
E = {"EN1990": 210e9, "ASCE7": 29000.0 * 6894757.293168361}  # EN 1993-1-1 3.2.6; AISC 360-16 B2


def quantity(text):
    value, unit = text.split(" ", 1)
    return float(value) * UNITS[unit]


def sections(path):
    """Second moment of area of rolled I sections with four root fillets (as src/model/section.cpp)."""
    out = {}
    for line in open(path, encoding="utf-8"):
        cells = line.strip().split(",")
        if line.startswith("#") or len(cells) < 7 or cells[1] != "mm":
            continue
        h, b, tw, tf, r = (float(x) * 1e-3 for x in cells[2:7])
        af = (1.0 - math.pi / 4.0) * r * r
        sc = r * (10.0 - 3.0 * math.pi) / (12.0 - 3.0 * math.pi)
        own = (1.0 - 5.0 * math.pi / 16.0) * r ** 4 - af * sc * sc
        hw, e = h - 2.0 * tf, h / 2.0 - tf - sc
        out[cells[0]] = (b * h ** 3 - (b - tw) * hw ** 3) / 12.0 + 4.0 * (own + af * e * e)
    return out


def stiffness_ranges(path):
    """Per detail id: (min, max) as N*m/rad, or as multiples of EI/L (second element True)."""
    out = {}
    for d in json.load(open(path, encoding="utf-8"))["details"]:
        lo, hi = d["stiffness"]["min"], d["stiffness"]["max"]
        if lo.endswith("EI/L"):
            out[d["id"]] = (float(lo.split()[0]), float(hi.split()[0]), True)
        elif hi != "rigid":
            out[d["id"]] = (quantity(lo), quantity(hi), False)
    return out


def compute(schedule, details, section_table, out_path):
    rows = [r for r in csv.reader(line for line in open(schedule, encoding="utf-8") if not line.startswith("#"))]
    head, rows = rows[0], rows[1:]
    col = {name: i for i, name in enumerate(head)}
    ranges, inertia = stiffness_ranges(details), sections(section_table)
    ids = [r[col["id"]] for r in rows]
    L = np.array([quantity(r[col["span"]]) for r in rows])
    G = np.array([quantity(r[col["g"]]) for r in rows])
    Q = np.array([quantity(r[col["q"]]) for r in rows])
    sets = np.array([r[col["combinations"]] for r in rows])
    EI = np.array([inertia[r[col["section"]]] for r in rows]) * np.where(sets == "ASCE7", E["ASCE7"], E["EN1990"])

    def k_range(column):
        lo, hi, rel = (np.array(x) for x in zip(*(ranges[r[col[column]]] for r in rows)))
        scale = np.where(rel, EI / L, 1.0)
        return lo * scale, hi * scale

    k1, k2 = k_range("start"), k_range("end")
    a, b = L / (3.0 * EI), L / (6.0 * EI)
    n = len(rows)
    env = {key: np.zeros(n) for key in ("R1", "R2", "M1", "M2", "T1", "T2")}
    for name in ("EN1990", "ASCE7"):
        mask = sets == name
        for fg, fq, strength in COMBINATIONS[name]:
            w = fg * G + fq * Q
            theta0 = w * L ** 3 / (24.0 * EI)
            for ks in (k1[0], k1[1]):
                for ke in (k2[0], k2[1]):
                    c1, c2 = 1.0 / ks, 1.0 / ke
                    det = (c1 + a) * (c2 + a) - b * b
                    M1, M2 = theta0 * (c2 + a - b) / det, theta0 * (c1 + a - b) / det
                    values = {"T1": c1 * M1, "T2": c2 * M2}
                    if strength:
                        values.update(M1=M1, M2=M2, R1=w * L / 2 + (M1 - M2) / L, R2=w * L / 2 - (M1 - M2) / L)
                    for key, v in values.items():
                        env[key] = np.where(mask, np.maximum(env[key], np.abs(v)), env[key])
    with open(out_path, "w", encoding="utf-8") as out:
        out.write("id,reaction_start,reaction_end,moment_start,moment_end,rotation_start,rotation_end\n")
        table = np.column_stack([env[k] for k in ("R1", "R2", "M1", "M2", "T1", "T2")])
        for i, values in enumerate(table):
            out.write(ids[i] + "," + ",".join(repr(float(v)) for v in values) + "\n")


def compare(peer_path, pinproof_path, rel):
    peer = {r[0]: [float(x) for x in r[1:]] for r in list(csv.reader(open(peer_path)))[1:]}
    keys = ("reaction_start", "reaction_end", "moment_start", "moment_end", "rotation_start", "rotation_end")
    worst, checked = 0.0, 0
    if open(pinproof_path, encoding="utf-8").readline().startswith("id,reaction_start"):
        # Another program's output in this script's format (the C++ floor).
        for r in list(csv.reader(open(pinproof_path)))[1:]:
            for mine, theirs in zip(peer[r[0]], (float(x) for x in r[1:])):
                worst = max(worst, abs(mine - theirs) / max(abs(theirs), 1e-30))
            checked += 1
        ok = worst <= rel
        how = f"largest relative difference {worst:.2e} (tolerance {rel:g})"
    elif pinproof_path.endswith(".json"):
        for beam in json.load(open(pinproof_path))["beams"]:
            for k, mine in zip(keys, peer[beam["id"]]):
                worst = max(worst, abs(mine - beam[k]) / max(abs(beam[k]), 1e-30))
            checked += 1
        ok = worst <= rel
        how = f"largest relative difference {worst:.2e} (tolerance {rel:g})"
    else:
        lines = [line for line in open(pinproof_path, encoding="utf-8") if not line.startswith("#")]
        rows = list(csv.reader(lines))
        head = [h.split(" [")[0] for h in rows[0]]
        scale = [1e-3, 1e-3, 1e-3, 1e-3, 1e3, 1e3]  # kN, kN*m, mrad: the CSV's SI units
        for r in rows[1:]:
            cells = dict(zip(head, r))
            for k, s, mine in zip(keys, scale, peer[cells["id"]]):
                # Printed to 4 decimals: agreement within half a unit of the last place.
                worst = max(worst, abs(mine * s - float(cells[k])) / 0.5e-4)
            checked += 1
        ok = worst <= 1.0 + 1e-6
        how = f"largest difference {worst:.3f} of half the last printed decimal"
    print(f"numpy peer against {pinproof_path.rsplit('/', 1)[-1]}: {checked} rows, {how}: {'agree' if ok else 'DISAGREE'}")
    return 0 if ok and checked == len(peer) else 1


if __name__ == "__main__":
    if len(sys.argv) >= 4 and sys.argv[1] == "--compare":
        sys.exit(compare(sys.argv[2], sys.argv[3], float(sys.argv[4]) if len(sys.argv) > 4 else 1e-9))
    if len(sys.argv) != 5:
        sys.exit(__doc__)
    compute(*sys.argv[1:])
