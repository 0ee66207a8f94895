// The beam with bilinear joints after the end gap closes, against hand
// solutions of the two-segment spring problem.
//
// Hand solutions: with hogging end moments M and rotations
// theta = theta0 - F M, where for a uniform beam F = (L/EI) [[1/3, 1/6], [1/6, 1/3]]
// and theta0 = w L^3/(24 EI) under a full UDL (Roark 7th ed. Table 8.1, from
// memory; Hicks, Civil Engineering Formulas Fig. 2.2, confirmed; pack section 6).
// A closed joint with rigid contact holds theta = theta_c; with a contact
// stiffness K_c it carries M = S theta + K_c (theta - theta_c).
// Tolerance 1e-9 relative.
#include <doctest/doctest.h>

#include <cmath>

#include "pinproof/checks/assessment.hpp"
#include "pinproof/checks/gap_closure.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/io/project_input.hpp"

using namespace pinproof;

namespace {
constexpr double L = 6.0, EI = 210e9 * 8356e-8, w = 30e3;
const double theta0 = w * L * L * L / (24 * EI);

beam_model udl_model(double q = w)
{
    load l;
    l.kind = load_kind::udl;
    l.value = q;
    l.from = 0;
    l.to = L;
    return beam_model(L, EI, {l});
}

bool close(double a, double b, double rel) { return std::abs(a - b) <= rel * std::max(std::abs(a), std::abs(b)); }
}  // namespace

TEST_CASE("one end closes with rigid contact: M_A = 3EI/L (theta0 - theta_c) with the far end pinned - tol 1e-9")
{
    const auto m = udl_model();
    closing_joint a;
    a.before = stiffness::spring(0.2 * EI / L);
    a.closure_sagging = 0.5 * theta0;
    const closed_state s = solve_with_closure(m, a, closing_joint{});
    CHECK(s.start == joint_phase::closed_sagging);
    CHECK(s.end == joint_phase::open);
    CHECK(s.state.rotation_start == *a.closure_sagging);
    CHECK(close(s.state.moment_start, 3 * EI / L * (theta0 - *a.closure_sagging), 1e-9));
    CHECK(s.state.moment_end == 0.0);
}

TEST_CASE("one end closes with a contact stiffness: M (1 + (S + Kc) F) = (S + Kc) theta0 - Kc theta_c - tol 1e-9")
{
    const auto m = udl_model();
    closing_joint a;
    const double S = 0.2 * EI / L, Kc = 5.0 * EI / L, F = L / (3 * EI);
    a.before = stiffness::spring(S);
    a.contact = stiffness::spring(Kc);
    a.closure_sagging = 0.5 * theta0;
    const closed_state s = solve_with_closure(m, a, closing_joint{});
    CHECK(s.start == joint_phase::closed_sagging);
    const double M = ((S + Kc) * theta0 - Kc * *a.closure_sagging) / (1 + (S + Kc) * F);
    CHECK(close(s.state.moment_start, M, 1e-9));
    CHECK(close(s.state.rotation_start, theta0 - F * M, 1e-9));
}

TEST_CASE("both ends close symmetrically: theta = theta_c and M = 2EI/L (theta0 - theta_c) - tol 1e-9")
{
    const auto m = udl_model();
    closing_joint j;
    j.before = stiffness::spring(0.3 * EI / L);
    j.closure_sagging = 0.4 * theta0;
    const closed_state s = solve_with_closure(m, j, j);
    CHECK(s.start == joint_phase::closed_sagging);
    CHECK(s.end == joint_phase::closed_sagging);
    CHECK(close(s.state.moment_start, 2 * EI / L * (theta0 - *j.closure_sagging), 1e-9));
    CHECK(close(s.state.moment_end, s.state.moment_start, 1e-12));
}

TEST_CASE("a joint that does not reach its closure stays linear and equals the spring solution exactly")
{
    const auto m = udl_model();
    closing_joint j;
    j.before = stiffness::spring(0.3 * EI / L);
    j.closure_sagging = 2.0 * theta0;
    const closed_state s = solve_with_closure(m, j, j);
    const beam_state lin = m.solve(j.before, j.before);
    CHECK(s.start == joint_phase::open);
    CHECK(s.state.moment_start == lin.moment_start);
    CHECK(s.state.rotation_start == lin.rotation_start);
}

TEST_CASE("continuity as the demand crosses the closure rotation (common practice and no source) - tol 1e-6")
{
    const auto m = udl_model();
    closing_joint j;
    j.before = stiffness::spring(0.3 * EI / L);
    const double demand = m.solve(j.before, j.before).rotation_start;
    j.closure_sagging = demand * (1 + 1e-7);
    const closed_state above = solve_with_closure(m, j, j);
    j.closure_sagging = demand * (1 - 1e-7);
    const closed_state below = solve_with_closure(m, j, j);
    CHECK(above.start == joint_phase::open);
    CHECK(below.start == joint_phase::closed_sagging);
    CHECK(close(above.state.moment_start, below.state.moment_start, 1e-6));
    CHECK(close(above.state.max_sagging_moment, below.state.max_sagging_moment, 1e-6));
}

TEST_CASE("uplift closes the gap at the top in hogging: rotation held at -theta_h - tol 1e-9")
{
    const auto m = udl_model(-w);
    closing_joint a;
    a.before = stiffness::pinned();
    a.closure_hogging = 0.5 * theta0;
    const closed_state s = solve_with_closure(m, a, closing_joint{});
    CHECK(s.start == joint_phase::closed_hogging);
    CHECK(s.state.rotation_start == -*a.closure_hogging);
    CHECK(close(s.state.moment_start, 3 * EI / L * (-theta0 + *a.closure_hogging), 1e-9));
}

namespace {
std::string project_with_gap(const std::string& gap, bool designed)
{
    return R"({"format": "pinproof-project/1", "title": "closure", "standard": "EN1993-1-8", "frame": "braced",
      "beams": [{"id": "B", "span": "8 m", "section": "IPE 240",
        "loads": [{"case": "G", "kind": "udl", "w": "12 kN/m"}, {"case": "Q", "kind": "udl", "w": "10 kN/m"}],
        "combinations": [{"name": "ULS", "use": "strength", "factors": {"G": 1.35, "Q": 1.5}},
                         {"name": "SLS", "use": "service", "factors": {"G": 1.0, "Q": 1.0}}],
        "joints": {"start": {"stiffness": {"min": 0, "max": "0.2 EI/L"},
                             "designed_for_closure": )" + std::string(designed ? "true" : "false") + R"(,
                             "detail": {"type": "end-plate", "plate_thickness": ")" + gap + R"(", "plate_top": "40 mm",
                                        "plate_depth": "150 mm", "bolt_rows": 2}},
                   "end": {"stiffness": {"min": 0, "max": "0.2 EI/L"}}}}]})";
}

const check& find(const beam_assessment& a, const std::string& id)
{
    for (const auto& c : a.checks)
        if (c.id == id) return c;
    FAIL("no check " << id);
    return a.checks.front();
}
}  // namespace

TEST_CASE("gap-closure check: fails when the gap closes under a strength combination [issue rule]")
{
    // End plate 8 mm, the plate bottom edge 190 mm below the top: tan(theta_c) = 8/(240 - 190) ~ 0.16;
    // an 8 m IPE 240 under 37.2 kN/m rotates about 0.04 rad: no closure. A 1 mm plate closes.
    const project open_p = parse_project(project_with_gap("8 mm", false));
    const auto a_open = assess_beam(open_p, open_p.beams[0]);
    CHECK(find(a_open, "gap-closure-start").status == check_status::pass);
    CHECK(find(a_open, "gap-closure-end").status == check_status::not_applicable);

    const project closed_p = parse_project(project_with_gap("1 mm", false));
    const auto a_closed = assess_beam(closed_p, closed_p.beams[0]);
    const check& c = find(a_closed, "gap-closure-start");
    CHECK(c.status == check_status::fail);
    REQUIRE(a_closed.start.detail);
    REQUIRE(a_closed.start.detail->consequence);
    const auto& cc = *a_closed.start.detail->consequence;
    CHECK(cc.result.start == joint_phase::closed_sagging);
    CHECK(cc.result.state.moment_start > 0);
    CHECK(cc.contact_force > 0);
    CHECK_FALSE(a_closed.holds());

    const project declared = parse_project(project_with_gap("1 mm", true));
    const auto a_declared = assess_beam(declared, declared.beams[0]);
    CHECK(find(a_declared, "gap-closure-start").status == check_status::pass);
}
