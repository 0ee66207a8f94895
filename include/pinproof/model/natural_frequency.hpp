// The first natural frequency of a beam on two vertical supports whose ends
// are held by rotational springs (pin, spring or rigid), carrying the mass of
// a load combination (a vibration combination such as G + 0.1 Q).
//
// Method: Euler-Bernoulli finite elements with consistent mass matrices
// (cubic Hermite elements; Przemieniecki, Theory of Matrix Structural
// Analysis, 1968, 11.4), nodes at every mass discontinuity and point mass and
// at least 48 elements; the springs add to the end rotations' stiffness, a
// rigid end removes its rotation; the lowest eigenvalue of the generalised
// symmetric eigenproblem K phi = omega^2 M phi is found by inverse iteration
// from the static deflection under the mass (Bathe, Finite Element Procedures,
// 11.2.1, from memory), with Eigen's GeneralizedSelfAdjointEigenSolver where
// that does not settle.
// The mass is the combination's downward load divided by the standard
// acceleration of gravity g_n = 9.80665 m/s^2 (by definition, CGPM 1901):
// distributed loads give distributed mass (taken as each element's mean),
// point loads point masses; point moments carry none. For a uniform mass the
// first eigenvalue lambda^2 = omega L^2 sqrt(m/EI) is pi^2 pinned-pinned,
// 22.373 fixed-fixed, 15.418 fixed-pinned, 3.516 clamped-free (Blevins, Formulas for Natural
// Frequency and Mode Shape, Table 8-1; reference pack 11.4).
// Units: SI (Hz, kg/m, m, N*m^2).
#pragma once

#include <vector>

#include "pinproof/model/beam_layout.hpp"
#include "pinproof/model/loads.hpp"
#include "pinproof/model/stiffness.hpp"

namespace pinproof {

inline constexpr double standard_gravity = 9.80665;  // m/s^2

// First natural frequency (Hz) of the beam carrying the mass of `loads`
// (already factored: a load's value times its combination factor). Throws
// std::invalid_argument for a span or EI that is not finite and > 0, a load
// outside the span, an upward load (negative mass) or no mass at all.
// A cantilever (beam_layout.hpp) holds only the root's deflection: its tip
// is free (`end` must be a pin, `start` not: std::invalid_argument otherwise).
// An overhang (`overhang` > 0, the length beyond the end support) is meshed
// over span + overhang with the deflection held at the start and at x = span
// (the beam continuous over it) and the tip free; `end` must be a pin; loads
// lie within span + overhang.
double first_natural_frequency(double span, double EI, const std::vector<load>& loads, stiffness start,
                               stiffness end, beam_layout layout = beam_layout::two_supports, double overhang = 0.0);

// The engineers' estimate f = 18 / sqrt(delta), delta the largest deflection in mm
// under the vibrating mass (f = 0.18 sqrt(g / delta) for a simply supported
// beam; reference pack 11.4). Throws std::invalid_argument for delta <= 0.
double frequency_from_deflection(double deflection);

}  // namespace pinproof
