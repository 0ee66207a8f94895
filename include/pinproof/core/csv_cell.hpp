// One cell of a CSV output file (RFC 4180), safe to open in a spreadsheet.
//
// Rule (docs/robustness.md, "CSV outputs"): a cell whose text starts with
// '=', '+', '-', '@', a tab or a carriage return is read by spreadsheet
// programs as a formula, so it is written with a leading apostrophe ("'=1+1"),
// as spreadsheet-safe CSV writers do (OWASP, "CSV Injection"). A cell that is
// a plain decimal number ("-12.5", "+3", "-1.2e-5") is left as it is: a
// negative number stays a number. Then, per RFC 4180, a cell holding a comma,
// a double quote or a line break is enclosed in double quotes with its quotes
// doubled.
#pragma once

#include <string>
#include <string_view>

namespace pinproof {

// Whether `text` is a plain decimal number: an optional sign, digits with an
// optional fraction, and an optional exponent.
bool is_plain_decimal(std::string_view text);

std::string csv_cell(std::string_view text);

}  // namespace pinproof
