// Cross-sections of beams.
//
// Standard hot-rolled I sections are stored as their dimensions (h, b, tw, tf, r)
// and their properties are computed from them, including the four root fillets.
// A user may instead give the properties directly (at least I and depth).
// All values in SI base units (m, m^2, m^3, m^4).
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pinproof {

struct section_dimensions {
    std::string name;          // as listed in the catalogue, e.g. "IPE 300"
    double h = 0;              // overall depth
    double b = 0;              // flange width
    double tw = 0;             // web thickness
    double tf = 0;             // flange thickness
    double r = 0;              // root radius
    // Properties as tabulated by the section's standard, where the catalogue
    // stores them (SI); the catalogue uses them in place of the values computed
    // from the dimensions. nullopt: computed.
    std::optional<double> A, I, W_el, W_pl;
};

struct section {
    std::string name;          // catalogue name, or "user-defined"
    double I = 0;              // second moment of area about the major axis
    double depth = 0;          // overall depth
    std::optional<double> area;
    std::optional<double> flange_width;
    std::optional<double> flange_thickness;
    std::optional<double> web_thickness;
    std::optional<double> root_radius;
    std::optional<double> W_el;  // elastic section modulus, major axis
    std::optional<double> W_pl;  // plastic section modulus, major axis
};

// Properties of a doubly symmetric rolled I section with four root fillets,
// computed from the dimensions (the tabulated values of `d` are ignored).
section rolled_i_section(const section_dimensions& d);

// The section as the catalogue gives it: computed from the dimensions, with
// each tabulated property of `d` in place of the computed one (W shapes: AISC
// Manual Table 1-1 A, Ix, Sx, Zx; docs/file-format.md says which is used).
section catalogue_section(const section_dimensions& d);

// Looks a section up in the built-in catalogue. Matching ignores case and
// spaces and accepts common spellings ("IPE300", "HE 300 A", "HEA300",
// "W18x35", "W 18 X 35"). Returns nullopt when the name is not listed.
std::optional<section> find_catalogue_section(std::string_view name);

// For a name that is not listed: the catalogue names nearest to it (at most
// `most`, in catalogue order), for a "did you mean" in an error message. Near
// means one or two characters inserted, deleted or changed in the matching
// form above; only the names at the smallest such distance are given; empty
// when nothing is that near.
std::vector<std::string> similar_catalogue_sections(std::string_view name, std::size_t most = 3);

// `found "NAME"` and, when similar names exist, `; did you mean "A" or "B"?`.
std::string unknown_section_text(std::string_view name);

// Every catalogue entry, as stored.
const std::vector<section_dimensions>& catalogue();

}  // namespace pinproof
