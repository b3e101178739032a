// SIGINT during a sweep, with a real signal to the real executable: a clear
// message, exit code 130 (128 + SIGINT, the shell convention), the completed
// rows kept in sweep-interrupted.csv, whole, and no partial file: no
// sweep.csv, no sweep.html, no temporary file left behind.
#include <algorithm>
#include <chrono>
#include <csignal>
#include <cstdlib>
#include <doctest/doctest.h>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <sys/wait.h>
#include <unistd.h>
#include <vector>

namespace fs = std::filesystem;

TEST_CASE("SIGINT keeps the completed rows and writes no partial file") {
    const fs::path folder =
        fs::temp_directory_path() / ("lapwing-sweep-int-" + std::to_string(::getpid()));
    fs::remove_all(folder);
    fs::create_directories(folder);
    const std::string tmpl = std::string(LAPWING_SOURCE_DIR) + "/templates/lap-splice.toml";
    std::vector<std::string> args = {LAPWING_EXE, "sweep",
                                     tmpl,        "--vary",
                                     "t=8:40:1",  "-j",
                                     "1",         "--single-mesh",
                                     "-o",        folder.string(),
                                     "--set",     "mesh.size=30",
                                     "--set",     "mesh.near_hole_size=12",
                                     "--set",     "mesh.around_hole=8",
                                     "--set",     "bolt_group[0].tie=\"spread\"",
                                     "--set",     "bolt_group[1].tie=\"spread\""};
    std::vector<char*> argv;
    for (auto& a : args) argv.push_back(a.data());
    argv.push_back(nullptr);

    int err_pipe[2];
    REQUIRE(::pipe(err_pipe) == 0);
    const pid_t pid = ::fork();
    REQUIRE(pid >= 0);
    if (pid == 0) {
        ::dup2(err_pipe[1], STDERR_FILENO);
        ::close(err_pipe[0]);
        ::close(err_pipe[1]);
        ::execv(argv[0], argv.data());
        std::_Exit(127);
    }
    ::close(err_pipe[1]);
    // Wait for the first plain progress line ("sweep: 1/33 variants done"), then interrupt.
    std::string seen;
    char buffer[512];
    while (seen.find("1/33 variants done") == std::string::npos) {
        const ssize_t n = ::read(err_pipe[0], buffer, sizeof buffer);
        if (n <= 0) break;
        seen.append(buffer, static_cast<size_t>(n));
    }
    REQUIRE(seen.find("1/33 variants done") != std::string::npos);
    REQUIRE(::kill(pid, SIGINT) == 0);
    for (ssize_t n; (n = ::read(err_pipe[0], buffer, sizeof buffer)) > 0;)
        seen.append(buffer, static_cast<size_t>(n));
    ::close(err_pipe[0]);
    int status = 0;
    REQUIRE(::waitpid(pid, &status, 0) == pid);
    REQUIRE(WIFEXITED(status));
    CHECK(WEXITSTATUS(status) == 130);
    CHECK(seen.find("interrupted; finishing the variants running now") != std::string::npos);
    CHECK(seen.find("sweep.csv and sweep.html were not written") != std::string::npos);

    CHECK_FALSE(fs::exists(folder / "sweep.csv"));
    CHECK_FALSE(fs::exists(folder / "sweep.html"));
    for (const auto& entry : fs::directory_iterator(folder))
        CHECK(entry.path().filename() == "sweep-interrupted.csv");
    std::ifstream in(folder / "sweep-interrupted.csv");
    std::vector<std::string> lines;
    for (std::string line; std::getline(in, line);) lines.push_back(line);
    REQUIRE(lines.size() >= 2); // the header and at least the first variant
    CHECK(lines.size() < 34);   // stopped before the end
    CHECK(lines[1].starts_with("1,8,yes,"));
    const auto fields = [](const std::string& s) { return std::count(s.begin(), s.end(), ','); };
    for (const std::string& line : lines) CHECK(fields(line) == fields(lines[0]));
    fs::remove_all(folder);
}
