// Opening a lab file checks its records but not its history (assessments and sign-offs), whose size grows for years;
// the history is checked before the first write that can touch it. And the records without the history, as the
// desktop application reads them.
#include "beamwarden/store/labstore.hpp"
#include "storetestsupport.hpp"

#include <catch2/catch.hpp>

#include <string>

using namespace beamwarden;
using namespace beamwarden::store;
using storetest::TempDir;

namespace {

constexpr std::size_t kPage = 4096; // SQLite's default page size (sqlite.org fileformat2, section 1.3.2)

// A lab whose assessment table spans many pages: one laser, many drafts with long stored results.
std::filesystem::path labWithHistory(const TempDir& dir)
{
    const auto path = dir / "history.bwlab";
    auto store = LabStore::create(path, storetest::sampleLab()).value();
    const auto laserId = store.saveLaser(storetest::pulsedLaser()).value();
    REQUIRE(store.saveEyewear(storetest::sampleEyewear()).has_value());
    for (int i = 0; i < 40; ++i) {
        model::Assessment a = storetest::draftAssessment(laserId);
        a.results = "{\"note\":\"" + std::string(3000, static_cast<char>('a' + i % 26)) + "\"}";
        REQUIRE(store.saveAssessment(a).has_value());
    }
    return path; // closed here: the WAL is folded back into the file
}

// Scribbles over the assessment table's leaf pages (SQLite's dbstat table says which pages they are).
void damageHistory(const std::filesystem::path& path)
{
    const std::string first =
        storetest::rawQuery(path, "SELECT min(pageno) FROM dbstat WHERE name = 'assessment' AND pagetype = 'leaf'");
    const std::string count =
        storetest::rawQuery(path, "SELECT count(*) FROM dbstat WHERE name = 'assessment' AND pagetype = 'leaf'");
    REQUIRE(!first.empty());
    REQUIRE(std::stoi(count) > 4);
    std::string bytes = storetest::fileBytes(path);
    const auto page = static_cast<std::size_t>(std::stoi(first)) - 1; // dbstat counts pages from 1
    std::fill_n(bytes.begin() + static_cast<std::ptrdiff_t>(page * kPage), 64, '\xA5');
    storetest::writeBytes(path, bytes);
}

} // namespace

TEST_CASE("Damage in the history is refused at the first write that touches it, not at opening", "[store][files]")
{
    TempDir dir;
    const auto path = labWithHistory(dir);
    damageHistory(path);
    const std::string damaged = storetest::fileBytes(path);

    auto store = LabStore::open(path);
    REQUIRE(store.has_value()); // the records are sound, and listing them does not read the history
    auto lasers = store->lasers();
    REQUIRE(lasers.has_value());
    REQUIRE(lasers->size() == 1);

    // Saving the laser would mark its approved assessments out of date: the history is checked first.
    model::Laser changed = lasers->front();
    changed.serial = "SN-changed";
    auto saved = store->saveLaser(changed);
    REQUIRE_FALSE(saved.has_value());
    CHECK(saved.error().field == "lab file");
    CHECK_THAT(saved.error().message(), Catch::Contains("damaged") || Catch::Contains("malformed"));
    auto signedOff = store->signOff(
        1, model::SignOff{0, "A. Tester", "", model::AssessmentStatus::Draft, model::AssessmentStatus::InReview, ""});
    CHECK_FALSE(signedOff.has_value());
    CHECK(storetest::fileBytes(path) == damaged);

    // The eyewear is not part of the history: it can still be edited.
    auto eyewear = store->eyewear();
    REQUIRE(eyewear.has_value());
    model::EyewearItem item = eyewear->front();
    item.count += 1;
    CHECK(store->saveEyewear(item).has_value());

    auto report = checkLabFile(path);
    REQUIRE(report.has_value());
    CHECK_FALSE(report->sound());
}

TEST_CASE("A sound history is checked once and then written to", "[store][files]")
{
    TempDir dir;
    const auto path = labWithHistory(dir);
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    model::Laser laser = store->lasers().value().front();
    laser.serial = "SN-1";
    REQUIRE(store->saveLaser(laser).has_value());
    laser.serial = "SN-2";
    REQUIRE(store->saveLaser(laser).has_value());
    CHECK(store->assessments(laser.id).value().size() == 40);
}

TEST_CASE("The records come without the assessments", "[store]")
{
    TempDir dir;
    const auto path = labWithHistory(dir);
    auto store = LabStore::open(path);
    REQUIRE(store.has_value());
    auto records = store->records();
    REQUIRE(records.has_value());
    auto contents = store->contents();
    REQUIRE(contents.has_value());
    CHECK(records->lab.name == contents->lab.name);
    REQUIRE(records->lasers.size() == 1);
    storetest::checkSameLaser(records->lasers.front(), contents->lasers.front(), true);
    REQUIRE(records->eyewear.size() == 1);
    storetest::checkSameEyewear(records->eyewear.front(), contents->eyewear.front());
    CHECK(records->assessments.empty());
    CHECK(contents->assessments.size() == 40);
}
