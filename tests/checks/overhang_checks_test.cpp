// Verification of the checks of an overhang (src/checks/overhang_checks.cpp,
// assess_overhang in src/checks/assessment.cpp) and of an overhang project
// read and assessed end to end.
//
// References:
//   [OH]  Beam overhanging one support, AISC Manual, Table 3-23, uniform load on
//         the overhang: tip deflection w a^3 (4l + 3a)/(24EI) (from memory;
//         re-derived in tests/model/beam_model_test.cpp [D]).
//   [2a]  A span/n deflection limit at the tip of an overhang taken with twice its
//         length (the tip read as a cantilever): common practice, no source.
//   [EN]  EN 1993-1-8:2005 5.2.2.5(2): nominally pinned where S_j,ini <= 0.5 E I_b / L_b
//         (reference pack 1.1), L_b the span between the supports.
#include <doctest/doctest.h>

#include <cmath>
#include <string>

#include "pinproof/checks/assessment.hpp"
#include "pinproof/io/project_input.hpp"
#include "pinproof/model/project.hpp"

using namespace pinproof;

namespace {
const check& find(const beam_assessment& a, const std::string& id)
{
    for (const auto& c : a.checks)
        if (c.id == id) return c;
    FAIL("no check " << id);
    return a.checks.front();
}

bool has(const beam_assessment& a, const std::string& id)
{
    for (const auto& c : a.checks)
        if (c.id == id) return true;
    return false;
}

// An IPE 300 on a 6 m back span with a 1.8 m overhang; `loads` and the start
// joint's stiffness as given; `extra` is spliced into the beam object.
std::string overhang(const std::string& stiffness, const std::string& loads, const std::string& extra = "")
{
    return R"({"format": "pinproof-project/1", "title": "overhang", "standard": "EN1993-1-8", "frame": "braced",
      "beams": [{"id": "OH1", "layout": "overhang", "span": "6 m", "overhang": "1.8 m", "section": "IPE 300",)" +
           extra + R"(
        "loads": )" + loads + R"(,
        "combinations": [{"name": "ULS", "use": "strength", "factors": {"G": 1.35}},
                         {"name": "SLS", "use": "service", "factors": {"G": 1.0}}],
        "joints": {"start": {"stiffness": )" + stiffness + R"(, "moment_resistance": "20 kN*m"}},
        "limits": {"deflection": "span/250"}}]})";
}

const char* on_overhang = R"([{"case": "G", "kind": "udl", "w": "12 kN/m", "from": "6 m", "to": "7.8 m"}])";
const char* everywhere = R"([{"case": "G", "kind": "udl", "w": "12 kN/m"}])";

void replace_text(std::string& text, const std::string& from, const std::string& to)
{
    const auto at = text.find(from);
    REQUIRE(at != std::string::npos);
    text.replace(at, from.size(), to);
}

void refused(const std::string& text, const std::string& pointer, const std::string& words)
{
    try {
        parse_project(text);
        FAIL("accepted: " << pointer);
    } catch (const input_error& e) {
        const std::string what = e.what();
        CHECK_MESSAGE(what.find(pointer) != std::string::npos, what);
        CHECK_MESSAGE(what.find(words) != std::string::npos, what);
    }
}
}  // namespace

TEST_CASE("tip-deflection [OH - 2a]: pinned start - load on the overhang - wa^3(4l+3a)/(24EI) against 2a/250 - tol 1e-9")
{
    const project p = parse_project(overhang("0", on_overhang));
    const beam& b = p.beams.at(0);
    CHECK(b.layout == beam_layout::overhang);
    CHECK(b.overhang == doctest::Approx(1.8).epsilon(1e-15));
    const auto a = assess_beam(p, b);
    const double w = 12e3, l = 6.0, oh = 1.8;
    const check& c = find(a, "tip-deflection");
    CHECK(*c.value == doctest::Approx(w * oh * oh * oh * (4 * l + 3 * oh) / (24 * b.EI())).epsilon(1e-9));
    CHECK(*c.limit == doctest::Approx(2 * oh / 250).epsilon(1e-12));
    CHECK(c.status == (*c.value <= *c.limit ? check_status::pass : check_status::fail));
    CHECK(c.message.find("common practice, no source") != std::string::npos);
}

TEST_CASE("overhang assessment: the start joint's checks as on two supports - no end joint - back span and tip deflection over the range corners [EN]")
{
    const project p = parse_project(overhang(R"({"min": "0.2 EI/L", "max": "4 EI/L"})", everywhere));
    const beam& b = p.beams.at(0);
    const auto a = assess_beam(p, b);
    for (const char* id : {"stiffness-class-start", "joint-moment-start", "strength-class-start", "support-moment-start",
                           "moment-reversal-start", "rotation-demand-start", "deflection", "tip-deflection"})
        CHECK_MESSAGE(has(a, id), id);
    for (const char* id : {"stiffness-class-end", "joint-moment-end", "gap-closure-start", "root-class"})
        CHECK_FALSE_MESSAGE(has(a, id), id);
    // 4 EI/L is above 0.5 EI/L: not nominally pinned [EN].
    CHECK(find(a, "stiffness-class-start").status == check_status::fail);
    CHECK(*find(a, "stiffness-class-start").value == doctest::Approx(4.0).epsilon(1e-12));
    // The tip-deflection value is the largest |w(l + a)| over the corners of the start's range.
    const combination_result* sls = nullptr;
    for (const auto& r : a.combinations)
        if (r.comb.name == "SLS") sls = &r;
    REQUIRE(sls);
    double worst = 0;
    for (const auto& s : sls->corners) worst = std::max(worst, std::abs(s.tip_deflection));
    CHECK(*find(a, "tip-deflection").value == doctest::Approx(worst).epsilon(1e-12));
    // A stiffer start lifts the tip less (it takes moment off the back span's sag).
    CHECK(sls->pinned->tip_deflection < sls->fixed.tip_deflection);
    // The back span's deflection check is against span/250 with the span between the supports.
    CHECK(*find(a, "deflection").limit == doctest::Approx(6.0 / 250).epsilon(1e-12));
    CHECK(sls->pinned->max_deflection_at <= 6.0);
}

TEST_CASE("overhang refusals at the input edge: no overhang - overhang on two supports - overhang 0 - a load beyond the tip - an end joint - a support rotation [the project's rules]")
{
    std::string missing = overhang("0", everywhere);
    replace_text(missing, R"("overhang": "1.8 m",)", "");
    refused(missing, "/beams/0/overhang", "missing required field");
    std::string two = overhang("0", everywhere);
    replace_text(two, R"("layout": "overhang")", R"("layout": "two-supports")");
    refused(two, "/beams/0/overhang", "only on a beam with \"layout\": \"overhang\"");
    std::string zero = overhang("0", everywhere);
    replace_text(zero, R"("overhang": "1.8 m")", R"("overhang": "0 m")");
    refused(zero, "/beams/0/overhang", "found");
    refused(overhang("0", R"([{"case": "G", "kind": "point", "P": "5 kN", "at": "8 m"}])"), "/beams/0/loads/0/at",
            "span plus the overhang");
    std::string with_end = overhang("0", everywhere);
    replace_text(with_end, R"("moment_resistance": "20 kN*m"}})",
                 R"("moment_resistance": "20 kN*m"}, "end": {"stiffness": 0}})");
    refused(with_end, "/beams/0/joints/end", "continuous");
    refused(overhang(R"(0, "support_rotation": "2 mrad")", everywhere), "/beams/0/joints/start/support_rotation",
            "not supported yet for an overhang");
}

TEST_CASE("overhang frequency check: the range between the pinned- and fixed-start frequencies - no 18/sqrt(delta) estimate - against limits.frequency [the natural_frequency tests hold the values]")
{
    std::string text = overhang(R"({"min": "0.2 EI/L", "max": "4 EI/L"})", everywhere);
    replace_text(text, R"({"name": "SLS", "use": "service", "factors": {"G": 1.0}})",
                 R"({"name": "SLS", "use": "service", "factors": {"G": 1.0}},
                    {"name": "VIB", "use": "vibration", "factors": {"G": 1.0}})");
    replace_text(text, R"("limits": {"deflection": "span/250"})", R"("limits": {"deflection": "span/250", "frequency": "4 Hz"})");
    const project p = parse_project(text);
    const auto a = assess_beam(p, p.beams.at(0));
    const check& c = find(a, "frequency");
    const combination_result* vib = nullptr;
    for (const auto& r : a.combinations)
        if (r.comb.name == "VIB") vib = &r;
    REQUIRE(vib);
    REQUIRE(vib->frequency);
    const auto& f = *vib->frequency;
    CHECK(*f.pinned < f.range.min);
    CHECK(f.range.min < f.range.max);
    CHECK(f.range.max < f.fixed);
    CHECK(*c.value == doctest::Approx(f.range.min).epsilon(1e-15));
    CHECK(*c.limit == doctest::Approx(4.0).epsilon(1e-15));
    CHECK(c.status == (f.range.min >= 4.0 ? check_status::pass : check_status::fail));
    CHECK(c.message.find("not given") != std::string::npos);  // the estimate
}
