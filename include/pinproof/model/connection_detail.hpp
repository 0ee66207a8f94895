// The detail of a nominally pinned beam end: the fitting that joins it to its
// support, the gap left at the beam end, copes, and the support itself.
//
// All lengths in metres. Positions are given the way a detailer measures them
// on the drawing: levels downwards from the top of the supported beam, and
// horizontal distances from the support face along the beam. The geometry
// module (model/end_geometry.hpp) turns them into its own frame. The reader is
// io/connection_detail_input.hpp.
//
// Defaults of every field, and their sources, are listed in
// docs/method/gap-geometry.md.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "pinproof/core/errors.hpp"
#include "pinproof/model/design_standard.hpp"
#include "pinproof/model/section.hpp"

namespace pinproof {

enum class detail_type { fin_plate, web_cleats, end_plate, custom };

// Names as written in a project file: "fin-plate", "web-cleats", "end-plate", "custom".
std::string to_string(detail_type t);
std::optional<detail_type> parse_detail_type(std::string_view text);
const std::vector<std::string>& detail_type_names();

// What the beam end frames into. A column web behaves in the elevation like a
// column flange (a plane face); whether the beam flange fits between the column
// flanges is a plan check, not made here.
enum class support_type { column_flange, column_web, beam_web };

// "column-flange", "column-web", "beam-web".
std::string to_string(support_type t);
std::optional<support_type> parse_support_type(std::string_view text);
const std::vector<std::string>& support_type_names();

// A rectangular cope cut from the beam end (flange and part of the web).
struct cope {
    double depth = 0;   // from the beam top (top cope) or bottom (bottom cope)
    double length = 0;  // from the beam end back along the beam
};

// The supporting beam seen in cross-section, for a beam-web support. Its web
// face is the support face; its flanges stand out towards the supported beam
// and a cope must clear them and their root fillets.
struct supporting_beam {
    std::string name;             // catalogue name, or "user-defined"
    double top = 0;               // level of its top surface below the top of the supported beam (negative: above)
    double depth = 0;
    double flange_width = 0;
    double flange_thickness = 0;
    double web_thickness = 0;
    double root_radius = 0;
    // From the web face to the flange tip.
    double flange_outstand() const { return 0.5 * (flange_width - web_thickness); }
    // Levels below the top of the supported beam.
    double top_flange_underside() const { return top + flange_thickness; }
    double bottom_flange_top() const { return top + depth - flange_thickness; }
};

// A point of the beam-end elevation in the detailer's measure.
struct detail_point {
    double from_support = 0;  // horizontal, from the support face along the beam (>= 0)
    double below_top = 0;     // vertical, downwards from the top of the supported beam
};

struct bolt_layout {
    double diameter = 0;       // nominal bolt diameter d
    double hole_diameter = 0;  // d0
    int rows = 1;
    double pitch = 0;          // between rows
    double first_bolt = 0;     // from the top of the plate or cleat to the first row
    double bolt_line = 0;      // fin plate: from the beam end to the bolt line in the beam web
};

// Plate grades of the fittings: EN 10025-2 for EN projects, ASTM for US projects.
enum class plate_grade { s275, s355, a36, a572_50 };
std::string to_string(plate_grade g);  // "S275", "S355", "A36", "A572-50"

// A fillet weld by its leg or its throat (throat = leg / sqrt 2 for equal legs).
struct fillet_weld {
    double size = 0;   // m
    bool leg = true;   // false: `size` is the throat
    double throat() const;
    double leg_length() const;
};

// What the joint's derivation from its detail needs beyond the geometry
// (joints/joint_from_detail.hpp). Each is nullopt where not given; the
// derivation then takes its documented default and reports it as a default.
struct derivation_fields {
    std::optional<std::string> bolt_grade;  // "4.6", "8.8", "10.9" (EN) or "A325", "A490" (US)
    std::optional<bool> threads_in_shear_plane;
    std::optional<fillet_weld> weld;        // the fitting's welds to the support, each side
    std::optional<double> edge_distance;    // fin plate: bolt line to the plate's free vertical edge
    std::optional<double> gauge;            // end plate: between the two bolt lines (cross-centres)
    std::optional<double> plate_width;      // end plate: across the beam web
};

// One field of the detail as the assessment used it: given in the file, or
// taken by the reader as a default, with the default's source. Every report
// lists them, so that no assumption is silent (docs/file-format.md).
struct detail_input {
    std::string field;             // as in the file: "gap", "bolt_pitch", ...
    std::optional<double> length;  // m, for a length
    std::string text;              // for anything else: a name, a grade, a count
    bool is_default = false;
    std::string source;            // of a default: its value's origin and status
};

struct connection_detail {
    detail_type type = detail_type::fin_plate;
    support_type support = support_type::column_flange;

    // Nominal (as-detailed) gap between the beam end and the support face.
    // end-plate: the plate thickness (the beam flanges stand that far clear of the face).
    // custom: the smallest distance of the given outline from the support face.
    double gap = 0;
    // Fabrication and erection allowance, subtracted from the gap for the worst case.
    double gap_tolerance = 0;
    double worst_case_gap() const { return gap - gap_tolerance; }

    // The fitting: fin plate, pair of cleats, or end plate (unused for custom).
    double plate_top = 0;        // from the beam top to the top of the fitting
    double plate_depth = 0;
    double plate_thickness = 0;  // fin plate or end plate thickness; cleat thickness
    plate_grade grade = plate_grade::s275;
    bool grade_is_default = true;  // the grade was not given
    bolt_layout bolts;
    derivation_fields derivation;

    std::optional<cope> cope_top;
    std::optional<cope> cope_bottom;
    std::optional<supporting_beam> support_beam;  // present exactly when support == beam_web

    // User's centre of rotation, replacing the default of the detail type.
    std::optional<detail_point> centre_of_rotation;
    // custom: the beam-end outline as a simple polygon, in order (either sense).
    std::vector<detail_point> outline;
    // The fields as used, in reading order, each given or defaulted.
    std::vector<detail_input> inputs;
    // Whether the gap tolerance was given (a default of 0 is flagged).
    bool gap_tolerance_given = false;
};

// The code's smallest distance from a bolt hole's centre to an edge or end of
// a ply, in either direction:
//   EN 1993-1-8:2005 Table 3.3: e_1, e_2 >= 1.2 d_0 (reference pack 7, from memory);
//   AISC 360-16 Table J3.4 (from memory): 1/2 in bolt 3/4 in, 5/8 7/8, 3/4 1, 7/8 1 1/8,
//   1 1 1/4, 1 1/8 1 1/2, 1 1/4 1 5/8, above 1 1/4 in 1.25 d; a diameter between two
//   rows takes the larger row's value.
double minimum_edge_distance(const bolt_layout& b, design_standard s);
std::string minimum_edge_distance_rule(design_standard s);  // the rule in words, with its source

// An end plate's defaults where the detail does not give them: the gauge
// 90 mm (the standard components of simple joints, SBE Part 5, MSB05 p. 14:
// gauge 90 or 140 mm; reference pack 7 [C]) and the width the gauge plus
// 60 mm, 30 mm from each bolt line to the plate's side edge (common practice,
// no source; 30 mm meets EN 1993-1-8 Table 3.3's 1.2 d_0 up to M22).
double default_end_plate_gauge();
double default_end_plate_width(double gauge);

// The largest fillet leg a plate of thickness t takes:
//   AISC 360-16 J2.2b (from memory): t below 1/4 in, else t - 1/16 in;
//   EN projects: t, the leg no larger than the thinner part joined (EN 1993-1-8
//   sets no maximum; common practice, no source).
double maximum_fillet_leg(double plate_thickness, design_standard s);
std::string maximum_fillet_leg_rule(design_standard s);

}  // namespace pinproof
