// Block shear paths: the bolts seen along each pull as lanes (lines parallel
// to the pull), the blocks bounded by shear planes along lanes and a
// tension plane through the lanes' innermost bolts, their lengths to the
// plate edge by ray casts, their hole counts and stagger allowances.
#include "check/block_shear_paths.hpp"

#include "geometry/ray_cast.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <numeric>

namespace lapwing::check {

namespace {

using Vec = Eigen::Vector2d;

// Bolt centres closer than this along a coordinate share a lane or rank;
// patterns are set out to 0.1 mm at best, and trigonometric round-off is
// ~1e-13 mm, so 1e-3 mm separates the two cleanly.
constexpr double same_coordinate = 1e-3;

// Groups of indices whose coordinate agrees within same_coordinate, in
// increasing order of the coordinate.
std::vector<std::vector<int>> cluster(const std::vector<double>& coordinate) {
    std::vector<int> order(coordinate.size());
    std::iota(order.begin(), order.end(), 0);
    std::sort(order.begin(), order.end(), [&](int a, int b) {
        return coordinate[static_cast<size_t>(a)] < coordinate[static_cast<size_t>(b)];
    });
    std::vector<std::vector<int>> groups;
    for (const int i : order) {
        if (groups.empty() || coordinate[static_cast<size_t>(i)] -
                                      coordinate[static_cast<size_t>(groups.back().front())] >
                                  same_coordinate)
            groups.emplace_back();
        groups.back().push_back(i);
    }
    return groups;
}

// The bolts seen along a pull `d`: lanes are the lines of bolts parallel
// to d, ordered from right to left of d (by their offset along e = d turned
// +90°); each lane's bolts are ordered along d, so bolts[0] is its innermost
// (nearest the joint, where a tear-out block starts). A staggered pattern
// has lanes whose innermost bolts sit at different places along d.
struct Lane {
    double across = 0;         // offset along e, mm
    std::vector<int> bolts;    // indices into the centres, ordered along d
    std::vector<double> along; // their offsets along d, mm
};

std::vector<Lane> lanes_along(const std::vector<Vec>& centres, const Vec& d) {
    const Vec e(-d.y(), d.x());
    std::vector<double> across;
    for (const Vec& c : centres) across.push_back(c.dot(e));
    std::vector<Lane> lanes;
    for (const auto& group : cluster(across)) {
        Lane lane;
        lane.across = across[static_cast<size_t>(group.front())];
        lane.bolts = group;
        std::sort(lane.bolts.begin(), lane.bolts.end(), [&](int a, int b) {
            return centres[static_cast<size_t>(a)].dot(d) < centres[static_cast<size_t>(b)].dot(d);
        });
        for (const int b : lane.bolts) lane.along.push_back(centres[static_cast<size_t>(b)].dot(d));
        lanes.push_back(std::move(lane));
    }
    return lanes;
}

struct Plane {
    bool ok = false;
    double length = 0;
    Vec end{0, 0};
};

// From a bolt centre along u to the plate's edge, through every hole (the
// holes on the plane are counted from the pattern, not met by the ray).
Plane to_edge(const geometry::RegionBoundary& boundary, const Vec& from, const Vec& u) {
    const geometry::RayHit hit = geometry::cast_ray(boundary, from, u, {.stop_at_holes = false});
    if (!hit.hit) return {};
    return {true, hit.distance, hit.at};
}

// A shear plane along lane k from its innermost bolt: half that hole, then
// every further hole of the lane short of the plane's end (whole holes
// along the plane, half a hole where it ends in one: the trade's rule).
double shear_holes(const Lane& lane, double length) {
    double n = 0.5;
    for (size_t r = 1; r < lane.along.size(); ++r)
        if (lane.along[r] - lane.along[0] < length) n += 1.0;
    return n;
}

// A tension plane through the innermost bolts of lanes `from` to `to` (a
// zig-zag where the pattern is staggered): its length across the pull (the
// sum of the gauges g), its holes (half at each end, whole between) and the
// stagger allowance Σ s²/(4g) for every diagonal step of pitch s (AISC
// 360-16 §B4.3b; EN 1993-1-1 §6.2.2.2(4) writes it s²/(4p)).
struct Chain {
    double across = 0, holes = 0, stagger = 0;
    std::vector<int> lanes;
};
Chain chain(const std::vector<Lane>& lanes, size_t from, size_t to) {
    Chain c;
    const int step = to >= from ? 1 : -1;
    for (size_t l = from;; l = static_cast<size_t>(static_cast<long>(l) + step)) {
        c.lanes.push_back(static_cast<int>(l));
        if (l == to) break;
        const Lane& a = lanes[l];
        const Lane& b = lanes[static_cast<size_t>(static_cast<long>(l) + step)];
        const double g = std::abs(b.across - a.across);
        const double s = std::abs(b.along[0] - a.along[0]);
        c.across += g;
        c.holes += 1.0; // a half hole at each end of the step
        if (s > same_coordinate) c.stagger += s * s / (4.0 * g);
    }
    return c;
}

struct Pull {
    std::string key;   // "along", "across-left", "across-right"
    std::string words; // "along the member axis"
    Vec d;
};

void paths_for_pull(const std::vector<Vec>& centres, const Pull& pull,
                    const geometry::RegionBoundary& boundary, BlockShearPaths& out) {
    const std::vector<Lane> lanes = lanes_along(centres, pull.d);
    const size_t n_lanes = lanes.size();
    const Vec e(-pull.d.y(), pull.d.x());
    const auto start = [&](size_t lane) {
        return centres[static_cast<size_t>(lanes[lane].bolts[0])];
    };
    const auto polyline_of = [&](const Chain& c) {
        std::vector<Vec> line;
        for (const int l : c.lanes) line.push_back(start(static_cast<size_t>(l)));
        return line;
    };
    const auto bolts_of = [&](const Chain& c) {
        std::vector<int> b;
        for (const int l : c.lanes)
            b.insert(b.end(), lanes[static_cast<size_t>(l)].bolts.begin(),
                     lanes[static_cast<size_t>(l)].bolts.end());
        std::sort(b.begin(), b.end());
        return b;
    };

    // Shear plane of each lane: from its innermost bolt along the pull.
    std::vector<Plane> shear(n_lanes);
    for (size_t l = 0; l < n_lanes; ++l) {
        shear[l] = to_edge(boundary, start(l), pull.d);
        if (!shear[l].ok)
            out.notes.push_back(fmt::format("{}: from bolt {} the line {} meets no plate edge",
                                            pull.key, lanes[l].bolts[0], pull.words));
    }

    // (a) The block between the outer lanes: two shear planes, tension
    // across through every lane's innermost bolt; uniform tension (the usual
    // gusset tear-out).
    if (n_lanes >= 2 && shear.front().ok && shear.back().ok) {
        const Chain c = chain(lanes, 0, n_lanes - 1);
        BlockShearPath p;
        p.id = pull.key + ":between-outer-lines";
        p.name = fmt::format("block between the outer bolt lines, pulled {}", pull.words);
        p.direction = pull.d;
        p.shear_length = shear.front().length + shear.back().length;
        p.shear_holes = shear_holes(lanes.front(), shear.front().length) +
                        shear_holes(lanes.back(), shear.back().length);
        p.tension_length = c.across;
        p.tension_holes = c.holes;
        p.tension_stagger = c.stagger;
        p.uniform_tension = true;
        p.bolts = bolts_of(c);
        p.polyline = polyline_of(c);
        p.polyline.insert(p.polyline.begin(), shear.front().end);
        p.polyline.push_back(shear.back().end);
        out.paths.push_back(std::move(p));
    }

    // (b) One-sided blocks: shear along lane k, tension from lane k's
    // innermost bolt through the innermost bolts of the lanes beyond it to
    // the side edge; the block holds the lanes from k to that side.
    for (const int side : {+1, -1}) {
        const char* side_word = side > 0 ? "left" : "right";
        for (size_t k = 0; k < n_lanes; ++k) {
            if (!shear[k].ok) continue;
            const size_t last = side > 0 ? n_lanes - 1 : 0;
            const Chain c = chain(lanes, k, last);
            const Plane rest = to_edge(boundary, start(last), static_cast<double>(side) * e);
            if (!rest.ok) continue;
            BlockShearPath p;
            p.id = fmt::format("{}:line{}-to-{}-edge", pull.key, k + 1, side_word);
            p.name =
                fmt::format("bolt lines {}–{} to the {} edge, pulled {}", std::min(k, last) + 1,
                            std::max(k, last) + 1, side_word, pull.words);
            p.direction = pull.d;
            p.shear_length = shear[k].length;
            p.shear_holes = shear_holes(lanes[k], shear[k].length);
            p.tension_length = c.across + rest.length;
            p.tension_holes = c.holes + 0.5;
            p.tension_stagger = c.stagger;
            // Several loaded lines across the tension plane: the stress on
            // it is not uniform (AISC 360-16 Commentary §J4.3, Ubs = 0.5).
            p.uniform_tension = c.lanes.size() == 1;
            p.bolts = bolts_of(c);
            p.polyline = polyline_of(c);
            p.polyline.insert(p.polyline.begin(), shear[k].end);
            p.polyline.push_back(rest.end);
            out.paths.push_back(std::move(p));
        }
    }
}

} // namespace

BlockShearPaths block_shear_paths(const std::vector<Vec>& centres, const Vec& axis,
                                  const geometry::RegionBoundary& boundary, bool across) {
    BlockShearPaths out;
    if (centres.empty() || !(axis.norm() > 0)) return out;
    const Vec d = axis.normalized();
    const Vec left(-d.y(), d.x());
    std::vector<Pull> pulls{{"along", "along the member axis", d}};
    if (across) {
        pulls.push_back({"across-left", "across the member axis, to its left", left});
        pulls.push_back({"across-right", "across the member axis, to its right", -left});
    }
    for (const Pull& p : pulls) paths_for_pull(centres, p, boundary, out);
    return out;
}

BlockShearAreas areas(const BlockShearPath& p, double t, double shear_hole, double tension_hole) {
    BlockShearAreas a;
    a.Agv = p.shear_length * t;
    a.Anv = (p.shear_length - p.shear_holes * shear_hole) * t;
    a.Agt = p.tension_length * t;
    a.Ant = (p.tension_length - p.tension_holes * tension_hole + p.tension_stagger) * t;
    return a;
}

double path_demand(const BlockShearPath& p, const std::vector<Vec>& forces) {
    double sum = 0;
    for (const int b : p.bolts) sum += forces.at(static_cast<size_t>(b)).dot(p.direction);
    return sum;
}

} // namespace lapwing::check
