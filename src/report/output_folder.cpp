// Recognising lapwing's own outputs in an output folder.
#include "report/output_folder.hpp"

#include <fmt/format.h>

namespace lapwing::report {

bool is_lapwing_output(const std::string& name) {
    if (name.starts_with(".") && name.find(".tmp-") != std::string::npos)
        return is_lapwing_output(name.substr(1, name.find(".tmp-") - 1));
    for (const char* fixed :
         {"report.html", "results.json", "model.vtu", "checks.csv", "geometry.svg", "mesh.svg",
          "contour.svg", "deformed.svg", "bolt-forces.svg"})
        if (name == fixed) return true;
    // Per-case figures (contour-CASE.svg, …) and section profiles; the
    // single-case names above are those of earlier versions.
    if (!name.ends_with(".svg")) return false;
    for (const char* prefix : {"section-", "contour-", "deformed-", "bolt-forces-"})
        if (name.starts_with(prefix)) return true;
    return false;
}

std::optional<std::string> refuse_folder(const std::string& folder,
                                         const std::vector<std::string>& entries, bool force) {
    if (force) return std::nullopt;
    std::vector<std::string> foreign;
    for (const std::string& e : entries)
        if (!is_lapwing_output(e)) foreign.push_back(e);
    if (foreign.empty()) return std::nullopt;
    std::string list;
    for (size_t i = 0; i < foreign.size() && i < 3; ++i) list += (i ? ", " : "") + foreign[i];
    if (foreign.size() > 3) list += fmt::format(" and {} more", foreign.size() - 3);
    return fmt::format("output folder {} holds files that are not lapwing outputs ({}); choose "
                       "another folder with -o, or pass --force to write into it anyway",
                       folder, list);
}

} // namespace lapwing::report
