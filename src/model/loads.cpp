#include "pinproof/model/loads.hpp"

#include <cmath>

namespace pinproof {

std::string to_string(load_kind k)
{
    switch (k) {
    case load_kind::point: return "point";
    case load_kind::udl: return "udl";
    case load_kind::linear: return "linear";
    case load_kind::moment: return "moment";
    }
    return "unknown";
}

std::string to_string(limit_state u)
{
    switch (u) {
    case limit_state::strength: return "strength";
    case limit_state::service: return "service";
    case limit_state::vibration: return "vibration";
    }
    return "unknown";
}

std::optional<double> position_on_span(double x, double span)
{
    // Unit conversions (mm, in, ft to m) round each value once; 1e-9 of the
    // span is far above that round-off and far below any detailed dimension.
    const double snap = 1e-9 * span;
    if (std::abs(x) <= snap) return 0.0;
    if (std::abs(x - span) <= snap) return span;
    if (x < 0 || x > span) return std::nullopt;
    return x;
}

double intensity_at(const load& l, double x)
{
    if (l.kind != load_kind::udl && l.kind != load_kind::linear) return 0.0;
    if (x < l.from || x > l.to) return 0.0;
    if (l.kind == load_kind::udl) return l.value;
    return l.value + (l.value_end - l.value) * (x - l.from) / (l.to - l.from);
}

double total_force(const load& l)
{
    switch (l.kind) {
    case load_kind::point: return l.value;
    case load_kind::udl: return l.value * (l.to - l.from);
    case load_kind::linear: return 0.5 * (l.value + l.value_end) * (l.to - l.from);
    case load_kind::moment: return 0.0;
    }
    return 0.0;
}

double moment_about_start(const load& l)
{
    const double len = l.to - l.from;
    switch (l.kind) {
    case load_kind::point: return l.value * l.from;
    case load_kind::moment: return l.value;
    case load_kind::udl: return l.value * len * (l.from + 0.5 * len);
    case load_kind::linear:
        // Uniform part at the middle, triangular part at two thirds of its length.
        return l.value * len * (l.from + 0.5 * len) +
               0.5 * (l.value_end - l.value) * len * (l.from + 2.0 * len / 3.0);
    }
    return 0.0;
}

std::vector<load> factored_loads(const std::vector<load>& all, const combination& c)
{
    std::vector<load> out;
    for (const auto& l : all) {
        auto f = c.factors.find(l.load_case);
        if (f == c.factors.end() || f->second == 0.0) continue;
        load scaled = l;
        scaled.value *= f->second;
        scaled.value_end *= f->second;
        out.push_back(scaled);
    }
    return out;
}

}  // namespace pinproof
