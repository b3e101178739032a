// Bad input never crashes: randomly damaged templates (characters deleted,
// inserted, replaced, or text copied elsewhere) either load or raise
// lapwing::InputError, never anything else. (Run under the debug-asan preset
// this also checks for memory errors.)
#include "input/load_connection.hpp"

#include <doctest/doctest.h>
#include <filesystem>
#include <fstream>
#include <random>
#include <sstream>

TEST_CASE("damaged templates give InputError or a model, never another failure") {
    namespace fs = std::filesystem;
    std::mt19937 random(20260412); // fixed seed: the same damage every run
    const std::string pieces = "-0.e\"[]{}=,x_9 #\n";
    int loaded = 0, rejected = 0;
    for (const auto& entry : fs::directory_iterator(fs::path(LAPWING_SOURCE_DIR) / "templates")) {
        std::ifstream in(entry.path(), std::ios::binary);
        std::ostringstream s;
        s << in.rdbuf();
        const std::string original = s.str();
        for (int trial = 0; trial < 150; ++trial) {
            std::string text = original;
            for (int edit = 0; edit < 1 + static_cast<int>(random() % 3); ++edit) {
                const size_t at = random() % text.size();
                switch (random() % 4) {
                case 0:
                    text.erase(at, 1 + random() % 5);
                    break;
                case 1:
                    text.insert(at, 1, pieces[random() % pieces.size()]);
                    break;
                case 2:
                    text[at] = pieces[random() % pieces.size()];
                    break;
                default:
                    text.insert(at, text.substr(random() % text.size(), 10));
                    break;
                }
            }
            try {
                lapwing::input::load_connection(text, "damaged.toml", {});
                ++loaded;
            } catch (const lapwing::InputError& e) {
                ++rejected;
                CHECK(!e.diagnostics().empty());
            } catch (const std::exception& e) {
                FAIL_CHECK("not an InputError: " << e.what() << "\n--- text ---\n" << text);
            }
        }
    }
    // Both outcomes occur, so the damage is neither always harmless nor always fatal.
    CHECK(loaded > 0);
    CHECK(rejected > 0);
}
