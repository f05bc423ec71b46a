// beamwarden-cli nohd and od: the JSON contract, cases end to end against check-values.md section 3, and refusals
// with exit code 2 that name the flag. MPEs as the engine computes them: 25.46 W/m2 for visible light at 0.25 s
// (check-values.md C25, P10), 50 W/m2 at 1064 nm and exactly 10 s (section 0 conventions, C27, C34), 1000 W/m2 at
// 10.6 um from 10 s (C38, taken at the 100 s default).
#include "cli_runner.hpp"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <string>
#include <vector>

namespace {

nlohmann::json hazardJson(const std::string& verb, std::vector<std::string> args)
{
    args.insert(args.begin(), verb);
    args.emplace_back("--json");
    const auto out = runCli(args);
    INFO(out.stderrText);
    REQUIRE(out.exitCode == 0);
    return nlohmann::json::parse(out.stdoutText);
}

double number(const nlohmann::json& j)
{
    REQUIRE(j.is_number());
    return j.get<double>();
}

// check-values.md C26: 1 W visible, a = 2 mm, 1 mrad, 0.25 s.
const std::vector<std::string> kC26 = {"--wavelength", "632.8nm",      "--power", "1W",         "--beam-diameter",
                                       "2mm",          "--divergence", "1mrad",   "--exposure", "0.25s"};

// check-values.md C35: 1064 nm, 100 mJ, 10 ns, 10 Hz, d63 = 6 mm, T = 10 s.
const std::vector<std::string> kC35 = {"--wavelength", "1064nm", "--pulse-energy",  "100mJ", "--duration",   "10ns",
                                       "--prf",        "10Hz",   "--beam-diameter", "6mm",   "--divergence", "1mrad",
                                       "--exposure",   "10s"};

std::vector<std::string> plus(std::vector<std::string> args, const std::vector<std::string>& more)
{
    args.insert(args.end(), more.begin(), more.end());
    return args;
}

} // namespace

TEST_CASE("hazard CLI: nohd and od --json carry the contract keys", "[cli][hazard]")
{
    for (const char* verb : {"nohd", "od"}) {
        INFO(verb);
        const auto j = hazardJson(verb, kC26);
        for (const char* key : {"nohd_m", "required_od", "exposure_at_point", "mpe", "caution"})
            CHECK(j.contains(key));
        CHECK(j["exposure_at_point"].contains("value"));
        CHECK(j["exposure_at_point"].contains("unit"));
        CHECK(j["mpe"].contains("value"));
        CHECK(j["mpe"].contains("unit"));
        CHECK(j["mpe"].contains("governing_rule"));
        CHECK(j["mpe"]["governing_rule"].is_string());
        CHECK(j["caution"].get<std::string>().find("laser safety officer") != std::string::npos);
    }
}

TEST_CASE("hazard CLI: CW direct beam end to end (C26)", "[cli][hazard]")
{
    const auto j = hazardJson("nohd", kC26);
    // check-values.md C26: quadrature NOHD 223.6 m reported (computed from verified formulas; tolerance 1e-3)
    CHECK(number(j["nohd_m"]) == Approx(223.6).epsilon(1e-3));
    // check-values.md C26: linear 221.6 m beside it (tolerance 1e-3)
    CHECK(number(j["nohd"]["linear_m"]) == Approx(221.6).epsilon(1e-3));
    // check-values.md C25/C26: MPE 25.46 W/m2 (computed from verified formulas; tolerance 1e-3)
    CHECK(number(j["mpe"]["value"]) == Approx(25.46).epsilon(1e-3));
    CHECK(j["mpe"]["unit"] == "W/m2");
    CHECK(j["exposure_at_point"]["unit"] == "W/m2");
}

TEST_CASE("hazard CLI: CW OD end to end (C38, C34)", "[cli][hazard]")
{
    // check-values.md C38: CO2 40 W, d63 = 6 mm: MPE 1000 W/m2, X = 1.415e6 W/m2, OD_req 3.151 -> 3.2
    // (computed from reconstructed formulas; tolerance 1e-3; displayed exact)
    const auto co2 = hazardJson(
        "od", {"--wavelength", "10.6um", "--power", "40W", "--beam-diameter", "6mm", "--divergence", "1mrad"});
    CHECK(number(co2["mpe"]["value"]) == Approx(1000.0).epsilon(1e-3));
    CHECK(number(co2["exposure_at_point"]["value"]) == Approx(1.415e6).epsilon(1e-3));
    CHECK(number(co2["required_od"]) == Approx(3.151).epsilon(1e-3));
    CHECK(number(co2["required_od_displayed"]) == Approx(3.2).margin(1e-9));
    // check-values.md C38, declared Gaussian: OD_req 3.079 -> 3.1 (tolerance 1e-3; displayed exact)
    const auto gaussian = hazardJson("od", {"--wavelength", "10.6um", "--power", "40W", "--beam-diameter", "6mm",
                                            "--divergence", "1mrad", "--profile", "gaussian"});
    CHECK(number(gaussian["required_od"]) == Approx(3.079).epsilon(1e-3));
    CHECK(number(gaussian["required_od_displayed"]) == Approx(3.1).margin(1e-9));

    // check-values.md C34: 1064 nm, 100 mW, d63 = 2 mm, 10 s, divergence neglected: X = 2598 W/m2, MPE 50 W/m2,
    // OD_req 1.716 -> 1.8 (computed from verified formulas; tolerance 1e-3); C33: zero divergence has no finite NOHD,
    // so nohd_m is null
    const auto tros = hazardJson("od", {"--wavelength", "1064nm", "--power", "100mW", "--beam-diameter", "2mm",
                                        "--divergence", "0mrad", "--exposure", "10s"});
    CHECK(number(tros["exposure_at_point"]["value"]) == Approx(2598.0).epsilon(1e-3));
    CHECK(number(tros["mpe"]["value"]) == Approx(50.0).epsilon(1e-3));
    CHECK(number(tros["required_od"]) == Approx(1.716).epsilon(1e-3));
    CHECK(number(tros["required_od_displayed"]) == Approx(1.8).margin(1e-9));
    CHECK(tros["nohd_m"].is_null());
}

TEST_CASE("hazard CLI: pulsed OD end to end (C35)", "[cli][hazard]")
{
    // check-values.md C35, strictest (default): X = 2598 J/m2 per pulse, per-pulse MPE 6.325e-3 J/m2 (2014
    // governs, pulse-train rule), OD_req 5.614 (computed from reconstructed formulas; tolerance 1e-3)
    const auto j = hazardJson("od", kC35);
    CHECK(j["exposure_at_point"]["unit"] == "J/m2");
    CHECK(j["mpe"]["unit"] == "J/m2");
    CHECK(number(j["exposure_at_point"]["value"]) == Approx(2598.0).epsilon(1e-3));
    CHECK(number(j["mpe"]["value"]) == Approx(6.325e-3).epsilon(1e-3));
    CHECK(j["mpe"]["governing_rule"] == "pulse-train");
    CHECK(number(j["required_od"]) == Approx(5.614).epsilon(1e-3));
    // check-values.md C35: 2007 default 5.216, declared Gaussian (strictest) 5.485, 2014 edition 5.114
    // (tolerance 1e-3)
    CHECK(number(hazardJson("od", plus(kC35, {"--rules", "iec60825-1:2007"}))["required_od"]) ==
          Approx(5.216).epsilon(1e-3));
    CHECK(number(hazardJson("od", plus(kC35, {"--profile", "gaussian"}))["required_od"]) ==
          Approx(5.485).epsilon(1e-3));
    CHECK(number(hazardJson("od", plus(kC35, {"--rules", "iec60825-1:2014", "--c5", "edition"}))["required_od"]) ==
          Approx(5.114).epsilon(1e-3));
}

TEST_CASE("hazard CLI: 1/e2 input is converted (C37 with C26)", "[cli][hazard]")
{
    // hazard-and-eyewear.md section 2 / check-values.md C37: d63 = d86 / sqrt 2, divergence likewise; C26's 1/e
    // values 2 mm and 1 mrad given at 1/e2 are 2.828427 mm and 1.414214 mrad (computed). Expected: check-values.md
    // C26, 223.6 m quadrature, 221.6 m linear (tolerance 1e-3)
    const auto j =
        hazardJson("nohd", {"--wavelength", "632.8nm", "--power", "1W", "--beam-diameter", "2.828427mm", "--divergence",
                            "1.414214mrad", "--beam-definition", "1/e2", "--exposure", "0.25s"});
    CHECK(number(j["nohd_m"]) == Approx(223.6).epsilon(1e-3));
    CHECK(number(j["nohd"]["linear_m"]) == Approx(221.6).epsilon(1e-3));
}

TEST_CASE("hazard CLI: diffuse and below-the-MPE cases", "[cli][hazard]")
{
    // check-values.md C30: diffuse, 5 W, rho = 0.8, theta = 30 deg, MPE 25.46 W/m2: r_NHZ 0.2081 m
    // (computed from verified formulas; tolerance 1e-3)
    const auto diffuse =
        hazardJson("nohd", {"--wavelength", "632.8nm", "--power", "5W", "--viewing", "diffuse", "--reflectance", "0.8",
                            "--angle", "30deg", "--distance", "1m", "--exposure", "0.25s"});
    CHECK(number(diffuse["nohd_m"]) == Approx(0.2081).epsilon(1e-3));
    // check-values.md C33: 0.5 mW, a = 7 mm, MPE 25.46 W/m2: NOHD 0 (exact), OD 0
    const auto weak = hazardJson("nohd", {"--wavelength", "632.8nm", "--power", "0.5mW", "--beam-diameter", "7mm",
                                          "--divergence", "1mrad", "--exposure", "0.25s"});
    CHECK(number(weak["nohd_m"]) == 0.0);
    CHECK(number(weak["required_od"]) == 0.0);
}

TEST_CASE("hazard CLI: bad geometry is refused with exit code 2 naming the flag", "[cli][hazard]")
{
    struct Case {
        std::vector<std::string> args;
        std::string mentions;
    };
    const std::vector<std::string> base = {"--wavelength", "632.8nm", "--power", "1W", "--exposure", "0.25s"};
    const std::vector<Case> cases = {
        {plus(base, {"--beam-diameter", "0mm", "--divergence", "1mrad"}), "--beam-diameter"},
        {plus(base, {"--beam-diameter", "-2mm", "--divergence", "1mrad"}), "--beam-diameter"},
        {plus(base, {"--beam-diameter", "2mm", "--divergence", "-1mrad"}), "--divergence"},
        {plus(base,
              {"--beam-diameter", "2mm", "--divergence", "1mrad", "--viewing", "specular", "--reflectance", "1.5"}),
         "--reflectance"},
        {plus(base, {"--viewing", "diffuse", "--reflectance", "1.01", "--distance", "1m"}), "--reflectance"},
        {plus(base, {"--viewing", "fibre", "--na", "1"}), "--na"},
        {plus(base, {"--viewing", "fibre", "--na", "1.5"}), "--na"},
    };
    for (const char* verb : {"nohd", "od"}) {
        for (const Case& c : cases) {
            std::vector<std::string> args{verb};
            args.insert(args.end(), c.args.begin(), c.args.end());
            const auto out = runCli(args);
            INFO(verb << " expecting " << c.mentions << "; stderr: " << out.stderrText);
            CHECK(out.exitCode == 2);
            CHECK(out.stderrText.find(c.mentions) != std::string::npos);
            CHECK(out.stdoutText.empty());
        }
    }
}
