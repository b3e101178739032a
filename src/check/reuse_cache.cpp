// The sweep's per-worker cache of meshes and solver states.
#include "check/reuse_cache.hpp"

#include <algorithm>
#include <cstring>

namespace lapwing::check {

namespace {

template <typename T>
void put(std::string& key, const T& value) {
    char bytes[sizeof(T)];
    std::memcpy(bytes, &value, sizeof(T));
    key.append(bytes, sizeof(T));
}

void put_point(std::string& key, const geometry::Point& p) {
    put(key, p.x());
    put(key, p.y());
}

} // namespace

std::string mesh_key(const geometry::PlateRegion& region, const mesh::MeshSettings& settings) {
    std::string key;
    put(key, static_cast<int>(settings.kind));
    put(key, settings.element_size);
    put(key, settings.elements_around_hole);
    put(key, settings.grading);
    put(key, settings.corner_size_ratio);
    put(key, settings.smoothing_passes);
    put(key, region.min_ligament);
    put(key, region.outline.size());
    for (const geometry::OutlineVertex& v : region.outline) {
        put_point(key, v.point);
        put(key, v.chamfer);
        put(key, v.fillet_radius);
    }
    put(key, region.holes.size());
    for (const geometry::Hole& h : region.holes) {
        put(key, static_cast<int>(h.shape));
        put_point(key, h.centre);
        put(key, h.diameter);
        put(key, h.length);
        put(key, h.width);
        put(key, h.angle_deg);
    }
    put(key, region.cutouts.size());
    for (const geometry::Polygon& c : region.cutouts) {
        put(key, c.points.size());
        for (const geometry::Point& p : c.points) put_point(key, p);
    }
    return key;
}

ReuseCache::Slot& ReuseCache::slot(const geometry::PlateRegion& region,
                                   const mesh::MeshSettings& settings) {
    std::string key = mesh_key(region, settings);
    for (auto it = slots.begin(); it != slots.end(); ++it)
        if (it->key == key) {
            slots.splice(slots.begin(), slots, it);
            ++meshes_reused;
            return slots.front();
        }
    // Built before the slot is added, so a mesher error leaves the cache as it was.
    mesh::Mesh mesh = mesh::build_mesh(region, settings);
    ++meshes_built;
    slots.emplace_front();
    slots.front().key = std::move(key);
    slots.front().mesh = std::move(mesh);
    while (slots.size() > std::max<size_t>(1, capacity)) {
        solvers_built_dropped += slots.back().solver.n_built();
        solvers_reused_dropped += slots.back().solver.n_reused();
        slots.pop_back();
    }
    return slots.front();
}

ReuseStats ReuseCache::stats() const {
    ReuseStats s;
    s.meshes_built = meshes_built;
    s.meshes_reused = meshes_reused;
    s.solvers_built = solvers_built_dropped;
    s.solvers_reused = solvers_reused_dropped;
    for (const Slot& slot : slots) {
        s.solvers_built += slot.solver.n_built();
        s.solvers_reused += slot.solver.n_reused();
    }
    return s;
}

} // namespace lapwing::check
