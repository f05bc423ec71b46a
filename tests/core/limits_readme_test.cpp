// The audit table in core/src/limits/README.md must name every implemented row, so an LSO can check coverage.
#include "beamwarden/limits/ruleset.hpp"

#include <catch2/catch.hpp>

#include <fstream>
#include <sstream>
#include <string>

TEST_CASE("The limits README lists every row of every rule set", "[limits][docs]")
{
    std::ifstream file(std::string(BEAMWARDEN_SOURCE_DIR) + "/core/src/limits/README.md");
    REQUIRE(file.good());
    std::stringstream text;
    text << file.rdbuf();
    const std::string readme = text.str();
    using beamwarden::limits::RuleSetId;
    for (const RuleSetId id : {RuleSetId::Iec60825_1_2007, RuleSetId::Iec60825_1_2014}) {
        for (const auto& row : beamwarden::limits::ruleSet(id).rows) {
            INFO(row.id);
            CHECK(readme.find("`" + std::string(row.id) + "`") != std::string::npos);
        }
    }
}
