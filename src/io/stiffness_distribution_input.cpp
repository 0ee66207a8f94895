#include "pinproof/io/stiffness_distribution_input.hpp"

#include <nlohmann/json.hpp>

#include <cmath>
#include <string>

#include "io/json_fields.hpp"
#include "pinproof/core/units.hpp"

namespace pinproof {

namespace {

using json = nlohmann::json;
using namespace json_fields;

// A positive stiffness: a rotational stiffness or a multiple of EI/L.
std::optional<double> read_positive_stiffness(const json& obj, const std::string& ptr, const std::string& key,
                                              double EI_over_L, problem_list& problems, bool& unresolved)
{
    const std::string p = child(ptr, key);
    auto it = obj.find(key);
    if (it == obj.end()) {
        problems.add(p, "missing required field \"" + key + "\" (a rotational stiffness such as \"2500 kN*m/rad\" "
                                                            "or a multiple such as \"0.5 EI/L\")");
        return std::nullopt;
    }
    std::optional<double> v;
    const auto relative = read_EI_over_L_multiple(*it, p, problems);
    if (relative.relative) {
        if (!relative.multiple) return std::nullopt;
        if (!(*relative.multiple > 0)) {
            problems.add(p, "expected a positive multiple of EI/L such as \"0.5 EI/L\", found " + shown(*it));
            return std::nullopt;
        }
        if (!(EI_over_L > 0)) {
            unresolved = true;  // span, E or I is already reported
            return std::nullopt;
        }
        v = *relative.multiple * EI_over_L;
    }
    if (!v) {
        problem_list local;
        v = json_fields::quantity(*it, p, dims::rotational_stiffness, local);
        if (!v) {
            for (const auto& pr : local.problems())
                problems.add(pr.where, pr.message + " (multiples such as \"0.5 EI/L\" are accepted too)");
            return std::nullopt;
        }
    }
    // The same ceiling as every other stiffness (src/project_input.cpp): "rigid"
    // is the way to write a fixed end.
    if (*v > 1e40) {
        problems.add(p, "expected a rotational stiffness of at most 1e40 N*m/rad, found " + shown(*it));
        return std::nullopt;
    }
    if (!(*v > 0)) {
        problems.add(p, "expected a positive rotational stiffness, found " + shown(*it));
        return std::nullopt;
    }
    return v;
}

std::optional<double> read_positive_number(const json& obj, const std::string& ptr, const std::string& key,
                                           const char* what, problem_list& problems)
{
    auto v = number_field(obj, ptr, key, true, problems);
    if (v && !(*v > 0)) {
        problems.add(child(ptr, key), std::string("expected ") + what + " above zero, found " + shown(obj.at(key)));
        return std::nullopt;
    }
    return v;
}

// Plausible scatter of a joint stiffness: a coefficient of variation from
// 0.001 to 10 (measured joint stiffnesses scatter with CoV of the order of
// 0.2 to 1; common practice, no source). Outside it the distribution's own
// arithmetic breaks down (sigma = sqrt(ln(1 + cov^2)) overflows or vanishes).
constexpr double min_cov = 1e-3, max_cov = 10.0;

bool cov_plausible(double cov) { return cov >= min_cov && cov <= max_cov; }

std::string cov_range_text() { return "0.001 and 10"; }  // min_cov and max_cov

}  // namespace

std::optional<stiffness_distribution> read_stiffness_distribution(const json& value, const std::string& pointer,
                                                                  double EI_over_L, problem_list& problems)
{
    if (!expect_object(value, pointer, problems)) return std::nullopt;
    const std::size_t before = problems.size();
    auto kind = choice_field(value, pointer, "kind", {"lognormal", "uniform-log", "normal"}, true, problems);
    if (!kind) return std::nullopt;
    bool unresolved = false;
    std::optional<stiffness_distribution> out;
    const auto S = [&](const char* key) {
        return read_positive_stiffness(value, pointer, key, EI_over_L, problems, unresolved);
    };
    if (*kind == "lognormal") {
        const bool by_median = value.contains("median") || value.contains("cov");
        const bool by_fractiles = value.contains("p05") || value.contains("p95");
        if (by_median && by_fractiles) {
            problems.add(pointer, "expected either \"median\" and \"cov\" or \"p05\" and \"p95\" for a lognormal "
                                  "stiffness, found both");
            return std::nullopt;
        }
        if (by_fractiles) {
            reject_unknown_keys(value, pointer, {"kind", "p05", "p95"}, problems);
            auto p05 = S("p05");
            auto p95 = S("p95");
            // The fractiles of a lognormal are median * exp(-/+ 1.6449 sigma), so
            // p95/p05 = exp(3.2897 sigma) with sigma = sqrt(ln(1 + cov^2)).
            const auto ratio_for = [](double cov) { return std::exp(2 * 1.6448536269514722 * std::sqrt(std::log1p(cov * cov))); };
            if (p05 && p95 && !(*p95 > *p05))
                problems.add(child(pointer, "p95"), "expected the 95 % fractile above the 5 % fractile, found " +
                                                        shown(value.at("p95")) + " not above " + shown(value.at("p05")));
            else if (p05 && p95 && !(*p95 / *p05 >= ratio_for(min_cov) && *p95 / *p05 <= ratio_for(max_cov)))
                problems.add(child(pointer, "p95"), "expected the 95 % fractile between " +
                                                        format_number(ratio_for(min_cov), 4) + " and " +
                                                        format_number(ratio_for(max_cov), 4) +
                                                        " times the 5 % fractile (a coefficient of variation between " +
                                                        cov_range_text() + "), found " + shown(value.at("p95")) +
                                                        " with p05 " + shown(value.at("p05")));
            else if (p05 && p95) out = stiffness_distribution::lognormal_from_fractiles(*p05, *p95);
        } else {
            reject_unknown_keys(value, pointer, {"kind", "median", "cov"}, problems);
            auto median = S("median");
            auto cov = read_positive_number(value, pointer, "cov", "a coefficient of variation", problems);
            if (cov && !cov_plausible(*cov))
                problems.add(child(pointer, "cov"), "expected a coefficient of variation between " + cov_range_text() +
                                                        ", found " + shown(value.at("cov")));
            else if (median && cov) out = stiffness_distribution::lognormal(*median, *cov);
        }
    } else if (*kind == "uniform-log") {
        reject_unknown_keys(value, pointer, {"kind", "min", "max"}, problems);
        auto lo = S("min");
        auto hi = S("max");
        if (lo && hi && !(*hi > *lo))
            problems.add(child(pointer, "max"), "expected max above min, found " + shown(value.at("max")) +
                                                    " not above " + shown(value.at("min")));
        else if (lo && hi) out = stiffness_distribution::uniform_log(*lo, *hi);
    } else {
        reject_unknown_keys(value, pointer, {"kind", "mean", "sd"}, problems);
        auto mean = S("mean");
        auto sd = S("sd");
        if (mean && sd && !cov_plausible(*sd / *mean))
            problems.add(child(pointer, "sd"), "expected a standard deviation between " + cov_range_text() +
                                                   " times the mean (a coefficient of variation), found " +
                                                   shown(value.at("sd")) + " with mean " + shown(value.at("mean")));
        else if (mean && sd) out = stiffness_distribution::normal(*mean, *sd);
    }
    if (problems.size() != before || unresolved) return std::nullopt;
    return out;
}

std::optional<int> read_stiffness_correlation(const json& beam_object, const std::string& beam_pointer,
                                              problem_list& problems)
{
    if (!beam_object.is_object() || !beam_object.contains("stiffness_correlation")) return 1;
    const json& v = beam_object.at("stiffness_correlation");
    if (v.is_number() && (v.get<double>() == 0.0 || v.get<double>() == 1.0)) return v.get<double>() == 1.0 ? 1 : 0;
    problems.add(child(beam_pointer, "stiffness_correlation"),
                 "expected 0 (the two end stiffnesses independent) or 1 (fully correlated, the same connection "
                 "type), found " + shown(v) + "; partial correlation is not supported");
    return std::nullopt;
}

stiffness_uncertainty read_stiffness_uncertainty(const nlohmann::json& document, const beam& b, problem_list& problems)
{
    stiffness_uncertainty out;
    const nlohmann::json::json_pointer bp(b.pointer);
    if (!document.contains(bp)) return out;
    const nlohmann::json& beam_object = document.at(bp);
    const double EI_over_L = b.span > 0 ? b.EI() / b.span : 0.0;
    for (beam_end e : {beam_end::start, beam_end::end}) {
        const std::string jp = b.pointer + "/joints/" + to_string(e);
        const nlohmann::json::json_pointer ptr(jp + "/stiffness_distribution");
        if (!document.contains(ptr)) continue;
        auto d = read_stiffness_distribution(document.at(ptr), jp + "/stiffness_distribution", EI_over_L, problems);
        (e == beam_end::start ? out.start : out.end) = d;
    }
    if (auto c = read_stiffness_correlation(beam_object, b.pointer, problems)) out.correlation = *c;
    return out;
}

}  // namespace pinproof
