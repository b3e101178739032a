// The terminal summary of a check run and its JSON form.
#include "report/terminal_summary.hpp"

#include "report/text_format.hpp"

#include <fmt/format.h>
#include <iterator>
#include <nlohmann/json.hpp>

namespace lapwing::report {

namespace {

// ANSI SGR codes (ECMA-48 §8.3.117): bold, red, green, reset.
struct Paint {
    bool on = false;
    std::string operator()(const std::string& text, const char* code) const {
        return on ? fmt::format("\x1b[{}m{}\x1b[0m", code, text) : text;
    }
};

const char* status_colour(check::Status s) {
    return s == check::Status::fail ? "1;31" : (s == check::Status::pass ? "32" : "2");
}

} // namespace

std::string terminal_summary(const check::CheckOutcome& o, const SummaryOptions& options) {
    const Paint paint{options.colour};
    const UnitSystem units = o.connection.units;
    const check::CheckTable& t = o.table;
    std::string out =
        fmt::format("{}: {} {} elements, {} dofs", options.input_file, o.mesh.n_elements(),
                    fe::name(o.mesh.kind), o.results.problem.model.n_dofs());
    if (o.convergence.done)
        out += fmt::format("; convergence mesh {} elements, largest change {:.1f} %",
                           o.convergence.fine_elements, 100 * o.convergence.largest_change());
    else
        out += "; single mesh (no convergence evidence)";
    out += "\n" + fmt::format("{:<28} {:>7}  {:<6} {}\n", "check family", "ratio", "status",
                              "governing row");
    for (size_t f = 0; f < std::size(check::all_families) && f < t.governing_by_family.size();
         ++f) {
        const int g = t.governing_by_family[f];
        if (g < 0) continue;
        const check::CheckRow& r = t.rows[static_cast<size_t>(g)];
        out += fmt::format(
            "{:<28} {:>7.3f}  {} {} ({}), {}: {} / {}\n", check::title(check::all_families[f]),
            r.ratio, paint(fmt::format("{:<6}", check::word(r.status)), status_colour(r.status)),
            r.what, r.where, r.load_case, with_unit(r.demand, r.quantity, units),
            with_unit(r.capacity, r.quantity, units));
    }
    if (t.governing < 0) {
        out += "No allowables given: every row is for information only.\n";
    } else {
        const check::CheckRow& r = t.rows[static_cast<size_t>(t.governing)];
        out +=
            paint(t.passes() ? "ALL CHECKS PASS" : "A CHECK FAILS", t.passes() ? "1;32" : "1;31") +
            fmt::format(": highest ratio {:.3f}, {} in {}\n", r.ratio, r.what, r.load_case);
    }
    if (!options.folder.empty() && !options.files.empty()) {
        out += fmt::format("wrote {} files to {}: ", options.files.size(), options.folder);
        for (size_t i = 0; i < options.files.size() && i < 3; ++i)
            out += (i ? ", " : "") + options.files[i];
        if (options.files.size() > 3) out += ", and the figures";
        out += "\n";
    }
    out += "Linear-elastic plane-stress model; peak stresses are local. The engineer of record "
           "decides; local codes and licensed practice govern.\n";
    return out;
}

std::string summary_json(const check::CheckOutcome& o, const SummaryOptions& options) {
    using nlohmann::json;
    const UnitSystem units = o.connection.units;
    const check::CheckTable& t = o.table;
    json governing = json::array();
    for (size_t f = 0; f < std::size(check::all_families) && f < t.governing_by_family.size();
         ++f) {
        const int g = t.governing_by_family[f];
        if (g < 0) continue;
        const check::CheckRow& r = t.rows[static_cast<size_t>(g)];
        governing.push_back({{"family", check::word(r.family)},
                             {"id", r.id},
                             {"load_case", r.load_case},
                             {"ratio", r.ratio},
                             {"status", check::word(r.status)},
                             {"demand", from_internal(r.demand, r.quantity, units)},
                             {"capacity", from_internal(r.capacity, r.quantity, units)},
                             {"unit", std::string(unit_label(r.quantity, units))}});
    }
    return json{{"input_file", options.input_file},
                {"passes", t.passes()},
                {"max_ratio", t.governing >= 0 ? json(t.max_ratio()) : json()},
                {"governing",
                 t.governing >= 0 ? json(t.rows[static_cast<size_t>(t.governing)].id) : json()},
                {"by_family", governing},
                {"convergence_largest_change",
                 o.convergence.done ? json(o.convergence.largest_change()) : json()},
                {"folder", options.folder},
                {"files", options.files}}
               .dump() +
           "\n";
}

} // namespace lapwing::report
