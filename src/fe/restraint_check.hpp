// Detects rigid-body motions the supports leave free, before factorizing,
// so an unrestrained model is reported in words ("free to translate along
// (1.000, 0.000)", "free to rotate about (120, 40)") and never reaches the
// solver as a singular matrix.
#pragma once

#include "fe/assembly.hpp"
#include "fe/constraints.hpp"
#include "fe/model.hpp"

#include <span>
#include <string>
#include <vector>

namespace lapwing::fe {

struct FreeRigidMotion {
    bool is_rotation = false;
    Vector2 direction{0, 0}; // unit translation direction, when not a rotation
    Vector2 centre{0, 0};    // centre of rotation, when a rotation
    std::string describe() const;
};

// The in-plane rigid motions (two translations, one rotation, and their
// combinations) that the constraints allow and that store no strain energy
// in the elements and springs: each is a way the model can move freely.
// `values` is the assembled K̃ of `assembler`.
std::vector<FreeRigidMotion> free_rigid_motions(const Model& model, const DofMap& map,
                                                const Constraints& constraints,
                                                const SparsePattern& pattern,
                                                std::span<const double> values);

} // namespace lapwing::fe
