// Look-ups over a resolved connection.
#include "model/connection.hpp"

namespace lapwing::model {

const BoltGroup* find_bolt_group(const Connection& connection, const std::string& name) {
    for (const auto& group : connection.bolt_groups) {
        if (group.name == name) return &group;
    }
    return nullptr;
}

} // namespace lapwing::model
