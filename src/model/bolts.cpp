// Bolt pattern layout and hole sizes from the clearance rules.
#include "model/bolts.hpp"

#include <array>
#include <cmath>
#include <numbers>

namespace lapwing::model {

std::vector<BoltPosition> bolt_positions(const BoltGroup& group) {
    const double a = group.angle * std::numbers::pi / 180.0;
    const double ux = std::cos(a), uy = std::sin(a); // along the axis (rows)
    const double vx = -uy, vy = ux;                  // across, to the left (lines)
    std::vector<BoltPosition> out;
    out.reserve(static_cast<size_t>(group.rows * group.lines));
    for (int row = 0; row < group.rows; ++row) {
        for (int line = 0; line < group.lines; ++line) {
            double along = row * group.pitch;
            if (group.stagger && line % 2 == 1) along += 0.5 * group.pitch;
            const double across = line * group.gauge;
            out.push_back({{group.origin.x + along * ux + across * vx,
                            group.origin.y + along * uy + across * vy},
                           row,
                           line});
        }
    }
    return out;
}

namespace {

// Metric steps by nominal diameter in mm (see bolts.hpp).
int metric_step(double d) {
    return d <= 14.0 ? 0 : d <= 22.0 ? 1 : d <= 24.0 ? 2 : 3;
}

// Inch steps by nominal diameter in inches; the half-sixteenth tolerance
// absorbs the rounding of a diameter typed in mm.
int inch_step(double d_in) {
    constexpr double tol = 1.0 / 32.0;
    if (d_in <= 0.5 + tol) return 0;
    if (d_in <= 0.875 + tol) return 1;
    if (d_in <= 1.0 + tol) return 2;
    return 3;
}

} // namespace

Hole hole_from_rule(HoleKind kind, HoleRule rule, double diameter, SlotDirection direction) {
    Hole hole;
    hole.kind = kind;
    hole.rule = rule;
    hole.direction = direction;
    double standard = 0.0, oversized = 0.0, short_slot = 0.0, long_slot = 0.0;
    if (rule == HoleRule::metric) {
        const int s = metric_step(diameter);
        standard = diameter + (diameter <= 24.0 ? 2.0 : 3.0);
        oversized = diameter + std::array{3.0, 4.0, 6.0, 8.0}[static_cast<size_t>(s)];
        short_slot = diameter + std::array{4.0, 6.0, 8.0, 10.0}[static_cast<size_t>(s)];
        long_slot = 1.5 * diameter;
    } else {
        const double d = diameter / mm_per_inch;
        const int s = inch_step(d);
        const double sixteenth = mm_per_inch / 16.0;
        standard = diameter + (s <= 1 ? 1.0 : 2.0) * sixteenth;
        oversized = diameter + std::array{2.0, 3.0, 4.0, 5.0}[static_cast<size_t>(s)] * sixteenth;
        short_slot = diameter + std::array{3.0, 4.0, 5.0, 6.0}[static_cast<size_t>(s)] * sixteenth;
        long_slot = 2.5 * diameter;
    }
    switch (kind) {
    case HoleKind::standard:
        hole.width = hole.length = standard;
        break;
    case HoleKind::oversized:
        hole.width = hole.length = oversized;
        break;
    case HoleKind::short_slot:
        hole.width = standard;
        hole.length = short_slot;
        break;
    case HoleKind::long_slot:
        hole.width = standard;
        hole.length = long_slot;
        break;
    }
    return hole;
}

std::string_view name(HoleKind kind) {
    switch (kind) {
    case HoleKind::standard:
        return "standard";
    case HoleKind::oversized:
        return "oversized";
    case HoleKind::short_slot:
        return "short_slot";
    case HoleKind::long_slot:
        return "long_slot";
    }
    return "?";
}

} // namespace lapwing::model
