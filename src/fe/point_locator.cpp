// Uniform-grid bucketing of element boxes plus the inverse map.
#include "fe/point_locator.hpp"

#include "fe/isoparametric_map.hpp"
#include "fe/stress.hpp"

#include <algorithm>
#include <cmath>

namespace lapwing::fe {

namespace {
struct Box {
    Vector2 lo, hi;
};

Box element_box(const Model& model, const Element& el) {
    Box b{Vector2::Constant(INFINITY), Vector2::Constant(-INFINITY)};
    for (int i = 0; i < node_count(el.kind); ++i) {
        const Vector2& x = model.nodes[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])];
        b.lo = b.lo.cwiseMin(x);
        b.hi = b.hi.cwiseMax(x);
    }
    // Curved quadratic edges bulge a little beyond their nodes.
    const Vector2 pad = 0.1 * (b.hi - b.lo);
    return {b.lo - pad, b.hi + pad};
}
} // namespace

PointLocator::PointLocator(const Model& model) : model_(&model) {
    const auto n_elements = static_cast<int>(model.elements.size());
    if (n_elements == 0) return;
    std::vector<Box> boxes;
    boxes.reserve(static_cast<size_t>(n_elements));
    Box all{Vector2::Constant(INFINITY), Vector2::Constant(-INFINITY)};
    for (const Element& el : model.elements) {
        boxes.push_back(element_box(model, el));
        all.lo = all.lo.cwiseMin(boxes.back().lo);
        all.hi = all.hi.cwiseMax(boxes.back().hi);
    }
    const Vector2 extent = (all.hi - all.lo).cwiseMax(1e-12);
    cell_ = std::sqrt(extent.x() * extent.y() / n_elements);
    origin_ = all.lo;
    nx_ = std::clamp(static_cast<int>(std::ceil(extent.x() / cell_)), 1, 4096);
    ny_ = std::clamp(static_cast<int>(std::ceil(extent.y() / cell_)), 1, 4096);
    cell_ = std::max(extent.x() / nx_, extent.y() / ny_);
    auto cell_range = [&](const Box& b, int& i0, int& i1, int& j0, int& j1) {
        i0 = std::clamp(static_cast<int>((b.lo.x() - origin_.x()) / cell_), 0, nx_ - 1);
        i1 = std::clamp(static_cast<int>((b.hi.x() - origin_.x()) / cell_), 0, nx_ - 1);
        j0 = std::clamp(static_cast<int>((b.lo.y() - origin_.y()) / cell_), 0, ny_ - 1);
        j1 = std::clamp(static_cast<int>((b.hi.y() - origin_.y()) / cell_), 0, ny_ - 1);
    };
    cell_start_.assign(static_cast<size_t>(nx_ * ny_) + 1, 0);
    for (const Box& b : boxes) {
        int i0, i1, j0, j1;
        cell_range(b, i0, i1, j0, j1);
        for (int j = j0; j <= j1; ++j)
            for (int i = i0; i <= i1; ++i) ++cell_start_[static_cast<size_t>(j * nx_ + i) + 1];
    }
    for (size_t c = 1; c < cell_start_.size(); ++c) cell_start_[c] += cell_start_[c - 1];
    cell_elements_.resize(static_cast<size_t>(cell_start_.back()));
    std::vector<int> fill(cell_start_.begin(), cell_start_.end() - 1);
    for (int e = 0; e < n_elements; ++e) {
        int i0, i1, j0, j1;
        cell_range(boxes[static_cast<size_t>(e)], i0, i1, j0, j1);
        for (int j = j0; j <= j1; ++j)
            for (int i = i0; i <= i1; ++i)
                cell_elements_[static_cast<size_t>(fill[static_cast<size_t>(j * nx_ + i)]++)] = e;
    }
}

std::optional<Located> PointLocator::locate(const Vector2& point) const {
    if (cell_elements_.empty()) return std::nullopt;
    const Vector2 r = (point - origin_) / cell_;
    if (r.x() < 0 || r.y() < 0 || r.x() > nx_ || r.y() > ny_) return std::nullopt;
    const int i = std::min(static_cast<int>(r.x()), nx_ - 1),
              j = std::min(static_cast<int>(r.y()), ny_ - 1);
    const auto c = static_cast<size_t>(j * nx_ + i);
    for (int p = cell_start_[c]; p < cell_start_[c + 1]; ++p) {
        const int e = cell_elements_[static_cast<size_t>(p)];
        const Element& el = model_->elements[static_cast<size_t>(e)];
        std::array<Vector2, 9> coords;
        for (int k = 0; k < node_count(el.kind); ++k)
            coords[static_cast<size_t>(k)] =
                model_->nodes[static_cast<size_t>(el.nodes[static_cast<size_t>(k)])];
        const auto xi = inverse_map(
            el.kind,
            std::span<const Vector2>(coords.data(), static_cast<size_t>(node_count(el.kind))),
            point);
        if (xi) return Located{e, *xi};
    }
    return std::nullopt;
}

std::optional<Stress> stress_at_point(const Model& model, const PointLocator& locator,
                                      const Eigen::VectorXd& u, const Vector2& point) {
    const auto at = locator.locate(point);
    if (!at) return std::nullopt;
    return element_stress(model, at->element, u, at->reference.x(), at->reference.y());
}

} // namespace lapwing::fe
