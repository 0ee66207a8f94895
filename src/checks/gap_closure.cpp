#include "pinproof/checks/gap_closure.hpp"

#include <cmath>

#include "pinproof/core/errors.hpp"

namespace pinproof {

std::string to_string(joint_phase p)
{
    switch (p) {
    case joint_phase::closed_hogging: return "closed-hogging";
    case joint_phase::open: return "open";
    case joint_phase::closed_sagging: return "closed-sagging";
    }
    return "open";
}

namespace {

// One row of the condensed system (hogging moments m, rotations
// rot = rot0 - F m): either a fixed rotation, rot_j = target, or a spring law
// m_j = k rot_j + b.
struct joint_row {
    bool fixed_rotation = false;
    double target = 0;  // rad, when fixed_rotation
    double k = 0, b = 0;
};

std::optional<joint_row> row_for(const closing_joint& j, joint_phase p)
{
    if (j.before.is_rigid()) {
        if (p != joint_phase::open) return std::nullopt;  // a rigid joint does not rotate, so never closes
        return joint_row{true, 0.0, 0, 0};
    }
    const double S = j.before.value();
    if (p == joint_phase::open) return joint_row{false, 0, S, 0};
    const auto& closure = p == joint_phase::closed_sagging ? j.closure_sagging : j.closure_hogging;
    if (!closure) return std::nullopt;
    const double theta_c = p == joint_phase::closed_sagging ? *closure : -*closure;
    if (j.contact.is_rigid()) return joint_row{true, theta_c, 0, 0};
    // m = S rot + K_c (rot - theta_c)
    const double Kc = j.contact.value();
    return joint_row{false, 0, S + Kc, -Kc * theta_c};
}

bool consistent(const closing_joint& j, joint_phase p, double rot, double m, double tol_rot, double tol_m)
{
    if (j.before.is_rigid()) return p == joint_phase::open;
    const double S = j.before.value();
    switch (p) {
    case joint_phase::open:
        return (!j.closure_sagging || rot <= *j.closure_sagging + tol_rot) &&
               (!j.closure_hogging || rot >= -*j.closure_hogging - tol_rot);
    case joint_phase::closed_sagging:
        // With rigid contact the rotation is held at closure; the contact must then push (m beyond S theta_c).
        if (j.contact.is_rigid()) return m >= S * *j.closure_sagging - tol_m;
        return rot >= *j.closure_sagging - tol_rot;
    case joint_phase::closed_hogging:
        if (j.contact.is_rigid()) return m <= -S * *j.closure_hogging + tol_m;
        return rot <= -*j.closure_hogging + tol_rot;
    }
    return false;
}

}  // namespace

closed_state solve_with_closure(const beam_model& model, const closing_joint& start, const closing_joint& end)
{
    const auto rot0 = model.pinned_rotations();
    const auto F = model.flexibility();
    const closing_joint* joints[2] = {&start, &end};
    const joint_phase phases[3] = {joint_phase::open, joint_phase::closed_sagging, joint_phase::closed_hogging};
    const double rot_scale = std::abs(rot0[0]) + std::abs(rot0[1]) + 1e-300;
    const double m_scale = rot_scale / (F[0][0] + 1e-300);
    for (joint_phase pa : phases) {
        for (joint_phase pb : phases) {
            const joint_phase p[2] = {pa, pb};
            const std::optional<joint_row> row_start = row_for(start, pa), row_end = row_for(end, pb);
            if (!row_start || !row_end) continue;
            const joint_row rows[2] = {*row_start, *row_end};
            double a[2][2], rhs[2];
            for (int j = 0; j < 2; ++j) {
                const int k = 1 - j;
                const joint_row& r = rows[j];
                if (r.fixed_rotation) {
                    // rot0_j - F_j . m = target
                    a[j][j] = F[j][j];
                    a[j][k] = F[j][k];
                    rhs[j] = rot0[j] - r.target;
                } else {
                    // m_j = k (rot0_j - F_j . m) + b
                    a[j][j] = 1.0 + r.k * F[j][j];
                    a[j][k] = r.k * F[j][k];
                    rhs[j] = r.k * rot0[j] + r.b;
                }
            }
            const double det = a[0][0] * a[1][1] - a[0][1] * a[1][0];
            if (!(std::abs(det) > 0.0)) continue;
            const double m[2] = {(rhs[0] * a[1][1] - a[0][1] * rhs[1]) / det,
                                 (a[0][0] * rhs[1] - a[1][0] * rhs[0]) / det};
            bool ok = true;
            for (int j = 0; j < 2; ++j) {
                const double rot = rot0[j] - F[j][0] * m[0] - F[j][1] * m[1];
                ok = ok && consistent(*joints[j], p[j], rot, m[j], 1e-12 * rot_scale, 1e-12 * m_scale);
            }
            if (!ok) continue;
            closed_state out;
            out.state = model.state_for_end_moments(m[0], m[1]);
            out.state.stiffness_start = start.before;
            out.state.stiffness_end = end.before;
            out.start = pa;
            out.end = pb;
            // A rotation held at closure (or by a rigid joint) is that value, not round-off.
            double* rots[2] = {&out.state.rotation_start, &out.state.rotation_end};
            for (int j = 0; j < 2; ++j)
                if (rows[j].fixed_rotation) *rots[j] = rows[j].target;
            return out;
        }
    }
    throw internal_error("no consistent state found for the joints with gap closure");
}

closed_state solve_with_closure_at_start(const beam_model& model, const closing_joint& start)
{
    const double EI = model.EI(), L = model.span();
    const beam_state pinned = model.solve(stiffness::pinned(), stiffness::pinned());
    const double rot0 = pinned.rotation_start;
    // The start's flexibility f (rotation per hogging moment), from a spring of EI/L.
    const beam_state probe = model.solve(stiffness::spring(EI / L), stiffness::pinned());
    if (!(std::abs(probe.moment_start) > 0)) throw internal_error("gap closure at the start: no moment from a spring");
    const double f = (rot0 - probe.rotation_start) / probe.moment_start;
    if (!(f > 0) || !std::isfinite(f)) throw internal_error("gap closure at the start: the flexibility is not positive");
    const double rot_scale = std::abs(rot0) + 1e-300, m_scale = rot_scale / f;
    for (joint_phase p : {joint_phase::open, joint_phase::closed_sagging, joint_phase::closed_hogging}) {
        const std::optional<joint_row> row = row_for(start, p);
        if (!row) continue;
        double m = 0, rot = 0;
        if (row->fixed_rotation) {
            rot = row->target;  // rot0 - f m = target
            m = (rot0 - rot) / f;
        } else {
            // m = k rot + b, rot = rot0 - f m
            m = (row->k * rot0 + row->b) / (1.0 + row->k * f);
            rot = rot0 - f * m;
        }
        if (!consistent(start, p, rot, m, 1e-12 * rot_scale, 1e-12 * m_scale)) continue;
        closed_state out;
        // The model at the spring that carries m at rot: a pin (m = 0), a rigid
        // joint (rot = 0), else the secant m / rot.
        const double tiny = 1e-14 * rot_scale;
        stiffness at = std::abs(m) <= 1e-14 * m_scale ? stiffness::pinned()
                       : std::abs(rot) <= tiny      ? stiffness::rigid()
                                                    : stiffness::spring(m / rot);
        if (!at.is_rigid() && !at.is_pinned() && !(at.value() > 0))
            throw internal_error("gap closure at the start: a negative secant stiffness");
        out.state = model.solve(at, stiffness::pinned());
        if (std::abs(out.state.moment_start - m) > 1e-9 * m_scale + 1e-9 * std::abs(m))
            throw internal_error("gap closure at the start: the state does not carry the moment found");
        out.state.stiffness_start = start.before;
        out.start = p;
        out.end = joint_phase::open;
        if (row->fixed_rotation) out.state.rotation_start = row->target;
        return out;
    }
    throw internal_error("no consistent state found for the joint with gap closure");
}

}  // namespace pinproof
