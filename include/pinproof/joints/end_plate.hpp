// A flexible (partial-depth) end plate worked out from its detail under
// EN 1993-1-8:2005: its resistance to the beam's end shear, the moment its
// bolt rows carry in tension about the plate's bottom edge, and its initial
// rotational stiffness by the component method.
//
// The plate is welded to the beam web only, bolted to the support by `rows`
// rows of two bolts at gauge w (one each side of the web). Under a sagging end
// rotation its bottom edge bears on the support (the centre of compression) and
// every bolt row above it is in tension at its lever arm h_r from that edge.
//
// Bolt rows in tension (6.2.4, 6.2.6.5, 6.2.7.2; gamma_M0 = 1.0, gamma_M2 = 1.25):
//   bolt in tension     F_t,Rd = k_2 f_ub A_s / gamma_M2, k_2 = 0.9 (Table 3.4), and not more
//                       than the punching shear B_p,Rd = 0.6 pi d_m t_p f_u / gamma_M2 (Table 3.4)
//   equivalent T-stub   Table 6.2, with prying (L_b <= L_b*):
//                         mode 1  F_T,1,Rd = 4 M_pl,1,Rd / m        (method 1)
//                         mode 2  F_T,2,Rd = (2 M_pl,2,Rd + n sum F_t,Rd) / (m + n)
//                         mode 3  F_T,3,Rd = sum F_t,Rd
//                       without prying (L_b > L_b* = 8.8 m^3 A_s n_b / (sum l_eff,1 t_p^3)):
//                         modes 1-2  F_T,1-2,Rd = 2 M_pl,1,Rd / m
//                       M_pl,i,Rd = 0.25 sum l_eff,i t_p^2 f_y / gamma_M0; l_eff,1 = min(l_eff,cp,
//                       l_eff,nc), l_eff,2 = l_eff,nc; m = (w - t_w)/2 - 0.8 a sqrt 2 (Fig. 6.2),
//                       e = (b_p - w)/2, n = min(e, 1.25 m)
//   effective lengths   Table 6.6, end plate: a row inside the plate 2 pi m and 4 m + 1.25 e
//                       alone; as part of a group 2 p and p (inner) or pi m + p and
//                       2 m + 0.625 e + 0.5 p (end of the group). A row next to the plate's top
//                       or bottom edge (end distance e_1) takes the free-end forms of Table 6.4
//                       (min(2 pi m, pi m + 2 e_1), min(4 m + 1.25 e, 2 m + 0.625 e + e_1); in a
//                       group min(pi m + p, 2 e_1 + p), min(2 m + 0.625 e + 0.5 p, e_1 + 0.5 p)):
//                       Table 6.6 has no row beside a free plate end, and a partial-depth plate
//                       has one above its top row (our reading, stated in the method page)
//   beam web in tension 6.2.6.8: F_t,wb,Rd = b_eff t_w f_y,w / gamma_M0, b_eff = l_eff,1 of the
//                       same T-stub (row alone or group)
//   column flange       6.2.6.4: its own T-stub (Table 6.4, away from the column's end) where
//                       the support is a column flange of a given section
//   rows in turn        6.2.7.2(6)-(8): row r takes the least of its own resistance and, for each
//                       group of rows j..r, the group's resistance less what rows j..r-1 took;
//                       6.2.7.2(9): where an earlier row x took more than 1.9 F_t,Rd, row r
//                       takes no more than F_tx,Rd h_r / h_x
//   moment resistance   M_j,Rd = sum h_r F_tr,Rd (6.2.7.2(1))
// Stiffness (6.3; Table 6.11, reference pack 2.3, coefficients from memory):
//   k_5  = 0.9 l_eff t_p^3 / m^3, l_eff the smallest of the row's effective lengths (alone or
//          in the group of all rows)
//   k_10 = 1.6 A_s / L_b, L_b = the grip (plate and support ply) + two washers + half the
//          head and nut heights
//   rows: k_eff,r = 1 / (1/k_5,r + 1/k_10,r); z_eq = sum k_eff,r h_r^2 / sum k_eff,r h_r;
//          k_eq = sum k_eff,r h_r / z_eq (6.3.3.1); S_j,ini = E z_eq^2 k_eq (6.3.1(4), mu = 1).
//   k_4  = 0.9 l_eff,c t_fc^3 / m_c^3, the column flange in bending, with its own T-stub
//          (6.2.6.4) limiting the rows, where the support is a column flange and the joint's
//          column is given (m_c = (w - t_wc)/2 - 0.8 r_c, Fig. 6.8); k_eff,r then takes
//          1/k_4,r too. The column web (k_1, k_2, k_3) is not included: taken as rigid.
// Shear (the simple-joint design guides' checks of a partial-depth end plate, reference
// pack 7; EN 1993-1-8 and 1993-1-1 clauses as named):
//   bolt-shear           0.8 x 2 n F_v,Rd (Table 3.4; the 0.8 leaves room for the tension the
//                        joint's rotation puts in the bolts, the simple-joint design guide, from memory)
//   bolt-bearing-plate   2 n F_b,Rd in the plate (Table 3.4; the bolts bear upward on the plate:
//                        the top end distance, the pitch, the edge distance and the gauge)
//   bolt-bearing-support 2 n F_b,Rd in a supporting beam's web (inner bolts), where it is given
//   plate-shear          gross 2 h_p t_p f_y / (1.27 sqrt 3 gamma_M0), net 2 (h_p - n d_0) t_p f_u /
//                        (sqrt 3 gamma_M2) (EN 1993-1-1 6.2.6; the 1.27 of the guide, from memory)
//   plate-block-tearing  two blocks outside the bolt lines, 3.10.2(2) concentric:
//                        f_u A_nt / gamma_M2 + f_y A_nv / (sqrt 3 gamma_M0) each
//   weld                 two fillets on the web, 2 (h_p - 2 a) a f_vw,d (4.5.2(1) effective length,
//                        4.5.3.3 simplified method)
//   web-shear            the beam web at the plate, h_p t_w f_y / (sqrt 3 gamma_M0) (EN 1993-1-1 6.2.6)
// Rotation capacity: 6.4.2(2), a joint whose moment resistance is governed by the end plate in
// bending has enough rotation capacity when t_p <= 0.36 d sqrt(f_ub / f_y) (from memory,
// reference pack 10.5); the clause gives no value, only that it is adequate.
// Units: SI.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "pinproof/joints/bolt.hpp"
#include "pinproof/model/connection_detail.hpp"
#include "pinproof/model/derived_joint.hpp"
#include "pinproof/model/section.hpp"
#include "pinproof/model/steel_grade.hpp"

namespace pinproof {

// Heights of the bolt's head, nut and washer and the nut's width across flats
// (m), for the bolt's elongation length and punching shear: ISO 4014 heads,
// ISO 4032 nuts, ISO 7089 washers, M12 to M30 (from memory). nullopt for
// another diameter.
struct bolt_assembly {
    double head = 0, nut = 0, washer = 0, across_flats = 0;
};
std::optional<bolt_assembly> metric_bolt_assembly(double diameter);

// One equivalent T-stub (Table 6.2): its flange of thickness t and yield
// strength f_y, effective lengths summed over its rows, m, n, and the bolts'
// tension resistance summed over them.
struct t_stub {
    double l_eff_1 = 0, l_eff_2 = 0;  // sum of l_eff for modes 1 and 2, m
    double m = 0, n = 0;              // m
    double t = 0, fy = 0;             // m, Pa
    double bolts = 0;                 // sum F_t,Rd, N
    bool prying = true;               // L_b <= L_b*
};
struct t_stub_modes {
    double mode1 = 0, mode2 = 0, mode3 = 0;  // N (mode1 = mode2 = F_T,1-2,Rd without prying)
    double resistance() const;                 // the least
    int governing() const;                     // 1, 2 or 3
};
t_stub_modes t_stub_resistance(const t_stub& s, double gamma_M0 = 1.0);
// L_b* of Table 6.2: 8.8 m^3 A_s n_b / (sum l_eff,1 t^3).
double t_stub_prying_limit(double m, double As, int bolt_rows, double l_eff_1, double t);

// One bolt row's share of the moment.
struct tension_row {
    double lever_arm = 0;     // h_r, from the row to the plate's bottom edge, m
    double resistance = 0;    // F_tr,Rd, N
    std::string governing;    // "end-plate-t-stub", "bolt-tension" or "web-tension"
    int mode = 0;             // the T-stub mode, or 0 where the web governs
    bool as_group = false;    // limited as part of a group of rows
    bool triangular = false;  // limited by 6.2.7.2(9)
    double k5 = 0, k10 = 0;   // m (Table 6.11; the spring is E k)
    double k4 = 0;            // m, the column flange in bending; 0 where the column is not given
};

// The flange of the column the plate is bolted to (support "column-flange"
// with the joint's column given): its k_4 (Table 6.11) and its T-stub
// (6.2.6.4, Table 6.4 away from the column's end) join the end plate's.
struct column_flange {
    double flange_thickness = 0, flange_width = 0, web_thickness = 0, root_radius = 0;  // m
    double fy = 0;                                                                      // Pa
};

struct end_plate_inputs {
    bolt_grade bolts = bolt_grade::g8_8;
    bool threads_in_shear_plane = true;
    std::optional<double> gauge;        // m, between the two bolt lines; default default_end_plate_gauge()
    std::optional<double> plate_width;  // m; default default_end_plate_width(gauge)
    std::optional<double> weld_throat;  // m; nullopt: m from the web face, the weld not derived
    std::optional<double> support_ply;  // m, the support's ply under the bolts; default t_p
    std::optional<column_flange> column;  // the column flange, where known (its t_f is then the ply)
    steel_material beam_steel;
    double E = 210e9;
};

struct end_plate_joint {
    std::vector<joint_component> components;
    std::vector<tension_row> rows;  // from the top row down
    double shear_resistance = 0;
    std::string governing;
    double moment_resistance = 0;
    std::string moment_governing;
    double initial_stiffness = 0;  // N*m/rad
    double z_eq = 0, k_eq = 0;     // m
    double m = 0, e = 0, n = 0;    // T-stub geometry, m
    double gauge = 0, plate_width = 0, bolt_length = 0;
    bool gauge_default = false, width_default = false, ply_default = false;
    bool rotation_capacity_adequate = false;  // 6.4.2(2) met
    std::string bending_part;                 // "end plate" or "column flange": the one 6.4.2(2) looks at
    double bending_thickness = 0;             // its thickness, m
    double thickness_limit = 0;               // 0.36 d sqrt(f_ub / f_y), m
};

// Throws std::invalid_argument for a detail that is not an end plate, a US bolt
// grade or plate, or a geometry that puts a hole off the plate or the web
// inside the bolt lines' reach.
end_plate_joint derive_end_plate(const connection_detail& d, const section& beam, const end_plate_inputs& in);

}  // namespace pinproof
