// Pattern construction and value refill for the reduced stiffness.
#include "fe/assembly.hpp"

#include "fe/element_matrix.hpp"

#include <algorithm>

namespace lapwing::fe {

long SparsePattern::find(int i, int j) const {
    const auto begin = row.begin() + col_start[static_cast<size_t>(j)];
    const auto end = row.begin() + col_start[static_cast<size_t>(j) + 1];
    const auto it = std::lower_bound(begin, end, i);
    if (it == end || *it != i) return -1;
    return static_cast<long>(it - row.begin());
}

namespace {

// The full dofs of element e, in element order u1 v1 u2 v2 ….
int element_dofs(const Model& model, int e, std::array<int, 18>& dofs) {
    const Element& el = model.elements[static_cast<size_t>(e)];
    const int n = node_count(el.kind);
    for (int i = 0; i < n; ++i) {
        dofs[static_cast<size_t>(2 * i)] = dof_ux(el.nodes[static_cast<size_t>(i)]);
        dofs[static_cast<size_t>(2 * i + 1)] = dof_uy(el.nodes[static_cast<size_t>(i)]);
    }
    return 2 * n;
}

int spring_dofs(const Spring& s, std::array<int, 18>& dofs) {
    dofs[0] = s.dof_a;
    if (s.dof_b < 0) return 1;
    dofs[1] = s.dof_b;
    return 2;
}

// Dofs (ux_a, uy_a[, ux_b, uy_b]) of a link spring and its coefficient
// vector c, so that the stretch is c · u and the stiffness k c cᵀ.
int link_dofs(const LinkSpring& s, std::array<int, 18>& dofs, Eigen::Vector4d& c) {
    dofs[0] = dof_ux(s.node_a);
    dofs[1] = dof_uy(s.node_a);
    c << -s.direction.x(), -s.direction.y(), s.direction.x(), s.direction.y();
    if (s.node_b < 0) {
        c.head<2>() = s.direction; // to the ground: stretch = u_a · n
        return 2;
    }
    dofs[2] = dof_ux(s.node_b);
    dofs[3] = dof_uy(s.node_b);
    return 4;
}

// Whether every dof of a block is a free unknown (no constraint terms).
bool all_free(const DofMap& map, const std::array<int, 18>& dofs, int n_dofs) {
    for (int a = 0; a < n_dofs; ++a)
        if (!map.is_free(dofs[static_cast<size_t>(a)])) return false;
    return true;
}

// Calls f(a, b, position) with the value position of each lower-triangle
// pair (a ≤ b) of a block of free dofs, in the order the scatter stores them.
template <typename F>
void for_each_position(const SparsePattern& pattern, const DofMap& map,
                       const std::array<int, 18>& dofs, int n_dofs, F&& f) {
    for (int b = 0; b < n_dofs; ++b)
        for (int a = 0; a <= b; ++a) {
            const int ua = map.unknown_of(dofs[static_cast<size_t>(a)]);
            const int ub = map.unknown_of(dofs[static_cast<size_t>(b)]);
            f(a, b, pattern.find(std::max(ua, ub), std::min(ua, ub)));
        }
}

// Calls f(dofs, n_dofs) for every element, then every spring.
template <typename F>
void for_each_block(const Model& model, F&& f) {
    std::array<int, 18> dofs{};
    Eigen::Vector4d c;
    for (int e = 0; e < static_cast<int>(model.elements.size()); ++e)
        f(dofs, element_dofs(model, e, dofs));
    for (const Spring& s : model.springs) f(dofs, spring_dofs(s, dofs));
    for (const LinkSpring& s : model.link_springs) f(dofs, link_dofs(s, dofs, c));
}

// K̃_ij += T_ai k_ab T_bj over all ordered (a, b) with i ≥ j, and the
// prescribed load −T_ai k_ab g_b: any block, constrained dofs included.
template <typename Block>
void add_generic(const SparsePattern& pattern, const DofMap& map, const std::array<int, 18>& dofs,
                 int n_dofs, const Block& k, std::vector<double>& values,
                 Eigen::VectorXd& prescribed_load) {
    for (int a = 0; a < n_dofs; ++a)
        for (int b = 0; b < n_dofs; ++b) {
            const double k_ab = k(a, b);
            if (k_ab == 0.0) continue;
            const int da = dofs[static_cast<size_t>(a)], db = dofs[static_cast<size_t>(b)];
            const double g_b = map.offset(db);
            for (const auto& ta : map.terms(da)) {
                if (g_b != 0.0) prescribed_load(ta.unknown) -= ta.coefficient * k_ab * g_b;
                for (const auto& tb : map.terms(db))
                    if (ta.unknown >= tb.unknown)
                        values[static_cast<size_t>(pattern.find(ta.unknown, tb.unknown))] +=
                            ta.coefficient * tb.coefficient * k_ab;
            }
        }
}

} // namespace

Assembler::Assembler(const Model& model, const DofMap& map) : map_(&map) {
    const int n = map.n_unknowns();
    // Unknowns touched by each block (element or spring).
    std::vector<long> block_start{0};
    std::vector<int> block_unknowns;
    for_each_block(model, [&](const std::array<int, 18>& dofs, int n_dofs) {
        const size_t first = block_unknowns.size();
        for (int a = 0; a < n_dofs; ++a)
            for (const auto& t : map.terms(dofs[static_cast<size_t>(a)]))
                block_unknowns.push_back(t.unknown);
        std::sort(block_unknowns.begin() + static_cast<long>(first), block_unknowns.end());
        block_unknowns.erase(
            std::unique(block_unknowns.begin() + static_cast<long>(first), block_unknowns.end()),
            block_unknowns.end());
        block_start.push_back(static_cast<long>(block_unknowns.size()));
    });
    const auto n_blocks = block_start.size() - 1;

    // Transpose: the blocks touching each unknown.
    std::vector<long> touch_start(static_cast<size_t>(n) + 1, 0);
    for (int u : block_unknowns) ++touch_start[static_cast<size_t>(u) + 1];
    for (size_t j = 0; j < static_cast<size_t>(n); ++j) touch_start[j + 1] += touch_start[j];
    std::vector<int> touch(block_unknowns.size());
    {
        std::vector<long> fill(touch_start.begin(), touch_start.end() - 1);
        for (size_t b = 0; b < n_blocks; ++b)
            for (long p = block_start[b]; p < block_start[b + 1]; ++p)
                touch[static_cast<size_t>(
                    fill[static_cast<size_t>(block_unknowns[static_cast<size_t>(p)])]++)] =
                    static_cast<int>(b);
    }

    // Column j of the lower triangle: every unknown i ≥ j sharing a block with j.
    pattern_.n = n;
    pattern_.col_start.assign(static_cast<size_t>(n) + 1, 0);
    std::vector<int> marker(static_cast<size_t>(n), -1);
    std::vector<int> column;
    for (int j = 0; j < n; ++j) {
        column.clear();
        for (long p = touch_start[static_cast<size_t>(j)];
             p < touch_start[static_cast<size_t>(j) + 1]; ++p) {
            const auto b = static_cast<size_t>(touch[static_cast<size_t>(p)]);
            for (long q = block_start[b]; q < block_start[b + 1]; ++q) {
                const int i = block_unknowns[static_cast<size_t>(q)];
                if (i >= j && marker[static_cast<size_t>(i)] != j) {
                    marker[static_cast<size_t>(i)] = j;
                    column.push_back(i);
                }
            }
        }
        if (marker[static_cast<size_t>(j)] != j) column.push_back(j); // keep the diagonal
        std::sort(column.begin(), column.end());
        pattern_.row.insert(pattern_.row.end(), column.begin(), column.end());
        pattern_.col_start[static_cast<size_t>(j) + 1] = static_cast<int>(pattern_.row.size());
    }

    // The node of each unknown (a θ dof sits at its rotation node).
    pattern_.position.resize(static_cast<size_t>(n));
    for (int u = 0; u < n; ++u) {
        const int dof = map.dof_of(u);
        const int node = dof < 2 * model.n_nodes()
                             ? dof / 2
                             : model.rotation_nodes[static_cast<size_t>(dof - 2 * model.n_nodes())];
        pattern_.position[static_cast<size_t>(u)] = model.nodes[static_cast<size_t>(node)];
    }
}

// Scatter positions for elements whose dofs are all free unknowns.
void Assembler::build_scatter(const Model& model) {
    const DofMap& map = *map_;
    scatter_start_.assign(model.elements.size(), -1);
    std::array<int, 18> dofs{};
    size_t pairs = 0;
    for (const Element& el : model.elements) {
        const auto n_dofs = static_cast<size_t>(2 * node_count(el.kind));
        pairs += n_dofs * (n_dofs + 1) / 2;
    }
    scatter_.reserve(pairs);
    for (int e = 0; e < static_cast<int>(model.elements.size()); ++e) {
        const int n_dofs = element_dofs(model, e, dofs);
        if (!all_free(map, dofs, n_dofs)) continue;
        scatter_start_[static_cast<size_t>(e)] = static_cast<long>(scatter_.size());
        for_each_position(pattern_, map, dofs, n_dofs, [&](int, int, long position) {
            scatter_.push_back(static_cast<int>(position));
        });
    }
}

void Assembler::assemble(const Model& model, std::vector<double>& values,
                         Eigen::VectorXd& prescribed_load) {
    assemble_all_but_links(model, values, prescribed_load);
    add_link_springs(model, values, prescribed_load);
}

void Assembler::assemble_all_but_links(const Model& model, std::vector<double>& values,
                                       Eigen::VectorXd& prescribed_load) {
    if (++assemblies_ == 2) build_scatter(model);
    const DofMap& map = *map_;
    values.assign(static_cast<size_t>(pattern_.nnz()), 0.0);
    prescribed_load = Eigen::VectorXd::Zero(map.n_unknowns());
    std::vector<Matrix3> D(model.materials.size());
    for (size_t m = 0; m < D.size(); ++m) D[m] = plane_stress_D(model.materials[m]);

    ElementMatrixStorage k;
    std::array<int, 18> dofs{};
    for (int e = 0; e < static_cast<int>(model.elements.size()); ++e) {
        const Element& el = model.elements[static_cast<size_t>(e)];
        const int n_dofs = element_stiffness(model, e, D[static_cast<size_t>(el.material)], k);
        if (!scatter_start_.empty()) {
            if (const long start = scatter_start_[static_cast<size_t>(e)]; start >= 0) {
                const int* position = scatter_.data() + start;
                for (int b = 0; b < n_dofs; ++b)
                    for (int a = 0; a <= b; ++a)
                        values[static_cast<size_t>(*position++)] += k(a, b);
                continue;
            }
        }
        element_dofs(model, e, dofs);
        if (!all_free(map, dofs, n_dofs)) {
            add_generic(pattern_, map, dofs, n_dofs, k, values, prescribed_load);
            continue;
        }
        // The positions build_scatter would store, found as they are used.
        for_each_position(pattern_, map, dofs, n_dofs, [&](int a, int b, long position) {
            values[static_cast<size_t>(position)] += k(a, b);
        });
    }
    for (const Spring& s : model.springs) {
        const int n_dofs = spring_dofs(s, dofs);
        Eigen::Matrix2d ks;
        ks << s.k, -s.k, -s.k, s.k;
        add_generic(pattern_, map, dofs, n_dofs, ks, values, prescribed_load);
    }
}

void Assembler::add_link_springs(const Model& model, std::vector<double>& values,
                                 Eigen::VectorXd& prescribed_load) const {
    std::array<int, 18> dofs{};
    Eigen::Vector4d c;
    for (const LinkSpring& s : model.link_springs) {
        const int n_dofs = link_dofs(s, dofs, c);
        const Eigen::Matrix4d kl = s.k * c * c.transpose();
        add_generic(pattern_, *map_, dofs, n_dofs, kl, values, prescribed_load);
    }
}

bool Assembler::link_column(const Model& model, int spring,
                            std::vector<std::pair<int, double>>& column) const {
    const DofMap& map = *map_;
    std::array<int, 18> dofs{};
    Eigen::Vector4d c;
    const int n_dofs = link_dofs(model.link_springs[static_cast<size_t>(spring)], dofs, c);
    column.clear();
    for (int a = 0; a < n_dofs; ++a) {
        const int dof = dofs[static_cast<size_t>(a)];
        if (map.offset(dof) != 0.0) return false;
        for (const auto& t : map.terms(dof)) column.emplace_back(t.unknown, c(a) * t.coefficient);
    }
    std::sort(column.begin(), column.end());
    // Sum the terms of one unknown (a slave and its master, say).
    size_t out = 0;
    for (size_t i = 0; i < column.size(); ++i)
        if (out > 0 && column[out - 1].first == column[i].first)
            column[out - 1].second += column[i].second;
        else
            column[out++] = column[i];
    column.resize(out);
    return true;
}

void Assembler::add_outer(std::span<const std::pair<int, double>> column, double dk,
                          std::vector<double>& values) const {
    for (const auto& [i, ci] : column)
        for (const auto& [j, cj] : column)
            if (i >= j) values[static_cast<size_t>(pattern_.find(i, j))] += dk * ci * cj;
}

Eigen::MatrixXd Assembler::internal_forces(const Model& model, const Eigen::MatrixXd& u) const {
    Eigen::MatrixXd f = Eigen::MatrixXd::Zero(model.n_dofs(), u.cols());
    std::vector<Matrix3> D(model.materials.size());
    for (size_t m = 0; m < D.size(); ++m) D[m] = plane_stress_D(model.materials[m]);
    std::array<int, 18> dofs{};
    Eigen::MatrixXd u_e, f_e;
    for (int e = 0; e < static_cast<int>(model.elements.size()); ++e) {
        const Element& el = model.elements[static_cast<size_t>(e)];
        const int n_dofs = element_dofs(model, e, dofs);
        u_e.resize(n_dofs, u.cols());
        f_e.resize(n_dofs, u.cols());
        for (int a = 0; a < n_dofs; ++a) u_e.row(a) = u.row(dofs[static_cast<size_t>(a)]);
        element_forces(model, e, D[static_cast<size_t>(el.material)], u_e, f_e);
        for (int a = 0; a < n_dofs; ++a) f.row(dofs[static_cast<size_t>(a)]) += f_e.row(a);
    }
    for (const Spring& s : model.springs) {
        const Eigen::RowVectorXd stretch =
            s.dof_b < 0 ? Eigen::RowVectorXd(u.row(s.dof_a))
                        : Eigen::RowVectorXd(u.row(s.dof_a) - u.row(s.dof_b));
        f.row(s.dof_a) += s.k * stretch;
        if (s.dof_b >= 0) f.row(s.dof_b) -= s.k * stretch;
    }
    Eigen::Vector4d c;
    for (const LinkSpring& s : model.link_springs) {
        const int n_dofs = link_dofs(s, dofs, c);
        Eigen::RowVectorXd stretch = Eigen::RowVectorXd::Zero(u.cols());
        for (int a = 0; a < n_dofs; ++a) stretch += c(a) * u.row(dofs[static_cast<size_t>(a)]);
        for (int a = 0; a < n_dofs; ++a)
            f.row(dofs[static_cast<size_t>(a)]) += s.k * c(a) * stretch;
    }
    return f;
}

} // namespace lapwing::fe
