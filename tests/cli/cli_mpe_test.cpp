// beamwarden-cli mpe: the flag and JSON contract, refusals with exit code 2, and reference values end to end.
#include "cli_runner.hpp"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

namespace {

nlohmann::json mpeJson(std::vector<std::string> args)
{
    args.insert(args.begin(), "mpe");
    args.emplace_back("--json");
    const auto out = runCli(args);
    INFO(out.stderrText);
    REQUIRE(out.exitCode == 0);
    return nlohmann::json::parse(out.stdoutText);
}

} // namespace

TEST_CASE("mpe --json carries the contract keys", "[cli][mpe]")
{
    const auto j = mpeJson({"--wavelength", "632.8nm", "--duration", "0.25s"});
    for (const char* key :
         {"rule_set", "target", "wavelength_m", "radiant_exposure_J_m2", "irradiance_W_m2",
          "per_pulse_radiant_exposure_J_m2", "governing_rule", "pulses_counted", "provenance", "caution"})
        CHECK(j.contains(key));
    CHECK(j["rule_set"] == "strictest");
    CHECK(j["target"] == "eye");
    CHECK(j["governing_rule"] == "single-pulse");
    CHECK(j["caution"].get<std::string>().find("laser safety officer") != std::string::npos);
    // check-values.md C1 / P2: HeNe 632.8 nm, 0.25 s: 6.364 J/m², 25.46 W/m² (IEC 60825-1:2007, 18 t^0.75; 1e-3)
    CHECK(j["radiant_exposure_J_m2"].get<double>() == Approx(6.364).epsilon(1e-3));
    CHECK(j["irradiance_W_m2"].get<double>() == Approx(25.46).epsilon(1e-3));
    CHECK(j["provenance"]["governing_rule_set"] == "both");
}

TEST_CASE("mpe --json for a pulse train names the governing rule and N", "[cli][mpe]")
{
    // check-values.md C8: 800 nm, 100 fs, 1 kHz, T = 10 s, strictest: 2.377e-5 J/m² per pulse, 2007 governs by the
    // pulse-train rule with N = 1e4 (computed from verified formulas, IEC 60825-1:2007; tolerance 1e-3)
    const auto j = mpeJson({"--wavelength", "800nm", "--duration", "100fs", "--prf", "1kHz", "--exposure", "10s"});
    CHECK(j["per_pulse_radiant_exposure_J_m2"].get<double>() == Approx(2.377e-5).epsilon(1e-3));
    CHECK(j["governing_rule"] == "pulse-train");
    CHECK(j["pulses_counted"].get<double>() == Approx(1e4).epsilon(1e-9));
    CHECK(j["provenance"]["governing_rule_set"] == "iec60825-1:2007");
    CHECK(j["provenance"]["rests_on_reconstructed_row"] == false);
    // average irradiance allowed = per-pulse x prf (definition)
    CHECK(j["irradiance_W_m2"].get<double>() == Approx(2.377e-5 * 1e3).epsilon(1e-3));
}

TEST_CASE("mpe --json for an extended source compares whole-source figures", "[cli][mpe]")
{
    // check-values.md C12: 532 nm, 10 ns, alpha = 10 mrad: strictest 2.667e-2 J/m² whole source, 2014 governs
    // (computed from reconstructed formulas; tolerance 1e-3)
    const auto j = mpeJson({"--wavelength", "532nm", "--duration", "10ns", "--source-angle", "10mrad"});
    CHECK(j["radiant_exposure_J_m2"].get<double>() == Approx(2.667e-2).epsilon(1e-3));
    CHECK(j["provenance"]["governing_rule_set"] == "iec60825-1:2014");
    CHECK(j["provenance"]["rests_on_reconstructed_row"] == true);
    CHECK_FALSE(j["notes"].empty());
}

TEST_CASE("mpe honours --rules and --c5", "[cli][mpe]")
{
    // check-values.md C7, 2014 edition: 1064 nm, 10 ns, 10 Hz, 10 s: 2e-2 J/m² per pulse, single-pulse governs
    // (computed from reconstructed formulas; tolerance 1e-3)
    const auto j = mpeJson({"--wavelength", "1064nm", "--duration", "10ns", "--prf", "10Hz", "--exposure", "10s",
                            "--rules", "iec60825-1:2014", "--c5", "edition"});
    CHECK(j["rule_set"] == "iec60825-1:2014");
    CHECK(j["per_pulse_radiant_exposure_J_m2"].get<double>() == Approx(2e-2).epsilon(1e-3));
    CHECK(j["governing_rule"] == "single-pulse");
}

TEST_CASE("mpe refuses bad input with exit code 2 and names the flag", "[cli][mpe]")
{
    struct Case {
        std::vector<std::string> args;
        std::string mentions;
    };
    const std::vector<Case> cases = {
        {{"--wavelength", "179nm", "--duration", "1s"}, "--wavelength"},
        {{"--wavelength", "1.1mm", "--duration", "1s"}, "--wavelength"},
        {{"--wavelength", "5kg", "--duration", "1s"}, "--wavelength"},
        {{"--wavelength", "800nm", "--duration", "0s"}, "--duration"},
        {{"--wavelength", "800nm", "--duration", "30001s"}, "--duration"},
        {{"--wavelength", "800nm", "--duration", "nan s"}, "--duration"},
        {{"--wavelength", "800nm", "--duration", "-1s"}, "--duration"},
        {{"--wavelength", "800nm"}, "--duration"},
        {{"--duration", "1s"}, "--wavelength"},
        {{"--wavelength", "800nm", "--duration", "35fs", "--prf", "1kHz"}, "--exposure"},
        {{"--wavelength", "800nm", "--duration", "35fs", "--prf", "-1kHz", "--exposure", "1s"}, "--prf"},
        {{"--wavelength", "800nm", "--duration", "1s", "--target", "hand"}, "--target"},
        {{"--wavelength", "800nm", "--duration", "1s", "--rules", "ansi"}, "--rules"},
        {{"--wavelength", "800nm", "--duration", "1s", "--c5", "loose"}, "--c5"},
        {{"--wavelength", "800nm", "--duration", "1s", "--no-such-flag", "1"}, "--no-such-flag"},
        {{"--wavelength", "800nm", "--duration", "35fs", "--prf", "1kHz", "--exposure", "1s", "--burst-count", "5"},
         "--burst-rate"},
    };
    for (const Case& c : cases) {
        std::vector<std::string> args{"mpe"};
        args.insert(args.end(), c.args.begin(), c.args.end());
        const auto out = runCli(args);
        INFO(out.stderrText);
        CHECK(out.exitCode == 2);
        CHECK(out.stderrText.find(c.mentions) != std::string::npos);
        CHECK(out.stdoutText.empty());
    }
}

TEST_CASE("mpe text output shows the figure, the rows and the caution", "[cli][mpe]")
{
    const auto out = runCli({"mpe", "--wavelength", "800nm", "--duration", "20fs"});
    REQUIRE(out.exitCode == 0);
    CHECK(out.stdoutText.find("iec60825-1:2007") != std::string::npos);
    CHECK(out.stdoutText.find("iec60825-1:2014") != std::string::npos);
    CHECK(out.stdoutText.find("shortest tabulated duration") != std::string::npos);
    CHECK(out.stdoutText.find("supercontinuum") != std::string::npos);
    CHECK(out.stdoutText.find("laser safety officer") != std::string::npos);
}
