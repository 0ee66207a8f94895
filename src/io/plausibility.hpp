// Plausibility ranges of input values: one set for every input path (project
// file, detail catalogue, beam schedule).
//
// Bounds far outside any building beam. They keep the analysis where double
// arithmetic and the equilibrium check of beam_model are meaningful, so that an
// absurd value is reported at its field (JSON pointer, or CSV line and column)
// instead of failing inside the engine (common practice, no source).
// docs/robustness.md lists them.
#pragma once

#include <optional>
#include <string>

#include "pinproof/core/units.hpp"

namespace pinproof::plausibility {

struct plausible_range {
    double lo, hi;  // SI
};
constexpr plausible_range plausible_span{0.01, 1000.0};      // m
constexpr plausible_range plausible_E{1e9, 1e12};            // Pa (structural steel: about 2.1e11)
constexpr plausible_range plausible_I{1e-10, 10.0};          // m^4 (IPE 80: 8.0e-7)
constexpr double plausible_load_magnitude = 1e12;            // N, N/m, N*m
constexpr double plausible_factor_magnitude = 1e3;
constexpr plausible_range plausible_section_size{1e-4, 10.0};   // m: depth, flange and web sizes
constexpr plausible_range plausible_section_area{1e-6, 10.0};   // m^2
constexpr double plausible_deflection_limit = 10.0;          // m, an absolute limit
constexpr plausible_range plausible_frequency_limit{0.1, 100.0};  // Hz (floor limits: about 3 to 10 Hz)
constexpr double plausible_support_rotation = 0.5;           // rad
constexpr double plausible_support_eccentricity = 2.0;       // m
constexpr plausible_range plausible_column_length{0.1, 100.0};  // m, a storey
constexpr double plausible_stiffness = 1e40;                 // N*m/rad; "rigid" is exact (1e30 agrees with it)

// The message for a positive value outside `r`, or nullopt when it lies inside:
// "expected a length between 10 mm and 1000 m (a value outside this range is
// not a building beam), found " followed by `found`.
std::optional<std::string> outside(double value, plausible_range r, dimension d, unit_system system,
                                   const std::string& found);

// The message for a load value above plausible_load_magnitude, or nullopt.
std::optional<std::string> load_too_large(double value, dimension d, unit_system system, const std::string& found);

// The message for a rotational stiffness above plausible_stiffness, or nullopt.
std::optional<std::string> stiffness_too_large(double value, unit_system system, const std::string& found);

}  // namespace pinproof::plausibility
