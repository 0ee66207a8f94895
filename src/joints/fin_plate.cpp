#include "pinproof/joints/fin_plate.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>

#include "pinproof/joints/bolt_group.hpp"

namespace pinproof {
namespace {

constexpr double gamma_M0 = 1.0, gamma_M2 = 1.25;
const double sqrt3 = std::sqrt(3.0);

steel_material plate_steel(plate_grade g)
{
    steel_material s;
    switch (g) {
    case plate_grade::s275: s.grade = steel_grade::s275; break;
    case plate_grade::s355: s.grade = steel_grade::s355; break;
    case plate_grade::a36: s.grade = steel_grade::a36; break;
    case plate_grade::a572_50: s.grade = steel_grade::a572_50; break;
    }
    return s;
}

// EN 1993-1-8 4.5.3.2(6) Table 4.1: beta_w 0.85 for S275, 0.9 for S355 (from memory).
double beta_w(plate_grade g) { return g == plate_grade::s355 ? 0.9 : 0.85; }

struct geometry {
    int n = 0;
    double d = 0, d0 = 0, p1 = 0, hp = 0, tp = 0, e1_top = 0, e1_bottom = 0, z = 0, e2 = 0, bolt_line = 0;
    std::optional<double> web_e1;  // top bolt to the edge of a top cope
};

geometry geometry_of(const connection_detail& d, const fin_plate_inputs& in)
{
    geometry g;
    g.n = d.bolts.rows;
    g.d = d.bolts.diameter;
    g.d0 = d.bolts.hole_diameter;
    g.p1 = d.bolts.pitch;
    g.hp = d.plate_depth;
    g.tp = d.plate_thickness;
    g.e1_top = d.bolts.first_bolt;
    g.e1_bottom = g.hp - g.e1_top - (g.n - 1) * g.p1;
    g.bolt_line = d.bolts.bolt_line;
    g.z = d.gap + d.bolts.bolt_line;
    g.e2 = in.plate_edge_distance.value_or(2 * g.d);
    if (d.cope_top) g.web_e1 = d.plate_top + g.e1_top - d.cope_top->depth;
    if (g.n < 2) throw std::invalid_argument("a fin plate joint is derived for two or more bolt rows");
    if (!(g.e1_top > 0.5 * g.d0) || !(g.e1_bottom > 0.5 * g.d0))
        throw std::invalid_argument("a bolt hole lies outside the fin plate");
    if (!(g.e2 > 0.5 * g.d0)) throw std::invalid_argument("the plate edge distance is smaller than the hole's radius");
    if (!(g.bolt_line > 0.5 * g.d0)) throw std::invalid_argument("the bolt line is too close to the beam end");
    return g;
}

// The smallest bearing resistance of any bolt, in either direction.
double bearing_in_plate(const geometry& g, double fub, double fu)
{
    bearing_geometry vertical;  // the bolts push the plate down: the bottom end distance
    vertical.hole = g.d0;
    vertical.e1 = g.e1_bottom;
    vertical.p1 = g.p1;
    vertical.e2 = g.e2;
    bearing_geometry horizontal;  // towards the plate's free edge
    horizontal.hole = g.d0;
    horizontal.e1 = g.e2;
    horizontal.e2 = std::min(g.e1_top, g.e1_bottom);
    horizontal.p2 = g.p1;
    return std::min(en_bolt_bearing_resistance(vertical, g.d, fub, fu, g.tp, gamma_M2),
                    en_bolt_bearing_resistance(horizontal, g.d, fub, fu, g.tp, gamma_M2));
}

double bearing_in_web(const geometry& g, double tw, double fub, double fu)
{
    bearing_geometry vertical;  // the bolts push the web up: only a top cope gives an end
    vertical.hole = g.d0;
    vertical.p1 = g.p1;
    if (g.web_e1) vertical.e1 = *g.web_e1;
    vertical.e2 = g.bolt_line;
    bearing_geometry horizontal;  // towards the beam end
    horizontal.hole = g.d0;
    horizontal.e1 = g.bolt_line;
    horizontal.p2 = g.p1;
    return std::min(en_bolt_bearing_resistance(vertical, g.d, fub, fu, tw, gamma_M2),
                    en_bolt_bearing_resistance(horizontal, g.d, fub, fu, tw, gamma_M2));
}

// The joint's shear resistance is its weakest component's; its moment
// resistance is the bolt group's with its weakest bolt (shear, bearing on the
// plate or on the web), with no shear.
void governing_components(fin_plate_joint& out, const bolt_group& group, double shear, double bearing_plate,
                          double bearing_web)
{
    out.shear_resistance = 1e300;
    for (const joint_component& k : out.components)
        if (k.resistance && *k.resistance < out.shear_resistance) {
            out.shear_resistance = *k.resistance;
            out.governing = k.id;
        }
    const double F_min = std::min({shear, bearing_plate, bearing_web});
    out.moment_resistance = group.moment_resistance(F_min);
    out.moment_governing =
        F_min == shear ? "bolt-shear" : (F_min == bearing_plate ? "bolt-bearing-plate" : "bolt-bearing-web");
}

double web_shear_area(const section& beam, const connection_detail& d)
{
    const double tw = *beam.web_thickness;
    if (d.cope_top || d.cope_bottom) {
        const double left = beam.depth - (d.cope_top ? d.cope_top->depth : 0) - (d.cope_bottom ? d.cope_bottom->depth : 0);
        return tw * left;
    }
    if (beam.area && beam.flange_width && beam.flange_thickness && beam.root_radius) {
        // EN 1993-1-1 6.2.6(3)(a), rolled I section, eta taken as 1 (on the safe side).
        const double tf = *beam.flange_thickness;
        const double Av = *beam.area - 2 * *beam.flange_width * tf + (tw + 2 * *beam.root_radius) * tf;
        return std::max(Av, (beam.depth - 2 * tf) * tw);
    }
    return beam.depth * tw;
}

}  // namespace

fin_plate_joint derive_fin_plate(const connection_detail& d, const section& beam, const fin_plate_inputs& in)
{
    if (d.type != detail_type::fin_plate) throw std::invalid_argument("the detail is not a fin plate");
    if (is_us_grade(in.bolts))
        throw std::invalid_argument("EN 1993-1-8 fin plate components take EN bolt classes (4.6, 8.8, 10.9)");
    if (d.grade == plate_grade::a36 || d.grade == plate_grade::a572_50)
        throw std::invalid_argument("EN 1993-1-8 fin plate components take EN 10025-2 plates (S275, S355)");
    if (!beam.web_thickness) throw std::invalid_argument("the beam's web thickness is needed for bearing on the web");
    const geometry g = geometry_of(d, in);
    const steel_material ps = plate_steel(d.grade);
    const double fy_p = ps.fy(g.tp), fu_p = *ps.fu(g.tp);
    const double tw = *beam.web_thickness;
    const double fy_w = in.beam_steel.fy(tw);
    const auto fu_w_opt = in.beam_steel.fu(tw);
    if (!fu_w_opt) throw std::invalid_argument("the beam steel's tensile strength is needed for bearing on the web");
    const double fu_w = *fu_w_opt;
    const double fub = bolt_fub(in.bolts);

    const bolt_group group(bolt_pattern(g.n, g.p1));
    fin_plate_joint out;
    out.lever_arm = g.z;
    out.plate_edge_distance = g.e2;
    out.plate_edge_distance_default = !in.plate_edge_distance;

    const double Fv = en_bolt_shear_resistance(in.bolts, g.d, in.threads_in_shear_plane, gamma_M2);
    const double Fb_p = bearing_in_plate(g, fub, fu_p);
    const double Fb_w = bearing_in_web(g, tw, fub, fu_w);

    // Stiffness per bolt: shear and bearing on both plies in series (Table 6.11).
    const double k11 = en_k11_bolt_shear(g.d, fub, in.E);
    const double k12_p = en_k12_bolt_bearing(g.d, fu_p, g.tp, std::min(g.e1_bottom, g.e2), g.p1, in.E);
    const double k12_w = en_k12_bolt_bearing(g.d, fu_w, tw, g.bolt_line, g.p1, in.E);
    const double k_bolt = in.E / (1 / k11 + 1 / k12_p + 1 / k12_w);

    auto& c = out.components;
    c.push_back({"bolt-shear", group.shear_resistance(Fv, g.z), Fv, in.E * k11,
                 "EN 1993-1-8 Table 3.4; bolt group with the eccentricity z (simple-joints design guide)"});
    c.push_back({"bolt-bearing-plate", group.shear_resistance(Fb_p, g.z), Fb_p, in.E * k12_p,
                 "EN 1993-1-8 Table 3.4, the smaller of the vertical and horizontal directions"});
    c.push_back({"bolt-bearing-web", group.shear_resistance(Fb_w, g.z), Fb_w, in.E * k12_w,
                 "EN 1993-1-8 Table 3.4, the smaller of the vertical and horizontal directions"});

    const double gross = g.hp * g.tp * fy_p / (1.27 * sqrt3 * gamma_M0);
    const double net = (g.hp - g.n * g.d0) * g.tp * fu_p / (sqrt3 * gamma_M2);
    c.push_back({"plate-shear", std::min(gross, net), std::nullopt, std::nullopt,
                 "EN 1993-1-1 6.2.6 gross (with the guide's 1.27 for bending, from memory) and net"});

    const double A_nt = g.tp * (g.e2 - 0.5 * g.d0);
    const double A_nv = g.tp * (g.hp - g.e1_top - (g.n - 0.5) * g.d0);
    c.push_back({"plate-block-tearing", 0.5 * fu_p * A_nt / gamma_M2 + fy_p * A_nv / (sqrt3 * gamma_M0), std::nullopt,
                 std::nullopt, "EN 1993-1-8 3.10.2(3), eccentric loading"});

    if (g.hp < 2.73 * g.z)
        c.push_back({"plate-bending", g.tp * g.hp * g.hp / 6 * fy_p / (g.z * gamma_M0), std::nullopt, std::nullopt,
                     "elastic bending at the bolt line; h_p < 2.73 z (simple-joints design guide, from memory)"});
    else
        c.push_back({"plate-bending", std::nullopt, std::nullopt, std::nullopt,
                     "not critical: h_p >= 2.73 z (simple-joints design guide, from memory)"});

    if (in.weld_throat) {
        const double fvw = fu_p / (sqrt3 * beta_w(d.grade) * gamma_M2);
        const double per_length = fvw * *in.weld_throat;  // N/m of one weld
        // Two welds of length h_p: V/(2 h_p) down, and V z over their section modulus 2 h_p^2 / 6.
        const double per_unit_V = std::hypot(1 / (2 * g.hp), g.z * 3 / (g.hp * g.hp));
        c.push_back({"weld", per_length / per_unit_V, std::nullopt, std::nullopt,
                     "EN 1993-1-8 4.5.3.3 simplified method; the shear taken at the bolt line"});
    } else {
        c.push_back({"weld", std::nullopt, std::nullopt, std::nullopt, "not derived: no weld size given"});
    }

    c.push_back({"web-shear", web_shear_area(beam, d) * fy_w / (sqrt3 * gamma_M0), std::nullopt, std::nullopt,
                 "EN 1993-1-1 6.2.6"});

    governing_components(out, group, Fv, Fb_p, Fb_w);
    out.initial_stiffness = group.rotational_stiffness(k_bolt);
    out.free_rotation = group.free_rotation(g.d0 - g.d);
    return out;
}

}  // namespace pinproof

namespace pinproof {
namespace {

constexpr double inch = 0.0254;

// J3.10(a)(i) with phi = 0.75: the smaller of the vertical and horizontal
// clear distances of the worst bolt.
double aisc_bearing(double d, double thickness, double Fu, double clear_vertical, double clear_horizontal)
{
    return aisc_bolt_bearing_strength(d, std::min(clear_vertical, clear_horizontal), thickness, Fu);
}

}  // namespace

single_plate_joint derive_single_plate(const connection_detail& d, const section& beam, const single_plate_inputs& in)
{
    if (d.type != detail_type::fin_plate) throw std::invalid_argument("the detail is not a single plate (fin plate)");
    if (!is_us_grade(in.bolts))
        throw std::invalid_argument("AISC 360 single-plate strengths take ASTM bolt grades (A325, A490)");
    if (!beam.web_thickness) throw std::invalid_argument("the beam's web thickness is needed for bearing on the web");
    fin_plate_inputs en_like;
    en_like.plate_edge_distance = in.plate_edge_distance.value_or(1.5 * d.bolts.diameter);
    const geometry g = geometry_of(d, en_like);
    const double Fy_p = in.plate_steel.fy(g.tp);
    const auto Fu_p_opt = in.plate_steel.fu(g.tp);
    const double tw = *beam.web_thickness;
    const double Fy_w = in.beam_steel.fy(tw);
    const auto Fu_w_opt = in.beam_steel.fu(tw);
    if (!Fu_p_opt || !Fu_w_opt) throw std::invalid_argument("the tensile strengths of the plate and the beam are needed");
    const double Fu_p = *Fu_p_opt, Fu_w = *Fu_w_opt;
    const double dh = g.d0;

    const bolt_group group(bolt_pattern(g.n, g.p1));
    single_plate_joint out;
    out.lever_arm = g.z;
    out.plate_edge_distance = g.e2;
    out.plate_edge_distance_default = !in.plate_edge_distance;

    const double rv = aisc_bolt_shear_strength(in.bolts, g.d, in.threads_in_shear_plane);
    // Plate: the bolts bear down towards its bottom edge, or along to its free edge.
    const double rb_p = aisc_bearing(g.d, g.tp, Fu_p, std::min(g.e1_bottom - 0.5 * dh, g.p1 - dh), g.e2 - 0.5 * dh);
    // Web: up towards a top cope (else only the next hole), or along to the beam end.
    double web_vertical = g.p1 - dh;
    if (g.web_e1) web_vertical = std::min(web_vertical, *g.web_e1 - 0.5 * dh);
    const double rb_w = aisc_bearing(g.d, tw, Fu_w, web_vertical, g.bolt_line - 0.5 * dh);

    auto& c = out.components;
    c.push_back({"bolt-shear", group.shear_resistance(rv, g.z), rv, std::nullopt,
                 "AISC 360-16 J3.6, Table J3.2; elastic bolt group with the eccentricity z"});
    c.push_back({"bolt-bearing-plate", group.shear_resistance(rb_p, g.z), rb_p, std::nullopt,
                 "AISC 360-16 J3.10(a)(i), bearing and tear-out"});
    c.push_back({"bolt-bearing-web", group.shear_resistance(rb_w, g.z), rb_w, std::nullopt,
                 "AISC 360-16 J3.10(a)(i), bearing and tear-out"});
    const double Agv = g.hp * g.tp, Anv = (g.hp - g.n * dh) * g.tp;
    c.push_back({"plate-shear", std::min(1.00 * 0.6 * Fy_p * Agv, 0.75 * 0.6 * Fu_p * Anv), std::nullopt,
                 std::nullopt, "AISC 360-16 J4.2, shear yielding and shear rupture"});
    // Block shear: the block below the top bolt, between the bolt line and the free edge.
    const double Agv_b = (g.hp - g.e1_top) * g.tp, Anv_b = (g.hp - g.e1_top - (g.n - 0.5) * dh) * g.tp;
    const double Ant_b = (g.e2 - 0.5 * dh) * g.tp;
    c.push_back({"plate-block-tearing", 0.75 * std::min(0.6 * Fu_p * Anv_b + Fu_p * Ant_b, 0.6 * Fy_p * Agv_b + Fu_p * Ant_b),
                 std::nullopt, std::nullopt, "AISC 360-16 J4.3, U_bs = 1"});
    c.push_back({"plate-bending", 0.90 * Fy_p * g.tp * g.hp * g.hp / 4 / g.z, std::nullopt, std::nullopt,
                 "flexural yielding of the plate at the bolt line, 0.90 F_y Z (from memory)"});
    if (in.weld_leg) {
        const double per_length = 0.75 * 0.6 * in.weld_strength * (*in.weld_leg / std::sqrt(2.0));
        const double per_unit_V = std::hypot(1 / (2 * g.hp), g.z * 3 / (g.hp * g.hp));
        c.push_back({"weld", per_length / per_unit_V, std::nullopt, std::nullopt,
                     "AISC 360-16 J2.4, E70 fillets on both sides; the shear taken at the bolt line"});
    } else {
        c.push_back({"weld", std::nullopt, std::nullopt, std::nullopt, "not derived: no weld size given"});
    }
    c.push_back({"web-shear", 1.00 * 0.6 * Fy_w * beam.depth * tw, std::nullopt, std::nullopt,
                 "AISC 360-16 G2.1, C_v1 = 1"});

    governing_components(out, group, rv, rb_p, rb_w);
    out.free_rotation = group.free_rotation(g.d0 - g.d);
    // No published component stiffness is used for US joints: the initial
    // stiffness stays the user's (0 here means not derived).
    out.initial_stiffness = 0;

    // The conventional configuration (AISC Manual Part 10; reference pack 10.3).
    const double t_max = 0.5 * g.d + inch / 16;
    if (g.n < 2 || g.n > 12) out.limits_exceeded.push_back("the conventional configuration has 2 to 12 bolt rows");
    if (g.z > 3.5 * inch + 1e-9)
        out.limits_exceeded.push_back("the bolt line is more than 3 1/2 in from the weld line (support face)");
    if (g.tp > t_max + 1e-9) out.limits_exceeded.push_back("the plate is thicker than d/2 + 1/16 in");
    if (tw > t_max + 1e-9) out.limits_exceeded.push_back("the beam web is thicker than d/2 + 1/16 in");
    if (in.weld_leg && *in.weld_leg < 0.625 * g.tp - 1e-9)
        out.limits_exceeded.push_back("the fillet welds are smaller than 5/8 of the plate thickness");
    return out;
}

}  // namespace pinproof
