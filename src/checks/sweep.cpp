#include "pinproof/checks/sweep.hpp"

#include <cmath>

#include "pinproof/core/errors.hpp"
#include "pinproof/model/result_fields.hpp"

namespace pinproof {

std::vector<stiffness> sweep_stiffnesses(double EI, double span, int points)
{
    std::vector<stiffness> out{stiffness::pinned()};
    for (double k : ratio_scan(points)) out.push_back(stiffness::spring(k * EI / span));
    out.push_back(stiffness::rigid());
    return out;
}

namespace {

std::size_t combination_index(const beam& b, const std::string& name)
{
    if (b.combinations.empty())
        throw input_error(b.pointer + "/combinations", "expected at least one load combination to sweep, found none");
    if (name.empty()) return 0;
    std::string known;
    for (std::size_t i = 0; i < b.combinations.size(); ++i) {
        if (b.combinations[i].name == name) return i;
        known += (i ? ", " : "") + b.combinations[i].name;
    }
    throw input_error("--combination", "expected one of the combinations of beam " + b.id + " (" + known +
                                           "), found \"" + name + "\"");
}

sweep_row row_at(const project& p, const beam& b, stiffness_pair at, std::size_t combo)
{
    const point_evaluation e = evaluate_at(p, b, at);
    sweep_row r;
    r.at = at;
    r.fixity_start = fixity_factor(at.start, b.EI(), b.span);
    r.fixity_end = fixity_factor(at.end, b.EI(), b.span);
    r.state = e.states.at(combo);
    r.checks = e.checks;
    return r;
}

// A beam with one joint (a cantilever's root, an overhang's start): the
// path of that joint alone; a cantilever's starts above the pin (a mechanism),
// and its `pinned` is the rigid root (sweep.hpp).
sweep_result sweep_one_joint(const project& p, const beam& b, const sweep_settings& settings, std::size_t combo)
{
    if (settings.grid)
        throw input_error("--grid", "expected a path sweep: a " + to_string(b.layout) + " (beam " + b.id +
                                        ") has one joint, so there is no two-end map");
    const bool cantilever = b.layout == beam_layout::cantilever;
    sweep_result out;
    out.beam_id = b.id;
    out.combination = b.combinations[combo].name;
    out.EI = b.EI();
    out.span = b.span;
    out.settings = settings;
    out.settings.path = single_joint_path();
    out.fixed = evaluate_at(p, b, {stiffness::rigid(), stiffness::pinned()}).states.at(combo);
    out.pinned = cantilever ? out.fixed : evaluate_at(p, b, {stiffness::pinned(), stiffness::pinned()}).states.at(combo);
    auto values = sweep_stiffnesses(b.EI(), b.span, settings.points);
    if (cantilever) values.erase(values.begin());
    for (stiffness s : values) out.rows.push_back(row_at(p, b, point_on_path(out.settings.path, s), combo));
    out.thresholds = find_thresholds(p, b, out.settings.path, settings.points);
    return out;
}

}  // namespace

sweep_result sweep_beam(const project& p, const beam& b, const sweep_settings& settings)
{
    if (settings.points < 2) throw internal_error("a sweep needs at least two points");
    const std::size_t combo = combination_index(b, settings.combination);
    if (b.layout != beam_layout::two_supports) return sweep_one_joint(p, b, settings, combo);
    sweep_result out;
    out.beam_id = b.id;
    out.combination = b.combinations[combo].name;
    out.EI = b.EI();
    out.span = b.span;
    out.settings = settings;
    out.pinned = evaluate_at(p, b, {stiffness::pinned(), stiffness::pinned()}).states.at(combo);
    out.fixed = evaluate_at(p, b, {stiffness::rigid(), stiffness::rigid()}).states.at(combo);
    const auto values = sweep_stiffnesses(b.EI(), b.span, settings.points);
    if (settings.grid) {
        for (stiffness s : values)
            for (stiffness e : values) out.rows.push_back(row_at(p, b, {s, e}, combo));
        return out;
    }
    for (stiffness s : values) out.rows.push_back(row_at(p, b, point_on_path(settings.path, s), combo));
    out.thresholds = find_thresholds(p, b, settings.path, settings.points);
    return out;
}

}  // namespace pinproof
