// Analyses a beam through the installed library: an IPE 300 of 6 m under
// 20 kN/m with both ends at 0.5 EI/L. Reference pack 5 (Monforton and Wu):
// M = M_F kappa/(kappa + 2) = 60 * 0.5/2.5 = 12.0 kN*m.
#include <cmath>
#include <cstdio>

#include "pinproof/model/beam_model.hpp"
#include "pinproof/model/section.hpp"

int main()
{
    const auto s = pinproof::find_catalogue_section("IPE 300");
    if (!s) return 1;
    const double L = 6.0, EI = 210e9 * s->I;
    pinproof::load w;
    w.kind = pinproof::load_kind::udl;
    w.value = 20e3;
    w.from = 0;
    w.to = L;
    const pinproof::beam_model model(L, EI, {w});
    const auto k = pinproof::stiffness::spring(0.5 * EI / L);
    const double M = model.solve(k, k).moment_start;
    std::printf("end moment %.3f kN*m\n", M / 1e3);
    return std::abs(M - 12.0e3) <= 0.01e3 ? 0 : 1;
}
