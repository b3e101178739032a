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
    write_atomically(path, content,
                     [](std::ostream& out, const std::string& text) { out << text; });
}

void write_atomically(const fs::path& path, const std::string& content,
                      const ContentWriter& write) {
    const std::string name = path.string();
    const fs::path folder = path.has_parent_path() ? path.parent_path() : fs::path(".");
    if (std::error_code ec; !fs::is_directory(folder, ec)) {
        throw OutputError("cannot write " + name + ": there is no folder " + folder.string());
    }
    const fs::path temporary =
        folder / ("." + path.filename().string() + ".tmp-" + std::to_string(::getpid()));
    const auto give_up = [&](const std::string& why) {
        std::error_code ignored;
        fs::remove(temporary, ignored);
        throw OutputError("cannot write " + name + ": " + why + "; nothing was written there");
    };
    {
        errno = 0;
        std::ofstream out(temporary, std::ios::binary | std::ios::trunc);
        if (!out) give_up(errno ? std::strerror(errno) : "the file cannot be created");
        write(out, content);
        out.flush();
        const int write_errno = errno;
        out.close();
        if (!out)
            give_up(write_errno ? std::strerror(write_errno)
                                : "the write failed (is the disk full?)");
    }
    std::error_code ec;
    fs::rename(temporary, path, ec);
    if (ec) give_up(ec.message());
}

} // namespace lapwing::cli
