// The bad-input corpus (tests/cases/bad_input/): every case must give exit
// code 2 and messages containing each expected fragment, with its line.
#include "input/load_connection.hpp"

#include <doctest/doctest.h>
#include <filesystem>
#include <fstream>
#include <set>
#include <sstream>
#include <string>
#include <vector>

namespace {

namespace fs = std::filesystem;
const fs::path corpus = fs::path(LAPWING_SOURCE_DIR) / "tests" / "cases" / "bad_input";

std::string read(const fs::path& path) {
    std::ifstream in(path, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

struct Case {
    std::string file;
    std::vector<std::string> sets;
    int exit_code = -1;
    std::vector<std::string> expects;
};

// The "# set:", "# exit:" and "# expect:" lines at the end of a case file.
Case parse_case(const std::string& file, const std::string& text) {
    Case c;
    c.file = file;
    std::istringstream lines(text);
    std::string line;
    auto after = [&](const std::string& tag) {
        return line.rfind(tag, 0) == 0 ? line.substr(tag.size()) : std::string();
    };
    while (std::getline(lines, line)) {
        if (auto v = after("# set: "); !v.empty()) c.sets.push_back(v);
        if (auto v = after("# exit: "); !v.empty()) c.exit_code = std::stoi(v);
        if (auto v = after("# expect: "); !v.empty()) c.expects.push_back(v);
    }
    return c;
}

// The files the index (README.md) lists, in its order.
std::vector<std::string> indexed_files() {
    std::vector<std::string> out;
    std::istringstream lines(read(corpus / "README.md"));
    std::string line;
    while (std::getline(lines, line)) {
        if (line.rfind("| ", 0) != 0) continue;
        const std::string name = line.substr(2, line.find(" |", 2) - 2);
        if (name.size() > 5 && name.substr(name.size() - 5) == ".toml") out.push_back(name);
    }
    return out;
}

// What `lapwing validate` would give: the exit code and the text on stderr.
std::pair<int, std::string> run(const std::string& text, const std::vector<std::string>& sets) {
    try {
        lapwing::input::load_connection(text, "case.toml", sets);
        return {0, ""};
    } catch (const lapwing::InputError& e) {
        return {2, lapwing::input::format_problems(e)};
    }
}

} // namespace

TEST_CASE("the bad-input index lists every case file, and there are at least 40") {
    const auto listed = indexed_files();
    std::set<std::string> in_index(listed.begin(), listed.end());
    int on_disk = 0;
    for (const auto& entry : fs::directory_iterator(corpus)) {
        if (entry.path().extension() != ".toml") continue;
        ++on_disk;
        INFO(entry.path().filename().string());
        CHECK(in_index.count(entry.path().filename().string()) == 1);
    }
    CHECK(on_disk == static_cast<int>(listed.size()));
    CHECK(listed.size() >= 40);
}

TEST_CASE("every bad-input case gives exit code 2 and its expected messages") {
    for (const auto& file : indexed_files()) {
        const std::string text = read(corpus / file);
        const Case c = parse_case(file, text);
        INFO("case ", file);
        REQUIRE(c.exit_code == 2);
        REQUIRE(!c.expects.empty());
        // Not a structured binding: clang 14 cannot capture one in INFO's lambda.
        const auto outcome = run(text, c.sets);
        const int code = outcome.first;
        const std::string& messages = outcome.second;
        INFO("messages:\n", messages);
        CHECK(code == c.exit_code);
        for (const auto& fragment : c.expects) {
            INFO("expected fragment: ", fragment);
            CHECK(messages.find(fragment) != std::string::npos);
        }
    }
}
