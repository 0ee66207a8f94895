// Shared test data for the end-gap tests: an IPE 300 and a three-row fin plate
// on it, the same in every test that uses them.
#pragma once

#include "pinproof/model/connection_detail.hpp"
#include "pinproof/model/section.hpp"

namespace pinproof::test_data {

constexpr double mm = 1e-3;

// EN 10365:2017 IPE 300: h 300, b 150, tw 7.1, tf 10.7, r 15 mm; I = 8356 cm4.
inline section ipe300()
{
    section s;
    s.name = "IPE 300";
    s.depth = 300 * mm;
    s.flange_width = 150 * mm;
    s.web_thickness = 7.1 * mm;
    s.flange_thickness = 10.7 * mm;
    s.root_radius = 15 * mm;
    s.I = 8356e-8;
    return s;
}

// Fin plate on an IPE 300: plate top 50 mm, first bolt 40 mm, three rows at
// 60 mm, so the bolt group centroid is 150 mm below the top (dc = 150 mm to
// either flange); bolt line 50 mm from the beam end.
inline connection_detail fin_plate(double gap = 10 * mm)
{
    connection_detail d;
    d.type = detail_type::fin_plate;
    d.gap = gap;
    d.plate_top = 50 * mm;
    d.plate_depth = 200 * mm;
    d.plate_thickness = 10 * mm;
    d.bolts.diameter = 20 * mm;
    d.bolts.hole_diameter = 22 * mm;
    d.bolts.rows = 3;
    d.bolts.pitch = 60 * mm;
    d.bolts.first_bolt = 40 * mm;
    d.bolts.bolt_line = 50 * mm;
    return d;
}

}  // namespace pinproof::test_data
