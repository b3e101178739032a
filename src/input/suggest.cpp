// Edit distance and suggestion lists.
#include "input/suggest.hpp"

#include <algorithm>
#include <cctype>

namespace lapwing::input {

// Optimal string alignment distance: Levenshtein plus swaps of two
// neighbouring letters ("wled" → "weld" is one edit), case-insensitive.
int edit_distance(std::string_view a, std::string_view b) {
    auto same = [](char x, char y) {
        return std::tolower(static_cast<unsigned char>(x)) ==
               std::tolower(static_cast<unsigned char>(y));
    };
    const size_t n = a.size(), m = b.size();
    std::vector<std::vector<int>> d(n + 1, std::vector<int>(m + 1));
    for (size_t i = 0; i <= n; ++i) d[i][0] = static_cast<int>(i);
    for (size_t j = 0; j <= m; ++j) d[0][j] = static_cast<int>(j);
    for (size_t i = 1; i <= n; ++i) {
        for (size_t j = 1; j <= m; ++j) {
            d[i][j] = std::min({d[i - 1][j] + 1, d[i][j - 1] + 1,
                                d[i - 1][j - 1] + (same(a[i - 1], b[j - 1]) ? 0 : 1)});
            if (i > 1 && j > 1 && same(a[i - 1], b[j - 2]) && same(a[i - 2], b[j - 1]))
                d[i][j] = std::min(d[i][j], d[i - 2][j - 2] + 1);
        }
    }
    return d[n][m];
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
