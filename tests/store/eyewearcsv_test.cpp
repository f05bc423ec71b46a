// Eyewear inventories from CSV: RFC 4180 quoting (quoted commas, doubled quotes, line breaks), a UTF-8 byte-order
// mark and CRLF line ends as spreadsheets write them; all rows or none; the row and column named on error.
#include "beamwarden/store/eyewearcsv.hpp"
#include "storetestsupport.hpp"

#include <catch2/catch.hpp>

using namespace beamwarden;
using namespace beamwarden::model;
using namespace beamwarden::store;
using namespace beamwarden::units::literals;
using storetest::TempDir;

namespace {

const std::string kHeader =
    "name,description,od_table,en207,en208,visible_transmittance,count,location,last_inspection,notes\n";

InputError csvError(const std::string& text)
{
    auto parsed = parseEyewearCsv(text);
    REQUIRE_FALSE(parsed.has_value());
    return parsed.error();
}

} // namespace

TEST_CASE("A CSV inventory with quoting, BOM and CRLF reads every column", "[store][csv]")
{
    const std::string text = "\xEF\xBB\xBF" // UTF-8 byte-order mark, as spreadsheet programs write it
                             "name,description,od_table,en207,en208,visible_transmittance,count,location,"
                             "last_inspection,notes\r\n"
                             "Goggle G1,\"absorbing glass, blue-green\",740-1100:7;1100-1300:=5.2,"
                             "\"740-1100 D LB7 + IR LB8 + M LB8; 1100-1300 D LB5\",,25%,6,B112 cabinet,2026-02-10,"
                             "\"said \"\"fine\"\"\nat inspection\"\r\n"
                             "\r\n"
                             "Alignment glasses V1,,632.8:3,,1 W 2x10^-4 J 632-640 RB3,0.35,,T03,,\r\n"
                             "Goggle G5,unlabelled,,,,,0,,,\r\n";
    auto items = parseEyewearCsv(text);
    REQUIRE(items.has_value());
    REQUIRE(items->size() == 3);

    const EyewearItem& g1 = (*items)[0];
    CHECK(g1.name == "Goggle G1");
    CHECK(g1.description == "absorbing glass, blue-green");
    REQUIRE(g1.spectralOd.size() == 2);
    // Nanometres to metres by division, the same double as the 740_nm literal
    CHECK(g1.spectralOd[0].from == 740_nm);
    CHECK(g1.spectralOd[0].to == 1100_nm);
    CHECK(g1.spectralOd[0].od == 7);
    CHECK(g1.spectralOd[0].atLeast);
    CHECK(g1.spectralOd[1].od == 5.2);
    CHECK_FALSE(g1.spectralOd[1].atLeast);
    CHECK(g1.en207Markings == std::vector<std::string>{"740-1100 D LB7 + IR LB8 + M LB8", "1100-1300 D LB5"});
    CHECK(g1.en208Markings.empty());
    CHECK(g1.visibleTransmittance == Approx(0.25)); // computed: the CSV cell "0.25" read back (round trip, no unit)
    CHECK(g1.count == 6);
    CHECK(g1.location == "B112 cabinet");
    CHECK(g1.lastInspection == "2026-02-10");
    CHECK(g1.notes == "said \"fine\"\nat inspection");

    const EyewearItem& v1 = (*items)[1];
    REQUIRE(v1.spectralOd.size() == 1);
    CHECK(v1.spectralOd[0].from == v1.spectralOd[0].to); // a single wavelength
    CHECK(v1.en208Markings == std::vector<std::string>{"1 W 2x10^-4 J 632-640 RB3"});
    CHECK(v1.count == 1); // empty: one item
    CHECK(v1.visibleTransmittance == 0.35);

    const EyewearItem& g5 = (*items)[2];
    CHECK(g5.spectralOd.empty());
    CHECK(g5.en207Markings.empty());
    CHECK(g5.count == 0);
    CHECK(g5.visibleTransmittance == 0);
}

TEST_CASE("Columns may come in any order and only the name is required", "[store][csv]")
{
    auto items = parseEyewearCsv("Count,NAME\n3,Goggle G2\n");
    REQUIRE(items.has_value());
    REQUIRE(items->size() == 1);
    CHECK((*items)[0].name == "Goggle G2");
    CHECK((*items)[0].count == 3);
}

TEST_CASE("A CSV error names the row and the column", "[store][csv]")
{
    CHECK(csvError(kHeader + "G1,,740-1100:7,,,,1,,,\nG2,,740-11x0:7,,,,1,,,\n").field ==
          "row 2, column od_table (line 3)");
    CHECK(csvError(kHeader + "G1,,740-1100:-1,,,,1,,,\n").field == "row 1, column od_table (line 2)");
    CHECK(csvError(kHeader + "G1,,1100-740:7,,,,1,,,\n").field == "row 1, column od_table (line 2)");
    CHECK(csvError(kHeader + "G1,,100-200:7,,,,1,,,\n").field == "row 1, column od_table (line 2)"); // below 180 nm
    CHECK(csvError(kHeader + "G1,,,,,1.5,1,,,\n").field == "row 1, column visible_transmittance (line 2)");
    CHECK(csvError(kHeader + "G1,,,,,,-2,,,\n").field == "row 1, column count (line 2)");
    CHECK(csvError(kHeader + "G1,,,,,,two,,,\n").field == "row 1, column count (line 2)");
    CHECK(csvError(kHeader + "G1,,,,,,1,,2026-13-01,\n").field == "row 1, column last_inspection (line 2)");
    CHECK(csvError(kHeader + ",,,,,,1,,,\n").field == "row 1, column name (line 2)");
    CHECK(csvError(kHeader + "G1,,,,,,1,,,\nG1,,,,,,1,,,\n").field == "row 2, column name (line 3)");
    CHECK(csvError(kHeader + "G1,,,,,,1,,\n").field == "row 1 (line 2)"); // a field short
    CHECK(csvError(kHeader + "\"G1,,,,,,1,,,\n").field == "line 2");      // an open quote
    CHECK(csvError(kHeader + "\"G1\"x,,,,,,1,,,\n").field == "line 2");   // text after a closing quote
    CHECK(csvError("name,colour\nG1,green\n").field == "header, column 2 (line 1)");
    CHECK(csvError("description\nglass\n").field == "header (line 1)");
    CHECK(csvError("").field == "header");
    // A quoted line break moves the line numbers of the rows after it.
    CHECK(csvError(kHeader + "G1,\"two\nlines\",,,,,1,,,\nG2,,,,,,x,,,\n").field == "row 2, column count (line 4)");
}

TEST_CASE("A CSV import adds every row in one transaction, or none", "[store][csv]")
{
    TempDir dir;
    auto store = LabStore::create(dir / "lab.bwlab", storetest::sampleLab()).value();
    REQUIRE(store.saveEyewear(storetest::sampleEyewear("Goggle G1")).has_value());

    storetest::writeBytes(dir / "bad.csv", kHeader + "Goggle G2,,190-534:6,,,,4,,,\nGoggle G3,,,,,,1,,2026-02-30,\n");
    auto bad = importEyewearCsv(store, dir / "bad.csv");
    REQUIRE_FALSE(bad.has_value());
    CHECK(bad.error().field == "row 2, column last_inspection (line 3)");
    CHECK(store.eyewear().value().size() == 1);

    storetest::writeBytes(dir / "clash.csv", kHeader + "Goggle G2,,,,,,4,,,\nGoggle G1,,,,,,1,,,\n");
    auto clash = importEyewearCsv(store, dir / "clash.csv");
    REQUIRE_FALSE(clash.has_value());
    CHECK(clash.error().field == "row 2, column name");
    CHECK(store.eyewear().value().size() == 1);

    storetest::writeBytes(dir / "good.csv", kHeader + "Goggle G2,,190-534:6;1040-1100:7,,,0.3,4,,,\n"
                                                      "Goggle G3,,9000-11000:6,10600 D LB5 + I LB6,,0.85,3,,,\n");
    auto good = importEyewearCsv(store, dir / "good.csv");
    REQUIRE(good.has_value());
    CHECK(good->size() == 2);
    const auto shelf = store.eyewear().value();
    REQUIRE(shelf.size() == 3);
    CHECK(shelf[2].name == "Goggle G3");
    CHECK(shelf[2].en207Markings.front() == "10600 D LB5 + I LB6");
}
