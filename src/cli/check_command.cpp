// `lapwing check FILE`: the whole pipeline and a compact summary of the
// check table: the governing row per family and overall, and the verdict.
// The calc sheet and data files are written by the report stage.
#include "check/pipeline.hpp"
#include "cli/commands.hpp"
#include "cli/files.hpp"
#include "core/error.hpp"
#include "input/load_connection.hpp"

#include <fmt/format.h>
#include <iterator>
#include <ostream>

namespace lapwing::cli {

namespace {

std::string value_text(double v, Quantity q, UnitSystem units) {
    return fmt::format("{:.4g} {}", from_internal(v, q, units), unit_label(q, units));
}

void print_summary(const check::CheckOutcome& o, const std::string& file, std::ostream& out) {
    const model::Connection& c = o.connection;
    const check::CheckTable& t = o.table;
    out << fmt::format("{}: {} {} elements, {} dofs", file, o.mesh.n_elements(),
                       fe::name(o.mesh.kind), o.results.problem.model.n_dofs());
    if (o.convergence.done)
        out << fmt::format("; convergence mesh {} elements, largest change {:.1f} %",
                           o.convergence.fine_elements, 100 * o.convergence.largest_change());
    out << "\n";
    out << fmt::format("{:<28} {:>7}  {:<6} {}\n", "check family", "ratio", "status",
                       "governing row");
    for (size_t f = 0; f < std::size(check::all_families); ++f) {
        const int g = t.governing_by_family[f];
        if (g < 0) continue;
        const check::CheckRow& r = t.rows[static_cast<size_t>(g)];
        out << fmt::format("{:<28} {:>7.3f}  {:<6} {} ({}), {}: {} / {}\n",
                           check::title(check::all_families[f]), r.ratio, check::word(r.status),
                           r.what, r.where, r.load_case, value_text(r.demand, r.quantity, c.units),
                           value_text(r.capacity, r.quantity, c.units));
    }
    if (t.governing < 0) {
        out << "No allowables given: every row is for information only.\n";
    } else {
        const check::CheckRow& r = t.rows[static_cast<size_t>(t.governing)];
        out << fmt::format("{}: highest ratio {:.3f}, {} in {}\n",
                           t.passes() ? "ALL CHECKS PASS" : "A CHECK FAILS", r.ratio, r.what,
                           r.load_case);
    }
    out << "Linear-elastic plane-stress model; peak stresses are local. The engineer of record "
           "decides; local codes and licensed practice govern.\n";
}

} // namespace

int run_check(const CheckArgs& args, std::ostream& out, std::ostream& err) {
    try {
        const auto c = input::load_connection(read_input_file(args.file), args.file, args.sets);
        check::CheckOptions options;
        options.two_mesh = !args.single_mesh;
        const check::CheckOutcome o = check::check_connection(c, options);
        if (!args.quiet) print_summary(o, args.file, out);
        return static_cast<int>(o.table.passes() ? ExitCode::all_pass : ExitCode::check_failed);
    } catch (...) {
        return report_failure(err);
    }
}

} // namespace lapwing::cli
