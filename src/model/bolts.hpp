// Bolt centres of a group and the hole each bolt sits in.
#pragma once

#include "model/connection.hpp"

#include <vector>

namespace lapwing::model {

// Bolt centres in plate coordinates, row by row (row-major), honouring
// pitch, gauge, angle and stagger as described on BoltGroup.
std::vector<BoltPosition> bolt_positions(const BoltGroup& group);

// The hole for a bolt of nominal diameter `diameter` (mm) from a stated
// clearance rule (common practice, tables from memory; an explicit hole size
// in the template overrides the rule):
//  metric, nominal clearances in the style of EN 1090-2 Table 11:
//    standard   d + 2 mm (d ≤ 24), d + 3 mm (d > 24)
//    oversized  d + 3 (d ≤ 14), + 4 (d ≤ 22), + 6 (d ≤ 24), + 8 (d > 24)
//    short slot standard width × (d + 4 / 6 / 8 / 10 over the same steps)
//    long slot  standard width × 1.5 d
//  inch, nominal hole dimensions of AISC 360-16 Table J3.3:
//    standard   d + 1/16 in (d ≤ 7/8 in), d + 1/8 in (d ≥ 1 in)
//    oversized  d + 1/8 (d ≤ 1/2), + 3/16 (d ≤ 7/8), + 1/4 (d = 1), + 5/16 (d ≥ 1 1/8)
//    short slot standard width × (d + 3/16, + 1/4, + 5/16, + 3/8 over the same steps)
//    long slot  standard width × 2.5 d
Hole hole_from_rule(HoleKind kind, HoleRule rule, double diameter, SlotDirection direction);

std::string_view name(HoleKind kind);

} // namespace lapwing::model
