// Verification of core/csv_cell: CSV output cells safe in a spreadsheet.
//
// References:
//   [RFC4180] RFC 4180, 2 (rules 5 to 7): a field holding a comma, a double
//             quote or a line break is enclosed in double quotes; a quote in
//             it is doubled.
//   [OWASP]   OWASP, "CSV Injection": cells starting with =, +, -, @, tab or
//             carriage return are read as formulas; prefix them with a single
//             quote.
// Every case is exact (text comparison).
#include <doctest/doctest.h>

#include "pinproof/core/csv_cell.hpp"

using namespace pinproof;

TEST_CASE("csv cell [OWASP]: formula-leading text gets a leading apostrophe - exact")
{
    CHECK(csv_cell("=1+1") == "'=1+1");
    CHECK(csv_cell("+B2") == "'+B2");
    CHECK(csv_cell("-B2") == "'-B2");
    CHECK(csv_cell("@SUM(A1)") == "'@SUM(A1)");
    CHECK(csv_cell("\tB2") == "'\tB2");
    CHECK(csv_cell("\rB2") == "\"'\rB2\"");
    CHECK(csv_cell("-2+3") == "'-2+3");
}

TEST_CASE("csv cell [OWASP]: a plain number keeps its sign and stays a number - exact")
{
    CHECK(csv_cell("-12.5") == "-12.5");
    CHECK(csv_cell("+3") == "+3");
    CHECK(csv_cell("-1.2e-5") == "-1.2e-5");
    CHECK(csv_cell("B-2") == "B-2");
    CHECK(is_plain_decimal(".5"));
    CHECK_FALSE(is_plain_decimal("-"));
    CHECK_FALSE(is_plain_decimal("1e"));
}

TEST_CASE("csv cell [RFC4180]: commas and quotes are quoted after the apostrophe - exact")
{
    CHECK(csv_cell("a,b") == "\"a,b\"");
    CHECK(csv_cell("say \"hi\"") == "\"say \"\"hi\"\"\"");
    CHECK(csv_cell("=HYPERLINK(\"x\",\"y\")") == "\"'=HYPERLINK(\"\"x\"\",\"\"y\"\")\"");
}
