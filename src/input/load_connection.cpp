// load_connection: the table of contents of the input stage.
#include "input/load_connection.hpp"

#include "core/error.hpp"
#include "input/sections.hpp"

#include <algorithm>

namespace lapwing::input {

namespace {

void read_units(Table& root, Context& context, model::Connection& connection) {
    Table units = root.table("units", true);
    const auto names = unit_system_names();
    const auto chosen =
        units.choice("system", names, units.present() ? std::nullopt : std::optional<int>(0));
    if (chosen) {
        connection.units = *parse_unit_system(names[static_cast<size_t>(*chosen)]);
        context.units = connection.units;
    }
    units.finish();
}

} // namespace

model::Connection load_connection(std::string_view toml_text, std::string_view file_name,
                                  const std::vector<std::string>& set_overrides) {
    Node tree = parse_document(toml_text, file_name);
    Context context;
    for (const auto& argument : set_overrides) apply_override(tree, argument, context);

    model::Connection connection;
    Table root(&tree, "", context);
    // Units first (they scale every number), then the names expressions may
    // use: parameters, then material values.
    read_units(root, context, connection);
    read_job(root, connection.job);
    read_parameters(root, context, connection.parameters);
    read_material(root, connection.material);

    PlateOrigins origins;
    read_plate(root, connection.plate, origins);
    read_bolt_groups(root, connection, origins);
    read_actions(root, connection);
    read_allowables(root, connection.allowables);
    read_mesh_and_report(root, connection);
    root.finish();

    if (origins.plate_ok && origins.bolts_ok) check_plate_geometry(connection, origins, context);

    if (!context.problems.empty()) {
        // Overrides (line 0) first, then in file order.
        std::stable_sort(context.problems.begin(), context.problems.end(),
                         [](const Diagnostic& a, const Diagnostic& b) {
                             if (a.line != b.line) return a.line < b.line;
                             return a.column < b.column;
                         });
        throw InputError(std::move(context.problems));
    }
    return connection;
}

std::string format_problems(const InputError& error) {
    std::string out;
    for (const auto& d : error.diagnostics()) out += d.format() + "\n";
    const size_t n = error.diagnostics().size();
    out +=
        std::to_string(n) + (n == 1 ? " problem" : " problems") + " found; nothing was written\n";
    return out;
}

} // namespace lapwing::input
