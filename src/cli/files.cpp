// Reading inputs and writing outputs atomically.
#include "cli/files.hpp"

#include "core/error.hpp"

#include <cerrno>
#include <cstring>
#include <fstream>
#include <sstream>
#include <stdexcept>
#include <unistd.h>

namespace lapwing::cli {

namespace fs = std::filesystem;

std::string read_input_file(const fs::path& path) {
    const std::string name = path.string();
    std::error_code ec;
    const auto status = fs::status(path, ec);
    if (!fs::exists(status)) {
        throw InputError(Diagnostic{name, 0, 0, "", "cannot be read: no such file", ""});
    }
    if (fs::is_directory(status)) {
        throw InputError(Diagnostic{name, 0, 0, "", "is a folder, not a template file", ""});
    }
    std::ifstream in(path, std::ios::binary);
    if (!in) {
        throw InputError(
            Diagnostic{name, 0, 0, "", std::string("cannot be read: ") + std::strerror(errno), ""});
    }
    std::ostringstream text;
    text << in.rdbuf();
    if (in.bad()) throw InputError(Diagnostic{name, 0, 0, "", "cannot be read: read error", ""});
    return text.str();
}

void write_atomically(const fs::path& path, const std::string& content) {
    const fs::path folder = path.has_parent_path() ? path.parent_path() : fs::path(".");
    const fs::path temporary =
        folder / ("." + path.filename().string() + ".tmp-" + std::to_string(::getpid()));
    {
        std::ofstream out(temporary, std::ios::binary | std::ios::trunc);
        if (!out)
            throw std::runtime_error("cannot write " + temporary.string() + ": " +
                                     std::strerror(errno));
        out << content;
        out.close();
        if (!out) {
            std::error_code ignored;
            fs::remove(temporary, ignored);
            throw std::runtime_error("cannot write " + temporary.string());
        }
    }
    std::error_code ec;
    fs::rename(temporary, path, ec);
    if (ec) {
        std::error_code ignored;
        fs::remove(temporary, ignored);
        throw std::runtime_error("cannot write " + path.string() + ": " + ec.message());
    }
}

} // namespace lapwing::cli
