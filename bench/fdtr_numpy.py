#!/usr/bin/env python3
"""The competitor of the speed benchmark, not part of Lamella: a plain vectorised numpy computation of what
`lamella simulate` computes for an FDTR case with Gaussian beams on a layered stack (the same impedance recursion
and Hankel integral, README "How the numbers are made"), written as a scientist would script it. It reads the case
file, integrates over wavenumber with composite Gauss-Legendre panels evenly spaced in ln k, and writes the same
CSV columns.

    python3 fdtr_numpy.py CASE.json OUT.csv
"""
import json
import sys

import numpy as np


def layers_of(case):
    out = []
    for layer in case["stack"]["layers"]:
        kz = layer["k_through_w_mk"]
        kr = layer.get("k_in_plane_w_mk", kz)
        out.append((layer.get("thickness_m", np.inf), kz, kr, layer["heat_capacity_j_m3k"],
                    layer.get("conductance_below_w_m2k", np.inf)))
    return out


def surface_impedance(layers, k2, omega):
    """Z(k, ω) for a semi-infinite bottom, from the bottom layer up; arrays broadcast over (frequency, k)."""
    d, kz, kr, c, g = layers[-1]
    q = np.sqrt((kr * k2 + 1j * omega * c) / kz)
    z = 1.0 / (kz * q)
    for d, kz, kr, c, g in reversed(layers[:-1]):
        if np.isfinite(g):
            z = z + 1.0 / g
        q = np.sqrt((kr * k2 + 1j * omega * c) / kz)
        e = np.exp(-2.0 * q * d)
        t = (1.0 - e) / (1.0 + e)
        gamma = kz * q
        z = (gamma * z + t) / (gamma * (1.0 + gamma * z * t))
    return z


def main():
    case = json.load(open(sys.argv[1]))
    geometry = case["geometry"]
    w2 = geometry["pump_radius_m"] ** 2 + geometry["probe_radius_m"] ** 2
    f = np.asarray(case["measurement"]["frequencies_hz"], dtype=float)
    k_max = np.sqrt(200.0 / w2)
    # 48 panels of 16 Gauss-Legendre points over ln k from k_max·1e-7 to k_max
    x, w = np.polynomial.legendre.leggauss(16)
    edges = np.linspace(np.log(k_max) - 7 * np.log(10), np.log(k_max), 49)
    mid = 0.5 * (edges[1:] + edges[:-1])
    half = 0.5 * (edges[1:] - edges[:-1])
    u = (mid[:, None] + half[:, None] * x[None, :]).ravel()
    wu = (half[:, None] * w[None, :]).ravel()
    k = np.exp(u)
    weight = wu * k * k * np.exp(-k * k * w2 / 8.0) / (2.0 * np.pi)
    z = surface_impedance(layers_of(case), (k * k)[None, :], 2.0 * np.pi * f[:, None])
    h = z @ weight
    with open(sys.argv[2], "w") as out:
        out.write("frequency_hz,re_k_per_w,im_k_per_w,amplitude_k_per_w,phase_deg\n")
        for fi, hi in zip(f, h):
            out.write("%.12e,%.12e,%.12e,%.12e,%.12e\n" % (fi, hi.real, hi.imag, abs(hi),
                                                            np.degrees(np.angle(hi))))


if __name__ == "__main__":
    main()
