// The section lines of a connection, made from its members, bolt groups,
// supports and the user's cut lines, clipped exactly to the plate region.
#pragma once

#include "analysis/plate_region.hpp"
#include "check/section.hpp"
#include "model/connection.hpp"

#include <vector>

namespace lapwing::check {

// Every section line of the connection, in this fixed order (ids in
// brackets; <m> a member name, <s> a support name, <k> the bolt row as
// numbered in the group, from 1 at the group's origin):
//  1. a Whitmore line per bolted member, members in template order
//     ("whitmore-<m>");
//  2. net sections, one per bolt row: first each bolted member's group in
//     member order ("net-<m>-row<k>"), then each bolted support's group in
//     support order ("net-<s>-row<k>");
//  3. welded interfaces: each edge of each welded support in support order,
//     then each welded edge of each member in member order ("weld-<s>" or
//     "weld-<m>" for a single edge, "weld-<s>-edge<i>" with i the outline
//     segment when there are several);
//  4. the user's cut lines in template order ("user-<name>", or "user-<n>"
//     counting from 1 when the line has no name).
// Directions: Whitmore and net-section lines run from the right of the
// member axis to its left (looking out along the member), so their normal
// points back to the joint; weld lines run along the outline (plate on the
// left, normal into the plate); user lines run from `from` to `to`.
// Throws InputError when a line has no material at all (a user line
// outside the plate, a welded edge entirely cut away).
std::vector<SectionLine> make_section_lines(const model::Connection& connection,
                                            const analysis::PlateLayout& layout);

} // namespace lapwing::check
