// Assembly of the reduced stiffness K̃ = Tᵀ K T (lower triangle, compressed
// columns) with the sparsity pattern built once from the connectivity and
// the values refilled on demand, so a new thickness, material or load case
// never rebuilds the pattern (DESIGN: Finite elements).
#pragma once

#include "fe/constraints.hpp"
#include "fe/model.hpp"

#include <Eigen/Core>
#include <span>
#include <utility>
#include <vector>

namespace lapwing::fe {

// Lower triangle including the diagonal, columns sorted by row.
struct SparsePattern {
    int n = 0;
    std::vector<int> col_start; // n + 1 entries
    std::vector<int> row;       // nnz entries
    // Position of each unknown's node (n entries, or none), for orderings
    // that dissect the mesh geometrically.
    std::vector<Vector2> position;
    long nnz() const { return static_cast<long>(row.size()); }
    // Position of entry (i, j), i ≥ j, in the value array; -1 when absent.
    long find(int i, int j) const;
};

class Assembler {
public:
    // Builds the pattern of the model's elements and springs under `map`.
    Assembler(const Model& model, const DofMap& map);
    // A copy of `other` under `map`, a copy of other's dof map.
    Assembler(const Assembler& other, const DofMap& map) : Assembler(other) { map_ = &map; }

    const SparsePattern& pattern() const { return pattern_; }

    // Values of K̃ (pattern order) and the load −Tᵀ K g that the prescribed
    // displacements put on the unknowns. The model must have the topology the
    // assembler was built with; coordinates, thicknesses and materials may
    // differ.
    //
    // The first assembly finds each entry's position in the pattern; the
    // second and later ones (a sweep's variants, refactorizations) use the
    // positions stored by the second, so a model assembled once never holds
    // them (at 2·10⁶ Q8 dofs the factorization's peak fell by 183 MiB,
    // docs/benchmarks.md). The values are the same either way.
    void assemble(const Model& model, std::vector<double>& values,
                  Eigen::VectorXd& prescribed_load);
    // assemble() in its two parts, the link springs last, for a caller that
    // learns the link springs' stiffness late (a contact start set from
    // another thread): the values are the same bit for bit.
    void assemble_all_but_links(const Model& model, std::vector<double>& values,
                                Eigen::VectorXd& prescribed_load);
    void add_link_springs(const Model& model, std::vector<double>& values,
                          Eigen::VectorXd& prescribed_load) const;

    // Internal forces K u at every dof of the model (elements and springs),
    // for each column of `displacements` (full dofs). Reactions follow as
    // K u − f_applied.
    Eigen::MatrixXd internal_forces(const Model& model, const Eigen::MatrixXd& displacements) const;

    // Link spring `spring` of the model in the unknowns: its stiffness in K̃
    // is k c̃ c̃ᵀ with c̃ = Tᵀ c, returned as (unknown, coefficient) pairs
    // sorted by unknown. False when one of its dofs carries a non-zero
    // prescribed value, whose load on the unknowns would change with k.
    bool link_column(const Model& model, int spring,
                     std::vector<std::pair<int, double>>& column) const;
    // values += dk c̃ c̃ᵀ (lower triangle, pattern order).
    void add_outer(std::span<const std::pair<int, double>> column, double dk,
                   std::vector<double>& values) const;

private:
    void build_scatter(const Model& model);

    const DofMap* map_;
    SparsePattern pattern_;
    int assemblies_ = 0;
    // For an element whose dofs are all free: the value positions of its
    // lower-triangle pairs (a ≤ b), consecutively; -1 start for the others.
    // Positions fit an int: the pattern's column starts are ints. Empty
    // until the second assembly.
    std::vector<long> scatter_start_;
    std::vector<int> scatter_;
};

} // namespace lapwing::fe
