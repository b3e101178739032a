// Every shipped template and demo project validates, and round-trips: the
// resolved template written back out loads to the same summary.
#include "input/load_connection.hpp"

#include <algorithm>
#include <doctest/doctest.h>
#include <filesystem>
#include <fstream>
#include <set>
#include <sstream>

namespace {

namespace fs = std::filesystem;

std::string read(const fs::path& path) {
    std::ifstream in(path, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

// templates/*.toml and projects/*/*.toml.
std::vector<fs::path> shipped_files() {
    std::vector<fs::path> out;
    const fs::path root(LAPWING_SOURCE_DIR);
    for (const auto& e : fs::directory_iterator(root / "templates"))
        if (e.path().extension() == ".toml") out.push_back(e.path());
    for (const auto& e : fs::recursive_directory_iterator(root / "projects"))
        if (e.path().extension() == ".toml") out.push_back(e.path());
    std::sort(out.begin(), out.end());
    return out;
}

std::string load_and_summarize(const std::string& text, const std::string& name,
                               const std::vector<std::string>& sets = {}) {
    try {
        return lapwing::input::summarize(lapwing::input::load_connection(text, name, sets));
    } catch (const lapwing::InputError& e) {
        FAIL_CHECK(e.what());
        return "";
    }
}

} // namespace

TEST_CASE("templates/ ships the five connection kinds of the issue") {
    std::vector<std::string> kinds;
    for (const auto& p : shipped_files())
        if (p.parent_path().filename() == "templates") kinds.push_back(p.stem().string());
    CHECK(kinds == std::vector<std::string>{"corner-gusset", "flange-splice", "lap-splice",
                                            "truss-gusset", "web-splice"});
}

TEST_CASE("every template and project validates, and its resolved form gives the same summary") {
    const auto files = shipped_files();
    CHECK(files.size() >= 6); // five templates and at least one project
    for (const auto& path : files) {
        INFO(path.filename().string());
        const std::string text = read(path);
        const std::string summary = load_and_summarize(text, path.filename().string());
        REQUIRE(!summary.empty());
        // Stable: a second load gives the identical text.
        CHECK(load_and_summarize(text, path.filename().string()) == summary);
        // Round trip: write every value resolved, load that, summarize again.
        const auto connection = lapwing::input::load_connection(text, path.filename().string(), {});
        const std::string resolved = lapwing::input::write_resolved(connection);
        CHECK(load_and_summarize(resolved, "resolved.toml") == summary);
    }
}

TEST_CASE("every block of a template is explained by a comment") {
    // Blocks are separated by blank lines. Each block holding keys starts with
    // a comment, unless it repeats a [[table]] explained earlier in the file.
    for (const auto& path : shipped_files()) {
        if (path.parent_path().filename() != "templates") continue;
        INFO(path.filename().string());
        const std::string text = read(path);
        CHECK(text.rfind("# lapwing template: ", 0) == 0);
        std::istringstream lines(text);
        std::string line, first;
        std::set<std::string> explained;
        bool in_block = false, has_key = false;
        int number = 0, block_start = 0;
        auto close_block = [&] {
            if (!in_block) return;
            const bool starts_with_comment = first.rfind("#", 0) == 0;
            const bool repeats = first.rfind("[[", 0) == 0 && explained.count(first) > 0;
            INFO("block at line ", block_start, ": ", first);
            if (has_key) CHECK((starts_with_comment || repeats));
            in_block = has_key = false;
        };
        std::string last_comment_header;
        bool after_comment = false;
        while (std::getline(lines, line)) {
            ++number;
            if (line.find_first_not_of(' ') == std::string::npos) {
                close_block();
                after_comment = false;
                continue;
            }
            if (!in_block) {
                in_block = true;
                first = line;
                block_start = number;
            }
            if (line[0] == '#')
                after_comment = true;
            else if (line[0] == '[' && after_comment)
                explained.insert(line);
            else if (line.find(" = ") != std::string::npos)
                has_key = true;
        }
        close_block();
    }
}
