// The report stage's strings on a small real model (the lap-splice
// template on a coarse mesh, one mesh only): the calc sheet's required
// content, results.json against the analysis and against statics, model.vtu's
// counts and cell type, the figures' colour scale.
#include "check/pipeline.hpp"
#include "input/load_connection.hpp"
#include "report/colour_map.hpp"
#include "report/figures.hpp"
#include "report/outputs.hpp"
#include "report/terminal_summary.hpp"

#include <doctest/doctest.h>
#include <fmt/format.h>
#include <fstream>
#include <nlohmann/json.hpp>
#include <sstream>
#include <string>
#include <vector>

using namespace lapwing;

namespace {

const check::CheckOutcome& lap_splice() {
    static const check::CheckOutcome outcome = [] {
        std::ifstream in(std::string(LAPWING_SOURCE_DIR) + "/templates/lap-splice.toml");
        std::stringstream text;
        text << in.rdbuf();
        const auto c = input::load_connection(
            text.str(), "lap-splice.toml",
            {"mesh.size=40", "mesh.around_hole=8", "mesh.near_hole_size=10"});
        check::CheckOptions options;
        options.two_mesh = false;
        return check::check_connection(c, options);
    }();
    return outcome;
}

report::RunInfo run_info() {
    report::RunInfo run;
    run.version = "test";
    run.build_id = "test";
    run.command_line = "lapwing check lap-splice.toml";
    run.input_file = "lap-splice.toml";
    run.input_sha256 = std::string(64, '0');
    run.resolved_sha256 = std::string(64, '1');
    run.date = report::reproducible_date;
    run.reproducible = true;
    run.two_mesh = false;
    return run;
}

size_t count(const std::string& text, const std::string& what) {
    size_t n = 0;
    for (size_t at = text.find(what); at != std::string::npos; at = text.find(what, at + 1)) ++n;
    return n;
}

} // namespace

TEST_CASE("calc sheet: cautions, units, governing row, self-contained") {
    const auto& o = lap_splice();
    const auto figures = report::all_figures(o);
    const std::string html = report::calc_sheet_html(o, run_info(), figures);
    CHECK(html.find("engineer of record decides") != std::string::npos);
    CHECK(html.find("local codes and licensed practice govern") != std::string::npos);
    CHECK(html.find("Peak stresses are local and mesh dependent") != std::string::npos);
    CHECK(html.find("bolt pretension and slip") != std::string::npos);
    CHECK(html.find("Single mesh") != std::string::npos); // this run skipped the finer mesh
    CHECK(html.find("MPa") != std::string::npos);
    // Exactly one governing row, and it is the table's governing row.
    REQUIRE(o.table.governing >= 0);
    CHECK(count(html, "<tr class=\"governing\">") == 1);
    const auto& g = o.table.rows[static_cast<size_t>(o.table.governing)];
    const size_t row_at = html.find("<tr class=\"governing\">");
    CHECK(html.find(g.id, row_at) < html.find("</tr>", row_at));
    // Self-contained: no script, nothing fetched (the SVG namespace is a name, not a fetch).
    CHECK(html.find("<script") == std::string::npos);
    CHECK(html.find("src=") == std::string::npos);
    CHECK(html.find("<link") == std::string::npos);
    CHECK(html.find("@import") == std::string::npos);
    // Every figure inline, one <svg> each.
    CHECK(count(html, "<svg ") == figures.size());
}

TEST_CASE("results.json: matches the analysis, and the bolts balance the member force") {
    const auto& o = lap_splice();
    const auto j = nlohmann::json::parse(report::results_json(o, run_info()));
    CHECK(j["schema"] == "lapwing-results/1");
    CHECK(j["units"]["stress"] == "MPa");
    CHECK(j["mesh"]["nodes"] == o.mesh.nodes.size());
    CHECK(j["mesh"]["elements"] == o.mesh.n_elements());
    CHECK(j["checks"]["rows"].size() == o.table.rows.size());
    CHECK(j["verdict"]["governing"] == o.table.rows[static_cast<size_t>(o.table.governing)].id);
    CHECK(j["run"].contains("seconds") == false); // reproducible: no timings
    // Statics: the left bar's bolts carry the member's whole axial force,
    // tie_force = 260 000 N along −x (template value), to the solver's
    // precision (the rigid member end is in equilibrium with its springs).
    double fx = 0, fy = 0;
    for (const auto& b : j["cases"][0]["bolts"])
        if (b["group"] == "left_bar") {
            fx += b["force"][0].get<double>();
            fy += b["force"][1].get<double>();
        }
    CHECK(fx == doctest::Approx(-260000).epsilon(1e-6));
    CHECK(std::abs(fy) < 1e-6 * 260000);
}

namespace {
// The fields of one CSV line (RFC 4180: quoted fields may hold commas and
// doubled quotes).
std::vector<std::string> csv_fields(const std::string& line) {
    std::vector<std::string> out(1);
    bool quoted = false;
    for (size_t i = 0; i < line.size(); ++i) {
        const char ch = line[i];
        if (quoted && ch == '"' && i + 1 < line.size() && line[i + 1] == '"')
            out.back() += '"', ++i;
        else if (ch == '"')
            quoted = !quoted;
        else if (ch == ',' && !quoted)
            out.emplace_back();
        else
            out.back() += ch;
    }
    return out;
}
} // namespace

TEST_CASE("checks.csv: one line per check row, quoted per RFC 4180, the values of results.json") {
    const auto& o = lap_splice();
    const std::string csv = report::checks_csv(o);
    const auto j = nlohmann::json::parse(report::results_json(o, run_info()));
    std::vector<std::string> lines;
    for (size_t at = 0; at < csv.size();) {
        const size_t end = csv.find("\r\n", at);
        REQUIRE(end != std::string::npos); // every line ends in CRLF (RFC 4180 §2)
        lines.push_back(csv.substr(at, end - at));
        at = end + 2;
    }
    REQUIRE(lines.size() == o.table.rows.size() + 1);
    const std::vector<std::string> header = csv_fields(lines[0]);
    REQUIRE(header.size() == 12);
    CHECK(header[0] == "id");
    CHECK(header[11] == "governing");
    int governing = 0;
    for (size_t i = 0; i < o.table.rows.size(); ++i) {
        const std::vector<std::string> f = csv_fields(lines[i + 1]);
        const auto& row = j["checks"]["rows"][i];
        REQUIRE(f.size() == 12);
        CHECK(f[0] == row["id"].get<std::string>());
        CHECK(f[2] == row["what"].get<std::string>()); // commas and all
        CHECK(f[6] == row["unit"].get<std::string>());
        // Shortest round-trip text: the same doubles as results.json.
        CHECK(std::stod(f[7]) == row["demand"].get<double>());
        if (row["capacity"].is_null()) {
            CHECK(f[8].empty());
            CHECK(f[9].empty());
        } else {
            CHECK(std::stod(f[8]) == row["capacity"].get<double>());
            CHECK(std::stod(f[9]) == row["ratio"].get<double>());
        }
        CHECK(f[10] == row["status"].get<std::string>());
        governing += f[11] == "yes";
    }
    CHECK(governing == 1);
    CHECK(csv.find("\"") != std::string::npos); // some field needed quoting
}

TEST_CASE("model.vtu: counts, cell type 23 for Q8, one displacement array per case") {
    const auto& o = lap_splice();
    const std::string vtu = report::model_vtu(o);
    CHECK(vtu.find("NumberOfPoints=\"" + std::to_string(o.mesh.nodes.size()) + "\"") !=
          std::string::npos);
    CHECK(vtu.find("NumberOfCells=\"" + std::to_string(o.mesh.n_elements()) + "\"") !=
          std::string::npos);
    // VTK_QUADRATIC_QUAD = 23 (VTK file formats, cell types).
    CHECK(count(vtu, "\n23\n") + 1 >= static_cast<size_t>(o.mesh.n_elements()));
    CHECK(count(vtu, "_displacement\"") == o.results.cases.size());
}

TEST_CASE("figures: contour uses the viridis ends, legend in the user's stress unit") {
    const auto& o = lap_splice();
    const std::string svg = report::contour_svg(o, report::figure_case(o));
    CHECK(svg.find(report::hex(report::viridis(0.05))) != std::string::npos);
    CHECK(svg.find(report::hex(report::viridis(0.95))) != std::string::npos);
    CHECK(svg.find("von Mises, MPa") != std::string::npos);
    const double scale = report::deformed_scale(o, 0);
    CHECK(scale > 0);
    CHECK(report::deformed_svg(o, 0, scale).find(fmt::format("{:g}", scale)) != std::string::npos);
}

TEST_CASE("terminal summary: verdict, where the files went, colour only when asked") {
    const auto& o = lap_splice();
    report::SummaryOptions plain{false, "lap-splice.toml", "out", {"report.html", "results.json"}};
    const std::string text = report::terminal_summary(o, plain);
    CHECK(text.find("wrote 2 files to out") != std::string::npos);
    CHECK(text.find("\x1b[") == std::string::npos);
    report::SummaryOptions coloured = plain;
    coloured.colour = true;
    CHECK(report::terminal_summary(o, coloured).find("\x1b[") != std::string::npos);
    const auto j = nlohmann::json::parse(report::summary_json(o, plain));
    CHECK(j["passes"] == o.table.passes());
    CHECK(j["files"].size() == 2);
}
