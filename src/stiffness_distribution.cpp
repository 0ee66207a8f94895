#include "pinproof/stiffness_distribution.hpp"

#include <boost/math/distributions/lognormal.hpp>
#include <boost/math/distributions/normal.hpp>
#include <boost/math/distributions/uniform.hpp>

#include <cctype>
#include <cmath>
#include <cstdlib>
#include <stdexcept>

#include "json_fields.hpp"
#include "pinproof/units.hpp"

namespace pinproof {

namespace {

const boost::math::normal standard_normal{0.0, 1.0};

// z of the 95 % fractile of the standard normal distribution.
double z95() { return boost::math::quantile(standard_normal, 0.95); }

void require(bool ok, const char* what)
{
    if (!ok) throw std::invalid_argument(what);
}

}  // namespace

std::string to_string(distribution_kind k)
{
    switch (k) {
    case distribution_kind::lognormal: return "lognormal";
    case distribution_kind::uniform_log: return "uniform-log";
    case distribution_kind::normal: return "normal";
    }
    return "unknown";
}

stiffness_distribution stiffness_distribution::lognormal(double median, double cov)
{
    require(std::isfinite(median) && median > 0, "the median stiffness must be positive and finite");
    require(std::isfinite(cov) && cov > 0, "the coefficient of variation must be positive and finite");
    // For a lognormal variable cov^2 = exp(sigma^2) - 1.
    return {distribution_kind::lognormal, std::log(median), std::sqrt(std::log1p(cov * cov))};
}

stiffness_distribution stiffness_distribution::lognormal_from_fractiles(double p05, double p95)
{
    require(std::isfinite(p05) && p05 > 0, "the 5 % fractile must be positive and finite");
    require(std::isfinite(p95) && p95 > p05, "the 95 % fractile must be finite and above the 5 % fractile");
    const double l5 = std::log(p05), l95 = std::log(p95);
    return {distribution_kind::lognormal, 0.5 * (l5 + l95), (l95 - l5) / (2.0 * z95())};
}

stiffness_distribution stiffness_distribution::uniform_log(double min, double max)
{
    require(std::isfinite(min) && min > 0, "the minimum stiffness must be positive and finite");
    require(std::isfinite(max) && max > min, "the maximum stiffness must be finite and above the minimum");
    return {distribution_kind::uniform_log, std::log(min), std::log(max)};
}

stiffness_distribution stiffness_distribution::normal(double mean, double sd)
{
    require(std::isfinite(mean) && mean > 0, "the mean stiffness must be positive and finite");
    require(std::isfinite(sd) && sd > 0, "the standard deviation must be positive and finite");
    return {distribution_kind::normal, mean, sd};
}

double stiffness_distribution::cdf(double S) const
{
    if (!(S > 0)) return 0.0;
    if (std::isinf(S)) return 1.0;
    switch (kind_) {
    case distribution_kind::lognormal: return boost::math::cdf(boost::math::lognormal(a_, b_), S);
    case distribution_kind::uniform_log: {
        const double x = std::log(S);
        if (x <= a_) return 0.0;
        if (x >= b_) return 1.0;
        return boost::math::cdf(boost::math::uniform(a_, b_), x);
    }
    case distribution_kind::normal: {
        const boost::math::normal n(a_, b_);
        const double below_zero = boost::math::cdf(n, 0.0);
        const double kept = boost::math::cdf(boost::math::complement(n, 0.0));
        return (boost::math::cdf(n, S) - below_zero) / kept;
    }
    }
    return 0.0;
}

double stiffness_distribution::pdf(double S) const
{
    if (!(S > 0) || std::isinf(S)) return 0.0;
    switch (kind_) {
    case distribution_kind::lognormal: return boost::math::pdf(boost::math::lognormal(a_, b_), S);
    case distribution_kind::uniform_log: {
        const double x = std::log(S);
        if (x < a_ || x > b_) return 0.0;
        return boost::math::pdf(boost::math::uniform(a_, b_), x) / S;
    }
    case distribution_kind::normal: {
        const boost::math::normal n(a_, b_);
        return boost::math::pdf(n, S) / boost::math::cdf(boost::math::complement(n, 0.0));
    }
    }
    return 0.0;
}

double stiffness_distribution::quantile(double u) const
{
    if (!(u > 0 && u < 1)) throw internal_error("a stiffness quantile was asked outside (0, 1)");
    switch (kind_) {
    case distribution_kind::lognormal: {
        const boost::math::lognormal d(a_, b_);
        // The complement keeps full precision in the upper tail.
        return u <= 0.5 ? boost::math::quantile(d, u) : boost::math::quantile(boost::math::complement(d, 1.0 - u));
    }
    case distribution_kind::uniform_log: return std::exp(boost::math::quantile(boost::math::uniform(a_, b_), u));
    case distribution_kind::normal: {
        const boost::math::normal n(a_, b_);
        const double below_zero = boost::math::cdf(n, 0.0);
        const double kept = boost::math::cdf(boost::math::complement(n, 0.0));
        const double S = u <= 0.5 ? boost::math::quantile(n, below_zero + u * kept)
                                  : boost::math::quantile(boost::math::complement(n, (1.0 - u) * kept));
        return std::max(S, 0.0);
    }
    }
    return 0.0;
}

fractile_bounds stiffness_distribution::fractile_range() const { return {quantile(0.05), quantile(0.95)}; }

std::string stiffness_distribution::describe() const
{
    const auto S = [](double v) { return format_quantity(v, dims::rotational_stiffness, unit_system::si); };
    switch (kind_) {
    case distribution_kind::lognormal:
        return "lognormal, median " + S(std::exp(a_)) + ", sigma of ln S " + format_number(b_, 3);
    case distribution_kind::uniform_log:
        return "uniform in log S from " + S(std::exp(a_)) + " to " + S(std::exp(b_));
    case distribution_kind::normal:
        return "normal truncated at zero, mean " + S(a_) + ", standard deviation " + S(b_);
    }
    return "unknown";
}

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
            if (p05 && p95 && !(*p95 > *p05))
                problems.add(child(pointer, "p95"), "expected the 95 % fractile above the 5 % fractile, found " +
                                                        shown(value.at("p95")) + " not above " + shown(value.at("p05")));
            else if (p05 && p95) out = stiffness_distribution::lognormal_from_fractiles(*p05, *p95);
        } else {
            reject_unknown_keys(value, pointer, {"kind", "median", "cov"}, problems);
            auto median = S("median");
            auto cov = read_positive_number(value, pointer, "cov", "a coefficient of variation", problems);
            if (median && cov) out = stiffness_distribution::lognormal(*median, *cov);
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
        if (mean && sd) out = stiffness_distribution::normal(*mean, *sd);
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

}  // namespace pinproof
