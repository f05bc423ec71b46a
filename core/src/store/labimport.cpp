// Reading a lab export: every field type-checked and range-checked, with its JSON path, before anything is written.
#include "beamwarden/store/labexport.hpp"

#include "store/jsonfields.hpp"
#include "store/labjsonread.hpp"
#include "store/recordcheck.hpp"
#include "store/tryresult.hpp"

#include <fmt/core.h>

#include <map>
#include <set>

namespace beamwarden::store {

namespace {

using nlohmann::json;

Result<model::Lab> readLabRecord(const json& value, const std::string& path)
{
    BW_TRY(f, JsonFields::of(value, path));
    model::Lab lab;
    BW_TRY(name, f.text("name"));
    BW_TRY(lso, f.text("lso_name", ""));
    BW_TRY(notes, f.text("notes", ""));
    lab.name = name;
    lab.lsoName = lso;
    lab.notes = notes;
    BW_TRY(rooms, f.list("rooms"));
    for (std::size_t i = 0; i < rooms->size(); ++i) {
        BW_TRY(r, JsonFields::of((*rooms)[i], indexPath(path, "rooms", i)));
        BW_TRY(roomName, r.text("name"));
        BW_TRY(description, r.text("description", ""));
        BW_CHECK(r.noOtherKeys());
        lab.rooms.push_back(model::Room{0, roomName, description});
    }
    BW_CHECK(f.noOtherKeys());
    return lab;
}

Result<model::AssessmentStatus> readStatus(JsonFields& f, std::string_view key)
{
    BW_TRY(text, f.text(key));
    return parsedAs(model::parseAssessmentStatus(text), f.pathOf(key));
}

// The history must lead from a draft to the recorded status by allowed moves; the store's triggers check it again.
Result<void> checkHistory(const model::Assessment& a, const std::string& path)
{
    model::AssessmentStatus current = model::AssessmentStatus::Draft;
    for (std::size_t i = 0; i < a.signOffs.size(); ++i) {
        const model::SignOff& s = a.signOffs[i];
        const std::string at = indexPath(path, "sign_offs", i);
        if (s.from != current)
            return fail(joinPath(at, "from"), std::string(model::toString(s.from)),
                        fmt::format("'{}', where the previous sign-off left the assessment", model::toString(current)));
        if (!model::isAllowedTransition(s.from, s.to))
            return fail(joinPath(at, "to"), std::string(model::toString(s.to)),
                        "an allowed move: draft -> in review -> approved, in review -> draft, or to withdrawn");
        current = s.to;
    }
    if (a.status != current)
        return fail(joinPath(path, "status"), std::string(model::toString(a.status)),
                    fmt::format("'{}', where the last sign-off leaves it", model::toString(current)));
    if (a.outOfDate && a.status != model::AssessmentStatus::Approved && a.status != model::AssessmentStatus::Withdrawn)
        return fail(joinPath(path, "out_of_date"), "true", "false for an assessment that was never approved");
    return {};
}

Result<model::Assessment> readAssessment(const json& value, const std::string& path,
                                         const std::map<std::string, model::RecordId>& laserIds)
{
    BW_TRY(f, JsonFields::of(value, path));
    model::Assessment a;
    BW_TRY(laser, f.text("laser"));
    const auto found = laserIds.find(laser);
    if (found == laserIds.end())
        return fail(f.pathOf("laser"), laser, "the name of one of the export's lasers");
    a.laserId = found->second;
    BW_TRY(title, f.text("title", ""));
    BW_TRY(ruleSet, f.text("rule_set", ""));
    BW_TRY(programVersion, f.text("program_version", ""));
    BW_TRY(author, f.text("author", ""));
    BW_TRY(created, f.text("created"));
    BW_TRY(updated, f.text("updated"));
    BW_TRY(status, readStatus(f, "status"));
    BW_TRY(outOfDate, f.flag("out_of_date", false));
    BW_TRY(snapshot, f.text("input_snapshot", ""));
    BW_TRY(results, f.text("results", ""));
    for (const auto& [key, time] : {std::pair{"created", &created}, std::pair{"updated", &updated}}) {
        if (time->empty())
            return fail(f.pathOf(key), "", "a UTC time such as 2026-12-01T14:03:00Z");
    }
    a.title = title;
    a.ruleSet = ruleSet;
    a.programVersion = programVersion;
    a.author = author;
    a.created = created;
    a.updated = updated;
    a.status = status;
    a.outOfDate = outOfDate;
    a.inputSnapshot = snapshot;
    a.results = results;
    BW_TRY(signOffs, f.list("sign_offs"));
    for (std::size_t i = 0; i < signOffs->size(); ++i) {
        const std::string at = indexPath(path, "sign_offs", i);
        BW_TRY(s, JsonFields::of((*signOffs)[i], at));
        BW_TRY(who, s.text("who"));
        BW_TRY(when, s.text("when"));
        BW_TRY(from, readStatus(s, "from"));
        BW_TRY(to, readStatus(s, "to"));
        BW_TRY(comment, s.text("comment", ""));
        BW_CHECK(s.noOtherKeys());
        if (when.empty())
            return fail(s.pathOf("when"), "", "a UTC time such as 2026-12-01T14:03:00Z");
        model::SignOff signOff{0, who, when, from, to, comment};
        BW_CHECK(validateSignOff(signOff, at));
        a.signOffs.push_back(std::move(signOff));
    }
    BW_CHECK(f.noOtherKeys());
    // Times are required here (a record's times are part of the evidence), unlike in saveAssessment.
    BW_CHECK(validateAssessment(a, path));
    BW_CHECK(checkHistory(a, path));
    return a;
}

Result<json> parseDocument(std::string_view text)
{
    try {
        return json::parse(text);
    } catch (const json::exception& error) {
        // nlohmann's text carries the line and column; drop its "[json.exception...]" prefix.
        std::string what = error.what();
        if (const auto end = what.find("] "); end != std::string::npos)
            what = what.substr(end + 2);
        return fail("document", what, "a lab export in JSON (docs/lab-export.md)");
    }
}

} // namespace

Result<LabContents> parseLabExport(std::string_view text)
{
    BW_TRY(document, parseDocument(text));
    BW_TRY(top, JsonFields::of(document, ""));
    BW_TRY(format, top.text("format"));
    if (format != kLabExportFormat)
        return fail("format", format, std::string(kLabExportFormat));
    BW_TRY(version, top.integer("version"));
    if (version > kLabExportVersion)
        return fail(
            "version", std::to_string(version),
            fmt::format("version {} or older; this export was written by a newer Beamwarden", kLabExportVersion));
    if (version < 1)
        return fail("version", std::to_string(version), fmt::format("1 to {}", kLabExportVersion));

    LabContents contents;
    BW_TRY(lab, top.object("lab", true));
    BW_TRY(parsedLab, readLabRecord(*lab, "lab"));
    BW_CHECK(validateLab(parsedLab, "lab"));
    contents.lab = std::move(parsedLab);
    std::set<std::string> rooms;
    for (const model::Room& room : contents.lab.rooms)
        rooms.insert(room.name);

    std::map<std::string, model::RecordId> laserIds;
    BW_TRY(lasers, top.list("lasers"));
    for (std::size_t i = 0; i < lasers->size(); ++i) {
        const std::string path = indexPath("", "lasers", i);
        BW_TRY(laser, laserFromJson((*lasers)[i], path));
        BW_CHECK(validateLaser(laser, path));
        if (!laser.room.empty() && !rooms.contains(laser.room))
            return fail(joinPath(path, "room"), laser.room, "the name of one of lab.rooms, or nothing");
        laser.id = static_cast<model::RecordId>(i + 1);
        if (!laserIds.emplace(laser.name, laser.id).second)
            return fail(joinPath(path, "name"), laser.name, "a name no other laser of the export has");
        contents.lasers.push_back(std::move(laser));
    }

    std::set<std::string> eyewearNames;
    BW_TRY(eyewear, top.list("eyewear"));
    for (std::size_t i = 0; i < eyewear->size(); ++i) {
        const std::string path = indexPath("", "eyewear", i);
        BW_TRY(item, eyewearFromJson((*eyewear)[i], path));
        BW_CHECK(validateEyewear(item, path));
        if (!eyewearNames.insert(item.name).second)
            return fail(joinPath(path, "name"), item.name, "a name no other eyewear item of the export has");
        item.id = static_cast<model::RecordId>(i + 1);
        contents.eyewear.push_back(std::move(item));
    }

    BW_TRY(assessments, top.list("assessments"));
    for (std::size_t i = 0; i < assessments->size(); ++i) {
        BW_TRY(a, readAssessment((*assessments)[i], indexPath("", "assessments", i), laserIds));
        a.id = static_cast<model::RecordId>(i + 1);
        contents.assessments.push_back(std::move(a));
    }
    BW_CHECK(top.noOtherKeys());
    return contents;
}

} // namespace beamwarden::store
