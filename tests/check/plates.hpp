// Connections built in code for the section tests: rectangular and other
// outlines, bolt groups, members and supports, without a template.
#pragma once

#include "model/connection.hpp"

#include <Eigen/Core>
#include <cmath>
#include <numbers>
#include <vector>

namespace lapwing::test {

inline model::Connection plate_with(const std::vector<Eigen::Vector2d>& corners,
                                    double thickness = 10) {
    model::Connection c;
    c.plate.thickness = thickness;
    for (const auto& p : corners) c.plate.outline.push_back({{p.x(), p.y()}, {}, 0.0, ""});
    return c;
}

inline model::BoltGroup bolt_group(const std::string& name, Eigen::Vector2d origin, double angle,
                                   int rows, int lines, double pitch, double gauge, double hole) {
    model::BoltGroup g;
    g.name = name;
    g.origin = {origin.x(), origin.y()};
    g.angle = angle;
    g.rows = rows;
    g.lines = lines;
    g.pitch = pitch;
    g.gauge = gauge;
    g.diameter = hole - 2;
    g.hole.width = hole;
    g.hole.length = hole;
    return g;
}

inline model::Member member(const std::string& name, const std::string& group, double angle) {
    model::Member m;
    m.name = name;
    m.bolt_group = group;
    m.angle = angle;
    return m;
}

inline Eigen::Vector2d rotated(const Eigen::Vector2d& p, double angle_deg) {
    const double a = angle_deg * std::numbers::pi / 180.0;
    return {std::cos(a) * p.x() - std::sin(a) * p.y(), std::sin(a) * p.x() + std::cos(a) * p.y()};
}

} // namespace lapwing::test
