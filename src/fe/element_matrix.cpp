// Kind dispatch for element stiffness matrices.
#include "fe/element_matrix.hpp"

#include "fe/element_stiffness.hpp"
#include "fe/isoparametric_map.hpp"

namespace lapwing::fe {

int element_stiffness(const Model& model, int e, const Matrix3& D, ElementMatrixStorage& k) {
    const Element& el = model.elements[static_cast<size_t>(e)];
    const std::span<const int> nodes(el.nodes.data(), static_cast<size_t>(node_count(el.kind)));
    switch (el.kind) {
    case ElementKind::Q4:
        k.topLeftCorner<8, 8>() =
            stiffness<4>(gather_coords<4>(model.nodes, nodes), D, el.thickness, e);
        return 8;
    case ElementKind::Q4i:
        k.topLeftCorner<8, 8>() =
            stiffness_q4i(gather_coords<4>(model.nodes, nodes), D, el.thickness, e).k;
        return 8;
    case ElementKind::Q8:
        k.topLeftCorner<16, 16>() =
            stiffness<8>(gather_coords<8>(model.nodes, nodes), D, el.thickness, e);
        return 16;
    case ElementKind::Q9:
        k.topLeftCorner<18, 18>() =
            stiffness<9>(gather_coords<9>(model.nodes, nodes), D, el.thickness, e);
        return 18;
    }
    return 0;
}

void element_forces(const Model& model, int e, const Matrix3& D,
                    const Eigen::Ref<const Eigen::MatrixXd>& u_e, Eigen::Ref<Eigen::MatrixXd> f_e) {
    const Element& el = model.elements[static_cast<size_t>(e)];
    const std::span<const int> nodes(el.nodes.data(), static_cast<size_t>(node_count(el.kind)));
    switch (el.kind) {
    case ElementKind::Q4:
        internal_forces<4>(gather_coords<4>(model.nodes, nodes), D, el.thickness, u_e, f_e);
        return;
    case ElementKind::Q4i:
        // The condensed modes make k_e the simplest route.
        f_e.noalias() =
            stiffness_q4i(gather_coords<4>(model.nodes, nodes), D, el.thickness, e).k * u_e;
        return;
    case ElementKind::Q8:
        internal_forces<8>(gather_coords<8>(model.nodes, nodes), D, el.thickness, u_e, f_e);
        return;
    case ElementKind::Q9:
        internal_forces<9>(gather_coords<9>(model.nodes, nodes), D, el.thickness, u_e, f_e);
        return;
    }
}

} // namespace lapwing::fe
