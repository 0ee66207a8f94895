// Rotational stiffness of a beam-end joint: a finite spring or an exact rigid
// fixity. Rigid is a state of its own, never a large number, so that fixed-end
// results are exact.
#pragma once

#include <limits>

namespace pinproof {

class stiffness {
public:
    // A finite spring in N*m/rad; 0 is a pin. Must be finite and >= 0.
    static stiffness spring(double n_m_per_rad);
    static stiffness pinned() { return spring(0.0); }
    static stiffness rigid() { return stiffness(true, 0.0); }

    bool is_rigid() const noexcept { return rigid_; }
    bool is_pinned() const noexcept { return !rigid_ && value_ == 0.0; }
    // The spring value; only meaningful when !is_rigid().
    double value() const noexcept { return value_; }

    // Orders springs by value with rigid above every finite spring.
    friend bool operator<(const stiffness& a, const stiffness& b) noexcept
    {
        if (a.rigid_) return false;
        if (b.rigid_) return true;
        return a.value_ < b.value_;
    }
    friend bool operator==(const stiffness& a, const stiffness& b) noexcept
    {
        return a.rigid_ == b.rigid_ && (a.rigid_ || a.value_ == b.value_);
    }
    friend bool operator<=(const stiffness& a, const stiffness& b) noexcept { return !(b < a); }

    // kappa = S L / (E I); +infinity is never returned: callers ask is_rigid() first.
    double ratio(double EI, double span) const noexcept { return value_ * span / EI; }

private:
    stiffness(bool rigid, double value) : rigid_(rigid), value_(value) {}
    bool rigid_ = false;
    double value_ = 0.0;
};

}  // namespace pinproof
