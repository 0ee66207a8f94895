// pinproof-bench: throughput of the beam engine over a joint-stiffness sweep,
// against the closed-form condensed evaluation that is its floor, and a
// generator of large schedules for timing `pinproof batch` end to end
// (src/bench/run-bench.sh, docs/performance.md).
//
//   pinproof-bench                      engine figures
//   pinproof-bench --schedule FILE N    writes a schedule of N beams to FILE
//   pinproof-bench --floor SCHEDULE DETAILS OUT
//                                       the read-compute-write floor (schedule_floor.cpp)
//
// Each figure is the best of several timed repetitions on one thread.
#include <array>
#include <chrono>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <fstream>
#include <functional>
#include <string>
#include <vector>

#include "pinproof/model/beam_model.hpp"
#include "schedule_floor.hpp"

using namespace pinproof;

namespace {

// The benchmark beam: IPE 400 (I = 23130 cm4), 8 m, 15 kN/m over the span and
// 20, 30 and 25 kN at 2.0, 4.0 and 6.5 m.
constexpr double L = 8.0;
constexpr double EI = 210e9 * 23130e-8;
constexpr double w = 15e3;
constexpr std::array<std::array<double, 2>, 3> points{{{20e3, 2.0}, {30e3, 4.0}, {25e3, 6.5}}};

std::vector<load> bench_loads()
{
    std::vector<load> out;
    load u;
    u.kind = load_kind::udl;
    u.value = w;
    u.from = 0;
    u.to = L;
    out.push_back(u);
    for (const auto& p : points) {
        load l;
        l.kind = load_kind::point;
        l.value = p[0];
        l.from = l.to = p[1];
        out.push_back(l);
    }
    return out;
}

// The sweep: a 100 x 100 grid of end stiffnesses, kappa = S L / EI from 0.01 to 100.
std::vector<stiffness> sweep_values()
{
    std::vector<stiffness> out;
    for (int i = 0; i < 100; ++i) out.push_back(stiffness::spring(std::pow(10.0, -2.0 + 4.0 * i / 99.0) * EI / L));
    return out;
}

// Closed-form condensed evaluation. Simply supported end rotations under the
// loads (Roark, Table 8.1; Hicks, Civil Engineering Formulas, Fig. 2.2):
//   UDL        theta_A = theta_B = w L^3 / (24 EI)
//   point P at a (b = L - a):  theta_A = P a b (L + b) / (6 EI L), theta_B = P a b (L + a) / (6 EI L)
// and the end flexibilities of a simply supported beam: f11 = f22 = L/(3EI),
// f12 = L/(6EI). With both known, a pair of springs is the 2x2 system
//   (1 + S_j f_jj) m_j + S_j f_jk m_k = S_j theta_j.
struct closed_form {
    double th0[2] = {0, 0};
    double f11 = L / (3 * EI), f12 = L / (6 * EI);
    closed_form()
    {
        th0[0] = th0[1] = w * L * L * L / (24 * EI);
        for (const auto& p : points) {
            const double a = p[1], b = L - a;
            th0[0] += p[0] * a * b * (L + b) / (6 * EI * L);
            th0[1] += p[0] * a * b * (L + a) / (6 * EI * L);
        }
    }
    std::array<double, 2> end_moments(double s0, double s1) const
    {
        const double a00 = 1 + s0 * f11, a01 = s0 * f12, b0 = s0 * th0[0];
        const double a10 = s1 * f12, a11 = 1 + s1 * f11, b1 = s1 * th0[1];
        const double det = a00 * a11 - a01 * a10;
        return {(b0 * a11 - a01 * b1) / det, (a00 * b1 - a10 * b0) / det};
    }
};

// Runs `pass` (one pass = `per_pass` analyses) until at least `min_seconds`
// have passed, `repeats` times; returns the best analyses per second.
double rate(const std::function<void()>& pass, double per_pass, double min_seconds = 0.4, int repeats = 3)
{
    double best = 0;
    for (int r = 0; r < repeats; ++r) {
        const auto t0 = std::chrono::steady_clock::now();
        long passes = 0;
        double elapsed = 0;
        do {
            pass();
            ++passes;
            elapsed = std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
        } while (elapsed < min_seconds);
        best = std::max(best, passes * per_pass / elapsed);
    }
    return best;
}

volatile double sink = 0;

// The figures of one run: how far the engine is from the closed form, and
// the speed of each way of evaluating the sweep (analyses per second).
struct engine_run {
    beam_model model{L, EI, bench_loads()};
    closed_form cf;
    std::vector<stiffness> ks = sweep_values();
    double n = static_cast<double>(ks.size() * ks.size());
    double worst = 0;
    double floor_rate = 0, condensed_rate = 0, grid_rate = 0, inline_rate = 0, full_rate = 0, rebuild_rate = 0;
};

// The two must agree before their speeds are compared.
void check_agreement(engine_run& r)
{
    const auto& model = r.model;
    const auto& cf = r.cf;
    const auto& ks = r.ks;
    double& worst = r.worst;
    for (const auto& a : ks)
        for (const auto& b : ks) {
            const auto m = model.end_moments(a, b);
            const auto c = cf.end_moments(a.value(), b.value());
            for (int j = 0; j < 2; ++j) worst = std::max(worst, std::abs(m[j] - c[j]) / std::max(1.0, std::abs(c[j])));
        }
}

// The closed-form floor and the engine one pair per call.
void time_pairs(engine_run& r)
{
    const auto& model = r.model;
    const auto& cf = r.cf;
    const auto& ks = r.ks;
    r.floor_rate = rate(
        [&] {
            double acc = 0;
            for (const auto& a : ks)
                for (const auto& b : ks) {
                    const auto m = cf.end_moments(a.value(), b.value());
                    acc += m[0] + m[1];
                }
            sink = sink + acc;
        },
        r.n);
    r.condensed_rate = rate(
        [&] {
            double acc = 0;
            for (const auto& a : ks)
                for (const auto& b : ks) {
                    const auto m = model.end_moments(a, b);
                    acc += m[0] + m[1];
                }
            sink = sink + acc;
        },
        r.n);
}

// The engine's sweep entry point: each joint's row formed once per sweep.
void time_grid(engine_run& r)
{
    const auto& model = r.model;
    const auto& cf = r.cf;
    const auto& ks = r.ks;
    double& worst = r.worst;
    std::vector<std::array<double, 2>> grid;
    r.grid_rate = rate(
        [&] {
            model.end_moments_grid(ks, ks, grid);
            double acc = 0;
            for (const auto& m : grid) acc += m[0] + m[1];
            sink = sink + acc;
        },
        r.n);
    model.end_moments_grid(ks, ks, grid);
    for (std::size_t i = 0; i < ks.size(); ++i)
        for (std::size_t j = 0; j < ks.size(); ++j) {
            const auto c = cf.end_moments(ks[i].value(), ks[j].value());
            for (int e = 0; e < 2; ++e)
                worst = std::max(worst, std::abs(grid[i * ks.size() + j][e] - c[e]) / std::max(1.0, std::abs(c[e])));
        }
}

// The engine's own condensed terms (from its factorised model), with the
// 2x2 solved inline in the sweep loop as a caller of the public API can;
// then the full state, and the model re-assembled for every pair.
void time_engine_terms(engine_run& r)
{
    const auto& model = r.model;
    const auto& ks = r.ks;
    closed_form from_engine;
    from_engine.th0[0] = model.pinned_rotations()[0];
    from_engine.th0[1] = model.pinned_rotations()[1];
    from_engine.f11 = model.flexibility()[0][0];
    from_engine.f12 = model.flexibility()[0][1];
    r.inline_rate = rate(
        [&] {
            double acc = 0;
            for (const auto& a : ks)
                for (const auto& b : ks) {
                    const auto m = from_engine.end_moments(a.value(), b.value());
                    acc += m[0] + m[1];
                }
            sink = sink + acc;
        },
        r.n);
    r.full_rate = rate(
        [&] {
            double acc = 0;
            for (const auto& a : ks)
                for (const auto& b : ks) acc += model.solve(a, b).max_deflection;
            sink = sink + acc;
        },
        r.n);
    // Re-assembling and factorising the model for every stiffness pair, which
    // the sweep avoids: measured on the first 20 x 20 pairs.
    r.rebuild_rate = rate(
        [&] {
            double acc = 0;
            for (int i = 0; i < 20; ++i)
                for (int j = 0; j < 20; ++j) {
                    const beam_model m(L, EI, bench_loads());
                    acc += m.end_moments(ks[i], ks[j])[0];
                }
            sink = sink + acc;
        },
        400.0);
}

void print_figures(const engine_run& r)
{
    const auto& ks = r.ks;
    const double floor_rate = r.floor_rate, grid_rate = r.grid_rate, condensed_rate = r.condensed_rate;
    const double inline_rate = r.inline_rate, full_rate = r.full_rate;
    std::printf("pinproof-bench: one beam (8 m, UDL and three point loads), sweep of %zu x %zu end stiffnesses, "
                "one thread\n",
                ks.size(), ks.size());
    std::printf("  engine and closed form agree to %.1e (relative, end moments)\n", r.worst);
    std::printf("  closed-form condensed floor (2x2 with known load terms): %14.0f analyses/s\n", floor_rate);
    std::printf("  engine, sweep (beam_model::end_moments_grid)           : %14.0f analyses/s\n", grid_rate);
    std::printf("  engine, one pair per call (beam_model::end_moments)    : %14.0f analyses/s\n", condensed_rate);
    std::printf("  engine condensed terms, 2x2 inline in the sweep loop   : %14.0f analyses/s\n", inline_rate);
    std::printf("  engine, full state (beam_model::solve)                 : %14.0f analyses/s\n", full_rate);
    std::printf("  engine, re-assembled for every pair (constructor + end_moments): %8.0f analyses/s\n", r.rebuild_rate);
    std::printf("  ratio floor/engine: sweep %.2f, one pair per call %.2f, condensed terms inline %.2f, full state %.1f\n",
                floor_rate / grid_rate, floor_rate / condensed_rate, floor_rate / inline_rate, floor_rate / full_rate);
}

int engine_figures()
{
    engine_run r;
    check_agreement(r);
    time_pairs(r);
    time_grid(r);
    time_engine_terms(r);
    print_figures(r);
    return 0;
}

// An invented building of repeated floor beams: sections, spans and loads
// cycle through plausible values; every row is well formed and assessed (an
// EN 1990 / EN 1993-1-8 project, as the catalogue's S275 plates are).
int write_schedule(const std::string& path, long n)
{
    std::ofstream out(path, std::ios::binary);
    if (!out) {
        std::fprintf(stderr, "pinproof-bench: cannot write %s\n", path.c_str());
        return 2;
    }
    const char* sections[] = {"IPE 240", "IPE 270", "IPE 300", "IPE 330", "IPE 360", "IPE 400", "IPE 450", "HE 240 A"};
    // Seven catalogue details for each section, each fitting within its depth
    // (fitting top + depth <= beam depth, as the detail reader requires).
    const char* shallow[] = {"FP-2-M20", "WC-2-M20", "EP-P-2-M20", "FP-2-M20", "WC-2-M20", "EP-P-2-M20", "FP-3-M20-SLOT"};
    const char* medium[] = {"FP-2-M20", "FP-3-M20", "WC-2-M20", "WC-3-M20", "EP-P-2-M20", "EP-P-3-M20", "FP-3-M20-SLOT"};
    const char* deep[] = {"FP-3-M20", "FP-4-M20", "WC-3-M20", "WC-4-M20", "EP-P-3-M20", "EP-P-4-M20", "FP-3-M20-SLOT"};
    const double depth_mm[] = {240, 270, 300, 330, 360, 400, 450, 230};
    const double spans[] = {4.5, 5.0, 5.4, 6.0, 6.6, 7.2, 7.5, 8.1};
    out << "id,span,section,g,q,start,end,combinations,deflection_limit\n";
    for (long i = 0; i < n; ++i) {
        const int s = static_cast<int>(i % 8), d = static_cast<int>((i / 8) % 7), e = static_cast<int>((i / 56) % 7);
        const char* const* details = depth_mm[s] >= 400 ? deep : depth_mm[s] >= 300 ? medium : shallow;
        const double g = 4.0 + 0.5 * static_cast<double>(i % 11), q = 2.5 + 0.5 * static_cast<double>(i % 9);
        char line[256];
        std::snprintf(line, sizeof line, "B%06ld,%.1f m,%s,%.1f kN/m,%.1f kN/m,%s,%s,EN1990,span/360\n", i + 1,
                      spans[(i / 3) % 8], sections[s], g, q, details[d], details[e]);
        out << line;
    }
    out.close();
    if (!out) {
        std::fprintf(stderr, "pinproof-bench: cannot write %s\n", path.c_str());
        return 2;
    }
    return 0;
}

}  // namespace

int main(int argc, char** argv)
{
    if (argc == 4 && std::string(argv[1]) == "--schedule") return write_schedule(argv[2], std::atol(argv[3]));
    if (argc == 5 && std::string(argv[1]) == "--floor") return schedule_floor(argv[2], argv[3], argv[4]);
    if (argc == 1) return engine_figures();
    std::fprintf(stderr, "usage: pinproof-bench [--schedule FILE N | --floor SCHEDULE DETAILS OUT]\n");
    return 2;
}
