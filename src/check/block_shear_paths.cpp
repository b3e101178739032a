// Block shear paths: the bolt grid seen along each pull (lanes parallel to
// the pull, ranks across it), the blocks bounded by shear planes along
// lanes and a tension plane across the innermost rank, their lengths to the
// plate edge by ray casts and their hole counts.
#include "check/block_shear_paths.hpp"

#include "geometry/ray_cast.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <numeric>
#include <optional>

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

// The bolt grid seen along a pull `d`: lanes (bolts on one line parallel to
// d) ordered from right to left of d, ranks ordered along d; at[lane][rank]
// is the bolt index.
struct Grid {
    std::vector<double> lane_offset; // along e = d rotated +90°, mm
    std::vector<double> rank_offset; // along d, mm
    std::vector<std::vector<int>> at;
};

std::optional<Grid> grid_along(const std::vector<Vec>& centres, const Vec& d) {
    const Vec e(-d.y(), d.x());
    std::vector<double> along, across;
    for (const Vec& c : centres) {
        along.push_back(c.dot(d));
        across.push_back(c.dot(e));
    }
    const auto lanes = cluster(across);
    const auto ranks = cluster(along);
    if (lanes.size() * ranks.size() != centres.size()) return std::nullopt;
    Grid g;
    g.at.assign(lanes.size(), std::vector<int>(ranks.size(), -1));
    std::vector<int> lane_of(centres.size()), rank_of(centres.size());
    for (size_t l = 0; l < lanes.size(); ++l)
        for (const int i : lanes[l]) lane_of[static_cast<size_t>(i)] = static_cast<int>(l);
    for (size_t r = 0; r < ranks.size(); ++r)
        for (const int i : ranks[r]) rank_of[static_cast<size_t>(i)] = static_cast<int>(r);
    for (size_t i = 0; i < centres.size(); ++i) {
        int& slot = g.at[static_cast<size_t>(lane_of[i])][static_cast<size_t>(rank_of[i])];
        if (slot >= 0) return std::nullopt; // two bolts in one grid cell: not a grid
        slot = static_cast<int>(i);
    }
    for (const auto& l : lanes) g.lane_offset.push_back(across[static_cast<size_t>(l.front())]);
    for (const auto& r : ranks) g.rank_offset.push_back(along[static_cast<size_t>(r.front())]);
    return g;
}

// A plane starting at a hole centre and running `length` along a row of
// holes at the given offsets from it: half the starting hole plus every
// further hole whose centre lies short of the plane's end (the trade's
// rule: whole holes along the plane, half holes where it ends in one).
double holes_on_plane(double length, const std::vector<double>& further_offsets) {
    double n = 0.5;
    for (const double o : further_offsets)
        if (o < length) n += 1.0;
    return n;
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

struct Pull {
    std::string key;   // "along", "across-left", "across-right"
    std::string words; // "along the member axis"
    Vec d;
};

void paths_for_pull(const std::vector<Vec>& centres, const Pull& pull,
                    const geometry::RegionBoundary& boundary, BlockShearPaths& out) {
    const auto grid = grid_along(centres, pull.d);
    if (!grid) {
        out.notes.push_back(fmt::format("{}: the bolts do not form a rectangular grid seen {} "
                                        "(staggered or skewed pattern); no path built",
                                        pull.key, pull.words));
        return;
    }
    const Grid& g = *grid;
    const size_t n_lanes = g.at.size(), n_ranks = g.rank_offset.size();
    const Vec e(-pull.d.y(), pull.d.x());
    const auto centre = [&](size_t lane) { return centres[static_cast<size_t>(g.at[lane][0])]; };
    std::vector<double> further_ranks;
    for (size_t r = 1; r < n_ranks; ++r)
        further_ranks.push_back(g.rank_offset[r] - g.rank_offset[0]);

    // Shear plane of each lane: from its innermost bolt along the pull.
    std::vector<Plane> shear(n_lanes);
    for (size_t l = 0; l < n_lanes; ++l) {
        shear[l] = to_edge(boundary, centre(l), pull.d);
        if (!shear[l].ok)
            out.notes.push_back(fmt::format("{}: from bolt {} the ray {} leaves no plate edge",
                                            pull.key, g.at[l][0], pull.words));
    }
    const auto bolts_of = [&](size_t first, size_t last) {
        std::vector<int> b;
        for (size_t l = first; l <= last; ++l)
            for (size_t r = 0; r < n_ranks; ++r) b.push_back(g.at[l][r]);
        std::sort(b.begin(), b.end());
        return b;
    };

    // (a) The block between the outer lanes: two shear planes, tension
    // across the innermost rank; uniform tension (the usual gusset tear-out).
    if (n_lanes >= 2 && shear.front().ok && shear.back().ok) {
        BlockShearPath p;
        p.id = pull.key + ":between-outer-lines";
        p.name = fmt::format("block between the outer bolt lines, pulled {}", pull.words);
        p.direction = pull.d;
        p.shear_length = shear.front().length + shear.back().length;
        p.shear_holes = holes_on_plane(shear.front().length, further_ranks) +
                        holes_on_plane(shear.back().length, further_ranks);
        p.tension_length = (centre(n_lanes - 1) - centre(0)).norm();
        p.tension_holes = static_cast<double>(n_lanes - 1); // two halves and the lanes between
        p.uniform_tension = true;
        p.bolts = bolts_of(0, n_lanes - 1);
        p.polyline = {shear.front().end, centre(0), centre(n_lanes - 1), shear.back().end};
        out.paths.push_back(std::move(p));
    }

    // (b) One-sided blocks: shear along lane k, tension from lane k's
    // innermost bolt to the side edge, holding the lanes from k to that side.
    for (const int side : {+1, -1}) {
        const Vec u = static_cast<double>(side) * e;
        const char* side_word = side > 0 ? "left" : "right";
        for (size_t k = 0; k < n_lanes; ++k) {
            if (!shear[k].ok) continue;
            const Plane tension = to_edge(boundary, centre(k), u);
            if (!tension.ok) continue;
            const size_t first = side > 0 ? k : 0, last = side > 0 ? n_lanes - 1 : k;
            std::vector<double> further_lanes;
            for (size_t l = first; l <= last; ++l)
                if (l != k) further_lanes.push_back(std::abs(g.lane_offset[l] - g.lane_offset[k]));
            BlockShearPath p;
            p.id = fmt::format("{}:line{}-to-{}-edge", pull.key, k + 1, side_word);
            p.name = fmt::format("bolt lines {}–{} to the {} edge, pulled {}", first + 1, last + 1,
                                 side_word, pull.words);
            p.direction = pull.d;
            p.shear_length = shear[k].length;
            p.shear_holes = holes_on_plane(shear[k].length, further_ranks);
            p.tension_length = tension.length;
            p.tension_holes = holes_on_plane(tension.length, further_lanes);
            // Several loaded lines across the tension plane: the stress on
            // it is not uniform (AISC 360-16 Commentary §J4.3, Ubs = 0.5).
            p.uniform_tension = first == last;
            p.bolts = bolts_of(first, last);
            p.polyline = {shear[k].end, centre(k), tension.end};
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
    a.Ant = (p.tension_length - p.tension_holes * tension_hole) * t;
    return a;
}

double path_demand(const BlockShearPath& p, const std::vector<Vec>& forces) {
    double sum = 0;
    for (const int b : p.bolts) sum += forces.at(static_cast<size_t>(b)).dot(p.direction);
    return sum;
}

} // namespace lapwing::check
