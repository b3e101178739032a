// Nodal stresses recovered from Gauss-point values, and the
// Zienkiewicz–Zhu error estimate built on them (docs/theory.md §8).
#pragma once

#include "fe/model.hpp"
#include "fe/stress.hpp"

#include <span>
#include <vector>

namespace lapwing::fe {

// Extrapolation of the stiffness-rule Gauss values to the element's nodes
// (bilinear from 2×2, biquadratic from 3×3) and averaging over the elements
// that share a node. Simple and robust; smooths less than SPR.
std::vector<Stress> recover_by_averaging(const Model& model, const Eigen::VectorXd& u);

// The Gauss points SPR samples: 2×2 for every element type. They are the
// superconvergent points of the quadratic elements (Zienkiewicz & Zhu 1992a);
// for the bilinear element the optimal point is the centre (Barlow 1976,
// IJNME 10:243), but 2×2 sampling with a linear fit keeps boundary patches
// determined and gives effectivity indices near 1 in tests/verification.
SampledStresses spr_samples(const Model& model, const Eigen::VectorXd& u);
// The same for several displacement fields at once, one result per field.
std::vector<SampledStresses> spr_samples(const Model& model,
                                         std::span<const Eigen::VectorXd* const> u);

// Superconvergent patch recovery (Zienkiewicz & Zhu 1992, IJNME 33:1331):
// around every interior corner node, a least-squares fit of a complete
// polynomial (linear for 4-node, quadratic for 8/9-node elements) to the
// sampled stresses of the elements sharing that node; the node takes its
// patch's value, mid-side, centre and boundary nodes the mean of the patches
// that contain them. Reproduces any stress field in the polynomial space
// exactly. `samples` must come from spr_samples (or have its layout).
std::vector<Stress> recover_spr(const Model& model, const SampledStresses& samples);

// recover_spr split in two: the patch fits, which depend on the mesh only
// (built once from the sample points' layout), and their application to the
// sampled values of any number of load cases (a few multiply-adds per patch).
// Keeps a reference to `model`.
class SprRecovery {
public:
    SprRecovery(const Model& model, const SampledStresses& samples);
    // `samples` at the same points as those the recovery was built from.
    std::vector<Stress> recover(const SampledStresses& samples) const;

private:
    // A patch keeps its normal matrix AᵀA factorized (Cholesky, lower
    // triangle packed by rows into factors_ from `factor`: 6 numbers for a
    // linear fit, 21 for a quadratic one) rather than the n_terms × points
    // fit (AᵀA)⁻¹Aᵀ, which is 8× larger for a 4-node patch; each case forms
    // Aᵀb from the sample points, as many multiply-adds as fit · b.
    struct Patch {
        int vertex = 0;
        bool boundary = false;
        int n_terms = 0;
        Vector2 origin{0, 0};
        double h = 0;
        size_t factor = 0;
    };
    const Model* model_;
    int per_element_ = 0;
    // The elements around each node, compressed: node n's are
    // elements_[element_start_[n] .. element_start_[n + 1]).
    std::vector<int> element_start_, elements_;
    std::vector<double> factors_;
    std::vector<Patch> patches_;
    std::span<const int> elements_of(size_t node) const {
        return {elements_.data() + element_start_[node],
                static_cast<size_t>(element_start_[node + 1] - element_start_[node])};
    }
};

struct ErrorEstimate {
    std::vector<double> element_error; // ‖σ* − σ_h‖ in the energy norm, per element
    double error_norm = 0;             // √Σ element_error²
    double energy_norm = 0;            // ‖u_h‖ = √∫ σ_hᵀ D⁻¹ σ_h dV
    double relative = 0;               // η = ‖e‖ / √(‖u_h‖² + ‖e‖²)
};

// Zienkiewicz & Zhu 1987 (IJNME 24:337) estimate with the recovered nodal
// field σ* interpolated by the element shape functions.
ErrorEstimate zz_error_estimate(const Model& model, const Eigen::VectorXd& u,
                                const std::vector<Stress>& recovered);

} // namespace lapwing::fe
