#include "backupverb.hpp"

#include "arguments.hpp"
#include "beamwarden/store/labstore.hpp"
#include "storeerrors.hpp"
#include "verbs.hpp"

#include <fmt/core.h>

namespace beamwarden::cli {

namespace {

void printHelp()
{
    fmt::print("Usage: beamwarden-cli backup LAB OUT\n\n"
               "Copies the lab file LAB to OUT (which must not exist) with SQLite's online backup, so the copy is\n"
               "consistent even while the desktop application has LAB open. OUT opens like any lab file.\n\n"
               "Exit codes: 0 done, 1 failed while working, 2 input refused.\n");
}

} // namespace

int runBackup(const std::vector<std::string>& args)
{
    static const std::vector<FlagSpec> flags = {{"help", false, "", "show this help"}};
    auto parsed = Arguments::parse(args, flags);
    if (!parsed)
        return reportStoreError("backup", parsed.error());
    if (parsed->has("help")) {
        printHelp();
        return kExitOk;
    }
    if (parsed->positional().size() != 2)
        return reportStoreError("backup",
                                InputError{"command line", fmt::format("{} file names", parsed->positional().size()),
                                           "a lab file and a new file: backup LAB OUT"});
    const std::string& lab = parsed->positional()[0];
    const std::string& out = parsed->positional()[1];
    auto store = store::LabStore::open(lab);
    if (!store)
        return reportStoreError("backup", store.error());
    if (auto done = store->backup(out); !done)
        return reportStoreError("backup", done.error());
    fmt::print("Backed up {} to {}.\n", lab, out);
    return kExitOk;
}

} // namespace beamwarden::cli
