// SHA-256 of a byte string (FIPS 180-4), for the calc sheet's traceability:
// the input file and the resolved model are identified by their digests.
#pragma once

#include <string>
#include <string_view>

namespace lapwing::report {

// The digest as 64 lower-case hexadecimal digits, as `sha256sum` prints it.
std::string sha256_hex(std::string_view bytes);

} // namespace lapwing::report
