// The calc sheet's look: inline CSS for screen and print. On paper each
// major part starts a new sheet, figures and table rows are not split, and
// every sheet carries project / mark / revision and "sheet x of y" in its
// margin boxes (CSS Paged Media; Chromium draws them when printing without
// its own header and footer).
#include "report/html_parts.hpp"

namespace lapwing::report {

namespace {

// Text inside a CSS string literal: quotes and backslashes escaped, line
// breaks dropped.
std::string css_string(const std::string& text) {
    std::string out;
    for (char c : text) {
        if (c == '"' || c == '\\') out += '\\';
        if (c == '\n' || c == '\r') c = ' ';
        if (c == '<') {
            out += "\\3c ";
            continue;
        }
        out += c;
    }
    return out;
}

} // namespace

std::string sheet_style(const model::Job& job) {
    std::string header = job.project.empty() ? "Calculation" : job.project;
    if (!job.mark.empty()) header += " · connection " + job.mark;
    if (!job.revision.empty()) header += " · revision " + job.revision;
    std::string css = R"css(
:root { --ink: #1d232b; --muted: #5b6573; --rule: #c9d0d9; --band: #f3f5f8; --accent: #1f5fa8;
        --pass: #2e7d32; --fail: #b3261e; --info: #6b7280; }
* { box-sizing: border-box; }
body { font-family: "Helvetica Neue", Helvetica, Arial, sans-serif; color: var(--ink);
       margin: 0 auto; max-width: 1000px; padding: 24px 32px; line-height: 1.4; font-size: 14px; }
h1 { font-size: 22px; margin: 0 0 4px; }
h2 { font-size: 17px; border-bottom: 2px solid var(--accent); padding-bottom: 3px; margin-top: 32px; }
h3 { font-size: 14.5px; margin: 20px 0 6px; }
table { border-collapse: collapse; width: 100%; margin: 6px 0 14px; font-size: 12.5px; }
th, td { border-bottom: 1px solid var(--rule); padding: 3px 6px; text-align: left; vertical-align: top; }
th { background: var(--band); font-weight: 600; }
td.n { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
.title-block { display: grid; grid-template-columns: repeat(3, 1fr); border: 1.5px solid var(--ink); }
.title-block div { border: 0.5px solid var(--rule); padding: 4px 8px; }
.title-block span { display: block; font-size: 10.5px; color: var(--muted); text-transform: uppercase;
                    letter-spacing: 0.04em; }
.verdict { font-size: 16px; font-weight: 700; padding: 8px 12px; margin: 14px 0; border-left: 6px solid; }
.verdict.pass { border-color: var(--pass); background: #eaf4ea; }
.verdict.fail { border-color: var(--fail); background: #fbeaea; }
.verdict.info { border-color: var(--info); background: var(--band); }
.cautions li { margin: 3px 0; }
figure { margin: 12px 0 20px; break-inside: avoid; page-break-inside: avoid; }
figure svg { max-width: 100%; height: auto; display: block; border: 1px solid var(--rule); background: #fff; }
figcaption { font-size: 12px; color: var(--muted); margin-top: 4px; }
h4 { font-size: 13px; margin: 0 0 4px; }
.figure-index { columns: 2; font-size: 12.5px; padding-left: 18px; }
.figure-group > h3 { border-bottom: 1px solid var(--rule); padding-bottom: 2px; }
.figure-group.per-case { display: grid; grid-template-columns: 1fr 1fr; column-gap: 16px; }
.figure-group.per-case > h3 { grid-column: 1 / -1; }
.figure-group.per-case figure { margin: 6px 0 12px; }
/* The contour spans the page so that its legend stays legible; the deformed
   shape and the bolt forces share the row below. */
.figure-group.per-case figure:first-of-type { grid-column: 1 / -1; }
.bar { position: relative; width: 120px; height: 11px; background: var(--band); border: 1px solid var(--rule); }
.bar i { position: absolute; left: 0; top: 0; bottom: 0; background: var(--pass); }
.bar.fail i { background: var(--fail); }
.bar b { position: absolute; left: 83.3%; top: -2px; bottom: -2px; border-left: 1.5px solid var(--ink); }
tr.governing td { background: #fff4cc; font-weight: 600; }
/* Ten columns must fit a portrait A4 or Letter page: long ids wrap anywhere
   and the worked formulas are small, so the status stays on the paper. */
table.checks th:first-child { width: 17%; }
table.checks td:first-child { overflow-wrap: anywhere; }
table.checks td .muted { font-size: 10.5px; }
.status-pass { color: var(--pass); font-weight: 600; }
.status-fail { color: var(--fail); font-weight: 700; }
.status-info { color: var(--info); }
pre { background: var(--band); padding: 8px; font-size: 11px; white-space: pre-wrap; word-break: break-all; }
.muted { color: var(--muted); }
@media print {
  body { max-width: none; padding: 0; font-size: 10.5pt; }
  section.sheet { break-before: page; page-break-before: always; }
  section.sheet:first-of-type { break-before: auto; }
  h2 { margin-top: 0; }
  .figure-group.per-case { break-inside: avoid; page-break-inside: avoid; }
  table.checks { font-size: 7.5pt; }
  table.checks td .muted { font-size: 6.5pt; }
  table.checks .bar { width: 48px; }
  tr, .title-block { break-inside: avoid; page-break-inside: avoid; }
  thead { display: table-header-group; }
  * { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
}
@page { margin: 16mm 13mm 15mm 13mm;
  @top-left { content: ")css";
    css += css_string(header);
    css += R"css("; font-size: 8pt; color: #5b6573; }
  @top-right { content: "Sheet " counter(page) " of " counter(pages); font-size: 8pt; color: #5b6573; }
  @bottom-left { content: "lapwing calc sheet · linear-elastic plane-stress model · the engineer of record decides"; font-size: 7pt; color: #5b6573; }
}
)css";
    return css;
}

} // namespace lapwing::report
