// Which files an output folder may hold: lapwing reuses a folder only when
// everything in it is one of its own outputs (or when told to with
// --force), so a mistyped -o never mixes the calc sheet into someone's
// files. Pure: cli/ lists the folder and passes the names in.
#pragma once

#include <optional>
#include <string>
#include <vector>

namespace lapwing::report {

// report.html, results.json, model.vtu and the figure files; also the
// temporary names an interrupted run may leave (".NAME.tmp-PID").
bool is_lapwing_output(const std::string& file_name);

// Why the folder may not be used, naming up to three foreign entries; empty
// when it may (or when `force`).
std::optional<std::string> refuse_folder(const std::string& folder,
                                         const std::vector<std::string>& entries, bool force);

} // namespace lapwing::report
