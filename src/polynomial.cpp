#include "polynomial.hpp"

#include <algorithm>
#include <cfloat>
#include <cmath>

namespace pinproof::polynomial {

double value(const coefficients& c, double s)
{
    double v = 0.0;
    for (int i = 5; i >= 0; --i) v = v * s + c[i];
    return v;
}

coefficients derivative(const coefficients& c)
{
    coefficients d{};
    for (int i = 1; i < 6; ++i) d[i - 1] = i * c[i];
    return d;
}

namespace {

int degree(const coefficients& c)
{
    double scale = 0.0;
    for (double v : c) scale = std::max(scale, std::abs(v));
    for (int i = 5; i >= 0; --i)
        if (std::abs(c[i]) > 1e-300 && std::abs(c[i]) > scale * 1e-300) return i;
    return -1;
}

// At most 5 real roots for degree <= 5; kept on the stack, as the beam engine
// asks for roots many times per state.
struct root_list {
    std::array<double, 8> v{};
    int n = 0;
    double back() const { return v[n - 1]; }
    void push(double x) { v[n++] = x; }
};

// The root of c in [a, b], where c is monotone and changes sign, to the last
// few units of the last place: Newton steps from the bracketed estimate, with a
// bisection step whenever Newton would leave the bracket (Press et al.,
// Numerical Recipes, 3rd ed., 2007, 9.4, "rtsafe"). The bracket shrinks at every
// step, so it converges at least as surely as plain bisection.
double refine(const coefficients& c, const coefficients& d, double a, double b)
{
    double fa = value(c, a);
    const double tol = 4.0 * DBL_EPSILON * std::max(std::abs(a), std::abs(b));
    double x = 0.5 * (a + b);
    for (int i = 0; i < 200; ++i) {
        const double fx = value(c, x);
        if (fx == 0.0) return x;
        if ((fx <= 0.0) == (fa <= 0.0)) {
            a = x;
            fa = fx;
        } else {
            b = x;
        }
        const double dx = value(d, x);
        double next = dx != 0.0 ? x - fx / dx : a;
        if (!(next > a && next < b)) next = 0.5 * (a + b);
        if (next <= a || next >= b) return 0.5 * (a + b);  // a and b are adjacent numbers
        if (std::abs(next - x) <= tol) return next;
        x = next;
    }
    return x;
}

void roots_into(const coefficients& c, double a, double b, root_list& out)
{
    const int n = degree(c);
    if (n <= 0) return;
    const coefficients d = derivative(c);
    // Split [a, b] at the stationary points into monotone pieces.
    root_list stationary;
    roots_into(d, a, b, stationary);
    root_list cuts;
    cuts.push(a);
    for (int i = 0; i < stationary.n; ++i)
        if (stationary.v[i] > cuts.back()) cuts.push(stationary.v[i]);
    if (b > cuts.back()) cuts.push(b);
    for (int i = 0; i + 1 < cuts.n; ++i) {
        const double lo = cuts.v[i], hi = cuts.v[i + 1];
        const double flo = value(c, lo), fhi = value(c, hi);
        if (flo == 0.0) {
            if (out.n == 0 || out.back() != lo) out.push(lo);
        } else if ((flo < 0.0) != (fhi < 0.0) && fhi != 0.0) {
            out.push(refine(c, d, lo, hi));
        }
        if (i + 2 == cuts.n && fhi == 0.0) out.push(hi);
    }
}

}  // namespace

std::vector<double> roots_in(const coefficients& c, double a, double b)
{
    root_list r;
    roots_into(c, a, b, r);
    return std::vector<double>(r.v.begin(), r.v.begin() + r.n);
}

}  // namespace pinproof::polynomial
