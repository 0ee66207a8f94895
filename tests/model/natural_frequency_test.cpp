// First natural frequency of a beam with end springs, against the classical
// eigenvalues and an independent solve of the frequency equation.
//
// Sources:
//   [Blevins]  Blevins, Formulas for Natural Frequency and Mode Shape (1979), Table 8-1:
//              f_1 = lambda^2/(2 pi L^2) sqrt(EI/m) with lambda = pi (pinned-pinned),
//              4.73004074 (fixed-fixed), 3.92660231 (fixed-pinned); lambda^2 = 9.8696, 22.373,
//              15.418 in the reference pack 11.4 (values to 9 figures from memory; the
//              frequency equations cos(l) cosh(l) = 1 and tan(l) = tanh(l) solved in the test).
//              Clamped-free (cantilever): lambda = 1.87510407, lambda^2 = 3.5160 (pack 11.4),
//              the root of cos(l) cosh(l) = -1 solved in the test.
//   [scipy]    python3-scipy brentq on the determinant of the four boundary conditions of
//              W = A cos + B sin + C cosh + D sinh with springs EI W'' = +-k W' at the ends,
//              written out in the test.
//   [scipy, cantilever] the same for a cantilever: root W = 0, W'' = kappa W'; free tip
//              W'' = W''' = 0.
//   [static]   a point mass M on a massless pinned beam: omega^2 = 48 EI/(M L^3) (the beam's
//              central stiffness 48 EI/L^3, Roark Table 8.1 from memory; pack 6).
//   [pack]     reference pack 11.4 [D]: f = 18/sqrt(delta mm) within about 1.5 % for a UDL beam
//              at every end fixity.
#include <doctest/doctest.h>

#include <cmath>
#include <cstdio>
#include <sstream>

#include "pinproof/model/beam_model.hpp"
#include "pinproof/model/natural_frequency.hpp"
#include "python_output.hpp"

using namespace pinproof;

namespace {
constexpr double L = 7.5, EI = 210e9 * 16266e-8, w = 4.0e3;  // IPE 360, 4 kN/m of mass load
const double m = w / standard_gravity;

load udl(double q, double from = 0, double to = L)
{
    load l;
    l.kind = load_kind::udl;
    l.value = q;
    l.from = from;
    l.to = to;
    return l;
}

double classical(double lambda) { return lambda * lambda / (2 * M_PI * L * L) * std::sqrt(EI / m); }

// Roots of the frequency equations by bisection (the test's own, independent of the library).
double root(double (*f)(double), double lo, double hi)
{
    for (int i = 0; i < 200; ++i) {
        const double mid = 0.5 * (lo + hi);
        ((f(lo) < 0) == (f(mid) < 0) ? lo : hi) = mid;
    }
    return 0.5 * (lo + hi);
}
}  // namespace

TEST_CASE("pinned-pinned UDL [Blevins]: f = (pi/2) sqrt(EI/m)/L^2 - tol 1e-7")
{
    const double f = first_natural_frequency(L, EI, {udl(w)}, stiffness::pinned(), stiffness::pinned());
    CHECK(std::abs(f / classical(M_PI) - 1) <= 1e-7);
}

TEST_CASE("fixed-fixed UDL [Blevins]: lambda = 4.73004074 (cos l cosh l = 1) - tol 1e-7")
{
    const double lambda = root([](double l) { return std::cos(l) * std::cosh(l) - 1; }, 4.5, 5.0);
    CHECK(std::abs(lambda - 4.73004074) <= 1e-8);
    const double f = first_natural_frequency(L, EI, {udl(w)}, stiffness::rigid(), stiffness::rigid());
    CHECK(std::abs(f / classical(lambda) - 1) <= 1e-7);
    CHECK(std::abs(lambda * lambda - 22.373) <= 5e-4);  // pack 11.4, 5 figures
}

TEST_CASE("fixed-pinned UDL [Blevins]: lambda = 3.92660231 (tan l = tanh l) - tol 1e-7")
{
    const double lambda = root([](double l) { return std::tan(l) - std::tanh(l); }, 3.5, 4.2);
    CHECK(std::abs(lambda - 3.92660231) <= 1e-8);
    const double f = first_natural_frequency(L, EI, {udl(w)}, stiffness::rigid(), stiffness::pinned());
    CHECK(std::abs(f / classical(lambda) - 1) <= 1e-7);
    const double g = first_natural_frequency(L, EI, {udl(w)}, stiffness::pinned(), stiffness::rigid());
    CHECK(std::abs(g / f - 1) <= 1e-9);  // the same beam turned round (eigensolver round-off)
}

TEST_CASE("end springs against scipy brentq on the frequency determinant [scipy] - tol 1e-6")
{
    const double kappas[][2] = {{0.5, 0.5}, {2, 2}, {8, 0.1}, {0.3, 25}, {1, 0}, {100, 100}};
    std::ostringstream py;
    py.precision(17);
    py << "import numpy as np\nfrom scipy.optimize import brentq\n"
          "def det(l,a,b):\n"
          "  c,s,ch,sh=np.cos(l),np.sin(l),np.cosh(l),np.sinh(l)\n"
          "  A=np.array([[1,0,1,0],[-l*l,-a*l,l*l,-a*l],[c,s,ch,sh],"
          "[-l*l*c+b*(-l*s),-l*l*s+b*(l*c),l*l*ch+b*(l*sh),l*l*sh+b*(l*ch)]])\n"
          "  return np.linalg.det(A)\n"
          "for (a,b) in [";
    for (const auto& k : kappas) py << "(" << k[0] << "," << k[1] << "),";
    py << "]:\n"
          "  print(repr(brentq(lambda l: det(l,a,b), np.pi-1e-9 if a+b>0 else np.pi-0.1, 4.7301, xtol=1e-15)))\n";
    const auto out = test_data::python_output(py.str());
    if (!out) {
        MESSAGE("scipy not available at /usr/bin/python3: cross-check skipped");
        return;
    }
    std::istringstream in(*out);
    const double EIL = EI / L;
    for (const auto& k : kappas) {
        double lambda = 0;
        in >> lambda;
        REQUIRE(static_cast<bool>(in));
        const double f =
            first_natural_frequency(L, EI, {udl(w)}, stiffness::spring(k[0] * EIL), stiffness::spring(k[1] * EIL));
        CHECK(std::abs(f / classical(lambda) - 1) <= 1e-6);
    }
}

TEST_CASE("a point mass on a massless pinned beam [static]: omega^2 = 48 EI/(M L^3) - tol 1e-9")
{
    load p;
    p.kind = load_kind::point;
    p.value = 20e3;  // N: a mass of 20e3/g kg
    p.from = L / 2;
    const double f = first_natural_frequency(L, EI, {p}, stiffness::pinned(), stiffness::pinned());
    const double M = 20e3 / standard_gravity;
    CHECK(std::abs(f / (std::sqrt(48 * EI / (M * L * L * L)) / (2 * M_PI)) - 1) <= 1e-9);
}

TEST_CASE("the 18/sqrt(delta) estimate within 1.5 % of the first frequency at every fixity [pack]")
{
    const double EIL = EI / L;
    for (stiffness s : {stiffness::pinned(), stiffness::spring(0.5 * EIL), stiffness::spring(2 * EIL),
                        stiffness::spring(8 * EIL), stiffness::rigid()}) {
        const beam_model model(L, EI, {udl(w)});
        const double delta = model.solve(s, s).max_deflection;
        const double f = first_natural_frequency(L, EI, {udl(w)}, s, s);
        CHECK(std::abs(frequency_from_deflection(delta) / f - 1) <= 0.015);
    }
}

TEST_CASE("a partial load adds its mass where it lies: a stiffer end rises the frequency [project rules]")
{
    const double full = first_natural_frequency(L, EI, {udl(w)}, stiffness::pinned(), stiffness::pinned());
    const double with_partial =
        first_natural_frequency(L, EI, {udl(w), udl(w, 0, L / 3)}, stiffness::pinned(), stiffness::pinned());
    CHECK(with_partial < full);
    CHECK(first_natural_frequency(L, EI, {udl(w)}, stiffness::spring(EI / L), stiffness::pinned()) > full);
    CHECK_THROWS_AS(first_natural_frequency(L, EI, {udl(-w)}, stiffness::pinned(), stiffness::pinned()),
                    std::invalid_argument);
    CHECK_THROWS_AS(first_natural_frequency(L, EI, {}, stiffness::pinned(), stiffness::pinned()), std::invalid_argument);
}

TEST_CASE("cantilever - rigid root - UDL [Blevins]: lambda = 1.87510407 (cos l cosh l = -1) - f = 3.516/(2 pi) sqrt(EI/m)/L^2 - tol 1e-7")
{
    const double lambda = root([](double l) { return std::cos(l) * std::cosh(l) + 1; }, 1.5, 2.2);
    CHECK(std::abs(lambda - 1.87510407) <= 1e-8);
    CHECK(std::abs(lambda * lambda - 3.5160) <= 5e-4);  // pack 11.4, 5 figures
    const double f = first_natural_frequency(L, EI, {udl(w)}, stiffness::rigid(), stiffness::pinned(),
                                             beam_layout::cantilever);
    CHECK(std::abs(f / classical(lambda) - 1) <= 1e-7);
}

TEST_CASE("cantilever - spring root: below the rigid root - tends to it as S grows - a pinned root is refused")
{
    // Adding stiffness never lowers an eigenvalue (Rayleigh quotient; common practice, no source).
    const auto f = [](stiffness s) {
        return first_natural_frequency(L, EI, {udl(w)}, s, stiffness::pinned(), beam_layout::cantilever);
    };
    const double rigid = f(stiffness::rigid());
    double previous = 0;
    for (double kappa : {0.5, 2.0, 8.0, 40.0}) {
        const double v = f(stiffness::spring(kappa * EI / L));
        CHECK(v > previous);
        CHECK(v < rigid);
        previous = v;
    }
    CHECK(std::abs(f(stiffness::spring(1e9 * EI / L)) / rigid - 1) <= 1e-6);
    CHECK_THROWS_AS(f(stiffness::pinned()), std::invalid_argument);
}

TEST_CASE("cantilever - spring root against scipy brentq on the frequency determinant [scipy] - tol 1e-6")
{
    // W = A cos + B sin + C cosh + D sinh in x/L; root: W = 0 and W'' = kappa W' (the spring,
    // as in the end-spring case above); free tip: W'' = 0 and W''' = 0. The first sign change
    // of the determinant above 0.02 is bracketed on a grid, then solved with brentq.
    const double kappas[] = {0.5, 2, 8, 40};
    std::ostringstream py;
    py.precision(17);
    py << "import numpy as np\nfrom scipy.optimize import brentq\n"
          "def det(l,a):\n"
          "  c,s,ch,sh=np.cos(l),np.sin(l),np.cosh(l),np.sinh(l)\n"
          "  A=np.array([[1,0,1,0],[-l*l,-a*l,l*l,-a*l],[-c,-s,ch,sh],[s,-c,sh,ch]])\n"
          "  return np.linalg.det(A)\n"
          "for a in [";
    for (double k : kappas) py << k << ",";
    py << "]:\n"
          "  g=np.arange(0.02,1.9,0.005); v=[det(x,a) for x in g]\n"
          "  i=next(i for i in range(len(g)-1) if v[i]*v[i+1]<0)\n"
          "  print(repr(brentq(lambda l: det(l,a), g[i], g[i+1], xtol=1e-15)))\n";
    const auto out = test_data::python_output(py.str());
    if (!out) {
        MESSAGE("scipy not available at /usr/bin/python3: cross-check skipped");
        return;
    }
    std::istringstream in(*out);
    for (double k : kappas) {
        double lambda = 0;
        in >> lambda;
        REQUIRE(static_cast<bool>(in));
        CAPTURE(k);
        const double f = first_natural_frequency(L, EI, {udl(w)}, stiffness::spring(k * EI / L), stiffness::pinned(),
                                                 beam_layout::cantilever);
        CHECK(std::abs(f / classical(lambda) - 1) <= 1e-6);
    }
}

// [scipy, overhang] a beam on supports at 0 and L, continuous over the end support to a free
// tip at L + a: W1 on the back span and W2 on the overhang (its own origin at the end support),
// each A cos + B sin + C cosh + D sinh in x/L; start W1 = 0 and W1'' = kappa W1' (W1' = 0 for a
// rigid start); W1(L) = W2(0) = 0, slope and moment continuous over the support; free tip
// W2'' = W2''' = 0. The first sign change of the 8 x 8 determinant above 0.02 is bracketed on a
// grid and solved with brentq; f = lambda^2/(2 pi L^2) sqrt(EI/m), L the back span.
TEST_CASE("overhang - pinned - spring and rigid start against scipy brentq on the frequency determinant [scipy] - tol 1e-6")
{
    const double a = 2.5;  // the overhang; the back span is L
    const double kappas[] = {0.0, 2.0, 40.0, -1.0};  // -1: rigid
    std::ostringstream py;
    py.precision(17);
    py << "import numpy as np\nfrom scipy.optimize import brentq\n"
          "r=" << a / L << "\n"
          "def det(l,k):\n"
          "  c,s,ch,sh=np.cos(l),np.sin(l),np.cosh(l),np.sinh(l)\n"
          "  cr,sr,chr,shr=np.cos(l*r),np.sin(l*r),np.cosh(l*r),np.sinh(l*r)\n"
          "  st=[0,1,0,1] if k<0 else [-l*l,-k*l,l*l,-k*l]\n"
          "  A=np.array([[1,0,1,0,0,0,0,0],st+[0,0,0,0],[c,s,ch,sh,0,0,0,0],[0,0,0,0,1,0,1,0],\n"
          "    [-s,c,sh,ch,0,-1,0,-1],[-c,-s,ch,sh,1,0,-1,0],[0,0,0,0,-cr,-sr,chr,shr],[0,0,0,0,sr,-cr,shr,chr]])\n"
          "  return np.linalg.det(A)\n"
          "for k in [";
    for (double k : kappas) py << k << ",";
    py << "]:\n"
          "  g=np.arange(0.02,6.0,0.002); v=[det(x,k) for x in g]\n"
          "  i=next(i for i in range(len(g)-1) if v[i]*v[i+1]<0)\n"
          "  print(repr(brentq(lambda l: det(l,k), g[i], g[i+1], xtol=1e-15)))\n";
    const auto out = test_data::python_output(py.str());
    if (!out) {
        MESSAGE("scipy not available at /usr/bin/python3: cross-check skipped");
        return;
    }
    std::istringstream in(*out);
    double previous = 0;
    for (double k : kappas) {
        double lambda = 0;
        in >> lambda;
        REQUIRE(static_cast<bool>(in));
        CAPTURE(k);
        const stiffness start = k < 0 ? stiffness::rigid() : stiffness::spring(k * EI / L);
        const double f = first_natural_frequency(L, EI, {udl(w, 0, L + a)}, start, stiffness::pinned(),
                                                 beam_layout::overhang, a);
        CHECK(std::abs(f / classical(lambda) - 1) <= 1e-6);
        CHECK(f > previous);  // a stiffer start never lowers it
        previous = f;
    }
    CHECK_THROWS_AS(first_natural_frequency(L, EI, {udl(w)}, stiffness::pinned(), stiffness::pinned(),
                                            beam_layout::overhang, 0.0),
                    std::invalid_argument);
}
