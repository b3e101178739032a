// checks.csv: the check table for a spreadsheet, one row per check row in
// the sheet's order, the values in the template's unit system.
#include "report/outputs.hpp"
#include "report/text_format.hpp"

#include <fmt/format.h>

namespace lapwing::report {

std::string checks_csv(const check::CheckOutcome& outcome) {
    const UnitSystem units = outcome.connection.units;
    const check::CheckTable& t = outcome.table;
    // Shortest text that reads back to the same double, as in results.json.
    const auto value = [](double v) { return fmt::format("{}", v); };
    std::string out =
        "id,family,what,where,load_case,method,unit,demand,capacity,ratio,status,governing\r\n";
    for (size_t i = 0; i < t.rows.size(); ++i) {
        const check::CheckRow& r = t.rows[i];
        const bool info = r.status == check::Status::info;
        out += fmt::format("{},{},{},{},{},{},{},{},{},{},{},{}\r\n", csv_field(r.id),
                           csv_field(check::word(r.family)), csv_field(r.what), csv_field(r.where),
                           csv_field(r.load_case), csv_field(r.method),
                           csv_field(unit_label(r.quantity, units)),
                           value(from_internal(r.demand, r.quantity, units)),
                           info ? "" : value(from_internal(r.capacity, r.quantity, units)),
                           info ? "" : value(r.ratio), check::word(r.status),
                           static_cast<int>(i) == t.governing ? "yes" : "");
    }
    return out;
}

} // namespace lapwing::report
