#include "core/polynomial.hpp"

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

void push(root_list& out, double x) { out.v[out.n++] = x; }
double back(const root_list& r) { return r.v[r.n - 1]; }

// The root of c in [a, b], where c is monotone and changes sign (fa = c(a),
// fb = c(b)), to the last few units of the last place: Newton steps from the
// regula falsi estimate, with a bisection step whenever Newton would leave the
// bracket (Press et al., Numerical Recipes, 3rd ed., 2007, 9.4, "rtsafe"). The
// bracket shrinks at every step, so it converges at least as surely as plain
// bisection.
double refine(const coefficients& c, const coefficients& d, double a, double b, double fa, double fb)
{
    const double tol = 4.0 * DBL_EPSILON * std::max(std::abs(a), std::abs(b));
    double x = a - fa * (b - a) / (fb - fa);
    if (!(x > a && x < b)) x = 0.5 * (a + b);
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

// c1 s + c0 = 0.
void linear_roots(const coefficients& c, double a, double b, root_list& out)
{
    const double x = -c[0] / c[1];
    if (x >= a && x <= b) push(out, x);
}

// c2 s^2 + c1 s + c0 = 0 by the form that avoids cancellation
// (Press et al., Numerical Recipes, 3rd ed., 2007, 5.6, Eq. 5.6.4), each root
// then polished by one Newton step where that lowers the residual.
void quadratic_roots(const coefficients& c, double a, double b, root_list& out)
{
    const double disc = c[1] * c[1] - 4.0 * c[2] * c[0];
    if (disc < 0.0) return;
    const double q = -0.5 * (c[1] + std::copysign(std::sqrt(disc), c[1]));
    double r[2] = {q / c[2], q != 0.0 ? c[0] / q : q / c[2]};
    if (r[1] < r[0]) std::swap(r[0], r[1]);
    const int count = r[0] == r[1] ? 1 : 2;
    for (int i = 0; i < count; ++i) {
        double x = r[i];
        const double fx = (c[2] * x + c[1]) * x + c[0];
        const double dx = 2.0 * c[2] * x + c[1];
        if (dx != 0.0) {
            const double polished = x - fx / dx;
            const double fp = (c[2] * polished + c[1]) * polished + c[0];
            if (std::isfinite(polished) && std::abs(fp) < std::abs(fx)) x = polished;
        }
        if (x >= a && x <= b && (out.n == 0 || back(out) != x)) push(out, x);
    }
}

void roots_into(const coefficients& c, double a, double b, root_list& out)
{
    const int n = degree(c);
    if (n <= 0) return;
    if (n == 1) return linear_roots(c, a, b, out);
    if (n == 2) return quadratic_roots(c, a, b, out);
    const coefficients d = derivative(c);
    // Split [a, b] at the stationary points into monotone pieces.
    root_list stationary;
    roots_into(d, a, b, stationary);
    root_list cuts;
    push(cuts, a);
    for (int i = 0; i < stationary.n; ++i)
        if (stationary.v[i] > back(cuts)) push(cuts, stationary.v[i]);
    if (b > back(cuts)) push(cuts, b);
    double flo = value(c, cuts.v[0]);
    for (int i = 0; i + 1 < cuts.n; ++i) {
        const double lo = cuts.v[i], hi = cuts.v[i + 1];
        const double fhi = value(c, hi);
        if (flo == 0.0) {
            if (out.n == 0 || back(out) != lo) push(out, lo);
        } else if ((flo < 0.0) != (fhi < 0.0) && fhi != 0.0) {
            push(out, refine(c, d, lo, hi, flo, fhi));
        }
        if (i + 2 == cuts.n && fhi == 0.0) push(out, hi);
        flo = fhi;
    }
}

}  // namespace

root_list roots_in(const coefficients& c, double a, double b)
{
    root_list r;
    roots_into(c, a, b, r);
    return r;
}

}  // namespace pinproof::polynomial
