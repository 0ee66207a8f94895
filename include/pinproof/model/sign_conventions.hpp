// Sign conventions of pinproof, stated once.
//
// The beam lies along x, from the start support (x = 0) to the end support
// (x = L), drawn left to right in elevation. Gravity acts downwards. An
// overhang runs on past the end support to its free tip at x = L + a, every
// position still measured from the start support (beam_layout.hpp).
//
//   Loads           positive downwards (point force P, line load w). A point
//                   moment M is positive clockwise in that elevation.
//   Deflection w(x) positive downwards.
//   Slope           theta(x) = dw/dx, positive clockwise.
//   Bending moment  M(x) positive sagging (tension in the bottom fibre).
//                   EI w'' = -M.
//   Shear force     V(x) = dM/dx = -EI w''': positive near the start support
//                   of a beam under downward load (V(0) = reaction_start,
//                   V(L) = -reaction_end).
//   Reactions       positive upwards.
//   End moments     positive hogging (tension in the top fibre at the joint),
//                   i.e. the moment a restraining joint takes from the beam
//                   under gravity load. M_start = -M(0), M_end = -M(L).
//   End rotations   positive in the sense a simply supported beam rotates
//                   under downward load: rotation_start = theta(0),
//                   rotation_end = -theta(L). A spring then carries
//                   M_start = S_start * rotation_start and
//                   M_end = S_end * rotation_end.
//   Stiffness       S in N*m/rad; 0 is a pin, "rigid" is an exact fixity
//                   (no spring term; the rotation is constrained to zero).
//
// Values are SI base units throughout: m, N, N/m, N*m, N*m/rad, Pa, m^4, rad.
#pragma once
