// The key of a detail on a section (src/detail_key.hpp), under which the
// closure geometry and the detailing findings are kept per thread: equal for
// copies, different when any value read by the gap check or the detailing
// rules differs (common practice for cache keys, no source).
#include <doctest/doctest.h>

#include <set>
#include <string>

#include "detail_fixtures.hpp"
#include "model/detail_key.hpp"

using namespace pinproof;

namespace {

using test_data::mm;

connection_detail base_detail()
{
    connection_detail d = test_data::fin_plate();
    d.gap_tolerance = 3 * mm;
    return d;
}

}  // namespace

TEST_CASE("detail key: equal for copies - different for each changed value (common practice - no source)")
{
    const connection_detail d = base_detail();
    const section s = test_data::ipe300();
    CHECK(detail_key(d, s) == detail_key(connection_detail(d), section(s)));

    std::set<std::string> keys{detail_key(d, s)};
    const auto differs = [&](const connection_detail& x, const section& y) {
        const bool inserted = keys.insert(detail_key(x, y)).second;
        CHECK(inserted);
    };
    auto x = d;
    x.gap = 11 * mm;
    differs(x, s);
    x = d;
    x.gap_tolerance = 0;
    differs(x, s);
    x = d;
    x.type = detail_type::web_cleats;
    differs(x, s);
    x = d;
    x.bolts.rows = 4;
    differs(x, s);
    x = d;
    x.grade = plate_grade::s355;
    differs(x, s);
    x = d;
    x.cope_top = cope{30 * mm, 100 * mm};
    differs(x, s);
    x = d;
    x.cope_bottom = cope{30 * mm, 100 * mm};  // the same cope at the other flange
    differs(x, s);
    x = d;
    x.centre_of_rotation = detail_point{0, 150 * mm};
    differs(x, s);
    x = d;
    x.outline = {{0, 0}, {0, 300 * mm}};
    differs(x, s);
    x = d;
    x.outline = {{0, 0}, {0, 300 * mm}, {5 * mm, 300 * mm}};
    differs(x, s);
    auto y = s;
    y.depth = 301 * mm;
    differs(d, y);
    y = s;
    y.name = "IPE 300A";
    differs(d, y);
    y = s;
    y.root_radius.reset();
    differs(d, y);
}
