#include "pinproof/joints/end_plate.hpp"

#include <algorithm>
#include <cmath>
#include <map>
#include <stdexcept>

namespace pinproof {
namespace {

constexpr double gamma_M0 = 1.0, gamma_M2 = 1.25;
constexpr double pi = 3.14159265358979323846;
constexpr double mm = 1e-3;
const double sqrt2 = std::sqrt(2.0), sqrt3 = std::sqrt(3.0);

steel_material en_plate_steel(plate_grade g)
{
    steel_material s;
    s.grade = g == plate_grade::s355 ? steel_grade::s355 : steel_grade::s275;
    return s;
}

// EN 1993-1-8 Table 4.1: beta_w 0.85 for S275, 0.9 for S355 (from memory).
double beta_w(plate_grade g) { return g == plate_grade::s355 ? 0.9 : 0.85; }

struct geometry {
    int rows = 0;
    double d = 0, d0 = 0, p = 0, hp = 0, tp = 0, bp = 0, w = 0, tw = 0;
    double e1_top = 0, e1_bottom = 0, e2 = 0;
    double m = 0, e = 0, n = 0;
    // The column flange, where the support is a column flange of a given section.
    bool column = false;
    double mc = 0, ec = 0, nc = 0, tfc = 0, fyc = 0;
    double lever(int r) const { return hp - e1_top - r * p; }  // r from 0 at the top
};

// The T-stub's effective lengths of one row (Table 6.6, with the free-end
// forms of Table 6.4 beside the plate's top and bottom edges).
struct row_lengths {
    double cp = 0, nc = 0;
};

// Row r alone.
row_lengths alone(const geometry& g, int r)
{
    row_lengths l{2 * pi * g.m, 4 * g.m + 1.25 * g.e};
    const auto free_end = [&](double e1) {
        l.cp = std::min(l.cp, pi * g.m + 2 * e1);
        l.nc = std::min(l.nc, 2 * g.m + 0.625 * g.e + e1);
    };
    if (r == 0) free_end(g.e1_top);
    if (r == g.rows - 1) free_end(g.e1_bottom);
    // No yield line is longer than the plate.
    l.cp = std::min(l.cp, g.hp);
    l.nc = std::min(l.nc, g.hp);
    return l;
}

// Row r as part of the group of rows first..last.
row_lengths in_group(const geometry& g, int r, int first, int last)
{
    if (r != first && r != last) return {2 * g.p, g.p};
    row_lengths l{pi * g.m + g.p, 2 * g.m + 0.625 * g.e + 0.5 * g.p};
    const auto free_end = [&](double e1) {
        l.cp = std::min(l.cp, 2 * e1 + g.p);
        l.nc = std::min(l.nc, e1 + 0.5 * g.p);
    };
    if (r == 0 && r == first) free_end(g.e1_top);
    if (r == g.rows - 1 && r == last) free_end(g.e1_bottom);
    return l;
}

// The column flange's rows (Table 6.4, unstiffened column flange, away from
// the column's end): alone 2 pi m and 4 m + 1.25 e; in a group 2 p and p
// (inner) or pi m + p and 2 m + 0.625 e + 0.5 p (end of the group).
row_lengths column_row(const geometry& g, int r, int first, int last)
{
    if (first == last) return {2 * pi * g.mc, 4 * g.mc + 1.25 * g.ec};
    if (r != first && r != last) return {2 * g.p, g.p};
    return {pi * g.mc + g.p, 2 * g.mc + 0.625 * g.ec + 0.5 * g.p};
}

struct stub_result {
    double resistance = 0;
    std::string governing;
    int mode = 0;
};

}  // namespace

std::optional<bolt_assembly> metric_bolt_assembly(double diameter)
{
    struct row {
        double d, head, nut, washer, s;
    };
    // ISO 4014 head k, ISO 4032 nut m, ISO 7089 washer h, nut width across flats s (mm; from memory).
    static constexpr row table[] = {{12, 7.5, 10.8, 2.5, 18}, {16, 10, 14.8, 3, 24},  {20, 12.5, 18, 3, 30},
                                    {22, 14, 19.4, 3, 34},    {24, 15, 21.5, 4, 36}, {27, 17, 23.8, 4, 41},
                                    {30, 18.7, 25.6, 4, 46}};
    for (const row& r : table)
        if (std::abs(diameter / mm - r.d) < 1e-6) return bolt_assembly{r.head * mm, r.nut * mm, r.washer * mm, r.s * mm};
    return std::nullopt;
}

double t_stub_modes::resistance() const { return std::min({mode1, mode2, mode3}); }

int t_stub_modes::governing() const
{
    const double r = resistance();
    return r == mode1 ? 1 : (r == mode2 ? 2 : 3);
}

t_stub_modes t_stub_resistance(const t_stub& s, double gM0)
{
    const double Mpl1 = 0.25 * s.l_eff_1 * s.t * s.t * s.fy / gM0;
    const double Mpl2 = 0.25 * s.l_eff_2 * s.t * s.t * s.fy / gM0;
    t_stub_modes out;
    out.mode3 = s.bolts;
    if (s.prying) {
        out.mode1 = 4 * Mpl1 / s.m;
        out.mode2 = (2 * Mpl2 + s.n * s.bolts) / (s.m + s.n);
    } else {
        out.mode1 = out.mode2 = 2 * Mpl1 / s.m;
    }
    return out;
}

double t_stub_prying_limit(double m, double As, int bolt_rows, double l_eff_1, double t)
{
    return 8.8 * m * m * m * As * bolt_rows / (l_eff_1 * t * t * t);
}


namespace {

geometry geometry_of(const connection_detail& d, const section& beam, const end_plate_inputs& in)
{
    geometry g;
    g.rows = d.bolts.rows;
    g.d = d.bolts.diameter;
    g.d0 = d.bolts.hole_diameter;
    g.p = d.bolts.pitch;
    g.hp = d.plate_depth;
    g.tp = d.plate_thickness;
    g.w = in.gauge.value_or(default_end_plate_gauge());
    g.bp = in.plate_width.value_or(default_end_plate_width(g.w));
    g.tw = *beam.web_thickness;
    g.e1_top = d.bolts.first_bolt;
    g.e1_bottom = g.hp - g.e1_top - (g.rows - 1) * g.p;
    g.e2 = 0.5 * (g.bp - g.w);
    // Fig. 6.2: m from the bolt to the web face less 0.8 of the fillet's leg (a sqrt 2).
    g.m = 0.5 * (g.w - g.tw) - (in.weld_throat ? 0.8 * *in.weld_throat * sqrt2 : 0.0);
    g.e = g.e2;
    g.n = std::min(g.e, 1.25 * g.m);
    if (in.column) {
        // Fig. 6.8: the column flange's m from the bolt to 0.8 of the root radius off its web;
        // n from the smaller of the plate's and the flange's edge distances (e_min).
        const column_flange& c = *in.column;
        g.column = true;
        g.mc = 0.5 * (g.w - c.web_thickness) - 0.8 * c.root_radius;
        g.ec = 0.5 * (c.flange_width - g.w);
        g.tfc = c.flange_thickness;
        g.fyc = c.fy;
        const double e_min = std::min(g.e, g.ec);
        g.n = std::min(e_min, 1.25 * g.m);
        g.nc = std::min(e_min, 1.25 * g.mc);
        if (!(g.ec > 0.5 * g.d0)) throw std::invalid_argument("the column flange is too narrow for the gauge");
        if (!(g.mc > 0.5 * g.d0))
            throw std::invalid_argument("the gauge leaves no room between the bolt holes and the column's web and root");
    }
    if (g.rows < 1) throw std::invalid_argument("an end plate joint needs at least one bolt row");
    if (!(g.e1_top > 0.5 * g.d0) || !(g.e1_bottom > 0.5 * g.d0))
        throw std::invalid_argument("a bolt hole lies outside the end plate");
    if (!(g.e2 > 0.5 * g.d0)) throw std::invalid_argument("the plate's width leaves no room outside the bolt holes");
    if (!(g.m > 0.5 * g.d0))
        throw std::invalid_argument("the gauge leaves no room between the bolt holes and the beam web and its welds");
    return g;
}

// The T-stub of rows first..last (a single row where first == last), with the
// beam web in tension over the same length; the component that limits it.
stub_result stub_of(const geometry& g, int first, int last, double Ft, double As, double Lb, double fy_p, double fy_w)
{
    double cp = 0, nc = 0;
    for (int r = first; r <= last; ++r) {
        const row_lengths l = first == last ? alone(g, r) : in_group(g, r, first, last);
        cp += l.cp;
        nc += l.nc;
    }
    t_stub s;
    s.l_eff_1 = std::min(cp, nc);
    s.l_eff_2 = nc;
    s.m = g.m;
    s.n = g.n;
    s.t = g.tp;
    s.fy = fy_p;
    const int nrows = last - first + 1;
    s.bolts = 2 * nrows * Ft;
    s.prying = Lb <= t_stub_prying_limit(g.m, As, nrows, s.l_eff_1, g.tp);
    const t_stub_modes modes = t_stub_resistance(s, gamma_M0);
    const double web = s.l_eff_1 * g.tw * fy_w / gamma_M0;  // 6.2.6.8
    stub_result out;
    out.resistance = modes.resistance();
    out.mode = modes.governing();
    out.governing = out.mode == 3 ? "bolt-tension" : "end-plate-t-stub";
    if (g.column) {
        // 6.2.6.4: the column flange in bending, its own T-stub over the same rows.
        double ccp = 0, cnc = 0;
        for (int r = first; r <= last; ++r) {
            const row_lengths l = column_row(g, r, first, last);
            ccp += l.cp;
            cnc += l.nc;
        }
        t_stub c = s;
        c.l_eff_1 = std::min(ccp, cnc);
        c.l_eff_2 = cnc;
        c.m = g.mc;
        c.n = g.nc;
        c.t = g.tfc;
        c.fy = g.fyc;
        c.prying = Lb <= t_stub_prying_limit(g.mc, As, nrows, c.l_eff_1, g.tfc);
        const t_stub_modes cm = t_stub_resistance(c, gamma_M0);
        if (cm.resistance() < out.resistance) {
            out.resistance = cm.resistance();
            out.mode = cm.governing();
            out.governing = out.mode == 3 ? "bolt-tension" : "column-flange-t-stub";
        }
    }
    if (web < out.resistance) {
        out.resistance = web;
        out.governing = "web-tension";
        out.mode = 0;
    }
    return out;
}

// 6.2.7.2(6)-(9): the rows from the top down, each alone and in every group
// with the rows above it.
std::vector<tension_row> tension_rows(const geometry& g, double Ft, double As, double Lb, double fy_p, double fy_w)
{
    std::vector<tension_row> rows;
    for (int r = 0; r < g.rows; ++r) {
        tension_row row;
        row.lever_arm = g.lever(r);
        const stub_result own = stub_of(g, r, r, Ft, As, Lb, fy_p, fy_w);
        row.resistance = own.resistance;
        row.governing = own.governing;
        row.mode = own.mode;
        for (int j = 0; j < r; ++j) {
            const stub_result group = stub_of(g, j, r, Ft, As, Lb, fy_p, fy_w);
            double taken = 0;
            for (int i = j; i < r; ++i) taken += rows[static_cast<std::size_t>(i)].resistance;
            const double left = std::max(0.0, group.resistance - taken);
            if (left < row.resistance) {
                row.resistance = left;
                row.governing = group.governing;
                row.mode = group.mode;
                row.as_group = true;
            }
        }
        for (int x = 0; x < r; ++x) {
            const tension_row& above = rows[static_cast<std::size_t>(x)];
            if (above.resistance > 1.9 * Ft) {
                const double cap = above.resistance * row.lever_arm / above.lever_arm;
                if (cap < row.resistance) {
                    row.resistance = cap;
                    row.triangular = true;
                }
            }
        }
        rows.push_back(row);
    }
    return rows;
}

// Table 6.11 and 6.3.3.1: k_5 and k_10 per row, the rows in one equivalent spring.
void stiffness_of(const geometry& g, double As, double Lb, double E, end_plate_joint& out)
{
    double sum_kh = 0, sum_kh2 = 0;
    for (int r = 0; r < g.rows; ++r) {
        const row_lengths a = alone(g, r);
        double l_eff = std::min(a.cp, a.nc);
        if (g.rows > 1) {
            const row_lengths b = in_group(g, r, 0, g.rows - 1);
            l_eff = std::min({l_eff, b.cp, b.nc});
        }
        tension_row& row = out.rows[static_cast<std::size_t>(r)];
        row.k5 = 0.9 * l_eff * std::pow(g.tp, 3) / std::pow(g.m, 3);
        row.k10 = 1.6 * As / Lb;
        double flexibility = 1 / row.k5 + 1 / row.k10;
        if (g.column) {
            const row_lengths ca = column_row(g, r, r, r);
            double lc = std::min(ca.cp, ca.nc);
            if (g.rows > 1) {
                const row_lengths cb = column_row(g, r, 0, g.rows - 1);
                lc = std::min({lc, cb.cp, cb.nc});
            }
            row.k4 = 0.9 * lc * std::pow(g.tfc, 3) / std::pow(g.mc, 3);
            flexibility += 1 / row.k4;
        }
        const double k_eff = 1 / flexibility;
        sum_kh += k_eff * row.lever_arm;
        sum_kh2 += k_eff * row.lever_arm * row.lever_arm;
    }
    out.z_eq = sum_kh2 / sum_kh;
    out.k_eq = sum_kh / out.z_eq;
    out.initial_stiffness = E * out.z_eq * out.z_eq * out.k_eq;
}

void shear_components(const connection_detail& d, const geometry& g, const end_plate_inputs& in, double fy_p,
                      double fu_p, double fy_w, end_plate_joint& out)
{
    auto& c = out.components;
    const double nb = 2.0 * g.rows;
    const double fub = bolt_fub(in.bolts);
    const double Fv = en_bolt_shear_resistance(in.bolts, g.d, in.threads_in_shear_plane, gamma_M2);
    c.push_back({"bolt-shear", 0.8 * nb * Fv, Fv, std::nullopt,
                 "EN 1993-1-8 Table 3.4; 0.8 of the bolts' shear for the tension the rotation puts in them "
                 "(simple-joint design guide, from memory)"});
    bearing_geometry plate;  // the bolts bear upward on the plate
    plate.hole = g.d0;
    plate.e1 = g.e1_top;
    if (g.rows > 1) plate.p1 = g.p;
    plate.e2 = g.e2;
    plate.p2 = g.w;
    const double Fb_p = en_bolt_bearing_resistance(plate, g.d, fub, fu_p, g.tp, gamma_M2);
    c.push_back({"bolt-bearing-plate", nb * Fb_p, Fb_p, std::nullopt,
                 "EN 1993-1-8 Table 3.4, upward on the plate: top end distance, pitch, edge distance and gauge"});
    if (d.support_beam) {
        steel_material s;
        s.grade = steel_grade::s275;
        const double t = d.support_beam->web_thickness;
        bearing_geometry web;  // inner bolts in a continuous web
        web.hole = g.d0;
        web.p1 = g.rows > 1 ? g.p : 3 * g.d0;  // one row: no pitch limits alpha_d below 1 (3 d_0 + ...)
        web.p2 = g.w;
        const double Fb_s = en_bolt_bearing_resistance(web, g.d, fub, *s.fu(t), t, gamma_M2);
        c.push_back({"bolt-bearing-support", nb * Fb_s, Fb_s, std::nullopt,
                     "EN 1993-1-8 Table 3.4 in the supporting beam's web (S275 taken), inner bolts"});
    }
    const double gross = 2 * g.hp * g.tp * fy_p / (1.27 * sqrt3 * gamma_M0);
    const double net = 2 * (g.hp - g.rows * g.d0) * g.tp * fu_p / (sqrt3 * gamma_M2);
    c.push_back({"plate-shear", std::min(gross, net), std::nullopt, std::nullopt,
                 "EN 1993-1-1 6.2.6, two planes, gross (with the guide's 1.27, from memory) and net"});
    const double A_nt = g.tp * (g.e2 - 0.5 * g.d0);
    const double A_nv = g.tp * (g.e1_top + (g.rows - 1) * g.p - (g.rows - 0.5) * g.d0);
    c.push_back({"plate-block-tearing", 2 * (fu_p * A_nt / gamma_M2 + fy_p * A_nv / (sqrt3 * gamma_M0)), std::nullopt,
                 std::nullopt, "EN 1993-1-8 3.10.2(2), two blocks outside the bolt lines, concentric"});
    if (in.weld_throat) {
        const double a = *in.weld_throat;
        const double fvw = fu_p / (sqrt3 * beta_w(d.grade) * gamma_M2);
        c.push_back({"weld", 2 * std::max(0.0, g.hp - 2 * a) * a * fvw, std::nullopt, std::nullopt,
                     "EN 1993-1-8 4.5.3.3 simplified method, two fillets on the web, length h_p - 2 a (4.5.2(1))"});
    } else {
        c.push_back({"weld", std::nullopt, std::nullopt, std::nullopt, "not derived: no weld size given"});
    }
    c.push_back({"web-shear", g.hp * g.tw * fy_w / (sqrt3 * gamma_M0), std::nullopt, std::nullopt,
                 "EN 1993-1-1 6.2.6, the beam web over the plate's depth"});
}

// The components that resist the moment: resistance null (they do not carry
// the end shear); the top row's stiffness and the bolts' tension resistance.
void tension_components(const end_plate_joint& j, double Ft, double E, end_plate_joint& out)
{
    const tension_row& top = j.rows.front();
    auto& c = out.components;
    c.push_back({"end-plate-t-stub", std::nullopt, std::nullopt, E * top.k5,
                 "EN 1993-1-8 6.2.6.5, Table 6.2 modes 1 and 2, Table 6.6; resists the moment (tension rows), not "
                 "the shear; stiffness k_5 of the top row (Table 6.11)"});
    c.push_back({"bolt-tension", std::nullopt, Ft, E * top.k10,
                 "EN 1993-1-8 Table 3.4, F_t,Rd = 0.9 f_ub A_s / gamma_M2 (not above punching B_p,Rd), Table 6.2 "
                 "mode 3; resists the moment; stiffness k_10 of a row of two bolts (Table 6.11)"});
    c.push_back({"web-tension", std::nullopt, std::nullopt, std::nullopt,
                 "EN 1993-1-8 6.2.6.8, the beam web in tension over the T-stub's effective length; resists the "
                 "moment"});
    if (top.k4 > 0)
        c.push_back({"column-flange-t-stub", std::nullopt, std::nullopt, E * top.k4,
                     "EN 1993-1-8 6.2.6.4, Table 6.2, Table 6.4; the column flange in bending; resists the moment; "
                     "stiffness k_4 of the top row (Table 6.11)"});
}

}  // namespace

end_plate_joint derive_end_plate(const connection_detail& d, const section& beam, const end_plate_inputs& in)
{
    if (d.type != detail_type::end_plate) throw std::invalid_argument("the detail is not an end plate");
    if (is_us_grade(in.bolts))
        throw std::invalid_argument("EN 1993-1-8 end plate components take EN bolt classes (4.6, 8.8, 10.9)");
    if (d.grade == plate_grade::a36 || d.grade == plate_grade::a572_50)
        throw std::invalid_argument("EN 1993-1-8 end plate components take EN 10025-2 plates (S275, S355)");
    if (!beam.web_thickness) throw std::invalid_argument("the beam's web thickness is needed for the end plate");
    const auto As_opt = metric_stress_area(d.bolts.diameter);
    const auto assembly = metric_bolt_assembly(d.bolts.diameter);
    if (!As_opt || !assembly) throw std::invalid_argument("no stress area or head and nut sizes for this bolt diameter");
    const geometry g = geometry_of(d, beam, in);
    const steel_material ps = en_plate_steel(d.grade);
    const double fy_p = ps.fy(g.tp), fu_p = *ps.fu(g.tp);
    const double fy_w = in.beam_steel.fy(g.tw);
    const double As = *As_opt, fub = bolt_fub(in.bolts);

    end_plate_joint out;
    out.m = g.m;
    out.e = g.e;
    out.n = g.n;
    out.gauge = g.w;
    out.plate_width = g.bp;
    out.gauge_default = !in.gauge;
    out.width_default = !in.plate_width;
    out.ply_default = !in.support_ply && !in.column;
    const double ply = in.column ? in.column->flange_thickness : in.support_ply.value_or(g.tp);
    out.bolt_length = g.tp + ply + 2 * assembly->washer + 0.5 * (assembly->head + assembly->nut);

    // Table 3.4: tension, and punching through the plate under the nut or head
    // (d_m the mean of the across-flats and across-corners widths, s and 2 s / sqrt 3).
    const double Ft_bolt = 0.9 * fub * As / gamma_M2;
    const double dm = 0.5 * (assembly->across_flats + 2 * assembly->across_flats / sqrt3);
    const double Bp = 0.6 * pi * dm * g.tp * fu_p / gamma_M2;
    const double Ft = std::min(Ft_bolt, Bp);

    out.rows = tension_rows(g, Ft, As, out.bolt_length, fy_p, fy_w);
    stiffness_of(g, As, out.bolt_length, in.E, out);
    shear_components(d, g, in, fy_p, fu_p, fy_w, out);
    tension_components(out, Ft, in.E, out);

    out.shear_resistance = 1e300;
    for (const joint_component& k : out.components)
        if (k.resistance && *k.resistance < out.shear_resistance) {
            out.shear_resistance = *k.resistance;
            out.governing = k.id;
        }
    // The component that limits the most moment names the moment's governor.
    std::map<std::string, double> moment_of;
    for (const tension_row& r : out.rows) {
        out.moment_resistance += r.lever_arm * r.resistance;
        moment_of[r.governing] += r.lever_arm * r.resistance;
    }
    double most = -1;
    for (const auto& [id, m] : moment_of)
        if (m > most) {
            most = m;
            out.moment_governing = id;
        }
    // 6.4.2(2): the plate or the column flange, whichever governs in bending.
    const bool column_governs = out.moment_governing == "column-flange-t-stub";
    out.bending_part = column_governs ? "column flange" : "end plate";
    out.bending_thickness = column_governs ? g.tfc : g.tp;
    out.thickness_limit = 0.36 * g.d * std::sqrt(fub / (column_governs ? g.fyc : fy_p));
    out.rotation_capacity_adequate = (out.moment_governing == "end-plate-t-stub" || column_governs) &&
                                     out.bending_thickness <= out.thickness_limit;
    return out;
}

}  // namespace pinproof
