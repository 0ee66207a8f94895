#include "pinproof/joints/classification.hpp"

#include <stdexcept>

namespace pinproof {

std::string to_string(en_joint_class c)
{
    switch (c) {
    case en_joint_class::nominally_pinned: return "nominally-pinned";
    case en_joint_class::semi_rigid: return "semi-rigid";
    case en_joint_class::rigid: return "rigid";
    }
    return "unknown";
}

std::string to_string(aisc_joint_class c)
{
    switch (c) {
    case aisc_joint_class::simple: return "simple";
    case aisc_joint_class::partially_restrained: return "partially-restrained";
    case aisc_joint_class::fully_restrained: return "fully-restrained";
    }
    return "unknown";
}

// EN 1993-1-8 5.2.2.5(1): k_b = 8 where the bracing reduces the horizontal
// displacement by at least 80 %, k_b = 25 for other frames.
double en_rigid_limit(frame_bracing f) { return f == frame_bracing::braced ? 8.0 : 25.0; }

en_joint_class classify_en(stiffness s, double EI, double span, frame_bracing f)
{
    if (s.is_rigid()) return en_joint_class::rigid;
    const double kappa = s.ratio(EI, span);
    if (kappa <= en_pinned_limit) return en_joint_class::nominally_pinned;
    if (kappa >= en_rigid_limit(f)) return en_joint_class::rigid;
    return en_joint_class::semi_rigid;
}

aisc_joint_class classify_aisc(stiffness s, double EI, double span)
{
    if (s.is_rigid()) return aisc_joint_class::fully_restrained;
    const double kappa = s.ratio(EI, span);
    if (kappa <= aisc_simple_limit) return aisc_joint_class::simple;
    if (kappa >= aisc_fully_restrained_limit) return aisc_joint_class::fully_restrained;
    return aisc_joint_class::partially_restrained;
}

double pinned_limit(design_standard s)
{
    return s == design_standard::en1993_1_8 ? en_pinned_limit : aisc_simple_limit;
}

bool is_nominally_pinned(stiffness s, double EI, double span, design_standard standard)
{
    if (s.is_rigid()) return false;
    return s.ratio(EI, span) <= pinned_limit(standard);
}

}  // namespace pinproof
