// The only place lapwing touches the disk: reading an input file and
// writing outputs atomically (temporary file, then rename).
#pragma once

#include <filesystem>
#include <functional>
#include <ostream>
#include <string>

namespace lapwing::cli {

// The whole file as text; a missing, unreadable or non-regular file throws
// lapwing::InputError naming it and why.
std::string read_input_file(const std::filesystem::path& path);

// Writes `content` to `path` through a temporary file in the same folder and
// a rename, so a reader never sees half a file. On any failure (no such
// folder, no permission, a failed write such as a full disk, a failed
// rename) throws lapwing::OutputError naming the file and why, and leaves
// neither the temporary file nor a changed `path` behind.
void write_atomically(const std::filesystem::path& path, const std::string& content);

// The same, with the bytes written by `write` (a seam for tests: a writer
// that fails half-way stands in for a full disk).
using ContentWriter = std::function<void(std::ostream& out, const std::string& content)>;
void write_atomically(const std::filesystem::path& path, const std::string& content,
                      const ContentWriter& write);

} // namespace lapwing::cli
