// The bad-input corpus (issue 10): every case of tests/data/bad/cases.json runs beamwarden-cli and must exit as the
// case says, with a message naming the field, and a refused case must write nothing (its folder, lab files included,
// is byte for byte as it was). A case marked `known_issue` describes a refusal the program does not make yet: for it
// the test requires that the program still falls short, so the mark has to go once the program is fixed.
#include "cli_runner.hpp"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <map>
#include <set>
#include <sstream>
#include <string>
#include <vector>

namespace {

namespace fs = std::filesystem;
using nlohmann::json;

const fs::path& badDir()
{
    static const fs::path dir = fs::path(BEAMWARDEN_TEST_DATA_DIR) / "bad";
    return dir;
}

class TempDir {
public:
    TempDir()
    {
        std::string pattern = (fs::temp_directory_path() / "bw-cli-bad-XXXXXX").string();
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
    [[nodiscard]] const fs::path& path() const { return m_path; }

private:
    fs::path m_path;
};

std::string bytes(const fs::path& path)
{
    std::ifstream in(path, std::ios::binary);
    std::ostringstream text;
    text << in.rdbuf();
    return text.str();
}

const json& corpus()
{
    static const json cases = [] {
        const fs::path file = badDir() / "cases.json";
        REQUIRE(fs::exists(file)); // a missing fixture fails, it never skips
        return json::parse(bytes(file));
    }();
    return cases;
}

std::string replaceAll(std::string text, const std::string& from, const std::string& to)
{
    std::string out;
    std::size_t start = 0;
    for (std::size_t at = text.find(from); at != std::string::npos; at = text.find(from, start)) {
        out.append(text, start, at - start);
        out.append(to);
        start = at + from.size();
    }
    out.append(text, start, std::string::npos);
    return out;
}

// {data}, {tmp}, {repeat:TEXT:N} and {byte:HH}, as cases.json describes them.
std::string expand(const std::string& raw, const fs::path& tmp)
{
    std::string text = replaceAll(replaceAll(raw, "{data}", badDir().string()), "{tmp}", tmp.string());
    for (std::size_t at = text.find("{repeat:"); at != std::string::npos; at = text.find("{repeat:")) {
        const std::size_t end = text.find('}', at);
        const std::string spec = text.substr(at + 8, end - at - 8);
        const std::size_t colon = spec.rfind(':');
        std::string repeated;
        for (long i = 0; i < std::stol(spec.substr(colon + 1)); ++i)
            repeated += spec.substr(0, colon);
        text.replace(at, end - at + 1, repeated);
    }
    for (std::size_t at = text.find("{byte:"); at != std::string::npos; at = text.find("{byte:"))
        text.replace(at, 9, 1, static_cast<char>(std::stoi(text.substr(at + 6, 2), nullptr, 16)));
    return text;
}

// Every file under the folder with its bytes: "nothing is written" means this does not change.
std::map<std::string, std::string> snapshot(const fs::path& folder)
{
    std::map<std::string, std::string> files;
    for (const auto& entry : fs::recursive_directory_iterator(folder))
        files[fs::relative(entry.path(), folder).string()] = entry.is_regular_file() ? bytes(entry.path()) : "(folder)";
    return files;
}

struct Verdict {
    std::vector<std::string> unmet; // each expectation the run did not meet, in words
};

Verdict runCase(const json& c)
{
    TempDir tmp;
    if (c.value("setup", "") == "lab") {
        const auto made = runCli({"lab", "new", (tmp.path() / "lab.bwlab").string()});
        REQUIRE(made.exitCode == 0);
    }
    if (c.contains("make")) {
        const json& make = c["make"];
        const std::string from = bytes(expand(make["from"], tmp.path()));
        REQUIRE_FALSE(from.empty());
        std::ofstream(expand(make["file"], tmp.path()), std::ios::binary)
            << replaceAll(from, make["replace"], expand(make["by"], tmp.path()));
    }
    std::vector<std::string> args;
    for (const auto& arg : c["args"])
        args.push_back(expand(arg.get<std::string>(), tmp.path()));

    const auto before = snapshot(tmp.path());
    const CliOutput out = runCli(args);
    Verdict verdict;
    const int exit = c["exit"];
    if (out.exitCode != exit)
        verdict.unmet.push_back("exit code " + std::to_string(out.exitCode) + ", expected " + std::to_string(exit));
    for (const char* key : {"stderr", "stderr_also"}) {
        if (c.contains(key) && out.stderrText.find(c[key].get<std::string>()) == std::string::npos)
            verdict.unmet.push_back("stderr lacks \"" + c[key].get<std::string>() +
                                    "\"; it reads: " + out.stderrText.substr(0, 400));
    }
    if (c.contains("stdout") && out.stdoutText.find(c["stdout"].get<std::string>()) == std::string::npos)
        verdict.unmet.push_back("stdout lacks \"" + c["stdout"].get<std::string>() + "\"");
    if (c.contains("stdout_lacks") && out.stdoutText.find(c["stdout_lacks"].get<std::string>()) != std::string::npos)
        verdict.unmet.push_back("stdout contains \"" + c["stdout_lacks"].get<std::string>() + "\"");
    if (exit != 0 && snapshot(tmp.path()) != before)
        verdict.unmet.push_back("the refused run wrote to its folder");
    return verdict;
}

bool isImport(const json& c)
{
    return c["args"].size() > 1 && c["args"][0] == "lab" && c["args"][1] == "import";
}

bool isCsvImport(const json& c)
{
    return c["args"].size() > 1 && c["args"][0] == "lab" && c["args"][1] == "import-eyewear";
}

// Runs the selected cases; returns how many ran.
int runCases(bool (*selected)(const json&))
{
    int count = 0;
    for (const json& c : corpus()["cases"]) {
        if (!selected(c))
            continue;
        ++count;
        const std::string id = c["id"];
        const Verdict verdict = runCase(c);
        if (c.contains("known_issue")) {
            // Still falling short as described; once this fails, the program is fixed: remove the mark.
            INFO(id << ": marked known_issue (" << c["known_issue"].get<std::string>()
                    << ") but every expectation is met now; remove the mark");
            CHECK_FALSE(verdict.unmet.empty());
        } else {
            for (const std::string& unmet : verdict.unmet) {
                INFO(id);
                FAIL_CHECK(unmet);
            }
        }
    }
    return count;
}

} // namespace

TEST_CASE("bad inputs: refused flags and values exit 2 naming the field (tests/data/bad/cases.json)", "[cli][bad]")
{
    const int count = runCases([](const json& c) { return !isImport(c) && !isCsvImport(c); });
    CHECK(count > 40);
}

TEST_CASE("bad inputs: a refused lab import exits 2 naming the field and writes no lab file", "[cli][bad]")
{
    const int count = runCases(&isImport);
    CHECK(count > 20);
}

TEST_CASE("bad inputs: a refused eyewear CSV import exits 2 naming the cell and leaves the lab file as it was",
          "[cli][bad]")
{
    const int count = runCases(&isCsvImport);
    CHECK(count > 8);
}

TEST_CASE("bad inputs: every file in tests/data/bad belongs to a case, and case ids are unique", "[cli][bad]")
{
    std::set<std::string> ids;
    std::string allArgs;
    for (const json& c : corpus()["cases"]) {
        CHECK(ids.insert(c["id"].get<std::string>()).second);
        allArgs += c.dump();
    }
    for (const auto& entry : fs::directory_iterator(badDir())) {
        const std::string name = entry.path().filename().string();
        if (name == "cases.json")
            continue;
        INFO(name);
        CHECK(allArgs.find(name) != std::string::npos);
    }
}
