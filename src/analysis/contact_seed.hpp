// The settled bearing-contact state of a load case carried from one mesh of
// a connection to another (the model's mesh to the finer convergence mesh),
// so that the second mesh's active-set iteration starts next to its answer.
// The settled set does not depend on where the iteration starts (each pass
// solves the same linear problem for a given set); a good start only saves
// passes.
#pragma once

#include "analysis/fe_problem.hpp"

#include <condition_variable>
#include <functional>
#include <mutex>
#include <optional>
#include <vector>

namespace lapwing::analysis {

// Per bearing bolt (FeProblem::bolts order), its hole nodes' angles about
// the bolt centre (radians, −π..π), whether each is in contact, and the gap
// there (mm, > 0 open; a closed node's penetration into its penalty spring
// is < 0), which places the edges of a contact arc between nodes.
struct ContactSeed {
    struct Hole {
        std::vector<double> angle;
        std::vector<char> closed;
        std::vector<double> gap;
    };
    std::vector<Hole> bolts; // empty Hole for a bolt without bearing contact
};

// The seed of a settled contact set `closed` (per link spring of p.model)
// with its displacements `u`.
ContactSeed contact_seed(const FeProblem& p, const std::vector<bool>& closed,
                         const Eigen::VectorXd& u);

// A start set for `p`'s link springs from a seed of another mesh of the same
// connection, bolt by bolt: a hole node at the angle of a seed node takes
// its state; one between two seed nodes is closed where the gap interpolated
// linearly in angle between them is not positive. Empty when the seed does
// not fit (another number of bolts, or contact at another bolt).
std::vector<bool> seeded_active_set(const FeProblem& p, const ContactSeed& seed);

// What analyse() exchanges with the outside about contact, per case
// (Results::cases index). Either may be empty.
struct ContactHooks {
    // A seed to start case `i` from, or nullopt for the usual start (the
    // previous case's set). May block until the seed exists.
    std::function<std::optional<ContactSeed>(size_t i)> seed_for;
    // Called once case `i` has settled, with its seed. May be called from
    // two threads at once (see threads).
    std::function<void(size_t i, const ContactSeed&)> settled;
    // Threads the analysis may use, for a caller that leaves a core idle
    // meanwhile: 2 lets analyse() settle the cases as two chains, the second
    // on a copy of the factor, where every case has a seed, and recover the
    // cases' stresses two at a time.
    int threads = 1;
};

// Seeds passed from one analysis (publish) to another running on another
// thread (wait), case by case. finish() releases every waiter: cases never
// published then give nullopt. Thread safe.
class ContactBoard {
public:
    explicit ContactBoard(size_t n_cases) : seeds_(n_cases) {}
    void publish(size_t i, ContactSeed seed);
    void finish();
    std::optional<ContactSeed> wait(size_t i);

    ContactHooks publisher();
    ContactHooks reader();

private:
    std::mutex mutex_;
    std::condition_variable changed_;
    std::vector<std::optional<ContactSeed>> seeds_;
    bool finished_ = false;
};

} // namespace lapwing::analysis
