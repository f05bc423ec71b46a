// beamwarden-cli eyewear level and eyewear check: the JSON contract (verdict, reasons, required_od, provided_od,
// required_levels, marking, caution), the verdict words, check-values.md C40/C35/P11 end to end, and a marking that
// does not parse (exit code 2, the reason on stderr).
#include "cli_runner.hpp"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <filesystem>
#include <fstream>
#include <string>
#include <vector>

#include <unistd.h>

namespace {

// check-values.md C40: Q-switched Nd:YAG 1064 nm, 100 mJ, 10 ns, 10 Hz, d63 = 6 mm at the eyewear (at the exit).
const std::vector<std::string> kC40 = {"--wavelength", "1064nm", "--pulse-energy",  "100mJ", "--duration",   "10ns",
                                       "--prf",        "10Hz",   "--beam-diameter", "6mm",   "--divergence", "0mrad"};

nlohmann::json eyewearJson(const std::string& verb, std::vector<std::string> args)
{
    args.insert(args.begin(), verb);
    args.insert(args.begin(), "eyewear");
    args.emplace_back("--json");
    const auto out = runCli(args);
    INFO(out.stderrText);
    REQUIRE(out.exitCode == 0);
    return nlohmann::json::parse(out.stdoutText);
}

std::vector<std::string> plus(std::vector<std::string> args, const std::vector<std::string>& more)
{
    args.insert(args.end(), more.begin(), more.end());
    return args;
}

bool anyMentions(const nlohmann::json& reasons, const std::string& words)
{
    for (const auto& r : reasons) {
        if (r.is_string() && r.get<std::string>().find(words) != std::string::npos)
            return true;
    }
    return false;
}

// A temporary OD table under /tmp, removed when the test ends.
class TempFile {
public:
    explicit TempFile(const std::string& text)
        : m_path("/tmp/beamwarden-eyewear-od-" + std::to_string(::getpid()) + "-" + std::to_string(++s_count) + ".txt")
    {
        std::ofstream out(m_path);
        out << text;
    }
    ~TempFile()
    {
        std::error_code ignored;
        std::filesystem::remove(m_path, ignored);
    }
    TempFile(const TempFile&) = delete;
    TempFile& operator=(const TempFile&) = delete;
    [[nodiscard]] const std::string& path() const { return m_path; }

private:
    inline static int s_count = 0;
    std::string m_path;
};

} // namespace

TEST_CASE("cli eyewear level: C40 prints the levels and the implied marking", "[cli][eyewear]")
{
    const auto j = eyewearJson("level", kC40);
    for (const char* key : {"required_levels", "marking", "required_od", "caution"})
        CHECK(j.contains(key));
    // check-values.md C40 (computed from verified formulas): D LB4, R LB7 (exact level numbers)
    CHECK(j["required_levels"] == nlohmann::json({{"D", 4}, {"R", 7}}));
    // check-values.md C40: `1064 D LB4 + R LB7`
    CHECK(j["marking"] == "1064 D LB4 + R LB7");
    CHECK(j["caution"].get<std::string>().find("laser safety officer") != std::string::npos);
}

TEST_CASE("cli eyewear level: text output names the levels", "[cli][eyewear]")
{
    auto args = kC40;
    args.insert(args.begin(), {"eyewear", "level"});
    const auto out = runCli(args);
    INFO(out.stderrText);
    REQUIRE(out.exitCode == 0);
    // check-values.md C40: the implied marking
    CHECK(out.stdoutText.find("1064 D LB4 + R LB7") != std::string::npos);
    CHECK(out.stdoutText.find("laser safety officer") != std::string::npos);
}

TEST_CASE("cli eyewear check: JSON keys and a covering item", "[cli][eyewear]")
{
    const auto j = eyewearJson("check", plus(kC40, {"--exposure", "10s", "--marking", "1064 D LB6 + R LB7"}));
    for (const char* key :
         {"verdict", "reasons", "required_od", "provided_od", "required_levels", "marking", "caution"})
        CHECK(j.contains(key));
    CHECK(j["reasons"].is_array());
    // check-values.md C40 levels D LB4, R LB7 met; C35: OD_req 5.614 (strictest, T = 10 s, default convention;
    // computed from reconstructed formulas; relative 1e-3) below the OD 7 that LB7 promises
    CHECK(j["verdict"] == "covers");
    CHECK(j["required_od"].get<double>() == Approx(5.614).epsilon(1e-3));
    CHECK(j["provided_od"].get<double>() == Approx(7.0).epsilon(1e-12));
    CHECK(j["required_levels"] == nlohmann::json({{"D", 4}, {"R", 7}}));
    CHECK(j["marking"] == "1064 D LB4 + R LB7");
}

TEST_CASE("cli eyewear check: falls short on the damage level", "[cli][eyewear]")
{
    // check-values.md C40: R LB7 required; an item marked R LB6 falls short
    const auto j = eyewearJson("check", plus(kC40, {"--marking", "1064 D LB6 + R LB6"}));
    CHECK(j["verdict"] == "falls short");
    CHECK(anyMentions(j["reasons"], "damage level"));
}

TEST_CASE("cli eyewear check: several marked lines in one --marking", "[cli][eyewear]")
{
    const auto j = eyewearJson("check", plus(kC40, {"--exposure", "10s", "--marking", "532 D LB5;1064 D LB6 + R LB7"}));
    CHECK(j["verdict"] == "covers");
}

TEST_CASE("cli eyewear check: P11 large CW beam cannot tell", "[cli][eyewear]")
{
    // check-values.md P11: 1064 nm CW 50 W in 5 mm: LB6 uncorrected, Beamwarden verdict `cannot tell` (P > 10 W)
    const auto j = eyewearJson("check", {"--wavelength", "1064nm", "--power", "50W", "--beam-diameter", "5mm",
                                         "--divergence", "0mrad", "--marking", "1064 D LB6"});
    CHECK(j["verdict"] == "cannot tell");
    CHECK(j["required_levels"] == nlohmann::json({{"D", 6}}));
    CHECK_FALSE(j["reasons"].empty());
}

TEST_CASE("cli eyewear check: an OD table alone cannot tell", "[cli][eyewear]")
{
    // OD table file format: "FROM-TO OD" in nm, optional ">=", '#' comments
    const TempFile table("# test table\n1000-1100 >=8\n500-540 6 # green\n");
    const auto j = eyewearJson("check", plus(kC40, {"--od-table", table.path()}));
    // convention: OD data without an EN 207 marking gives at best `cannot tell`
    CHECK(j["verdict"] == "cannot tell");
    CHECK(j["provided_od"].get<double>() == Approx(8.0).epsilon(1e-12));
    CHECK_FALSE(j["reasons"].empty());
}

TEST_CASE("cli eyewear check: every verdict is one of the three words", "[cli][eyewear]")
{
    const TempFile table("1000-1100 9\n");
    const std::vector<std::vector<std::string>> items = {
        {"--marking", "1064 D LB6 + R LB7"},
        {"--marking", "1064 D LB2"},
        {"--marking", "532 D LB8"},
        {"--od-table", table.path()},
        {"--en208", "0.01 W 2x10^-6 J 532 RB1"},
    };
    for (const auto& extra : items) {
        INFO(extra.back());
        const auto j = eyewearJson("check", plus(kC40, extra));
        REQUIRE(j["verdict"].is_string());
        const std::string verdict = j["verdict"].get<std::string>();
        CHECK((verdict == "covers" || verdict == "falls short" || verdict == "cannot tell"));
    }
    // a wavelength the item is not rated at: falls short, "wavelength range"
    const auto j = eyewearJson("check", plus(kC40, {"--marking", "532 D LB8"}));
    CHECK(j["verdict"] == "falls short");
    CHECK(anyMentions(j["reasons"], "wavelength range"));
}

TEST_CASE("cli eyewear check: a marking that does not parse exits 2", "[cli][eyewear]")
{
    for (const std::string& bad : {std::string{"1064 DD LB7"}, std::string{"1064 D LB11"}, std::string{"D LB5"}}) {
        INFO(bad);
        auto args = plus(kC40, {"--marking", bad});
        args.insert(args.begin(), {"eyewear", "check"});
        const auto out = runCli(args);
        CHECK(out.exitCode == 2);
        CHECK_FALSE(out.stderrText.empty());
        CHECK(out.stdoutText.empty());
    }
    auto args = plus(kC40, {"--marking", "1064 DD LB7", "--json"});
    args.insert(args.begin(), {"eyewear", "check"});
    const auto out = runCli(args);
    CHECK(out.exitCode == 2);
    // the reason names the failing part
    CHECK(out.stderrText.find("DD") != std::string::npos);
}

TEST_CASE("cli eyewear check: without OD data the margin is not known, never NaN or zero", "[cli][eyewear][bad]")
{
    // No OD table and no marking: the optical density the item gives is not known (protection.cpp), so the verdict
    // is "cannot tell" and neither the provided OD nor its wavelength is reported as 0.
    const auto j = eyewearJson("check", kC40);
    CHECK(j["verdict"] == "cannot tell");
    CHECK(j["provided_od"].is_null());
    CHECK(j["margin_od"].is_null());
    CHECK(j["worst_wavelength_nm"].is_null());
    const auto text = runCli(plus({"eyewear", "check"}, kC40));
    REQUIRE(text.exitCode == 0);
    CHECK(text.stdoutText.find("provided: not known; margin: cannot tell") != std::string::npos);
    CHECK(text.stdoutText.find("nan") == std::string::npos);
}
