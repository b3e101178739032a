// Fuzz target: the template loader and validator on arbitrary bytes. Any
// input must either load or raise lapwing::InputError; anything else (a
// crash, another exception, a sanitizer report, a hang) is a defect. A
// loaded template must also survive the summary and the resolved writer,
// and the resolved text must load again (input/load_connection.hpp promises
// that load_connection of write_resolved gives the same model).
#include "core/error.hpp"
#include "input/load_connection.hpp"

#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <string_view>

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    lapwing::model::Connection connection;
    try {
        connection = lapwing::input::load_connection(text, "fuzz.toml");
    } catch (const lapwing::InputError& e) {
        (void)lapwing::input::format_problems(e);
        return 0;
    }
    (void)lapwing::input::summarize(connection);
    const std::string resolved = lapwing::input::write_resolved(connection);
    try {
        (void)lapwing::input::load_connection(resolved, "resolved.toml");
    } catch (const lapwing::InputError& e) {
        std::fprintf(stderr, "the resolved template does not load again:\n%s\n%s\n",
                     lapwing::input::format_problems(e).c_str(), resolved.c_str());
        std::abort();
    }
    return 0;
}
