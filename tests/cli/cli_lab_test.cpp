// beamwarden-cli lab and backup: the verbs end to end, with exit codes 0 done, 1 failed while working, 2 refused
// (the message naming the field, row or path).
#include "cli_runner.hpp"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <sstream>

namespace {

namespace fs = std::filesystem;

class TempDir {
public:
    TempDir()
    {
        std::string pattern = (fs::temp_directory_path() / "bw-cli-lab-XXXXXX").string();
        REQUIRE(mkdtemp(pattern.data()) != nullptr);
        m_path = pattern;
    }
    TempDir(const TempDir&) = delete;
    TempDir& operator=(const TempDir&) = delete;
    ~TempDir()
    {
        std::error_code ignored;
        fs::remove_all(m_path, ignored);
    }
    [[nodiscard]] std::string operator/(const std::string& name) const { return (m_path / name).string(); }

private:
    fs::path m_path;
};

std::string bytes(const std::string& path)
{
    std::ifstream in(path, std::ios::binary);
    std::ostringstream text;
    text << in.rdbuf();
    return text.str();
}

void write(const std::string& path, const std::string& text)
{
    std::ofstream(path, std::ios::binary) << text;
}

CliOutput requireOk(const std::vector<std::string>& args)
{
    const auto out = runCli(args);
    INFO(out.stderrText);
    REQUIRE(out.exitCode == 0);
    return out;
}

} // namespace

TEST_CASE("lab new --demo creates the demo lab, and lab check finds it sound", "[cli][lab]")
{
    TempDir dir;
    const auto lab = dir / "demo.bwlab";
    const auto created = requireOk({"lab", "new", "--demo", lab});
    CHECK_THAT(created.stdoutText, Catch::Contains("Larkspur Ridge Photonics Laboratory"));
    CHECK_THAT(created.stdoutText, Catch::Contains("7 lasers"));
    const auto checked = requireOk({"lab", "check", lab});
    CHECK_THAT(checked.stdoutText, Catch::Contains("sound"));
    // A second 'new' on the same path is refused and leaves the file alone.
    const std::string before = bytes(lab);
    const auto again = runCli({"lab", "new", "--demo", lab});
    CHECK(again.exitCode == 2);
    CHECK_THAT(again.stderrText, Catch::Contains("no file exists yet"));
    CHECK(bytes(lab) == before);
}

TEST_CASE("lab new without --demo makes an empty lab named after the file", "[cli][lab]")
{
    TempDir dir;
    requireOk({"lab", "new", "--lso", "A. N. Example", dir / "physics-2.bwlab"});
    requireOk({"lab", "export", dir / "physics-2.bwlab", dir / "out.bwlab.json"});
    const auto document = nlohmann::json::parse(bytes(dir / "out.bwlab.json"));
    CHECK(document["lab"]["name"] == "physics-2");
    CHECK(document["lab"]["lso_name"] == "A. N. Example");
    CHECK(document["lasers"].empty());
}

TEST_CASE("lab export, import, export gives the same bytes", "[cli][lab]")
{
    TempDir dir;
    requireOk({"lab", "new", "--demo", dir / "demo.bwlab"});
    requireOk({"lab", "export", dir / "demo.bwlab", dir / "first.bwlab.json"});
    const auto imported = requireOk({"lab", "import", dir / "first.bwlab.json", dir / "copy.bwlab"});
    CHECK_THAT(imported.stdoutText, Catch::Contains("7 lasers"));
    requireOk({"lab", "export", dir / "copy.bwlab", dir / "second.bwlab.json"});
    CHECK(bytes(dir / "first.bwlab.json") == bytes(dir / "second.bwlab.json"));
    CHECK(nlohmann::json::parse(bytes(dir / "first.bwlab.json"))["format"] == "beamwarden-lab");
}

TEST_CASE("lab import refuses a bad export with its JSON path and writes nothing", "[cli][lab]")
{
    TempDir dir;
    requireOk({"lab", "new", "--demo", dir / "demo.bwlab"});
    requireOk({"lab", "export", dir / "demo.bwlab", dir / "good.bwlab.json"});
    auto document = nlohmann::json::parse(bytes(dir / "good.bwlab.json"));
    document["lasers"][2]["outputs"][0]["beam"]["diameter_m"] = -1;
    write(dir / "bad.bwlab.json", document.dump(2));
    const auto out = runCli({"lab", "import", dir / "bad.bwlab.json", dir / "new.bwlab"});
    CHECK(out.exitCode == 2);
    CHECK_THAT(out.stderrText, Catch::Contains("lasers[2].outputs[0].beam.diameter_m"));
    CHECK_FALSE(fs::exists(dir / "new.bwlab"));

    const auto existing = runCli({"lab", "import", dir / "good.bwlab.json", dir / "demo.bwlab"});
    CHECK(existing.exitCode == 2);
}

TEST_CASE("lab check refuses a file that is not a lab file, exit 2, and leaves it unchanged", "[cli][lab]")
{
    TempDir dir;
    write(dir / "notes.bwlab", "not a database");
    const auto out = runCli({"lab", "check", dir / "notes.bwlab"});
    CHECK(out.exitCode == 2);
    CHECK_THAT(out.stderrText, Catch::Contains("not an SQLite database"));
    CHECK(bytes(dir / "notes.bwlab") == "not a database");
    CHECK(runCli({"lab", "export", dir / "notes.bwlab", dir / "x.json"}).exitCode == 2);
    CHECK_FALSE(fs::exists(dir / "x.json"));
}

TEST_CASE("lab import-eyewear adds a CSV inventory, all rows or none", "[cli][lab]")
{
    TempDir dir;
    requireOk({"lab", "new", dir / "lab.bwlab"});
    const std::string header = "name,od_table,en207,visible_transmittance,count,location,last_inspection\n";
    write(dir / "bad.csv", header + "Goggle G1,740-1100:7,740-1100 D LB7,0.25,6,B112,2026-02-10\n"
                                    "Goggle G2,190-534:six,,0.3,4,B114,\n");
    const auto bad = runCli({"lab", "import-eyewear", dir / "lab.bwlab", dir / "bad.csv"});
    CHECK(bad.exitCode == 2);
    CHECK_THAT(bad.stderrText, Catch::Contains("row 2, column od_table"));

    write(dir / "good.csv",
          "\xEF\xBB\xBF" + header + "Goggle G1,740-1100:7,\"740-1100 D LB7 + IR LB8\",25%,6,B112,\r\n");
    const auto good = requireOk({"lab", "import-eyewear", dir / "lab.bwlab", dir / "good.csv"});
    CHECK_THAT(good.stdoutText, Catch::Contains("Added 1 eyewear item"));
    requireOk({"lab", "export", dir / "lab.bwlab", dir / "out.bwlab.json"});
    const auto eyewear = nlohmann::json::parse(bytes(dir / "out.bwlab.json"))["eyewear"];
    REQUIRE(eyewear.size() == 1); // nothing of the refused file got in
    CHECK(eyewear[0]["en207"][0] == "740-1100 D LB7 + IR LB8");
}

TEST_CASE("backup copies a lab file into one that opens and checks sound", "[cli][lab][backup]")
{
    TempDir dir;
    requireOk({"lab", "new", "--demo", dir / "demo.bwlab"});
    requireOk({"backup", dir / "demo.bwlab", dir / "copy.bwlab"});
    requireOk({"lab", "check", dir / "copy.bwlab"});
    requireOk({"lab", "export", dir / "demo.bwlab", dir / "a.json"});
    requireOk({"lab", "export", dir / "copy.bwlab", dir / "b.json"});
    CHECK(bytes(dir / "a.json") == bytes(dir / "b.json"));
    const auto again = runCli({"backup", dir / "demo.bwlab", dir / "copy.bwlab"});
    CHECK(again.exitCode == 2);
    CHECK(runCli({"backup", dir / "demo.bwlab"}).exitCode == 2);
}

TEST_CASE("lab refuses an unknown sub-verb and lists itself in --help", "[cli][lab]")
{
    CHECK(runCli({"lab", "frobnicate"}).exitCode == 2);
    CHECK(runCli({"lab"}).exitCode == 2);
    const auto help = requireOk({"lab", "--help"});
    CHECK_THAT(help.stdoutText, Catch::Contains("import-eyewear"));
    const auto overview = requireOk({"--help"});
    CHECK_THAT(overview.stdoutText, Catch::Contains("lab"));
    CHECK_THAT(overview.stdoutText, Catch::Contains("backup"));
}
