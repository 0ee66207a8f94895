// Properties of the beam engine over 10 000 seeded random beams
// (docs/robustness.md, "What holds for every beam").
//
// Beams: span log-uniform 0.3 m to 80 m, I log-uniform 1e-8 to 1e-1 m^4,
// E = 210 GPa; each end a pin, an exact rigid fixity, or a spring with
// kappa = S L / (E I) log-uniform 1e-3 to 1e4; one to six loads of mixed kinds
// (point, full and partial UDL, linear, point couple) at positions anywhere,
// including exactly at the supports and within 1e-9 L to 1e-6 L of another
// load. Half of the beams carry only downward forces and line loads (the
// "gravity" beams, for the bounds).
//
// Sources of the properties:
//   [ST]  statics of a rigid body (sum of vertical forces and of moments
//         about the start vanish) - common practice, no source.
//   [SP]  superposition for the linear beam: M(x) = M0(x) - M_A (1 - x/L) -
//         M_B x/L, w(x) = w0(x) - M_A wA(x) - M_B wB(x); Euler-Bernoulli
//         beam theory (Timoshenko & Gere, Mechanics of Materials, ch. 9 and
//         10, superposition of simple-beam cases; from memory).
//   [MW]  end moments from the condensed 2x2 flexibility system with springs
//         M = S theta; fixity factor r = kappa / (kappa + 3): Monforton & Wu,
//         J. Struct. Div. ASCE 89(ST6), 1963 (reference pack section 5). The
//         monotonicity and bound arguments built on it are in
//         docs/method/beam-model.md ("Pinned and fixed as bounds").
//   [UN]  exact unit factors: in = 0.0254 m, ft = 0.3048 m (international
//         yard and pound agreement, 1959); lbf = 0.45359237 kg x 9.80665 m/s^2
//         (standard gravity, 3rd CGPM 1901); kip = 1000 lbf.
//
// Tolerances are relative to the scale of the result's kind for that beam
// (force F = sum of |load forces| + sum |couples| / L, moment F L, rotation
// F L^2 / (EI), deflection F L^3 / (EI)), so that a result that is near zero
// by cancellation is compared with the size of the problem, not with itself.
#include <doctest/doctest.h>

#include <nlohmann/json.hpp>

#include <algorithm>
#include <array>
#include <chrono>
#include <cmath>
#include <cstdio>
#include <optional>
#include <random>
#include <set>
#include <string>
#include <vector>

#include "pinproof/checks/assessment.hpp"
#include "pinproof/model/beam_model.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/model/result_fields.hpp"
#include "pinproof/io/project_input.hpp"

using namespace pinproof;

namespace {

constexpr int beam_count = 10000;
constexpr std::uint64_t seed = 20240611;
constexpr double E_steel = 210e9;  // EN 1993-1-1 3.2.6(1)

struct random_beam {
    double span = 0, I = 0;
    // kappa at each end: 0 a pin, < 0 rigid, else a spring.
    double kappa_start = 0, kappa_end = 0;
    bool gravity = false;  // only downward forces and line loads
    std::vector<load> loads;
    double EI() const { return E_steel * I; }
    stiffness joint(double kappa) const
    {
        return kappa < 0 ? stiffness::rigid() : stiffness::spring(kappa * EI() / span);
    }
};

class beam_generator {
public:
    explicit beam_generator(std::uint64_t s) : rng_(s) {}

    double uniform(double a, double b) { return std::uniform_real_distribution<double>(a, b)(rng_); }
    double log_uniform(double a, double b) { return std::exp(uniform(std::log(a), std::log(b))); }
    bool chance(double p) { return uniform(0, 1) < p; }

    double kappa()
    {
        const double u = uniform(0, 1);
        if (u < 0.1) return 0.0;
        if (u < 0.2) return -1.0;
        return log_uniform(1e-3, 1e4);
    }

    // Anywhere on the span, exactly at a support, or very close to an earlier position.
    double position(double L, const std::vector<double>& earlier)
    {
        const double u = uniform(0, 1);
        if (u < 0.08) return 0.0;
        if (u < 0.16) return L;
        if (u < 0.35 && !earlier.empty()) {
            const double near = earlier[static_cast<std::size_t>(uniform(0, 1) * earlier.size()) % earlier.size()];
            const double d = log_uniform(1e-9, 1e-6) * L * (chance(0.5) ? 1 : -1);
            return std::clamp(near + d, 0.0, L);
        }
        return uniform(0, L);
    }

    random_beam next()
    {
        random_beam b;
        b.span = log_uniform(0.3, 80.0);
        b.I = log_uniform(1e-8, 1e-1);
        b.kappa_start = kappa();
        b.kappa_end = kappa();
        b.gravity = chance(0.5);
        const double L = b.span;
        const int n = 1 + static_cast<int>(uniform(0, 6)) % 6;
        std::vector<double> at;
        for (int i = 0; i < n; ++i) {
            load l;
            l.load_case = chance(0.6) ? "G" : "Q";
            const double kind = uniform(0, 1);
            const double sign = b.gravity || chance(0.75) ? 1.0 : -1.0;
            const double magnitude = log_uniform(1e2, 1e6);
            if (kind < 0.3 || (kind >= 0.7 && b.gravity)) {
                l.kind = load_kind::point;
                l.value = sign * magnitude;
                l.from = l.to = position(L, at);
            } else if (kind < 0.7) {
                l.kind = kind < 0.55 ? load_kind::udl : load_kind::linear;
                l.value = sign * magnitude / L;
                l.value_end = l.kind == load_kind::linear ? (b.gravity || chance(0.7) ? 1 : -1) * log_uniform(1e2, 1e6) / L
                                                          : 0.0;
                if (chance(0.3)) {
                    l.from = 0;
                    l.to = L;
                } else {
                    double a = position(L, at), c = position(L, at);
                    if (a > c) std::swap(a, c);
                    if (!(c - a > 1e-6 * L)) {
                        c = std::min(L, a + 1e-6 * L);
                        a = c - 1e-6 * L;
                    }
                    l.from = a;
                    l.to = c;
                }
            } else {
                l.kind = load_kind::moment;
                l.value = (chance(0.5) ? 1.0 : -1.0) * magnitude * L;
                l.from = l.to = position(L, at);
            }
            at.push_back(l.from);
            if (l.kind == load_kind::udl || l.kind == load_kind::linear) at.push_back(l.to);
            b.loads.push_back(l);
        }
        return b;
    }

private:
    std::mt19937_64 rng_;
};

const std::vector<random_beam>& beams()
{
    static const std::vector<random_beam> all = [] {
        beam_generator g(seed);
        std::vector<random_beam> v;
        v.reserve(beam_count);
        for (int i = 0; i < beam_count; ++i) v.push_back(g.next());
        return v;
    }();
    return all;
}

// Load resultants computed here, independently of loads.cpp [ST].
struct resultants {
    double force = 0, moment = 0;          // downward total; clockwise about the start
    double force_abs = 0, moment_abs = 0;  // sums of magnitudes, for the tolerance
};

resultants resultants_of(const std::vector<load>& loads)
{
    resultants r;
    for (const auto& l : loads) {
        double F = 0, Mx = 0;
        const double len = l.to - l.from;
        switch (l.kind) {
        case load_kind::point: F = l.value; Mx = l.value * l.from; break;
        case load_kind::moment: Mx = l.value; break;
        case load_kind::udl: F = l.value * len; Mx = F * (l.from + len / 2); break;
        case load_kind::linear: {
            // Trapezoid: resultant (w0 + w1) len / 2 at its centroid from `from`,
            // len (w0 + 2 w1) / (3 (w0 + w1)); written as two parts to allow w0 + w1 = 0.
            const double F0 = l.value * len / 2, F1 = l.value_end * len / 2;
            F = F0 + F1;
            Mx = F0 * (l.from + len / 3) + F1 * (l.from + 2 * len / 3);
            r.force_abs += std::abs(F0) + std::abs(F1);
            r.moment_abs += std::abs(F0 * (l.from + len / 3)) + std::abs(F1 * (l.from + 2 * len / 3));
            r.force += F;
            r.moment += Mx;
            continue;
        }
        }
        r.force += F;
        r.moment += Mx;
        r.force_abs += std::abs(F);
        r.moment_abs += std::abs(Mx);
    }
    return r;
}

struct scales {
    double force, moment, rotation, deflection;
};

scales scales_of(const random_beam& b)
{
    double F = 0;
    for (const auto& l : b.loads) {
        const double len = l.to - l.from;
        switch (l.kind) {
        case load_kind::point: F += std::abs(l.value); break;
        case load_kind::moment: F += std::abs(l.value) / b.span; break;
        case load_kind::udl: F += std::abs(l.value) * len; break;
        case load_kind::linear: F += (std::abs(l.value) + std::abs(l.value_end)) * len / 2; break;
        }
    }
    const double L = b.span;
    return {F, F * L, F * L * L / b.EI(), F * L * L * L / b.EI()};
}

bool finite_state(const beam_state& s)
{
    for (const auto& f : result_fields())
        if (!std::isfinite(s.*(f.member))) return false;
    return true;
}

// Largest difference of two states, each result divided by its kind's scale;
// |max deflection| is compared because its sign is that of the larger of two
// extremes and may flip where they tie. Locations of maxima are not compared:
// they jump where two maxima tie.
double state_difference(const beam_state& a, const beam_state& b, const scales& s)
{
    double d = 0;
    d = std::max(d, std::abs(a.reaction_start - b.reaction_start) / s.force);
    d = std::max(d, std::abs(a.reaction_end - b.reaction_end) / s.force);
    d = std::max(d, std::abs(a.moment_start - b.moment_start) / s.moment);
    d = std::max(d, std::abs(a.moment_end - b.moment_end) / s.moment);
    d = std::max(d, std::abs(a.max_sagging_moment - b.max_sagging_moment) / s.moment);
    d = std::max(d, std::abs(std::abs(a.max_deflection) - std::abs(b.max_deflection)) / s.deflection);
    d = std::max(d, std::abs(a.rotation_start - b.rotation_start) / s.rotation);
    d = std::max(d, std::abs(a.rotation_end - b.rotation_end) / s.rotation);
    return d;
}

random_beam mirrored(const random_beam& b)
{
    random_beam m = b;
    std::swap(m.kappa_start, m.kappa_end);
    const double L = b.span;
    for (auto& l : m.loads) {
        switch (l.kind) {
        case load_kind::point: l.from = l.to = L - l.from; break;
        // A clockwise couple seen from the other side is anticlockwise.
        case load_kind::moment: l.from = l.to = L - l.from; l.value = -l.value; break;
        case load_kind::udl:
        case load_kind::linear: {
            const double from = L - l.to, to = L - l.from;
            l.from = std::max(0.0, from);
            l.to = std::min(L, to);
            if (l.kind == load_kind::linear) std::swap(l.value, l.value_end);
            break;
        }
        }
    }
    return m;
}

// The first failure of each kind is reported in full; later ones are counted.
struct failures {
    int count = 0;
    std::string first;
    void add(int beam, const std::string& what)
    {
        if (count++ == 0) first = "beam " + std::to_string(beam) + ": " + what;
    }
};

std::string num(double v)
{
    char buf[40];
    std::snprintf(buf, sizeof buf, "%.17g", v);
    return buf;
}

}  // namespace

TEST_CASE("properties: every state of 10000 random beams is finite and in equilibrium [ST] to 1e-9")
{
    failures bad;
    for (int i = 0; i < beam_count; ++i) {
        const random_beam& b = beams()[i];
        const beam_model m(b.span, b.EI(), b.loads);
        const resultants r = resultants_of(b.loads);
        const stiffness joints[] = {stiffness::pinned(), stiffness::rigid(), b.joint(b.kappa_start),
                                    b.joint(b.kappa_end)};
        for (const auto& ja : joints)
            for (const auto& jb : joints) {
                beam_state s;
                try {
                    s = m.solve(ja, jb);  // the engine's own check throws internal_error
                } catch (const std::exception& e) {
                    bad.add(i, std::string("solve threw: ") + e.what());
                    continue;
                }
                if (!finite_state(s)) bad.add(i, "a result is not finite");
                const double L = b.span;
                const double vertical = s.reaction_start + s.reaction_end - r.force;
                const double rotational = r.moment - s.reaction_end * L - s.moment_start + s.moment_end;
                const double v_scale = r.force_abs + std::abs(s.reaction_start) + std::abs(s.reaction_end);
                const double m_scale = r.moment_abs + std::abs(s.reaction_end) * L + std::abs(s.moment_start) +
                                       std::abs(s.moment_end);
                if (std::abs(vertical) > 1e-9 * v_scale) bad.add(i, "vertical residual " + num(vertical));
                if (std::abs(rotational) > 1e-9 * m_scale) bad.add(i, "moment residual " + num(rotational));
                // Each joint obeys its law: a pin carries no moment, a rigid end does not rotate,
                // a spring carries M = S theta [MW].
                const double tol_m = 1e-9 * scales_of(b).moment;
                for (int end = 0; end < 2; ++end) {
                    const stiffness& j = end == 0 ? ja : jb;
                    const double M = end == 0 ? s.moment_start : s.moment_end;
                    const double th = end == 0 ? s.rotation_start : s.rotation_end;
                    if (j.is_rigid() && th != 0.0) bad.add(i, "rigid end rotates");
                    if (!j.is_rigid() && std::abs(M - j.value() * th) > tol_m)
                        bad.add(i, "spring law M = S theta broken by " + num(M - j.value() * th));
                }
            }
    }
    INFO(bad.first);
    CHECK(bad.count == 0);
}

TEST_CASE("properties: a mirrored beam gives mirrored results to 1e-9 of the result scale [SP]")
{
    failures bad;
    for (int i = 0; i < beam_count; ++i) {
        const random_beam& b = beams()[i];
        const random_beam mb = mirrored(b);
        const scales sc = scales_of(b);
        const beam_model m(b.span, b.EI(), b.loads), mm(mb.span, mb.EI(), mb.loads);
        const beam_state s = m.solve(b.joint(b.kappa_start), b.joint(b.kappa_end));
        const beam_state t = mm.solve(mb.joint(mb.kappa_start), mb.joint(mb.kappa_end));
        beam_state swapped = t;
        swapped.reaction_start = t.reaction_end;
        swapped.reaction_end = t.reaction_start;
        swapped.moment_start = t.moment_end;
        swapped.moment_end = t.moment_start;
        swapped.rotation_start = t.rotation_end;
        swapped.rotation_end = t.rotation_start;
        const double d = state_difference(s, swapped, sc);
        if (d > 1e-9) bad.add(i, "mirror differs by " + num(d) + " of the scale");
        // Pointwise M(x) and w(x) at 16 stations.
        for (int k = 0; k < 16; ++k) {
            const double x = (k + 0.37) / 16 * b.span;
            const double dm = std::abs(m.moment_at(x, s.moment_start, s.moment_end) -
                                       mm.moment_at(b.span - x, t.moment_start, t.moment_end));
            const double dw = std::abs(m.deflection_at(x, s.moment_start, s.moment_end) -
                                       mm.deflection_at(b.span - x, t.moment_start, t.moment_end));
            if (dm > 1e-9 * sc.moment || dw > 1e-9 * sc.deflection)
                bad.add(i, "M(x) or w(x) differs from the mirror at x = " + num(x));
        }
    }
    INFO(bad.first);
    CHECK(bad.count == 0);
}

TEST_CASE("properties: abs(M_start) grows with S_start and abs(M_end) with S_end with the other joint held [MW]")
{
    // M_A = N / (a d - b^2) with a = F_AA + 1/S_A and N independent of S_A
    // (docs/method/beam-model.md): |M_A| rises as S_A rises, whatever the loads.
    // Tolerance 1e-11 of the moment scale for round-off where M_A saturates.
    const std::vector<double> kappas{0, 1e-3, 1e-2, 0.1, 0.5, 1, 2, 5, 8, 25, 100, 1e3, 1e4, 1e6, -1};
    failures bad;
    for (int i = 0; i < beam_count; ++i) {
        const random_beam& b = beams()[i];
        const beam_model m(b.span, b.EI(), b.loads);
        const double tol = 1e-11 * scales_of(b).moment;
        for (int end = 0; end < 2; ++end) {
            double previous = -1;
            for (double k : kappas) {
                const auto M = end == 0 ? m.end_moments(b.joint(k), b.joint(b.kappa_end))
                                        : m.end_moments(b.joint(b.kappa_start), b.joint(k));
                const double own = std::abs(M[static_cast<std::size_t>(end)]);
                if (own < previous - tol)
                    bad.add(i, std::string(end == 0 ? "|M_start|" : "|M_end|") + " falls from " + num(previous) +
                                   " to " + num(own) + " at kappa " + num(k));
                previous = own;
            }
        }
    }
    INFO(bad.first);
    CHECK(bad.count == 0);
}

TEST_CASE("properties: for downward loads the pinned and propped states bound the results [SP] [MW]")
{
    // Downward forces and line loads only (no couples): theta0 >= 0 at both ends
    // and the flexibility terms are positive, so M_A, M_B >= 0 and
    //   M(x) <= M0(x), w(x) <= w0(x), 0 <= rotation <= pinned rotation;
    //   M_A <= M_A(rigid at A, pinned at B) (the propped cantilever), likewise B;
    //   M(x) >= M0(x) - M_A,prop (1 - x/L) - M_B,prop x/L.
    // Tolerance 1e-10 of the kind's scale.
    failures bad;
    int tested = 0;
    for (int i = 0; i < beam_count; ++i) {
        const random_beam& b = beams()[i];
        if (!b.gravity) continue;
        ++tested;
        const scales sc = scales_of(b);
        const double tm = 1e-10 * sc.moment, tw = 1e-10 * sc.deflection, tr = 1e-10 * sc.rotation;
        const beam_model m(b.span, b.EI(), b.loads);
        const beam_state s = m.solve(b.joint(b.kappa_start), b.joint(b.kappa_end));
        const beam_state pin = m.solve(stiffness::pinned(), stiffness::pinned());
        const beam_state prop_a = m.solve(stiffness::rigid(), stiffness::pinned());
        const beam_state prop_b = m.solve(stiffness::pinned(), stiffness::rigid());
        if (s.moment_start < -tm || s.moment_end < -tm) bad.add(i, "a hogging end moment is negative");
        if (s.moment_start > prop_a.moment_start + tm)
            bad.add(i, "M_start " + num(s.moment_start) + " above the propped bound " + num(prop_a.moment_start));
        if (s.moment_end > prop_b.moment_end + tm)
            bad.add(i, "M_end " + num(s.moment_end) + " above the propped bound " + num(prop_b.moment_end));
        if (s.rotation_start < -tr || s.rotation_start > pin.rotation_start + tr ||
            s.rotation_end < -tr || s.rotation_end > pin.rotation_end + tr)
            bad.add(i, "an end rotation outside 0 .. pinned rotation");
        if (s.max_sagging_moment > pin.max_sagging_moment + tm) bad.add(i, "max sagging moment above pinned");
        for (int k = 0; k <= 32; ++k) {
            const double x = (k + 0.41) / 33.41 * b.span;
            const double M = m.moment_at(x, s.moment_start, s.moment_end);
            const double M0 = m.moment_at(x, 0, 0);
            const double Mlow = m.moment_at(x, prop_a.moment_start, prop_b.moment_end);
            if (M > M0 + tm) bad.add(i, "M(x) above M0(x) at x = " + num(x));
            if (M < Mlow - tm) bad.add(i, "M(x) below the propped-end bound at x = " + num(x));
            if (m.deflection_at(x, s.moment_start, s.moment_end) > m.deflection_at(x, 0, 0) + tw)
                bad.add(i, "w(x) above w0(x) at x = " + num(x));
        }
    }
    CHECK(tested > 4000);
    INFO(bad.first);
    CHECK(bad.count == 0);
}

TEST_CASE("properties: results tend to the pinned state as kappa goes to 0 and to the fixed state as kappa grows")
{
    // A spring of kappa differs from its limit by about kappa (to the pin) or
    // 1 / kappa (to rigid) times an O(1) factor (fixity factor kappa / (kappa + 3),
    // [MW]). Tolerances, relative to the kind's scale: 1e-6 at kappa 1e-9 and
    // 1e9, 1e-3 at kappa 1e-6 and 1e6; and the gap shrinks as the limit is approached.
    failures bad;
    for (int i = 0; i < beam_count; ++i) {
        const random_beam& b = beams()[i];
        const scales sc = scales_of(b);
        const beam_model m(b.span, b.EI(), b.loads);
        for (int end = 0; end < 2; ++end) {
            const auto state = [&](double k) {
                return end == 0 ? m.solve(b.joint(k), b.joint(b.kappa_end)) : m.solve(b.joint(b.kappa_start), b.joint(k));
            };
            const beam_state pin = state(0), fix = state(-1);
            const double d_pin_far = state_difference(state(1e-6), pin, sc);
            const double d_pin = state_difference(state(1e-9), pin, sc);
            const double d_fix_far = state_difference(state(1e6), fix, sc);
            const double d_fix = state_difference(state(1e9), fix, sc);
            if (d_pin > 1e-6 || d_pin_far > 1e-3) bad.add(i, "does not tend to the pin: " + num(d_pin));
            if (d_fix > 1e-6 || d_fix_far > 1e-3) bad.add(i, "does not tend to rigid: " + num(d_fix));
            if (d_pin > d_pin_far + 1e-12 || d_fix > d_fix_far + 1e-12) bad.add(i, "the gap does not shrink");
        }
    }
    INFO(bad.first);
    CHECK(bad.count == 0);
}

namespace {

// Exact factors [UN].
constexpr double ft = 0.3048, inch = 0.0254;
constexpr double lbf = 0.45359237 * 9.80665, kip = 1000 * lbf;

std::string with_unit(double value_in_unit, const char* unit) { return num(value_in_unit) + " " + unit; }

// The project file of one random beam, with every quantity written as a
// string in SI or in US customary units.
nlohmann::json project_json(const random_beam& b, bool us)
{
    using nlohmann::json;
    const auto length = [&](double m) { return us ? with_unit(m / ft, "ft") : with_unit(m, "m"); };
    const auto force = [&](double N) { return us ? with_unit(N / kip, "kip") : with_unit(N, "N"); };
    const auto line = [&](double N_per_m) { return us ? with_unit(N_per_m / (kip / ft), "kip/ft") : with_unit(N_per_m, "N/m"); };
    const auto moment = [&](double Nm) { return us ? with_unit(Nm / (kip * ft), "kip*ft") : with_unit(Nm, "N*m"); };
    const auto rot = [&](double S) {
        return us ? with_unit(S / (kip * inch), "kip*in/rad") : with_unit(S, "N*m/rad");
    };
    const auto joint = [&](double kappa) -> json {
        if (kappa < 0) return {{"stiffness", "rigid"}};
        const double S = kappa * b.EI() / b.span;
        return {{"stiffness", {{"min", rot(S)}, {"max", rot(S * 4)}}}};
    };
    json loads = json::array();
    std::set<std::string> cases;
    for (const auto& l : b.loads) {
        json j{{"case", l.load_case}};
        cases.insert(l.load_case);
        switch (l.kind) {
        case load_kind::point: j["kind"] = "point"; j["P"] = force(l.value); j["at"] = length(l.from); break;
        case load_kind::moment: j["kind"] = "moment"; j["M"] = moment(l.value); j["at"] = length(l.from); break;
        case load_kind::udl:
            j["kind"] = "udl";
            j["w"] = line(l.value);
            j["from"] = length(l.from);
            j["to"] = length(l.to);
            break;
        case load_kind::linear:
            j["kind"] = "linear";
            j["w_start"] = line(l.value);
            j["w_end"] = line(l.value_end);
            j["from"] = length(l.from);
            j["to"] = length(l.to);
            break;
        }
        loads.push_back(j);
    }
    json strength_factors = json::object(), service_factors = json::object();
    for (const auto& c : cases) {
        strength_factors[c] = c == "G" ? 1.35 : 1.5;
        service_factors[c] = 1.0;
    }
    const double ksi = kip / (inch * inch), in4 = std::pow(inch, 4);
    json beam{{"id", "B1"},
              {"span", length(b.span)},
              {"E", us ? with_unit(E_steel / ksi, "ksi") : with_unit(E_steel, "Pa")},
              {"section", {{"I", us ? with_unit(b.I / in4, "in4") : with_unit(b.I, "m4")},
                           {"depth", length(std::max(0.05, std::min(2.0, 2 * std::cbrt(b.I))))}}},
              {"loads", loads},
              {"combinations", {{{"name", "strength"}, {"use", "strength"}, {"factors", strength_factors}},
                                {{"name", "service"}, {"use", "service"}, {"factors", service_factors}}}},
              {"joints", {{"start", joint(b.kappa_start)}, {"end", joint(b.kappa_end)}}},
              {"limits", {{"deflection", "span/360"}}}};
    return {{"format", project_format},
            {"title", "random beam"},
            {"standard", "EN1993-1-8"},
            {"frame", "braced"},
            {"beams", json::array({beam})}};
}

}  // namespace

TEST_CASE("properties: the same beam in SI and in US customary units gives the same SI results to 1e-12 [UN]")
{
    // Every 50th random beam (200 beams). Values in US units are the exact
    // conversions printed with 17 significant digits, so the inputs agree to
    // about 1e-16; the results of assess_project are compared field by field
    // to 1e-12 of the scale of the field's kind (a result near zero by
    // cancellation, such as the reaction of a support that carries only loads
    // placed on it, inherits the rounding of the large terms), and each
    // check's value and limit to 1e-12 of their own magnitude.
    failures bad;
    int compared = 0;
    for (int i = 0; i < beam_count; i += 50) {
        const random_beam& b = beams()[i];
        const project si = parse_project(project_json(b, false).dump());
        const project us = parse_project(project_json(b, true).dump());
        REQUIRE(us.units == unit_system::us_customary);
        const project_assessment a = assess_project(si), c = assess_project(us);
        REQUIRE(a.beams.size() == 1);
        REQUIRE(c.beams.size() == 1);
        const beam_assessment &x = a.beams[0], &y = c.beams[0];
        const scales sc = scales_of(b);
        REQUIRE(x.combinations.size() == y.combinations.size());
        ++compared;
        for (std::size_t k = 0; k < x.combinations.size(); ++k) {
            const auto &p = x.combinations[k], &q = y.combinations[k];
            std::vector<const beam_state*> ps{&p.pinned.value(), &p.fixed}, qs{&q.pinned.value(), &q.fixed};
            REQUIRE(p.corners.size() == q.corners.size());
            for (std::size_t n = 0; n < p.corners.size(); ++n) {
                ps.push_back(&p.corners[n]);
                qs.push_back(&q.corners[n]);
            }
            for (std::size_t f = 0; f < result_fields().size(); ++f) {
                const auto& field = result_fields()[f];
                if (field.dim == dims::length && std::string(field.key).find("_at") != std::string::npos) continue;
                const double scale = field.dim == dims::force    ? sc.force
                                     : field.dim == dims::moment ? sc.moment
                                     : field.dim == dims::angle  ? sc.rotation
                                                                 : sc.deflection;
                for (std::size_t n = 0; n < ps.size(); ++n) {
                    double u = ps[n]->*(field.member), v = qs[n]->*(field.member);
                    if (field.member == &beam_state::max_deflection) u = std::abs(u), v = std::abs(v);
                    if (std::abs(u - v) > 1e-12 * scale)
                        bad.add(i, std::string(field.key) + " " + num(u) + " (SI) vs " + num(v) + " (US)");
                }
                const value_range &ra = p.envelope.ranges.at(f), &rb = q.envelope.ranges.at(f);
                if (field.member != &beam_state::max_deflection &&
                    (std::abs(ra.min - rb.min) > 1e-12 * scale || std::abs(ra.max - rb.max) > 1e-12 * scale))
                    bad.add(i, std::string("envelope of ") + field.key);
            }
        }
        REQUIRE(x.checks.size() == y.checks.size());
        for (std::size_t k = 0; k < x.checks.size(); ++k) {
            const check &u = x.checks[k], &v = y.checks[k];
            if (u.id != v.id || u.status != v.status) bad.add(i, "check " + u.id + " differs in id or status");
            for (auto pair : {std::make_pair(u.value, v.value), std::make_pair(u.limit, v.limit)}) {
                if (pair.first.has_value() != pair.second.has_value()) {
                    bad.add(i, "check " + u.id + ": a value in one system only");
                } else if (pair.first) {
                    const double kind = u.dim == dims::force    ? sc.force
                                      : u.dim == dims::moment ? sc.moment
                                      : u.dim == dims::angle  ? sc.rotation
                                      : u.dim == dims::length ? sc.deflection
                                                              : 0.0;
                    const double s = std::max({std::abs(*pair.first), std::abs(*pair.second), kind});
                    if (std::abs(*pair.first - *pair.second) > 1e-12 * s)
                        bad.add(i, "check " + u.id + ": " + num(*pair.first) + " (SI) vs " + num(*pair.second) + " (US)");
                }
            }
        }
    }
    CHECK(compared == 200);
    INFO(bad.first);
    CHECK(bad.count == 0);
}

TEST_CASE("properties: 2000 random overhangs - finite - in equilibrium [ST] - the start spring's law [MW] - the tip from the deflection polynomial - to 1e-9")
{
    // Each random beam read as a whole member: its back span a share 0.3 to 0.95
    // of its length (or exactly at a load position, so that a load sits on the
    // end support), the rest the overhang; the start joint pinned, rigid or a spring.
    failures bad;
    std::mt19937_64 rng(seed + 17);
    std::uniform_real_distribution<double> share(0.3, 0.95);
    for (int i = 0; i < 2000; ++i) {
        const random_beam& b = beams()[i];
        const double length = b.span;
        double L = share(rng) * length;
        if (i % 5 == 0)
            for (const auto& l : b.loads)
                if (l.from > 0.3 * length && l.from < 0.95 * length) L = l.from;
        const double a = length - L;
        // L + a may differ from the length by round-off: a load at the far end is put at L + a.
        std::vector<load> loads = b.loads;
        for (auto& l : loads) {
            l.from = std::min(l.from, L + a);
            l.to = std::min(l.to, L + a);
        }
        const resultants r = resultants_of(loads);
        const scales sc = scales_of(b);
        std::optional<beam_model> built;
        try {
            built.emplace(L, b.EI(), loads, beam_layout::overhang, a);
        } catch (const std::exception& e) {
            bad.add(i, std::string("model threw: ") + e.what());
            continue;
        }
        const beam_model& m = *built;
        for (const stiffness& j : {stiffness::pinned(), stiffness::rigid(), b.joint(b.kappa_start)}) {
            beam_state s;
            try {
                s = m.solve(j, stiffness::pinned());  // the engine's own check throws internal_error
            } catch (const std::exception& e) {
                bad.add(i, std::string("solve threw: ") + e.what());
                continue;
            }
            if (!finite_state(s) || !std::isfinite(s.tip_deflection) || !std::isfinite(s.rotation_tip))
                bad.add(i, "a result is not finite");
            const double vertical = s.reaction_start + s.reaction_end - r.force;
            // Moments about the start: the loads, the end support's reaction at L and the start joint's couple.
            const double rotational = r.moment - s.reaction_end * L - s.moment_start;
            const double v_scale = r.force_abs + std::abs(s.reaction_start) + std::abs(s.reaction_end);
            const double m_scale = r.moment_abs + std::abs(s.reaction_end) * L + std::abs(s.moment_start);
            if (std::abs(vertical) > 1e-9 * v_scale) bad.add(i, "vertical residual " + num(vertical));
            if (std::abs(rotational) > 1e-9 * m_scale) bad.add(i, "moment residual " + num(rotational));
            if (j.is_rigid() && s.rotation_start != 0.0) bad.add(i, "rigid start rotates");
            if (!j.is_rigid() && std::abs(s.moment_start - j.value() * s.rotation_start) > 1e-9 * sc.moment)
                bad.add(i, "spring law M = S theta broken");
            // The tip's deflection is the deflection polynomial's at L + a; w(L) = 0 at the end support.
            if (std::abs(s.tip_deflection - m.deflection_at(length, s)) > 1e-9 * sc.deflection * std::pow(length / L, 3))
                bad.add(i, "tip deflection " + num(s.tip_deflection) + " against " + num(m.deflection_at(length, s)));
            if (std::abs(m.deflection_at(L, s)) > 1e-9 * sc.deflection * std::pow(length / L, 3))
                bad.add(i, "the end support moves by " + num(m.deflection_at(L, s)));
            if (s.max_deflection_at > L * (1 + 1e-12)) bad.add(i, "max_deflection is not the back span's");
        }
    }
    INFO(bad.first);
    CHECK(bad.count == 0);
}
