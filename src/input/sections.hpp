// The readers of each part of the template (internal to input/), in the
// order load_connection calls them.
#pragma once

#include "input/reader.hpp"
#include "model/connection.hpp"

#include <map>
#include <string>
#include <vector>

namespace lapwing::input {

// Where parts of the plate came from, for the geometry checks' messages.
struct PlateOrigins {
    Origin plate;
    std::vector<Origin> corners;
    std::vector<Origin> cutouts;
    std::vector<Origin> bolt_groups;
    bool plate_ok = true; // the plate read without problems
    bool bolts_ok = true; // every bolt group read without problems
};

// Applies one "KEY=VALUE" override to the tree; problems go to `context`.
void apply_override(Node& root, const std::string& argument, Context& context);

void read_job(Table& root, model::Job& job);
void read_parameters(Table& root, Context& context, std::map<std::string, double>& parameters);
void read_material(Table& root, model::Material& material);

void read_plate(Table& root, model::Plate& plate, PlateOrigins& origins);
// More bolts than this in all groups together is refused as absurd input
// (a large splice has a few hundred; 10⁴ holes would mean a mesh of millions
// of elements before anything useful is known).
inline constexpr long max_bolts = 10000;
// Corners of the outline or points of one cut-out, for the same reason (the
// shape checks compare every pair of segments).
inline constexpr size_t max_polygon_points = 2000;
void read_bolt_groups(Table& root, model::Connection& connection, PlateOrigins& origins);

// Actions: load cases first, then members, supports, edge loads, combinations.
void read_actions(Table& root, model::Connection& connection);

void read_allowables(Table& root, model::Allowables& allowables);
void read_mesh_and_report(Table& root, model::Connection& connection);

// An outline segment named by index or by edge name; nullopt (problem
// recorded) when there is no such segment.
std::optional<int> read_edge(const Node& node, const std::string& key_path,
                             const model::Plate& plate, Context& context);

// Geometry that needs only the input: outline shape, holes against the
// outline, the cut-outs and each other.
void check_plate_geometry(const model::Connection& connection, const PlateOrigins& origins,
                          Context& context);

} // namespace lapwing::input
