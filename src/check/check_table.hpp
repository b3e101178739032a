// The check table (DESIGN: Checks): one row per demand set against a
// capacity, with the method behind the capacity named, the ratio and the
// status; the governing row overall and per family.
#pragma once

#include "core/units.hpp"

#include <string>
#include <vector>

namespace lapwing::check {

// Families group rows for "the governing row per family" and for sweeps.
enum class Family {
    peak_stress, // local von Mises peaks against the user's allowable
    section,     // section-averaged and linearized stresses along a line
    bearing,     // bolt bearing and tear-out from the computed bolt forces
    block_shear, // block shear (block tearing) paths of a bolt group
    whitmore,    // Whitmore-section yielding
    buckling,    // Whitmore-section buckling of a compression member
    net_section, // gross and net section tension and shear across bolt rows
    weld,        // force per unit length along welded edges
};
inline constexpr Family all_families[] = {Family::peak_stress, Family::section,  Family::bearing,
                                          Family::block_shear, Family::whitmore, Family::buckling,
                                          Family::net_section, Family::weld};
// Stable words used in results.json, sweep.csv and the calc sheet.
const char* word(Family family);
const char* title(Family family); // words for a heading, e.g. "Bolt bearing and tear-out"

enum class Status {
    pass, // ratio ≤ 1
    fail, // ratio > 1
    info, // evaluated and shown, no capacity given (the allowable is not set)
};
const char* word(Status status);

struct CheckRow {
    std::string id; // stable within one model, e.g. "BRG-brace-3"
    Family family = Family::peak_stress;
    std::string what;      // what is checked, e.g. "bearing at the bolt hole"
    std::string where;     // e.g. "bolt brace[3] at (120.0, 40.0) mm"
    std::string load_case; // load case or combination name
    std::string method;  // "user allowable" or the published form, e.g. "AISC 360-16 §J3.10 form"
    std::string formula; // the capacity with its numbers, in internal units (N, mm, MPa)
    Quantity quantity = Quantity::stress; // of demand and capacity
    double demand = 0;                    // internal units
    double capacity = 0;                  // internal units; 0 with Status::info
    double ratio = 0;                     // demand / capacity
    Status status = Status::info;
    // A published form whose capacity comes out as zero (an edge distance
    // or spacing below the form's minimum) fails rather than being shown
    // for information; the ratio is then no_capacity_ratio.
    bool capacity_required = false;
    std::string note; // e.g. the other published form's value, for information
};

struct CheckTable {
    std::vector<CheckRow> rows;
    int governing = -1;                   // row with the largest ratio, -1 when none has a capacity
    std::vector<int> governing_by_family; // per all_families entry, -1 when none

    bool passes() const; // no row fails
    double max_ratio() const;
    int governing_in(Family family) const;
};

// The ratio shown for a required capacity of zero (a finite stand-in for ∞,
// so that tables and JSON stay plain numbers).
inline constexpr double no_capacity_ratio = 999.0;

// Ratios, statuses and governing rows from demands and capacities. A row
// with capacity ≤ 0 is Status::info. Ties go to the first row.
CheckTable make_table(std::vector<CheckRow> rows);

} // namespace lapwing::check
