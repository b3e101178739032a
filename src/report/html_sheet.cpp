// report.html: the calc sheet in reading order. Title block and verdict,
// scope and cautions, resolved inputs, figures, results, checks with the
// convergence evidence, traceability. One file: CSS and SVG inline, no
// script, nothing fetched.
#include "report/html_parts.hpp"
#include "report/outputs.hpp"
#include "report/text_format.hpp"

#include <fmt/format.h>

namespace lapwing::report {

namespace {

std::string title_block(const check::CheckOutcome& o, const RunInfo& run) {
    const model::Job& j = o.connection.job;
    const auto cell = [](const char* label, const std::string& value) {
        return fmt::format("<div><span>{}</span>{}</div>", label,
                           value.empty() ? "&nbsp;" : escape(value));
    };
    std::string h = "<div class=\"title-block\">";
    h +=
        cell("project", j.project) + cell("connection mark", j.mark) + cell("revision", j.revision);
    h += cell("prepared by", j.prepared_by) + cell("checked by", j.checked_by) +
         cell("date", run.date);
    h += cell("program", run.program + " " + run.version) + cell("build", run.build_id) +
         cell("input", run.input_file);
    h += "</div>\n";
    if (!j.notes.empty()) h += "<p class=\"muted\">" + escape(j.notes) + "</p>\n";
    return h;
}

std::string verdict(const check::CheckOutcome& o) {
    const check::CheckTable& t = o.table;
    if (t.governing < 0)
        return "<div class=\"verdict info\">No capacity was given: every row is for information "
               "only.</div>\n";
    const check::CheckRow& r = t.rows[static_cast<size_t>(t.governing)];
    return fmt::format("<div class=\"verdict {}\">{} — governing ratio {:.3f}: {} ({}), {}</div>\n",
                       t.passes() ? "pass" : "fail",
                       t.passes() ? "Every check passes" : "A check fails", r.ratio, escape(r.what),
                       escape(r.id), escape(r.load_case));
}

std::string cautions(const check::CheckOutcome& o, const RunInfo& run) {
    std::string h = "<h2>Scope and cautions</h2>\n<ul class=\"cautions\">\n";
    h += "<li><b>Model.</b> Linear-elastic, plane-stress finite elements of the plate alone ("
         "isoparametric quadrilaterals). Material stays elastic; no yielding, no redistribution."
         "</li>\n";
    h += "<li><b>Modelled:</b> the plate outline, holes and cut-outs; each bolt as a node tied to "
         "its hole with a shear spring to its member; member ends as rigid bodies carrying the "
         "entered forces; welded edges as fixed edges; symmetry lines; edge loads.</li>\n";
    h += "<li><b>Not modelled:</b> bolt pretension and slip (the bolts carry load in bearing from "
         "the first newton); friction; out-of-plane bending and out-of-plane buckling of the "
         "plate, unless a buckling row in the check table says otherwise; the members' own "
         "stresses; weld metal and heat-affected zones; residual stresses.</li>\n";
    h += fmt::format(
        "<li><b>Peak stresses are local and mesh dependent.</b> At hole edges and re-entrant "
        "corners a peak grows as the mesh is refined; compare it with an allowable meant for "
        "local peaks, and use the section-averaged rows for the plate's strength. The peak "
        "rows keep bolt holes apart: within {:.3g} hole diameters of a bolt hole's edge "
        "(<code>[allowables.peak] bolt_hole_zone</code>) the elastic peak stands in for the "
        "bolt's bearing pressure, which the bearing and tear-out rows check; "
        "<code>peak_von_mises</code> applies to the rest of the plate (re-entrant corners, "
        "copes, free edges). The bearing field fades gradually, so the row away from the holes "
        "often peaks at the zone's edge: widen the zone only with judgement.</li>\n",
        o.connection.allowables.peak.bolt_hole_zone);
    if (!run.two_mesh || !o.convergence.done)
        h += "<li><b>Single mesh.</b> This run skipped the finer convergence mesh.</li>\n";
    h += "<li><b>Capacities are the user's.</b> lapwing evaluates the allowables and published "
         "forms named in each row with the values entered; it does not claim compliance with "
         "any code.</li>\n";
    h += "<li><b>The engineer of record decides.</b> This record supports, and does not replace, "
         "the engineer's judgement; local codes and licensed practice govern.</li>\n</ul>\n";
    return h;
}

// "(also FILE)" only when the .svg files are written beside the sheet.
std::string figure_html(const Figure& f, const char* heading, bool files_written) {
    return fmt::format("<figure id=\"fig-{0}\"><{1}>{2}</{1}>\n{3}<figcaption>{4}{5}"
                       "</figcaption></figure>\n",
                       escape(f.file), heading, escape(f.title), f.svg, escape(f.caption),
                       files_written ? " (also " + escape(f.file) + ")" : std::string());
}

// Figures grouped as a reviewer reads them: the model (geometry, mesh),
// then one group per load case or combination (its contour, deformed shape
// and bolt forces side by side), then the section profiles; a list of the
// groups first, so a case is one click away.
std::string figures_html(const check::CheckOutcome& o, const std::vector<Figure>& figures) {
    struct Group {
        std::string id, heading;
        std::vector<const Figure*> members;
        bool per_case = false;
    };
    std::vector<Group> groups;
    const int governing = figure_case(o);
    const std::string governing_case = governing >= 0 && o.table.governing >= 0
                                           ? o.results.cases[static_cast<size_t>(governing)].name
                                           : std::string();
    for (const Figure& f : figures) {
        std::string key = f.kind == "section" ? "sections" : f.load_case;
        if (groups.empty() || groups.back().id != key) {
            Group g;
            g.id = key;
            if (f.load_case.empty()) {
                g.heading = "Model";
            } else if (f.kind == "section") {
                g.heading = "Section stress profiles, load case " + f.load_case;
            } else {
                bool combination = false;
                for (const analysis::CaseResult& r : o.results.cases)
                    if (r.name == f.load_case) combination = r.combination;
                g.heading = (combination ? "Combination " : "Load case ") + f.load_case +
                            (f.load_case == governing_case ? " (governing)" : "");
                g.per_case = true;
            }
            groups.push_back(std::move(g));
        }
        groups.back().members.push_back(&f);
    }
    std::string h = "<h2>Figures</h2>\n<ul class=\"figure-index\">";
    for (size_t i = 0; i < groups.size(); ++i)
        h += fmt::format("<li><a href=\"#figures-{}\">{}</a></li>", i, escape(groups[i].heading));
    h += "</ul>\n";
    for (size_t i = 0; i < groups.size(); ++i) {
        const Group& g = groups[i];
        h += fmt::format("<div class=\"figure-group{}\" id=\"figures-{}\"><h3>{}</h3>\n",
                         g.per_case ? " per-case" : "", i, escape(g.heading));
        for (const Figure* f : g.members) h += figure_html(*f, "h4", o.connection.report.figures);
        h += "</div>\n";
    }
    return h;
}

std::string traceability(const check::CheckOutcome& o, const RunInfo& run) {
    std::string h = "<h2>Traceability</h2>\n<table>";
    h +=
        row({"program", escape(run.program + " " + run.version + " (build " + run.build_id + ")")});
    h += row({"command line", "<code>" + escape(run.command_line) + "</code>"});
    h += row({"date", escape(run.date) + (run.reproducible ? " (fixed: --reproducible)" : "")});
    h += row({"input file", escape(run.input_file)});
    h += row({"SHA-256 of the input file", "<code>" + escape(run.input_sha256) + "</code>"});
    h += row({"SHA-256 of the resolved model", "<code>" + escape(run.resolved_sha256) + "</code>"});
    if (!run.reproducible)
        h += row({"time (s)", fmt::format("mesh {:.2f}, analysis {:.2f}, checks {:.2f}, "
                                          "convergence mesh {:.2f}",
                                          o.seconds.mesh, o.seconds.analysis, o.seconds.checks,
                                          o.seconds.fine_mesh)});
    h += "</table>\n<h3>Resolved model</h3>\n<p>The model exactly as analysed, as a template of "
         "plain numbers (<code>lapwing validate --resolved</code>); its SHA-256 is the one "
         "above.</p>\n<pre>" +
         escape(run.resolved_model) + "</pre>\n";
    return h;
}

} // namespace

std::string calc_sheet_html(const check::CheckOutcome& o, const RunInfo& run,
                            const std::vector<Figure>& figures) {
    const model::Job& j = o.connection.job;
    const std::string title = (j.title.empty() ? std::string("Connection plate check") : j.title) +
                              (j.mark.empty() ? "" : " — " + j.mark);
    std::string h = "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n";
    h += "<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n";
    h += "<title>" + escape(title) + "</title>\n<style>" + sheet_style(j) + "</style>\n</head>\n";
    h += "<body>\n<section class=\"sheet\" id=\"summary\">\n<h1>" + escape(title) + "</h1>\n";
    h += "<p class=\"muted\">Calculation record of a connection plate by plane-stress finite "
         "elements</p>\n";
    h += title_block(o, run) + verdict(o) + cautions(o, run) + "</section>\n";
    h += "<section class=\"sheet\" id=\"inputs\">\n" + inputs_html(o) + "</section>\n";
    h += "<section class=\"sheet\" id=\"figures\">\n" + figures_html(o, figures) + "</section>\n";
    h += "<section class=\"sheet\" id=\"results\">\n" + results_html(o) + "</section>\n";
    h += "<section class=\"sheet\" id=\"checks\">\n" + check_table_html(o) + convergence_html(o) +
         "</section>\n";
    h += "<section class=\"sheet\" id=\"traceability\">\n" + traceability(o, run) + "</section>\n";
    return h + "</body>\n</html>\n";
}

} // namespace lapwing::report
