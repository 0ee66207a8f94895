// Verification of the stiffness distributions and of their reader.
//
// Sources:
//   [LN]    Lognormal distribution: ln S ~ N(mu, sigma), median = exp(mu),
//           cov^2 = exp(sigma^2) - 1 (Johnson, Kotz & Balakrishnan, Continuous
//           Univariate Distributions, vol. 1, 2nd ed. 1994, ch. 14; from memory).
//   [TN]    Truncated normal: F(x) = (Phi((x-m)/s) - Phi(-m/s)) / Phi(m/s) for
//           x >= 0 (same book, ch. 13; from memory).
//   [scipy] scipy.stats (lognorm, truncnorm) run by /usr/bin/python3 as an
//           independent library; skipped with a message where unavailable.
// Tolerances are relative unless stated.
#include <doctest/doctest.h>

#include <nlohmann/json.hpp>

#include <array>
#include <cmath>
#include <cstdio>
#include <memory>
#include <optional>
#include <string>

#include "python_output.hpp"
#include "pinproof/model/stiffness_distribution.hpp"
#include "pinproof/io/stiffness_distribution_input.hpp"

using namespace pinproof;

namespace {

bool close(double a, double b, double rel) { return std::abs(a - b) <= rel * std::max(std::abs(a), std::abs(b)); }

using test_data::python_output;

std::optional<stiffness_distribution> read(const std::string& text, problem_list& problems, double EI_over_L = 2.9e6)
{
    return read_stiffness_distribution(nlohmann::json::parse(text), "/beams/0/joints/start/stiffness_distribution",
                                       EI_over_L, problems);
}

}  // namespace

TEST_CASE("lognormal from median and cov [LN]: F(median) = 0.5 - S_95 = median exp(sigma z95) - tol 1e-12")
{
    const double median = 1.5e6, cov = 0.4;
    const auto d = stiffness_distribution::lognormal(median, cov);
    const double sigma = std::sqrt(std::log(1 + cov * cov));
    CHECK(close(d.second(), sigma, 1e-14));
    CHECK(close(d.cdf(median), 0.5, 1e-12));
    CHECK(close(d.quantile(0.5), median, 1e-12));
    CHECK(close(d.quantile(0.95), median * std::exp(sigma * 1.6448536269514722), 1e-12));
    CHECK(close(d.cdf(d.quantile(0.999)), 0.999, 1e-12));
    CHECK(close(1 - d.cdf(d.quantile(1 - 1e-10)), 1e-10, 1e-4));  // upper tail keeps precision
}

TEST_CASE("lognormal from fractiles [LN]: the 5 and 95 % fractiles are returned - tol 1e-12")
{
    const auto d = stiffness_distribution::lognormal_from_fractiles(0.8e6, 3.2e6);
    CHECK(close(d.quantile(0.05), 0.8e6, 1e-12));
    CHECK(close(d.quantile(0.95), 3.2e6, 1e-12));
    CHECK(close(d.median(), std::sqrt(0.8e6 * 3.2e6), 1e-12));
    const auto r = d.fractile_range();
    CHECK(close(r.p05, 0.8e6, 1e-12));
    CHECK(close(r.p95, 3.2e6, 1e-12));
}

TEST_CASE("uniform in log S [common practice - no source]: F(sqrt(min max)) = 0.5 - F outside = 0 and 1 - tol 1e-12")
{
    const auto d = stiffness_distribution::uniform_log(1e5, 1e7);
    CHECK(close(d.cdf(1e6), 0.5, 1e-12));
    CHECK(d.cdf(5e4) == 0.0);
    CHECK(d.cdf(2e7) == 1.0);
    CHECK(close(d.quantile(0.25), std::pow(10.0, 5.5), 1e-12));
    CHECK(close(d.pdf(1e6), 1.0 / (1e6 * std::log(100.0)), 1e-12));
}

TEST_CASE("normal truncated at zero [TN]: F(0) = 0 - quantile inverts cdf - tol 1e-12")
{
    const double m = 1e6, s = 0.8e6;
    const auto d = stiffness_distribution::normal(m, s);
    CHECK(d.cdf(0.0) == 0.0);
    const auto phi = [](double z) { return 0.5 * std::erfc(-z / std::sqrt(2.0)); };
    CHECK(close(d.cdf(m), (0.5 - phi(-m / s)) / phi(m / s), 1e-12));
    for (double u : {1e-6, 0.05, 0.5, 0.95, 1 - 1e-9}) {
        CAPTURE(u);
        CHECK(close(d.cdf(d.quantile(u)), u, 1e-9));
    }
    // The density is the derivative of the cdf (central difference, tol 1e-6).
    const double x = 1.3e6, h = 1e2;
    CHECK(close(d.pdf(x), (d.cdf(x + h) - d.cdf(x - h)) / (2 * h), 1e-6));
}

TEST_CASE("independent library [scipy.stats]: lognorm.ppf and truncnorm.cdf agree - tol 1e-10")
{
    const auto ln = stiffness_distribution::lognormal(1.5e6, 0.4);
    const auto tn = stiffness_distribution::normal(1e6, 0.8e6);
    const auto out = python_output("from scipy.stats import lognorm, truncnorm; import math; s=math.sqrt(math.log(1+0.4**2)); "
                            "print(repr(lognorm.ppf(0.9, s, scale=1.5e6))); "
                            "print(repr(truncnorm.cdf(1.3e6, -1e6/0.8e6, math.inf, loc=1e6, scale=0.8e6)))");
    if (!out) {
        MESSAGE("scipy not available at /usr/bin/python3: cross-check skipped");
        return;
    }
    double q = 0, c = 0;
    REQUIRE(std::sscanf(out->c_str(), "%lf %lf", &q, &c) == 2);
    CHECK(close(ln.quantile(0.9), q, 1e-10));
    CHECK(close(tn.cdf(1.3e6), c, 1e-10));
}

TEST_CASE("reader - valid forms [file format]: median and cov - p05 and p95 in EI/L - uniform-log - normal")
{
    problem_list pr;
    auto a = read(R"({"kind": "lognormal", "median": "1500 kN*m/rad", "cov": 0.4})", pr);
    auto b = read(R"({"kind": "lognormal", "p05": "0.2 EI/L", "p95": "0.8 EI/L"})", pr);
    auto c = read(R"({"kind": "uniform-log", "min": 1e5, "max": "10000 kN*m/rad"})", pr);
    auto d = read(R"({"kind": "normal", "mean": "1000 kN*m/rad", "sd": "300 kN*m/rad"})", pr);
    CHECK(pr.empty());
    REQUIRE(a);
    REQUIRE(b);
    REQUIRE(c);
    REQUIRE(d);
    CHECK(close(a->median(), 1.5e6, 1e-12));
    CHECK(close(b->quantile(0.05), 0.2 * 2.9e6, 1e-12));
    CHECK(c->kind() == distribution_kind::uniform_log);
    CHECK(close(d->first(), 1e6, 1e-12));
}

TEST_CASE("reader - bad input names the field [project rules]: JSON pointer and what was expected")
{
    const std::string base = "/beams/0/joints/start/stiffness_distribution";
    struct bad {
        const char* text;
        std::string where;
        const char* words;
    } cases[] = {
        {R"({"median": 1e6, "cov": 0.3})", base + "/kind", "missing"},
        {R"({"kind": "weibull"})", base + "/kind", "lognormal"},
        {R"({"kind": "lognormal", "median": 1e6, "cov": -0.3})", base + "/cov", "above zero"},
        {R"({"kind": "lognormal", "median": "25 kN*m", "cov": 0.3})", base + "/median", "rotational stiffness"},
        {R"({"kind": "lognormal", "p05": 2e6, "p95": 1e6})", base + "/p95", "above the 5 %"},
        {R"({"kind": "lognormal", "median": 1e6, "p95": 2e6})", base, "either"},
        {R"({"kind": "uniform-log", "min": 1e6, "max": 1e6})", base + "/max", "above min"},
        {R"({"kind": "uniform-log", "min": 0, "max": 1e6})", base + "/min", "positive"},
        {R"({"kind": "normal", "mean": 1e6, "sd": 1e5, "cov": 0.1})", base + "/cov", "unknown"},
        {R"({"kind": "normal", "mean": 1e6})", base + "/sd", "missing"},
        {R"("lognormal")", base, "object"},
    };
    for (const auto& c : cases) {
        CAPTURE(c.text);
        problem_list pr;
        CHECK_FALSE(read(c.text, pr));
        REQUIRE_FALSE(pr.empty());
        CHECK(pr.problems().front().where == c.where);
        CHECK(pr.problems().front().message.find(c.words) != std::string::npos);
    }
}

TEST_CASE("stiffness correlation reader [file format]: default 1 - 0 and 1 accepted - 0.5 refused with its pointer")
{
    problem_list pr;
    CHECK(read_stiffness_correlation(nlohmann::json::parse("{}"), "/beams/0", pr) == 1);
    CHECK(read_stiffness_correlation(nlohmann::json::parse(R"({"stiffness_correlation": 0})"), "/beams/0", pr) == 0);
    CHECK(read_stiffness_correlation(nlohmann::json::parse(R"({"stiffness_correlation": 1})"), "/beams/0", pr) == 1);
    CHECK(pr.empty());
    CHECK_FALSE(read_stiffness_correlation(nlohmann::json::parse(R"({"stiffness_correlation": 0.5})"), "/beams/0", pr));
    REQUIRE(pr.size() == 1);
    CHECK(pr.problems().front().where == "/beams/0/stiffness_correlation");
}
