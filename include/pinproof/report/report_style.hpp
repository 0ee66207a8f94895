// The look of the HTML pages (the calculation report, the schedule summary):
// one stylesheet for the screen and for print, and the calc sheet's running
// header and footer in the page-margin boxes (CSS Paged Media Level 3, 5.3).
#pragma once

#include <string>

#include "pinproof/core/units.hpp"

namespace pinproof {

// The stylesheet shared by every page (without the @page rule).
std::string report_stylesheet();

// The @page rule: A4, or Letter for US customary units, margins of 16 mm top
// and bottom and 18 mm left and right (a 174 mm column on either paper), the
// given texts in the top-left, top-right and bottom-left boxes ("" leaves a
// box empty) and "Sheet x of y" in the bottom-right one.
std::string page_margin_boxes(unit_system units, const std::string& top_left, const std::string& top_right,
                              const std::string& bottom_left);

// A CSS string literal of a user's text (CSS Syntax Level 3, 4.3.5).
std::string css_string(const std::string& text);

}  // namespace pinproof
