// Edit distance and suggestion lists.
#include "input/suggest.hpp"

#include <algorithm>
#include <cctype>

namespace lapwing::input {

int edit_distance(std::string_view a, std::string_view b) {
    std::vector<int> previous(b.size() + 1), current(b.size() + 1);
    for (size_t j = 0; j <= b.size(); ++j) previous[j] = static_cast<int>(j);
    for (size_t i = 1; i <= a.size(); ++i) {
        current[0] = static_cast<int>(i);
        for (size_t j = 1; j <= b.size(); ++j) {
            const bool same = std::tolower(static_cast<unsigned char>(a[i - 1])) ==
                              std::tolower(static_cast<unsigned char>(b[j - 1]));
            current[j] =
                std::min({previous[j] + 1, current[j - 1] + 1, previous[j - 1] + (same ? 0 : 1)});
        }
        std::swap(previous, current);
    }
    return previous[b.size()];
}

std::string closest(std::string_view word, const std::vector<std::string>& candidates) {
    // A one-letter word is one edit from every other one-letter word, so a
    // suggestion must also keep at least one letter of the word.
    const int size = static_cast<int>(word.size());
    const int limit = std::min(std::max(1, size / 3), size - 1);
    std::string best;
    int best_distance = limit + 1;
    for (const auto& c : candidates) {
        const int d = edit_distance(word, c);
        if (d < best_distance) {
            best_distance = d;
            best = c;
        }
    }
    return best;
}

std::string did_you_mean(std::string_view word, const std::vector<std::string>& candidates) {
    const std::string best = closest(word, candidates);
    return best.empty() ? "" : " (did you mean \"" + best + "\"?)";
}

std::string one_of(const std::vector<std::string>& choices) {
    std::string out;
    for (size_t i = 0; i < choices.size(); ++i) {
        if (i > 0) out += i + 1 == choices.size() ? " or " : ", ";
        out += choices[i];
    }
    return out;
}

} // namespace lapwing::input
