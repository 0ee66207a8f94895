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

enum class plate_grade { s275, s355 };
std::string to_string(plate_grade g);  // "S275", "S355"

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
    bolt_layout bolts;

    std::optional<cope> cope_top;
    std::optional<cope> cope_bottom;
    std::optional<supporting_beam> support_beam;  // present exactly when support == beam_web

    // User's centre of rotation, replacing the default of the detail type.
    std::optional<detail_point> centre_of_rotation;
    // custom: the beam-end outline as a simple polygon, in order (either sense).
    std::vector<detail_point> outline;
};

}  // namespace pinproof
