// The read-compute-write floor of a schedule run (docs/performance.md): what a
// hand-written C++ loop costs for the same schedule and the same closed form
// as src/bench/numpy_peer.py, with nothing else (no checks, no validation
// beyond what the loop needs, no messages). `pinproof batch` is measured
// against it.
//
// Per row: std::getline, the cells split at commas, std::strtod for the
// numbers, a lookup of the section's second moment of area and of the two
// details' stiffness ranges, the four corners of each combination solved in
// closed form (slope-deflection, as in numpy_peer.py), one output line.
#include "schedule_floor.hpp"

#include <nlohmann/json.hpp>

#include <charconv>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <fstream>
#include <string>
#include <unordered_map>
#include <vector>

#include "pinproof/model/section.hpp"

namespace {

struct stiffness_range {
    double lo = 0, hi = 0;
    bool relative = false;  // multiples of EI/L
};

double unit_factor(const char* unit)
{
    const std::string u(unit);
    if (u == "kN*m/rad") return 1e3;
    if (u == "MN*m/rad") return 1e6;
    if (u == "N*m/rad") return 1.0;
    return 0.0;
}

}  // namespace

int schedule_floor(const std::string& schedule_path, const std::string& details_path, const std::string& out_path)
{
    std::ifstream details_file(details_path);
    const auto details = nlohmann::json::parse(details_file, nullptr, false);
    if (details.is_discarded()) return std::fprintf(stderr, "floor: cannot read %s\n", details_path.c_str()), 2;
    std::unordered_map<std::string, stiffness_range> ranges;
    for (const auto& d : details["details"]) {
        const std::string lo = d["stiffness"]["min"], hi = d["stiffness"]["max"];
        if (hi == "rigid") continue;
        char* end = nullptr;
        stiffness_range r;
        r.lo = std::strtod(lo.c_str(), &end);
        r.relative = std::string(end) == " EI/L";
        if (!r.relative) r.lo *= unit_factor(end + 1);
        r.hi = std::strtod(hi.c_str(), &end);
        if (!r.relative) r.hi *= unit_factor(end + 1);
        ranges[d["id"]] = r;
    }
    std::unordered_map<std::string, double> inertia;
    std::ifstream in(schedule_path);
    std::FILE* out = std::fopen(out_path.c_str(), "w");
    if (!in || !out) return std::fprintf(stderr, "floor: cannot open the schedule or the output\n"), 2;
    std::string line;
    std::vector<std::string> cells;
    std::getline(in, line);  // the header: id,span,section,g,q,start,end,combinations,deflection_limit
    std::fputs("id,reaction_start,reaction_end,moment_start,moment_end,rotation_start,rotation_end\n", out);
    while (std::getline(in, line)) {
        cells.clear();
        std::size_t from = 0;
        for (;;) {
            const std::size_t comma = line.find(',', from);
            cells.emplace_back(line, from, comma == std::string::npos ? std::string::npos : comma - from);
            if (comma == std::string::npos) break;
            from = comma + 1;
        }
        if (cells.size() < 8) continue;
        const double L = std::strtod(cells[1].c_str(), nullptr);
        const double G = std::strtod(cells[3].c_str(), nullptr) * 1e3, Q = std::strtod(cells[4].c_str(), nullptr) * 1e3;
        auto I = inertia.find(cells[2]);
        if (I == inertia.end()) I = inertia.emplace(cells[2], pinproof::find_catalogue_section(cells[2])->I).first;
        const bool asce = cells[7] == "ASCE7";
        // EN 1993-1-1 3.2.6: E = 210 GPa; AISC 360-16 B2: E = 29,000 ksi.
        const double EI = I->second * (asce ? 29000.0 * 6894757.293168361 : 210e9);
        const stiffness_range &rs = ranges.at(cells[5]), &re = ranges.at(cells[6]);
        const double ks[2] = {rs.lo * (rs.relative ? EI / L : 1), rs.hi * (rs.relative ? EI / L : 1)};
        const double ke[2] = {re.lo * (re.relative ? EI / L : 1), re.hi * (re.relative ? EI / L : 1)};
        // EN 1990 6.10 and 6.14b; ASCE 7-16 2.3.1-1, -2 and service.
        static const double en[][3] = {{1.35, 1.5, 1}, {1.0, 1.0, 0}}, us[][3] = {{1.4, 0, 1}, {1.2, 1.6, 1}, {1.0, 1.0, 0}};
        const auto* combs = asce ? us : en;
        const int ncomb = asce ? 3 : 2;
        const double a = L / (3 * EI), b = L / (6 * EI);
        double env[6] = {0, 0, 0, 0, 0, 0};
        for (int c = 0; c < ncomb; ++c) {
            const double w = combs[c][0] * G + combs[c][1] * Q, theta0 = w * L * L * L / (24 * EI);
            for (double k1 : ks)
                for (double k2 : ke) {
                    const double c1 = 1 / k1, c2 = 1 / k2, det = (c1 + a) * (c2 + a) - b * b;
                    const double M1 = theta0 * (c2 + a - b) / det, M2 = theta0 * (c1 + a - b) / det;
                    env[4] = std::fmax(env[4], std::fabs(c1 * M1));
                    env[5] = std::fmax(env[5], std::fabs(c2 * M2));
                    if (combs[c][2] == 0) continue;
                    env[0] = std::fmax(env[0], std::fabs(w * L / 2 + (M1 - M2) / L));
                    env[1] = std::fmax(env[1], std::fabs(w * L / 2 - (M1 - M2) / L));
                    env[2] = std::fmax(env[2], std::fabs(M1));
                    env[3] = std::fmax(env[3], std::fabs(M2));
                }
        }
        char buf[256];
        char* p = buf;
        p = std::copy(cells[0].begin(), cells[0].end(), p);
        for (double v : env) {
            *p++ = ',';
            p = std::to_chars(p, buf + sizeof buf, v).ptr;
        }
        *p++ = '\n';
        std::fwrite(buf, 1, static_cast<std::size_t>(p - buf), out);
    }
    return std::fclose(out) == 0 ? 0 : 2;
}
