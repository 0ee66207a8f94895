#include "polynomial.hpp"

#include <algorithm>
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

double bisect(const coefficients& c, double a, double b)
{
    double fa = value(c, a);
    for (int i = 0; i < 200 && b - a > 0.0; ++i) {
        const double m = 0.5 * (a + b);
        if (m <= a || m >= b) break;
        const double fm = value(c, m);
        if ((fm <= 0.0) == (fa <= 0.0)) {
            a = m;
            fa = fm;
        } else {
            b = m;
        }
    }
    return 0.5 * (a + b);
}

}  // namespace

std::vector<double> roots_in(const coefficients& c, double a, double b)
{
    std::vector<double> out;
    const int n = degree(c);
    if (n <= 0) return out;
    // Split [a, b] at the stationary points into monotone pieces.
    std::vector<double> cuts{a};
    for (double r : roots_in(derivative(c), a, b))
        if (r > cuts.back()) cuts.push_back(r);
    if (b > cuts.back()) cuts.push_back(b);
    for (std::size_t i = 0; i + 1 < cuts.size(); ++i) {
        const double lo = cuts[i], hi = cuts[i + 1];
        const double flo = value(c, lo), fhi = value(c, hi);
        if (flo == 0.0) {
            if (out.empty() || out.back() != lo) out.push_back(lo);
        } else if ((flo < 0.0) != (fhi < 0.0) && fhi != 0.0) {
            out.push_back(bisect(c, lo, hi));
        }
        if (i + 2 == cuts.size() && fhi == 0.0) out.push_back(hi);
    }
    return out;
}

}  // namespace pinproof::polynomial
