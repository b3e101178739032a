// The only place lapwing touches the disk: reading an input file and
// writing outputs atomically (temporary file, then rename).
#pragma once

#include <filesystem>
#include <string>

namespace lapwing::cli {

// The whole file as text; a missing, unreadable or non-regular file throws
// lapwing::InputError naming it and why.
std::string read_input_file(const std::filesystem::path& path);

// Writes `content` to `path` through a temporary file in the same folder and
// a rename, so a reader never sees half a file. Throws std::runtime_error.
void write_atomically(const std::filesystem::path& path, const std::string& content);

} // namespace lapwing::cli
