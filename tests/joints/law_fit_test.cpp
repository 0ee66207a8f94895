// Fitting moment-rotation laws to measured points.
//
// Sources:
//   [KC1990]  Kishi and Chen (1990) power model; [RA1975] Richard and Abbott (1975) model
//             (reference pack 4; formulas from memory).
//   [scipy]   python3-scipy optimize.curve_fit on the same points, the independent fit.
#include <doctest/doctest.h>

#include <cmath>
#include <sstream>
#include <stdexcept>

#include "pinproof/joints/law_fit.hpp"
#include "python_output.hpp"

using namespace pinproof;

namespace {
bool close(double a, double b, double rel) { return std::abs(a - b) <= rel * std::max(std::abs(a), std::abs(b)); }

std::vector<law_point> sample(const joint_law& l, double noise)
{
    std::vector<law_point> pts;
    for (int i = 1; i <= 16; ++i) {
        const double theta = 2.5e-3 * i;
        // Deterministic scatter of +-noise, alternating.
        pts.push_back({theta, l.moment(theta) * (1 + noise * ((i % 3) - 1))});
    }
    return pts;
}
}  // namespace

TEST_CASE("power law recovered from exact points [KC1990] - tol 1e-6")
{
    const joint_law truth = joint_law::power(8e6, 60e3, 1.6);
    const law_fit f = fit_power_law(sample(truth, 0));
    const auto p = f.law.parameters();
    CHECK(close(p[0].second, 8e6, 1e-6));
    CHECK(close(p[1].second, 60e3, 1e-6));
    CHECK(close(p[2].second, 1.6, 1e-6));
    CHECK(f.rms_error <= 1e-6 * 60e3);
}

TEST_CASE("Richard-Abbott law recovered from exact points [RA1975] - tol 1e-5")
{
    const joint_law truth = joint_law::richard_abbott(8e6, 40e3, 2e5, 2.2);
    const law_fit f = fit_richard_abbott_law(sample(truth, 0));
    for (double theta : {1e-3, 1e-2, 4e-2}) CHECK(close(f.law.moment(theta), truth.moment(theta), 1e-6));
    const auto p = f.law.parameters();
    CHECK(close(p[0].second, 8e6, 1e-5));
    CHECK(close(p[1].second, 40e3, 1e-5));
    CHECK(close(p[2].second, 2e5, 1e-5));
    CHECK(close(p[3].second, 2.2, 1e-5));
}

TEST_CASE("power law fit of scattered points against scipy curve_fit [scipy] - tol 1e-5")
{
    const auto pts = sample(joint_law::power(8e6, 60e3, 1.6), 0.03);
    const law_fit f = fit_power_law(pts);
    std::ostringstream py;
    py.precision(17);
    py << "import numpy as np\nfrom scipy.optimize import curve_fit\nt=np.array([";
    for (const auto& p : pts) py << p.rotation << ",";
    py << "])\nm=np.array([";
    for (const auto& p : pts) py << p.moment << ",";
    py << "])\n"
          "f=lambda t,R,Mu,n: R*t/(1+(t*R/Mu)**n)**(1/n)\n"
          "p,_=curve_fit(f,t,m,p0=[9e6,65e3,1.5],xtol=1e-15,ftol=1e-15,maxfev=100000)\n"
          "print(repr(p[0]),repr(p[1]),repr(p[2]),repr(np.sqrt(np.mean((f(t,*p)-m)**2))))\n";
    const auto out = test_data::python_output(py.str());
    if (!out) {
        MESSAGE("scipy not available at /usr/bin/python3: cross-check skipped");
        return;
    }
    std::istringstream in(*out);
    double R = 0, Mu = 0, n = 0, rms = 0;
    in >> R >> Mu >> n >> rms;
    REQUIRE(static_cast<bool>(in));
    const auto p = f.law.parameters();
    CHECK(close(p[0].second, R, 1e-5));
    CHECK(close(p[1].second, Mu, 1e-5));
    CHECK(close(p[2].second, n, 1e-5));
    CHECK(close(f.rms_error, rms, 1e-6));
}

TEST_CASE("a fit with too few points or no moment is refused [project rules]")
{
    CHECK_THROWS_AS(fit_power_law({{1e-3, 1e3}, {2e-3, 2e3}}), std::invalid_argument);
    CHECK_THROWS_AS(fit_richard_abbott_law({{1e-3, 0}, {2e-3, 0}, {3e-3, 0}, {4e-3, 0}, {5e-3, 0}}),
                    std::invalid_argument);
    CHECK_THROWS_AS(fit_power_law({{-1e-3, 1e3}, {2e-3, 2e3}, {3e-3, 3e3}, {4e-3, 4e3}}), std::invalid_argument);
}
