// Writing the CalculiX deck and reading its displacement and stress output.
#include "calculix_deck.hpp"

#include <fmt/format.h>
#include <sstream>
#include <stdexcept>

namespace lapwing::bench {

std::string calculix_deck(const fe::Model& model, const fe::Constraints& constraints,
                          const fe::Loads& loads) {
    if (model.elements.empty() || model.materials.size() != 1)
        throw std::runtime_error("the deck writer needs elements of one material");
    const fe::ElementKind kind = model.elements.front().kind;
    if (kind != fe::ElementKind::Q4 && kind != fe::ElementKind::Q8)
        throw std::runtime_error("the deck writer knows Q4 (CPS4) and Q8 (CPS8) only");
    std::string out;
    out.reserve(static_cast<size_t>(model.n_nodes()) * 48 + model.elements.size() * 80);
    out += "** lapwing benchmark: plate with a hole, plane stress\n*NODE, NSET=NALL\n";
    for (int i = 0; i < model.n_nodes(); ++i) {
        const fe::Vector2& x = model.nodes[static_cast<size_t>(i)];
        out += fmt::format("{}, {:.13g}, {:.13g}\n", i + 1, x.x(), x.y());
    }
    // Node order: corners, then mid-sides of edges 1-2, 2-3, 3-4, 4-1, the
    // same in both programs (VTK's order, element_kind.hpp).
    const int n_per = fe::node_count(kind);
    out += fmt::format("*ELEMENT, TYPE={}, ELSET=EALL\n",
                       kind == fe::ElementKind::Q4 ? "CPS4" : "CPS8");
    for (size_t e = 0; e < model.elements.size(); ++e) {
        out += fmt::format("{}", e + 1);
        for (int a = 0; a < n_per; ++a)
            out += fmt::format(", {}", model.elements[e].nodes[static_cast<size_t>(a)] + 1);
        out += '\n';
    }
    const fe::Material& m = model.materials.front();
    out += fmt::format("*MATERIAL, NAME=PLATE\n*ELASTIC\n{:.13g}, {:.13g}\n", m.E, m.nu);
    out += fmt::format("*SOLID SECTION, ELSET=EALL, MATERIAL=PLATE\n{:.13g}\n",
                       model.elements.front().thickness);
    out += "*BOUNDARY\n";
    for (const fe::PrescribedDof& p : constraints.prescribed) {
        if (p.value != 0.0)
            throw std::runtime_error("the deck writer takes zero prescribed values only");
        const int direction = p.dof % 2 == 0 ? 1 : 2;
        out += fmt::format("{}, {}, {}\n", p.dof / 2 + 1, direction, direction);
    }
    out += "*STEP\n*STATIC\n*CLOAD\n";
    const Eigen::VectorXd f = fe::applied_forces(model, loads);
    for (int d = 0; d < f.size(); ++d)
        if (f(d) != 0.0) out += fmt::format("{}, {}, {:.13g}\n", d / 2 + 1, d % 2 + 1, f(d));
    out += "*NODE PRINT, NSET=NALL\nU\n*NODE FILE\nS\n*END STEP\n";
    return out;
}

Eigen::MatrixX2d read_calculix_displacements(const std::string& dat, int n_nodes) {
    Eigen::MatrixX2d u = Eigen::MatrixX2d::Constant(n_nodes, 2, std::nan(""));
    std::istringstream in(dat);
    std::string line;
    bool in_block = false;
    while (std::getline(in, line)) {
        if (line.find("displacements") != std::string::npos) {
            in_block = true;
            continue;
        }
        if (!in_block) continue;
        std::istringstream fields(line);
        long node = 0;
        double ux = 0, uy = 0;
        if (!(fields >> node >> ux >> uy)) continue;
        if (node >= 1 && node <= n_nodes) u.row(node - 1) << ux, uy;
    }
    if (!u.allFinite()) throw std::runtime_error("the .dat file lacks displacements of some nodes");
    return u;
}

Eigen::MatrixX3d read_calculix_stresses(const std::string& frd, int n_nodes) {
    // Fixed columns (CalculiX's .frd format): " -1", the node in 10
    // characters, then 12-character values SXX SYY SZZ SXY SYZ SZX.
    Eigen::MatrixX3d s = Eigen::MatrixX3d::Constant(n_nodes, 3, std::nan(""));
    std::istringstream in(frd);
    std::string line;
    bool in_block = false;
    while (std::getline(in, line)) {
        if (line.rfind(" -4", 0) == 0) {
            in_block = line.find("STRESS") != std::string::npos;
            continue;
        }
        if (!in_block) continue;
        if (line.rfind(" -3", 0) == 0) break;
        if (line.rfind(" -1", 0) != 0 || line.size() < 13 + 4 * 12) continue;
        const long node = std::stol(line.substr(3, 10));
        const auto value = [&](int k) {
            return std::stod(line.substr(static_cast<size_t>(13 + 12 * k), 12));
        };
        if (node >= 1 && node <= n_nodes) s.row(node - 1) << value(0), value(1), value(3);
    }
    if (!s.allFinite()) throw std::runtime_error("the .frd file lacks stresses of some nodes");
    return s;
}

} // namespace lapwing::bench
