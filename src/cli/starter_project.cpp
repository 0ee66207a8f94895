// The starter project files written by `pinproof new`: one invented beam in
// SI (EN 1993-1-8) or US customary units (AISC 360), each object explained in
// its "notes" field. tests/cli/new_command_test.cpp checks that `pinproof
// check` accepts both as written and that every verdict holds.
#include "new_command.hpp"

namespace pinproof::cli {

const char* starter_project(bool us_customary)
{
    static const char* const si = R"starter({
  "format": "pinproof-project/1",
  "title": "New project: the job's title here",
  "notes": "Starter project written by 'pinproof new'. Every value is an invented placeholder: replace it with the job's own. Every object accepts a 'notes' field like this one, which pinproof ignores. Quantities carry their units ('6.0 m', '8.5 kN/m'); docs/file-format.md lists every field. Run: pinproof check THIS-FILE.",
  "standard": "EN1993-1-8",
  "frame": "braced",
  "units": "SI",
  "beams": [
    {
      "id": "B1",
      "description": "Secondary beam, grid line and bay here",
      "notes": "One beam between two supports. E defaults to 210 GPa under EN 1993-1-8; the section comes from the built-in catalogue ('pinproof sections'), or give {'I': ..., 'depth': ...}.",
      "span": "6.0 m",
      "E": "210 GPa",
      "section": "IPE 300",
      "loads": [
        { "case": "G", "kind": "udl", "w": "8.5 kN/m", "notes": "permanent: slab, finishes, services" },
        { "case": "Q", "kind": "udl", "w": "7.5 kN/m", "notes": "imposed floor load" },
        { "case": "G", "kind": "point", "P": "5 kN", "at": "2.0 m", "notes": "a point load from a trimmer; other kinds: 'moment', 'linear'" }
      ],
      "combinations": [
        { "name": "ULS-6.10", "use": "strength", "factors": { "G": 1.35, "Q": 1.5 }, "notes": "EN 1990 6.10: joint moments are checked under strength combinations" },
        { "name": "SLS-char", "use": "service", "factors": { "G": 1.0, "Q": 1.0 }, "notes": "EN 1990 6.14b: deflection is checked under service combinations" }
      ],
      "joints": {
        "start": {
          "notes": "A fin plate given inline: a stiffness range (the designer's estimate, here as multiples of EI/L) and the connection as detailed, for the end-gap check and the detailing rules. A joint may also be the id of an entry of a detail catalogue.",
          "description": "fin plate 10 mm, 3 M20 8.8",
          "stiffness": { "min": "0.05 EI/L", "max": "0.25 EI/L" },
          "moment_resistance": "9 kN*m",
          "detail": {
            "type": "fin-plate",
            "support": "column-flange",
            "gap": "10 mm",
            "gap_tolerance": "3 mm",
            "plate_top": "50 mm",
            "plate_depth": "200 mm",
            "plate_thickness": "10 mm",
            "bolt_diameter": "20 mm",
            "bolt_rows": 3,
            "bolt_pitch": "60 mm",
            "first_bolt": "40 mm",
            "bolt_line": "50 mm"
          }
        },
        "end": {
          "notes": "Web cleats with the stiffness as a probability distribution: the range checked is its 5 % to 95 % fractiles, and 'pinproof sweep' gives the failure probabilities. The third detail type is 'end-plate' (a partial-depth end plate).",
          "description": "double angle web cleats, 3 M20 8.8",
          "stiffness_distribution": { "kind": "lognormal", "median": "0.1 EI/L", "cov": 0.5 },
          "moment_resistance": "9 kN*m",
          "detail": {
            "type": "web-cleats",
            "support": "column-web",
            "gap": "10 mm",
            "gap_tolerance": "3 mm",
            "cleat_top": "50 mm",
            "cleat_depth": "200 mm",
            "cleat_thickness": "10 mm",
            "bolt_diameter": "20 mm",
            "bolt_rows": 3,
            "bolt_pitch": "60 mm",
            "first_bolt": "40 mm"
          }
        }
      },
      "limits": { "deflection": "span/250", "notes": "or a length such as '20 mm'" }
    }
  ]
}
)starter";
    static const char* const us = R"starter({
  "format": "pinproof-project/1",
  "title": "New project: the job's title here",
  "notes": "Starter project written by 'pinproof new --units US'. Every value is an invented placeholder: replace it with the job's own. Every object accepts a 'notes' field like this one, which pinproof ignores. Quantities carry their units ('24 ft', '0.6 kip/ft'); docs/file-format.md lists every field. Run: pinproof check THIS-FILE.",
  "standard": "AISC360",
  "frame": "braced",
  "units": "US",
  "beams": [
    {
      "id": "B1",
      "description": "Filler beam, grid line and bay here",
      "notes": "One beam between two supports. E defaults to 29000 ksi under AISC 360; the section comes from the built-in catalogue ('pinproof sections'), or give {'I': ..., 'depth': ...}.",
      "span": "24 ft",
      "E": "29000 ksi",
      "section": "W16x31",
      "loads": [
        { "case": "D", "kind": "udl", "w": "0.55 kip/ft", "notes": "dead: deck, slab, finishes" },
        { "case": "L", "kind": "udl", "w": "0.50 kip/ft", "notes": "live load" },
        { "case": "D", "kind": "point", "P": "1.5 kip", "at": "8 ft", "notes": "a point load from a hanger; other kinds: 'moment', 'linear'" }
      ],
      "combinations": [
        { "name": "1.2D+1.6L", "use": "strength", "factors": { "D": 1.2, "L": 1.6 }, "notes": "ASCE 7 LRFD: joint moments are checked under strength combinations" },
        { "name": "D+L", "use": "service", "factors": { "D": 1.0, "L": 1.0 }, "notes": "deflection is checked under service combinations" }
      ],
      "joints": {
        "start": {
          "notes": "A single-plate (fin plate) connection given inline: a stiffness range (the designer's estimate, here as multiples of EI/L) and the connection as detailed, for the end-gap check and the detailing rules. Its moment resistance is worked out from the detail ('from-detail': the bolt group under AISC 360-16 J3.6 and J3.10); a value such as '12 kip*ft' may be given instead, and is then compared with the derived one. A joint may also be the id of an entry of a detail catalogue.",
          "description": "single plate 3/8 in, 3 bolts 3/4 in",
          "stiffness": { "min": "0.05 EI/L", "max": "0.15 EI/L" },
          "moment_resistance": "from-detail",
          "detail": {
            "type": "fin-plate",
            "support": "column-flange",
            "gap": "0.5 in",
            "gap_tolerance": "0.125 in",
            "plate_top": "2 in",
            "plate_depth": "10 in",
            "plate_thickness": "0.375 in",
            "bolt_diameter": "0.75 in",
            "hole_diameter": "0.8125 in",
            "bolt_rows": 3,
            "bolt_pitch": "3 in",
            "first_bolt": "1.5 in",
            "bolt_line": "2 in"
          }
        },
        "end": {
          "notes": "Double-angle web cleats with the stiffness as a probability distribution: the range checked is its 5 % to 95 % fractiles, and 'pinproof sweep' gives the failure probabilities. The third detail type is 'end-plate' (a shear end plate).",
          "description": "2L 4x3-1/2x5/16, 3 bolts 3/4 in",
          "stiffness_distribution": { "kind": "lognormal", "median": "0.1 EI/L", "cov": 0.5 },
          "moment_resistance": "12 kip*ft",
          "detail": {
            "type": "web-cleats",
            "support": "column-web",
            "gap": "0.5 in",
            "gap_tolerance": "0.125 in",
            "cleat_top": "2 in",
            "cleat_depth": "10 in",
            "cleat_thickness": "0.3125 in",
            "bolt_diameter": "0.75 in",
            "hole_diameter": "0.8125 in",
            "bolt_rows": 3,
            "bolt_pitch": "3 in",
            "first_bolt": "1.5 in"
          }
        }
      },
      "limits": { "deflection": "span/360", "notes": "or a length such as '0.75 in'" }
    }
  ]
}
)starter";
    return us_customary ? us : si;
}

}  // namespace pinproof::cli
