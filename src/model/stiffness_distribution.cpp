#include "pinproof/model/stiffness_distribution.hpp"

#include <boost/math/distributions/lognormal.hpp>
#include <boost/math/distributions/normal.hpp>
#include <boost/math/distributions/uniform.hpp>

#include <cctype>
#include <cmath>
#include <cstdlib>
#include <stdexcept>

#include "pinproof/core/units.hpp"

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

}  // namespace pinproof
