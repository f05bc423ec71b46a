#include "beamwarden/store/labexport.hpp"

#include "store/databasecopy.hpp"
#include "store/labjson.hpp"
#include "store/textfile.hpp"

#include <map>

namespace beamwarden::store {

namespace {

constexpr int kIndent = 2;

} // namespace

std::string toLabExport(const LabContents& contents)
{
    std::map<model::RecordId, std::string> laserNames;
    OrderedJson lasers = OrderedJson::array();
    for (const model::Laser& laser : contents.lasers) {
        laserNames[laser.id] = laser.name;
        lasers.push_back(toJson(laser));
    }
    OrderedJson eyewear = OrderedJson::array();
    for (const model::EyewearItem& item : contents.eyewear)
        eyewear.push_back(toJson(item));
    OrderedJson assessments = OrderedJson::array();
    for (const model::Assessment& assessment : contents.assessments)
        assessments.push_back(toJson(assessment, laserNames[assessment.laserId]));
    const OrderedJson document{{"format", kLabExportFormat},    {"version", kLabExportVersion},
                               {"lab", toJson(contents.lab)},   {"lasers", std::move(lasers)},
                               {"eyewear", std::move(eyewear)}, {"assessments", std::move(assessments)}};
    // nlohmann prints the shortest decimal that reads back as the same double, so numbers survive a round trip;
    // ensure_ascii off keeps names such as "µm" readable, and invalid UTF-8 is replaced rather than thrown on.
    return document.dump(kIndent, ' ', false, OrderedJson::error_handler_t::replace) + "\n";
}

Result<void> exportLab(LabStore& store, const std::filesystem::path& out)
{
    auto contents = store.contents();
    if (!contents)
        return std::unexpected(contents.error());
    return writeTextFileAtomically(out, toLabExport(*contents));
}

Result<LabStore> importLab(const std::filesystem::path& exportPath, const std::filesystem::path& labPath)
{
    std::error_code error;
    if (std::filesystem::exists(labPath, error))
        return fail("lab file", labPath.string(), "a path where no file exists yet");
    auto text = readTextFile(exportPath);
    if (!text)
        return std::unexpected(text.error());
    auto contents = parseLabExport(*text);
    if (!contents)
        return std::unexpected(contents.error());
    return LabStore::create(labPath, *contents);
}

} // namespace beamwarden::store
