// The governing check of a beam (checks/governing_check.hpp): the order of
// precedence stated there, case by case. The cases are made by hand; the
// expected choice follows from the rule (exact).
#include <doctest/doctest.h>

#include <string>

#include "pinproof/checks/governing_check.hpp"

using namespace pinproof;

namespace {

check make(std::string id, check_status s, std::optional<double> value, std::optional<double> limit)
{
    check c;
    c.id = std::move(id);
    c.status = s;
    c.value = value;
    c.limit = limit;
    return c;
}

}  // namespace

TEST_CASE("utilisation - value over limit and limit over value for a least limit - exact")
{
    // | check                        | utilisation |
    // | 12 mm against 16 mm          | 0.75        |
    // | 5 Hz against a least 4 Hz    | 0.8         |
    // | no limit                     | none        |
    CHECK(*utilisation(make("deflection", check_status::pass, 0.012, 0.016)) == doctest::Approx(0.75).epsilon(1e-15));
    check f = make("frequency", check_status::pass, 5.0, 4.0);
    f.limit_is_minimum = true;
    CHECK(*utilisation(f) == doctest::Approx(0.8).epsilon(1e-15));
    CHECK_FALSE(utilisation(make("support-moment-start", check_status::warn, 1e3, std::nullopt)).has_value());
}

TEST_CASE("governing_check - a failure first and then the largest utilisation - advice never governs")
{
    beam_assessment a;
    a.checks = {make("deflection", check_status::pass, 0.9, 1.0),
                make("joint-moment-start", check_status::pass, 0.95, 1.0),
                make("detailing-min-gap-start", check_status::warn, 0.007, 0.010)};
    check info = make("declared-resistance-start", check_status::warn, 2.0, 1.0);
    info.informative = true;
    a.checks.push_back(info);
    // | checks                                         | governs             |
    // | passes 0.90 and 0.95; advice 0.7; info 2.0     | joint-moment-start  |
    REQUIRE(governing_check(a) != nullptr);
    CHECK(governing_check(a)->id == "joint-moment-start");
    // | + a failure at 1.2                             | that failure        |
    a.checks.push_back(make("stiffness-class-end", check_status::fail, 1.2, 1.0));
    CHECK(governing_check(a)->id == "stiffness-class-end");
    // | + a failure without a utilisation (rigid)      | the rigid failure   |
    a.checks.push_back(make("stiffness-class-start", check_status::fail, std::nullopt, 1.0));
    CHECK(governing_check(a)->id == "stiffness-class-start");
    // | only advice and information                    | none                |
    beam_assessment b;
    b.checks = {make("detailing-min-gap-start", check_status::warn, 0.007, 0.010), info};
    CHECK(governing_check(b) == nullptr);
}
