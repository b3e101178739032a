// Ratios, statuses and the governing rows of the check table.
#include "check/check_table.hpp"

#include <cmath>
#include <iterator>

namespace lapwing::check {

const char* word(Family family) {
    switch (family) {
    case Family::peak_stress:
        return "peak_stress";
    case Family::section:
        return "section";
    case Family::bearing:
        return "bearing";
    case Family::block_shear:
        return "block_shear";
    case Family::whitmore:
        return "whitmore";
    case Family::buckling:
        return "buckling";
    case Family::net_section:
        return "net_section";
    case Family::weld:
        return "weld";
    }
    return "?";
}

const char* title(Family family) {
    switch (family) {
    case Family::peak_stress:
        return "Local peak stress";
    case Family::section:
        return "Section stresses";
    case Family::bearing:
        return "Bolt bearing and tear-out";
    case Family::block_shear:
        return "Block shear";
    case Family::whitmore:
        return "Whitmore section yielding";
    case Family::buckling:
        return "Whitmore section buckling";
    case Family::net_section:
        return "Gross and net sections";
    case Family::weld:
        return "Welds";
    }
    return "?";
}

const char* word(Status status) {
    switch (status) {
    case Status::pass:
        return "pass";
    case Status::fail:
        return "fail";
    case Status::info:
        return "info";
    }
    return "?";
}

bool CheckTable::passes() const {
    for (const CheckRow& r : rows)
        if (r.status == Status::fail) return false;
    return true;
}

double CheckTable::max_ratio() const {
    return governing >= 0 ? rows[static_cast<size_t>(governing)].ratio : 0.0;
}

int CheckTable::governing_in(Family family) const {
    for (size_t i = 0; i < std::size(all_families); ++i)
        if (all_families[i] == family)
            return i < governing_by_family.size() ? governing_by_family[i] : -1;
    return -1;
}

CheckTable make_table(std::vector<CheckRow> rows) {
    CheckTable table;
    table.rows = std::move(rows);
    table.governing_by_family.assign(std::size(all_families), -1);
    for (size_t i = 0; i < table.rows.size(); ++i) {
        CheckRow& r = table.rows[i];
        if (r.capacity > 0 && std::isfinite(r.capacity) && std::isfinite(r.demand)) {
            r.ratio = std::abs(r.demand) / r.capacity;
            r.status = r.ratio > 1.0 ? Status::fail : Status::pass;
        } else if (r.capacity_required && std::abs(r.demand) > 0) {
            r.ratio = no_capacity_ratio;
            r.status = Status::fail;
        } else {
            r.ratio = 0;
            r.status = Status::info;
            continue;
        }
        const int row = static_cast<int>(i);
        if (table.governing < 0 || r.ratio > table.rows[static_cast<size_t>(table.governing)].ratio)
            table.governing = row;
        for (size_t f = 0; f < std::size(all_families); ++f) {
            int& g = table.governing_by_family[f];
            if (all_families[f] == r.family &&
                (g < 0 || r.ratio > table.rows[static_cast<size_t>(g)].ratio))
                g = row;
        }
    }
    return table;
}

} // namespace lapwing::check
