// What a sweep keeps between the runs of one worker (CheckOptions::cache):
// the mesh of each plate region and mesh settings seen lately, and for each
// such mesh the solver state (sparse pattern and fill-reducing ordering) of
// its last analysis. A variant that changes only values (thickness,
// allowables, forces) then skips the mesher, the pattern and the ordering;
// one that changes the geometry meshes and analyses afresh. Results are the
// same either way: the mesher is deterministic and a refactorization with a
// kept ordering repeats the operations of a fresh one.
#pragma once

#include "analysis/solver_reuse.hpp"
#include "geometry/plate_region.hpp"
#include "mesh/mesh.hpp"

#include <list>
#include <string>

namespace lapwing::check {

struct ReuseStats {
    int meshes_built = 0, meshes_reused = 0;
    int solvers_built = 0, solvers_reused = 0;
};

struct ReuseCache {
    struct Slot {
        std::string key; // region and settings, as bytes
        mesh::Mesh mesh;
        analysis::SolverReuse solver;
    };

    // The slot for this region and these settings: the kept one, or a new one
    // whose mesh is built now (the least recently used slot is dropped
    // beyond `capacity`). The model's mesh and the convergence mesh take
    // one slot each, so a capacity of 4 keeps two geometries.
    Slot& slot(const geometry::PlateRegion& region, const mesh::MeshSettings& settings);

    ReuseStats stats() const;

    size_t capacity = 4;
    std::list<Slot> slots; // most recently used first
    int meshes_built = 0, meshes_reused = 0;
    int solvers_built_dropped = 0, solvers_reused_dropped = 0; // of slots no longer kept
};

// The bytes that decide the mesh: equal keys give equal meshes.
std::string mesh_key(const geometry::PlateRegion& region, const mesh::MeshSettings& settings);

} // namespace lapwing::check
