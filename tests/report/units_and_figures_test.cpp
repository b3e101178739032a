// Locations and figure dimensions in the template's own units (a kip-in
// template reads inches and ksi, never a silent mix with millimetres), and
// the figures of every load case with distinct, space-free file names.
#include "check/pipeline.hpp"
#include "report/figures.hpp"
#include "report/outputs.hpp"
#include "support/templates.hpp"

#include <doctest/doctest.h>
#include <fmt/format.h>
#include <regex>
#include <set>

using namespace lapwing;

namespace {

check::CheckOutcome run(const std::string& name, const std::vector<std::string>& sets) {
    const auto c = test::load_template(name, sets);
    check::CheckOptions options;
    options.two_mesh = false;
    return check::check_connection(c, options);
}

// The flange splice is the shipped kip-in template (its [units] system).
const check::CheckOutcome& flange_splice() {
    static const check::CheckOutcome o = run(
        "flange-splice.toml", {"mesh.size=1.5", "mesh.around_hole=8", "mesh.near_hole_size=0.5"});
    return o;
}

// "mm" as a unit word (not inside "mmm" or a name such as "comm").
bool has_mm(const std::string& text) {
    static const std::regex mm(R"((^|[^A-Za-z])mm([^A-Za-z]|$))");
    return std::regex_search(text, mm);
}

} // namespace

TEST_CASE("units: every where text of a kip-in template is in inches") {
    const auto& o = flange_splice();
    REQUIRE(o.connection.units == UnitSystem::kip_in);
    int bearing = 0;
    for (const check::CheckRow& r : o.table.rows) {
        CHECK_MESSAGE(!has_mm(r.where), r.id << ": " << r.where);
        CHECK_MESSAGE(!has_mm(r.note), r.id << ": " << r.note);
        CHECK_MESSAGE(r.what.find("MPa") == std::string::npos, r.id << ": " << r.what);
        if (r.method == "user allowable")
            CHECK_MESSAGE(r.formula.find("MPa") == std::string::npos, r.id << ": " << r.formula);
        if (r.family != check::Family::bearing) continue;
        // "bolt G[k] at (x, y) in": the centre the analysis used, divided by
        // 25.4 mm per inch (exact, NIST SP 811 appendix B), to the 0.01 in shown.
        std::smatch m;
        REQUIRE_MESSAGE(
            std::regex_search(r.where, m,
                              std::regex(R"(\[(\d+)\] at \((-?[\d.]+), (-?[\d.]+)\) in)")),
            r.where);
        const int k = std::stoi(m[1]);
        bool found = false;
        for (const auto& b : o.results.problem.bolts) {
            const auto& g = o.connection.bolt_groups[static_cast<size_t>(b.group)];
            if (b.bolt != k || r.where.find(g.name + "[") == std::string::npos) continue;
            CHECK(std::abs(std::stod(m[2]) - b.centre.x() / 25.4) <= 0.0051);
            CHECK(std::abs(std::stod(m[3]) - b.centre.y() / 25.4) <= 0.0051);
            found = true;
        }
        CHECK_MESSAGE(found, r.where);
        ++bearing;
    }
    CHECK(bearing > 0);
    for (const check::PeakStress& p : o.peaks) CHECK_MESSAGE(!has_mm(p.near), p.near);
}

TEST_CASE("units: the same rows of an N-mm template are in millimetres") {
    // The check above could pass by printing no unit at all: here the
    // millimetres must be there.
    const auto o =
        run("lap-splice.toml", {"mesh.size=40", "mesh.around_hole=8", "mesh.near_hole_size=10"});
    REQUIRE(o.connection.units != UnitSystem::kip_in);
    int with_mm = 0;
    for (const check::CheckRow& r : o.table.rows)
        if (r.family == check::Family::bearing) with_mm += has_mm(r.where) ? 1 : 0;
    CHECK(with_mm > 0);
}

TEST_CASE("units: figures of a kip-in template dimension in inches") {
    const auto& o = flange_splice();
    const auto figures = report::all_figures(o);
    for (const report::Figure& f : figures) {
        CHECK_MESSAGE(!has_mm(f.svg), f.file);
        CHECK_MESSAGE(!has_mm(f.caption), f.file << ": " << f.caption);
    }
    // The geometry figure's overall width: the mesh's extent in x over
    // 25.4 mm per inch (NIST SP 811), 4 significant digits as on the sheet.
    double lo = 1e300, hi = -1e300;
    for (const auto& p : o.mesh.nodes) {
        lo = std::min(lo, p.x());
        hi = std::max(hi, p.x());
    }
    const std::string width = fmt::format(">{:.4g} in<", (hi - lo) / 25.4);
    CHECK_MESSAGE(figures[0].svg.find(width) != std::string::npos, width);
    for (const report::Figure& f : figures)
        if (f.kind == "section")
            CHECK(f.svg.find("distance along the line, in") != std::string::npos);
}

TEST_CASE("figures: contour, deformed shape and bolt forces for every case, distinct names") {
    // Four cases whose names as typed collide once made file-safe ("D+L"
    // and "D L" are both "D_L"); the figures only read the case results.
    check::CheckOutcome o = flange_splice();
    REQUIRE(!o.results.cases.empty());
    const analysis::CaseResult first = o.results.cases[0];
    o.results.cases.clear();
    for (const char* name : {"D+L", "D L", "1.2D + 1.6L", "wind/west"}) {
        o.results.cases.push_back(first);
        o.results.cases.back().name = name;
    }
    o.section_stress.assign(4, o.section_stress.empty() ? std::vector<check::SectionStress>{}
                                                        : o.section_stress[0]);
    const auto figures = report::all_figures(o);
    std::set<std::string> files;
    std::map<std::string, std::set<std::string>> kinds_by_case;
    for (const report::Figure& f : figures) {
        CHECK_MESSAGE(files.insert(f.file).second, "duplicate " << f.file);
        CHECK(std::regex_match(f.file, std::regex(R"([A-Za-z0-9._-]+\.svg)")));
        if (!f.load_case.empty() && f.kind != "section") kinds_by_case[f.load_case].insert(f.kind);
    }
    CHECK(kinds_by_case.size() == 4);
    const std::set<std::string> per_case = {"contour", "deformed", "bolt-forces"};
    for (const auto& entry : kinds_by_case) CHECK_MESSAGE(entry.second == per_case, entry.first);
    CHECK(files.count("contour-D_L.svg") == 1);
    CHECK(files.count("contour-D_L-2.svg") == 1);
    CHECK(files.count("contour-1.2D___1.6L.svg") == 1);

    // The sheet groups them per case, and results.json lists every one.
    report::RunInfo run;
    run.input_sha256 = run.resolved_sha256 = std::string(64, '0');
    run.date = report::reproducible_date;
    const std::string html = report::calc_sheet_html(o, run, figures);
    for (const char* heading : {"Load case D+L", "Load case D L", "Load case 1.2D + 1.6L"})
        CHECK_MESSAGE(html.find(heading) != std::string::npos, heading);
    const std::string json = report::results_json(o, run, figures);
    for (const std::string& f : files)
        CHECK_MESSAGE(json.find("\"file\": \"" + f + "\"") != std::string::npos, f);
}
