// The command line (CLI11, kept in this one file): subcommands, their help
// and the mapping of CLI11's own errors to the "bad input" exit code.
#include "cli/app.hpp"

#include "analysis/resource_estimate.hpp"
#include "cli/commands.hpp"
#include "cli/sweep_command.hpp"
#include "core/error.hpp"

#include <CLI/CLI.hpp>
#include <iostream>

#ifdef LAPWING_HAS_VERIFY
#include "cli/verify_command.hpp"
#endif

namespace lapwing::cli {

namespace {

// --max-dofs for every command that meshes: one wording, one default.
void add_max_dofs_option(CLI::App* command, long& max_dofs, long highest = 2'000'000'000L,
                         const std::string& note = "") {
    command
        ->add_option("--max-dofs", max_dofs,
                     "Refuse a model estimated above N degrees of freedom before meshing "
                     "(default " +
                         std::to_string(analysis::default_max_dofs) +
                         ", what fits a 24 GiB machine; about 2.5 kB of memory per dof)" + note)
        ->check(CLI::Range(1L, highest));
}

std::string kinds_list() {
    std::string out = "Kinds:\n";
    for (const auto& k : template_kinds())
        out += "  " + k.name + std::string(16 - std::min<size_t>(15, k.name.size()), ' ') +
               k.description + "\n";
    return out;
}

} // namespace

int run(int argc, char** argv) {
    CLI::App app{
        "lapwing: checks steel connection plates (gusset and splice plates) by plane-stress\n"
        "finite elements. Describe one plate in a TOML template, then validate it."};
    app.name("lapwing");
    app.set_version_flag("--version",
                         std::string("lapwing ") + LAPWING_VERSION + " (" + LAPWING_BUILD_ID + ")",
                         "Print the program version and build, then stop");
    app.require_subcommand(1, 1);
    app.footer("Exit codes: 0 success, 1 a check fails (check), 2 bad input (every problem is "
               "listed with file:line), 3 an output could not be written.\n"
               "Run `lapwing COMMAND --help` for the options of one command.");

    std::string kind, output;
    bool force = false;
    auto* new_cmd = app.add_subcommand(
        "new", "Write a fully commented starting template of one connection kind");
    new_cmd->add_option("KIND", kind, "Connection kind (listed below)")->required();
    new_cmd->add_option("-o,--output", output, "File to write (default: print to standard output)");
    new_cmd->add_flag("--force", force,
                      "Replace FILE if it already exists (otherwise it is left alone)");
    new_cmd->footer(kinds_list() + "\nExample: lapwing new corner-gusset -o G3.toml");

    std::string file;
    std::vector<std::string> sets;
    auto* validate_cmd = app.add_subcommand(
        "validate",
        "Resolve parameters and expressions, check every value, print the resolved model");
    validate_cmd->add_option("FILE", file, "Connection template (TOML)")->required();
    validate_cmd->add_option(
        "--set", sets,
        "Override one key before validating, KEY=VALUE (repeatable); the value is TOML, "
        "e.g. --set parameters.t=14 --set 'job.revision=\"B\"' --set bolt_group[0].rows=5");
    bool resolved = false;
    validate_cmd->add_flag(
        "--resolved", resolved,
        "Print the resolved template (plain numbers in the template's units) instead of "
        "the summary");
    validate_cmd->footer(
        "Prints the summary in the template's own units and ends with \"FILE: valid\".\n"
        "Bad input: exit code 2, every problem on standard error as\n"
        "FILE:LINE:COLUMN: key.path = value: what is valid.");

    std::string mesh_file, mesh_folder;
    std::vector<std::string> mesh_sets;
    auto* mesh_cmd = app.add_subcommand(
        "mesh", "Validate a template, mesh its plate, write mesh.svg and mesh.vtu");
    mesh_cmd->add_option("FILE", mesh_file, "Connection template (TOML)")->required();
    mesh_cmd->add_option(
        "--set", mesh_sets,
        "Override one key before meshing, KEY=VALUE (repeatable), as for validate");
    mesh_cmd->add_option("-o,--output", mesh_folder,
                         "Folder for mesh.svg and mesh.vtu (default: the current folder)");
    long max_dofs = analysis::default_max_dofs;
    add_max_dofs_option(mesh_cmd, max_dofs);
    mesh_cmd->footer(
        "Prints the element count and quality figures. The files are written through a temporary\n"
        "file and a rename; nothing is written when the input is bad (exit code 2).\n"
        "Example: lapwing mesh G3.toml -o out");

    std::string analyse_file;
    std::vector<std::string> analyse_sets;
    auto* analyse_cmd = app.add_subcommand(
        "analyse", "Validate, mesh and solve every load case; print bolt forces and reactions");
    analyse_cmd->add_option("FILE", analyse_file, "Connection template (TOML)")->required();
    analyse_cmd->add_option("--set", analyse_sets,
                            "Override one key, KEY=VALUE (repeatable), as for validate");
    add_max_dofs_option(analyse_cmd, max_dofs);
    analyse_cmd->footer(
        "Exit codes: 0 solved, 2 bad input or a model that cannot be solved (the message says\n"
        "what and where, e.g. a plate that can rotate about a single support bolt).\n"
        "Example: lapwing analyse G3.toml --set parameters.t=12");

    CheckArgs check_args;
    auto* check_cmd = app.add_subcommand(
        "check", "Mesh, solve and check the plate; print the governing checks; write the calc "
                 "sheet");
    check_cmd->add_option("FILE", check_args.file, "Connection template (TOML)")->required();
    check_cmd->add_option("--set", check_args.sets,
                          "Override one key, KEY=VALUE (repeatable), as for validate");
    check_cmd->add_option("-o,--output", check_args.output_folder,
                          "Folder for the calc sheet and data files");
    check_cmd->add_flag("--single-mesh", check_args.single_mesh,
                        "Skip the second, finer mesh (no convergence evidence; quicker)");
    check_cmd->add_flag("-q,--quiet", check_args.quiet, "Print nothing but errors");
    check_cmd->add_flag("--json", check_args.json, "Print the summary as JSON");
    check_cmd->add_flag("--reproducible", check_args.reproducible,
                        "Fixed date in the outputs, so two runs give byte-identical files");
    check_cmd->add_flag("--force", check_args.force,
                        "Write into an output folder that holds files other than lapwing's");
    check_args.max_dofs = analysis::default_max_dofs;
    add_max_dofs_option(check_cmd, check_args.max_dofs);
    check_cmd->footer(
        "Exit codes: 0 every check passes, 1 a demand exceeds its capacity, 2 bad input or a\n"
        "model that cannot be solved, 3 an output could not be written (the folder cannot be\n"
        "made, or holds other files without --force). Capacities are the allowables you\n"
        "enter; lapwing names the method of each row and does not claim code compliance.\n"
        "Example: lapwing check G3.toml -o G3-out");

    SweepArgs sweep_args;
    auto* sweep_cmd = app.add_subcommand(
        "sweep", "Check every variant of a template over a grid of values, in parallel; write "
                 "sweep.csv and sweep.html");
    sweep_cmd->add_option("FILE", sweep_args.file, "Connection template (TOML)")->required();
    sweep_cmd
        ->add_option("--vary", sweep_args.vary,
                     "A key and its values, KEY=START:STOP:STEP (stop included) or KEY=A,B,C; "
                     "a bare name is a parameter (t means parameters.t); repeat for a grid, the "
                     "first varying slowest")
        ->required();
    sweep_cmd->add_option("--set", sweep_args.sets,
                          "Override one key for every variant, KEY=VALUE (repeatable)");
    sweep_cmd->add_option("-j,--jobs", sweep_args.threads, "Worker threads (default: every core)")
        ->check(CLI::Range(1, 1024));
    sweep_cmd->add_option("-o,--output", sweep_args.output_folder,
                          "Folder for sweep.csv and sweep.html (default: the current folder)");
    sweep_cmd->add_option("--find-min", sweep_args.find_min,
                          "Search the smallest passing value of this varied key by bisection "
                          "(per combination of the other keys) instead of running every variant");
    sweep_cmd->add_option("--shard", sweep_args.shard,
                          "Run only part I of N (every N-th variant, from variant I), for a batch "
                          "scheduler; join the parts with lapwing merge");
    sweep_cmd->add_flag("--single-mesh", sweep_args.single_mesh,
                        "Skip the finer convergence mesh of each variant (quicker)");
    sweep_cmd->add_flag("--no-reuse", sweep_args.no_reuse,
                        "Mesh and factorize every variant afresh (for timing comparisons)");
    sweep_cmd->add_flag("--reports", sweep_args.reports,
                        "Also write each variant's calc sheet and data files, as lapwing check -o "
                        "would, into DIR/variants/NAME/ (NAME from the variant's number and "
                        "values)");
    sweep_cmd->add_flag("--reproducible", sweep_args.reproducible,
                        "Reports with a fixed date and no timings (byte-identical reruns)");
    sweep_cmd->add_flag("-q,--quiet", sweep_args.quiet, "No progress and no summary");
    sweep_args.max_dofs = analysis::default_max_dofs;
    add_max_dofs_option(sweep_cmd, sweep_args.max_dofs);
    sweep_cmd->footer(
        "Exit codes: 0 written (whether variants pass or not), 2 bad input or no variant could "
        "be built,\n3 an output could not be written (with --reports: some variant's files; "
        "the rest is written),\n130 interrupted: the completed rows are in "
        "sweep-interrupted.csv.\n"
        "Example: lapwing sweep G3.toml --vary t=8:30:2 --find-min t -o G3-sweep");

    std::vector<std::string> merge_files;
    std::string merge_output;
    int merge_expect = 0;
    auto* merge_cmd = app.add_subcommand(
        "merge", "Join the sweep.csv files of the shards of one sweep into the full sweep.csv");
    merge_cmd->add_option("FILES", merge_files, "Shard CSV files")->required();
    merge_cmd->add_option("-o,--output", merge_output,
                          "File to write (default: print to standard output)");
    merge_cmd
        ->add_option("--expect", merge_expect,
                     "Number of variants of the full sweep, to catch a missing last shard")
        ->check(CLI::Range(1, 100000));

#ifdef LAPWING_HAS_VERIFY
    std::string example = "all";
    auto* verify_cmd = app.add_subcommand(
        "verify", "Run the shipped verification examples (published benchmarks)");
    verify_cmd->add_option("EXAMPLE", example, "One example by name, or all (the default)");
    std::string examples = "Examples:";
    for (const auto& name : verify_examples()) examples += " " + name;
    verify_cmd->footer(
        examples +
        "\nExit codes: 0 every value within its tolerance, 1 one is not, 2 unknown example.");
#endif

    try {
        app.parse(argc, argv);
    } catch (const CLI::ParseError& e) {
        const int code = app.exit(e); // prints help, the version, or the error
        return code == 0 ? 0 : static_cast<int>(ExitCode::bad_input);
    }

    if (new_cmd->parsed()) return run_new(kind, output, force, std::cout, std::cerr);
    if (mesh_cmd->parsed())
        return run_mesh(mesh_file, mesh_sets, mesh_folder, max_dofs, std::cout, std::cerr);
    if (check_cmd->parsed()) {
        for (int i = 0; i < argc; ++i)
            check_args.command_line += (i ? " " : "") + std::string(argv[i]);
        return run_check(check_args, std::cout, std::cerr);
    }
    if (sweep_cmd->parsed()) {
        for (int i = 0; i < argc; ++i)
            sweep_args.command_line += (i ? " " : "") + std::string(argv[i]);
        return run_sweep(sweep_args, std::cout, std::cerr);
    }
    if (merge_cmd->parsed())
        return run_merge(merge_files, merge_output, merge_expect, std::cout, std::cerr);
    if (analyse_cmd->parsed())
        return run_analyse(analyse_file, analyse_sets, max_dofs, std::cout, std::cerr);
    if (validate_cmd->parsed()) return run_validate(file, sets, resolved, std::cout, std::cerr);
#ifdef LAPWING_HAS_VERIFY
    if (verify_cmd->parsed()) return run_verify(example, std::cout);
#endif
    return static_cast<int>(ExitCode::bad_input);
}

} // namespace lapwing::cli
