#include "sheetverb.hpp"

#include "arguments.hpp"
#include "beamwarden/caution.hpp"
#include "beamwarden/store/labstore.hpp"
#include "flagvalues.hpp"
#include "sheetcontent.hpp"
#include "sheetrenderer.hpp"
#include "sheettranslator.hpp"
#include "verbs.hpp"

#include <QGuiApplication>
#include <QString>

#include <fmt/core.h>

#include <algorithm>

namespace beamwarden::cli {

namespace {

const std::vector<FlagSpec>& sheetFlags()
{
    static const std::vector<FlagSpec> flags = {
        {"laser", true, "NAME", "the laser, by its name in the lab file"},
        {"out", true, "FILE.pdf", "where to write the sheet"},
        {"page", true, "SIZE", "paper: a4 (default) or letter"},
        {"language", true, "CODE", "language of the sheet: en (default) or de"},
        {"rules", true, "SET", "strictest (default), iec60825-1:2014 or iec60825-1:2007"},
        {"c5", true, "OPTION", "2014 repeated-pulse factor: conservative (default) or edition"},
        {"help", false, "", "show this help"},
    };
    return flags;
}

void printHelp()
{
    fmt::print(
        "Usage: beamwarden-cli sheet LAB.bwlab --laser NAME --out FILE.pdf [FLAGS]\n\nWrites the hazard sheet of "
        "one laser (its outputs, limits, distances, required OD, eyewear, assessment record and space for "
        "signatures) as a PDF. No display is needed.\n\n");
    for (const FlagSpec& flag : sheetFlags())
        fmt::print("  --{:<10} {:<9} {}\n", flag.name, flag.meta, flag.help);
    fmt::print("\nExit codes: 0 written, 1 the file could not be written or the lab file read, 2 input refused.\n");
}

int refuse(const InputError& error)
{
    fmt::print(stderr, "beamwarden-cli sheet: {}\n", error.message());
    return kExitBadInput;
}

// A storage failure (disk, lock) is a failure while working; anything else about the lab file is refused input.
int storeError(const InputError& error)
{
    fmt::print(stderr, "beamwarden-cli sheet: {}\n", error.message());
    return error.field == store::kStorageField ? kExitFailed : kExitBadInput;
}

// Qt's own chatter about a headless session (no XDG runtime folder, and the like) is not the user's business; its
// warnings about real trouble still reach stderr.
void qtMessage(QtMsgType type, const QMessageLogContext&, const QString& message)
{
    if (type == QtDebugMsg || type == QtInfoMsg || message.startsWith(QStringLiteral("QStandardPaths:")))
        return;
    fmt::print(stderr, "beamwarden-cli sheet: {}\n", message.toStdString());
}

// The CLI's only Qt application: fonts and painting need one. Without a platform chosen, the offscreen one is used so
// that no display is needed.
QGuiApplication& guiApplication()
{
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    qInstallMessageHandler(qtMessage);
    static int argc = 1;
    static char name[] = "beamwarden-cli";
    static char* argv[] = {name, nullptr};
    static QGuiApplication app(argc, argv);
    return app;
}

} // namespace

int runSheet(const std::vector<std::string>& argv)
{
    auto args = Arguments::parse(argv, sheetFlags());
    if (!args)
        return refuse(args.error());
    if (args->has("help")) {
        printHelp();
        return kExitOk;
    }
    if (args->positional().size() != 1)
        return refuse(InputError{"LAB", args->positional().empty() ? "" : args->positional()[1],
                                 "exactly one lab file before the flags"});
    const auto laserName = args->value("laser");
    if (!laserName || laserName->empty())
        return refuse(InputError{"--laser", "", "the name of one of the lab's lasers"});
    const auto out = args->value("out");
    if (!out || out->empty())
        return refuse(InputError{"--out", "", "the PDF file to write"});
    sheet::PageSize pageSize = sheet::PageSize::A4;
    if (const auto page = args->value("page")) {
        const auto parsed = sheet::parsePageSize(*page);
        if (!parsed)
            return refuse(InputError{"--page", *page, "a4 or letter"});
        pageSize = *parsed;
    }
    const std::string language = args->value("language").value_or("en");
    if (language != "en" && language != "de")
        return refuse(InputError{"--language", language, "en or de"});
    assessment::AssessmentOptions options;
    const auto flags = ruleFlags(*args);
    if (!flags)
        return refuse(flags.error());
    options.rules = flags->rules;
    options.c5 = flags->c5;

    auto labStore = store::LabStore::open(args->positional().front());
    if (!labStore)
        return storeError(labStore.error());
    auto lab = labStore->lab();
    if (!lab)
        return storeError(lab.error());
    auto lasers = labStore->lasers();
    if (!lasers)
        return storeError(lasers.error());
    const auto laser =
        std::find_if(lasers->begin(), lasers->end(), [&](const model::Laser& l) { return l.name == *laserName; });
    if (laser == lasers->end()) {
        std::string names;
        for (const model::Laser& l : *lasers)
            names += (names.empty() ? "" : ", ") + ("'" + l.name + "'");
        return refuse(InputError{"--laser", *laserName,
                                 lasers->empty() ? std::string("a laser, but the lab has none")
                                                 : "one of the lab's lasers: " + names});
    }
    auto shelf = labStore->eyewear();
    if (!shelf)
        return storeError(shelf.error());
    auto records = labStore->assessments(laser->id);
    if (!records)
        return storeError(records.error());

    QGuiApplication& app = guiApplication();
    const QString qLanguage = QString::fromStdString(language);
    if (!sheet::installSheetTranslator(app, qLanguage))
        return refuse(InputError{"--language", language, "en or de (no translation found)"});
    auto content = sheet::buildSheetContent(*lab, *laser, *shelf, std::move(*records), options, pageSize, qLanguage);
    if (!content)
        return refuse(content.error());
    const auto pages = sheet::writePdf(*content, QString::fromStdString(*out), pageSize);
    if (!pages) {
        InputError error = pages.error();
        error.field = "--out";
        fmt::print(stderr, "beamwarden-cli sheet: {}\n", error.message());
        return kExitFailed;
    }
    fmt::print("Wrote the hazard sheet of '{}' to {} ({} page{}, {}).\n\n{}\n", laser->name, *out, *pages,
               *pages == 1 ? "" : "s", pageSize == sheet::PageSize::Letter ? "US Letter" : "A4", caution());
    return kExitOk;
}

} // namespace beamwarden::cli
