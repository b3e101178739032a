// "Did you mean ...?" for mistyped keys and names.
#pragma once

#include <string>
#include <string_view>
#include <vector>

namespace lapwing::input {

// Edit distance: insertions, deletions, substitutions and swaps of two
// neighbouring letters each cost 1 (optimal string alignment), case-insensitive.
int edit_distance(std::string_view a, std::string_view b);

// The closest candidate within a distance that grows with the word's length
// (1 for short words, up to a third of the length), or "" when none is close.
std::string closest(std::string_view word, const std::vector<std::string>& candidates);

// " (did you mean \"x\"?)" or "".
std::string did_you_mean(std::string_view word, const std::vector<std::string>& candidates);

// "a, b or c" for "what is valid" lists.
std::string one_of(const std::vector<std::string>& choices);

} // namespace lapwing::input
