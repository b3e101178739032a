// Finds the element containing a physical point and its reference
// coordinates there (inverse isoparametric map), so any field can be
// evaluated at any point, e.g. along section lines.
#pragma once

#include "fe/model.hpp"

#include <optional>
#include <vector>

namespace lapwing::fe {

struct Located {
    int element = -1;
    Vector2 reference{0, 0}; // (ξ, η)
};

class PointLocator {
public:
    // Buckets element bounding boxes on a uniform grid of about one element
    // per cell. Keeps a reference to `model`.
    explicit PointLocator(const Model& model);

    // The containing element (the lowest-numbered one for a point on a shared
    // edge), or nothing when the point lies outside the mesh.
    std::optional<Located> locate(const Vector2& point) const;

private:
    const Model* model_;
    Vector2 origin_{0, 0};
    double cell_ = 1;
    int nx_ = 1, ny_ = 1;
    std::vector<int> cell_start_;
    std::vector<int> cell_elements_;
};

// Stress at a physical point; nothing when the point is outside the mesh.
std::optional<Stress> stress_at_point(const Model& model, const PointLocator& locator,
                                      const Eigen::VectorXd& u, const Vector2& point);

} // namespace lapwing::fe
