#include "labverbs.hpp"

#include "arguments.hpp"
#include "beamwarden/store/eyewearcsv.hpp"
#include "beamwarden/store/labexport.hpp"
#include "beamwarden/store/labstore.hpp"
#include "demolocation.hpp"
#include "storeerrors.hpp"
#include "verbs.hpp"

#include <fmt/core.h>

#include <cstdio>
#include <filesystem>

namespace beamwarden::cli {

namespace {

namespace fs = std::filesystem;

const std::vector<FlagSpec>& newFlags()
{
    static const std::vector<FlagSpec> flags = {
        {"demo", false, "", "fill the new lab file with the invented demo lab"},
        {"name", true, "TEXT", "the lab's name (default: the file name)"},
        {"lso", true, "TEXT", "the responsible laser safety officer's name"},
        {"help", false, "", "show this help"},
    };
    return flags;
}

const std::vector<FlagSpec>& helpOnly()
{
    static const std::vector<FlagSpec> flags = {{"help", false, "", "show this help"}};
    return flags;
}

void printHelp()
{
    fmt::print("Usage: beamwarden-cli lab new [--demo] [--name TEXT] [--lso TEXT] LAB\n"
               "       beamwarden-cli lab export LAB OUT.bwlab.json\n"
               "       beamwarden-cli lab import IN.bwlab.json LAB\n"
               "       beamwarden-cli lab check LAB\n"
               "       beamwarden-cli lab import-eyewear LAB FILE.csv\n\n"
               "Lab files (.bwlab) hold a lab's lasers, eyewear and assessments. 'import' creates LAB and refuses an\n"
               "existing one; nothing is written unless the whole input is sound. The export format and the CSV\n"
               "columns are described in docs/lab-export.md.\n\n"
               "Exit codes: 0 done (for 'check': the file is sound), 1 failed while working, 2 input refused or\n"
               "file not sound (the message names the field, row or problem).\n");
}

int refuse(std::string_view verb, const std::string& text)
{
    fmt::print(stderr, "beamwarden-cli {}: {}\n", verb, text);
    return kExitBadInput;
}

// The positional arguments of a sub-verb, exactly `count` of them.
Result<std::vector<std::string>> operands(const std::vector<std::string>& args, const std::vector<FlagSpec>& specs,
                                          std::size_t count, const char* usage, Arguments* parsed = nullptr)
{
    auto arguments = Arguments::parse(args, specs);
    if (!arguments)
        return std::unexpected(arguments.error());
    if (arguments->positional().size() != count)
        return fail("command line", fmt::format("{} file names", arguments->positional().size()), usage);
    if (parsed != nullptr)
        *parsed = *arguments;
    return arguments->positional();
}

bool wantsHelp(const std::vector<std::string>& args)
{
    for (const std::string& arg : args) {
        if (arg == "--help" || arg == "-h")
            return true;
    }
    return false;
}

int runNew(const std::vector<std::string>& args)
{
    Arguments flags;
    auto files = operands(args, newFlags(), 1, "one lab file: lab new [--demo] LAB", &flags);
    if (!files)
        return reportStoreError("lab new", files.error());
    const fs::path labPath = files->front();
    if (flags.has("demo")) {
        if (flags.has("name") || flags.has("lso"))
            return refuse("lab new", "--demo brings its own lab name and LSO; leave out --name and --lso");
        const auto demo = demoLabExport();
        if (!demo) {
            fmt::print(stderr, "beamwarden-cli lab new: the demo lab (demo.bwlab.json) is not installed\n");
            return kExitFailed;
        }
        auto store = store::importLab(*demo, labPath);
        if (!store)
            return reportStoreError("lab new", store.error());
        auto contents = store->contents();
        if (!contents)
            return reportStoreError("lab new", contents.error());
        fmt::print("Created {} with the demo lab '{}': {} lasers, {} eyewear items.\n", labPath.string(),
                   contents->lab.name, contents->lasers.size(), contents->eyewear.size());
        return kExitOk;
    }
    model::Lab lab;
    lab.name = flags.value("name").value_or(labPath.stem().string());
    lab.lsoName = flags.value("lso").value_or("");
    auto store = store::LabStore::create(labPath, lab);
    if (!store)
        return reportStoreError("lab new", store.error());
    fmt::print("Created {} for the lab '{}'.\n", labPath.string(), lab.name);
    return kExitOk;
}

int runExport(const std::vector<std::string>& args)
{
    auto files = operands(args, helpOnly(), 2, "a lab file and an export file: lab export LAB OUT.bwlab.json");
    if (!files)
        return reportStoreError("lab export", files.error());
    auto store = store::LabStore::open((*files)[0]);
    if (!store)
        return reportStoreError("lab export", store.error());
    if (auto done = store::exportLab(*store, (*files)[1]); !done)
        return reportStoreError("lab export", done.error());
    fmt::print("Exported {} to {}.\n", (*files)[0], (*files)[1]);
    return kExitOk;
}

int runImport(const std::vector<std::string>& args)
{
    auto files = operands(args, helpOnly(), 2, "an export file and a new lab file: lab import IN.bwlab.json LAB");
    if (!files)
        return reportStoreError("lab import", files.error());
    auto store = store::importLab((*files)[0], (*files)[1]);
    if (!store)
        return reportStoreError("lab import", store.error());
    auto contents = store->contents();
    if (!contents)
        return reportStoreError("lab import", contents.error());
    fmt::print("Created {} from {}: {} lasers, {} eyewear items, {} assessments.\n", (*files)[1], (*files)[0],
               contents->lasers.size(), contents->eyewear.size(), contents->assessments.size());
    return kExitOk;
}

int runCheck(const std::vector<std::string>& args)
{
    auto files = operands(args, helpOnly(), 1, "one lab file: lab check LAB");
    if (!files)
        return reportStoreError("lab check", files.error());
    auto report = store::checkLabFile(files->front());
    if (!report)
        return reportStoreError("lab check", report.error());
    if (report->sound()) {
        fmt::print("{}: sound (schema version {}).\n", files->front(), report->schemaVersion);
        return kExitOk;
    }
    fmt::print("{}: {} problem{} found.\n", files->front(), report->problems.size(),
               report->problems.size() == 1 ? "" : "s");
    for (const std::string& problem : report->problems)
        fmt::print("  {}\n", problem);
    return kExitBadInput;
}

int runImportEyewear(const std::vector<std::string>& args)
{
    auto files = operands(args, helpOnly(), 2, "a lab file and a CSV file: lab import-eyewear LAB FILE.csv");
    if (!files)
        return reportStoreError("lab import-eyewear", files.error());
    auto store = store::LabStore::open((*files)[0]);
    if (!store)
        return reportStoreError("lab import-eyewear", store.error());
    auto ids = store::importEyewearCsv(*store, (*files)[1]);
    if (!ids)
        return reportStoreError("lab import-eyewear", ids.error());
    fmt::print("Added {} eyewear item{} from {} to {}.\n", ids->size(), ids->size() == 1 ? "" : "s", (*files)[1],
               (*files)[0]);
    return kExitOk;
}

} // namespace

int runLab(const std::vector<std::string>& args)
{
    if (args.empty() || args.front() == "--help" || args.front() == "-h" || args.front() == "help") {
        printHelp();
        return args.empty() ? kExitBadInput : kExitOk;
    }
    const std::string& sub = args.front();
    const std::vector<std::string> rest(args.begin() + 1, args.end());
    if (wantsHelp(rest)) {
        printHelp();
        return kExitOk;
    }
    if (sub == "new")
        return runNew(rest);
    if (sub == "export")
        return runExport(rest);
    if (sub == "import")
        return runImport(rest);
    if (sub == "check")
        return runCheck(rest);
    if (sub == "import-eyewear")
        return runImportEyewear(rest);
    return refuse("lab",
                  fmt::format("unknown sub-verb '{}'; expected new, export, import, check or import-eyewear", sub));
}

} // namespace beamwarden::cli
