// beamwarden-cli sheet: a hazard sheet PDF for every demo laser, read back with poppler's pdfinfo and pdftotext
// (real text, not an image): the laser's name, every output wavelength and the caution are on it; eight outputs flow
// onto a second page under a repeated header; Letter paper and German on request; refusals exit 2.
#include "cli_runner.hpp"

#include "beamwarden/caution.hpp"
#include "beamwarden/store/labstore.hpp"
#include "beamwarden/units.hpp"

#include <catch2/catch.hpp>

#include <array>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <memory>
#include <string>
#include <vector>

namespace {

namespace fs = std::filesystem;
using namespace beamwarden;
using namespace beamwarden::units::literals;

class TempDir {
public:
    TempDir()
    {
        std::string pattern = (fs::temp_directory_path() / "bw-cli-sheet-XXXXXX").string();
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

// What a shell command printed; the poppler tools are run as the user would run them.
std::string commandOutput(const std::string& command)
{
    std::string out;
    const std::unique_ptr<FILE, int (*)(FILE*)> pipe(popen(command.c_str(), "r"), pclose);
    REQUIRE(pipe != nullptr);
    std::array<char, 4096> buffer{};
    std::size_t n = 0;
    while ((n = std::fread(buffer.data(), 1, buffer.size(), pipe.get())) > 0)
        out.append(buffer.data(), n);
    return out;
}

std::string quoted(const std::string& path)
{
    return "'" + path + "'";
}

std::string pdfInfo(const std::string& path)
{
    return commandOutput("pdfinfo " + quoted(path) + " 2>&1");
}

// The value of one "Key: value" line of pdfinfo.
std::string infoField(const std::string& info, const std::string& key)
{
    const auto at = info.find("\n" + key + ":");
    const auto start = at == std::string::npos ? (info.starts_with(key + ":") ? 0 : std::string::npos) : at + 1;
    if (start == std::string::npos)
        return {};
    const auto colon = info.find(':', start);
    const auto end = info.find('\n', colon);
    const std::string value = info.substr(colon + 1, end - colon - 1);
    const auto first = value.find_first_not_of(' ');
    return first == std::string::npos ? std::string{} : value.substr(first);
}

int pageCount(const std::string& path)
{
    const std::string pages = infoField(pdfInfo(path), "Pages");
    INFO(pdfInfo(path));
    REQUIRE(!pages.empty());
    return std::stoi(pages);
}

// The PDF's text, with every run of white space (and no-break spaces) as one space, so wrapped lines read on.
std::string pdfText(const std::string& path)
{
    std::string raw = commandOutput("pdftotext -layout -enc UTF-8 " + quoted(path) + " - 2>&1");
    std::string text;
    bool space = false;
    for (std::size_t i = 0; i < raw.size(); ++i) {
        const bool nbsp = raw.compare(i, 2, "\xC2\xA0") == 0;
        const char c = raw[i];
        if (nbsp || c == ' ' || c == '\n' || c == '\t' || c == '\f' || c == '\r') {
            space = true;
            if (nbsp)
                ++i;
            continue;
        }
        if (space && !text.empty())
            text += ' ';
        space = false;
        text += c;
    }
    return text;
}

std::string fileStart(const std::string& path, std::size_t n)
{
    std::ifstream in(path, std::ios::binary);
    std::string bytes(n, '\0');
    in.read(bytes.data(), static_cast<std::streamsize>(n));
    bytes.resize(static_cast<std::size_t>(in.gcount()));
    return bytes;
}

std::size_t occurrences(const std::string& text, const std::string& what)
{
    std::size_t count = 0;
    for (auto at = text.find(what); at != std::string::npos; at = text.find(what, at + what.size()))
        ++count;
    return count;
}

std::string demoLab(const TempDir& dir)
{
    const std::string path = dir / "demo.bwlab";
    const auto out = runCli({"lab", "new", "--demo", path});
    INFO(out.stderrText);
    REQUIRE(out.exitCode == 0);
    return path;
}

std::vector<model::Laser> lasersOf(const std::string& lab)
{
    auto store = store::LabStore::open(lab);
    REQUIRE(store.has_value());
    auto lasers = store->lasers();
    REQUIRE(lasers.has_value());
    return *lasers;
}

// The wavelengths a reader must find for an output: a line as printed, a band by its two ends.
std::vector<std::string> wavelengthTexts(const model::Output& output)
{
    const model::Spectrum& s = output.emission.spectrum;
    if (s.isSingleLine())
        return {units::format(s.samples.front().wavelength)};
    bool lines = true;
    for (const model::SpectralSample& sample : s.samples)
        lines = lines && sample.width.si() <= 0.0;
    if (!lines)
        return {units::format(s.shortest()), units::format(s.longest())};
    std::vector<std::string> all;
    for (const model::SpectralSample& sample : s.samples)
        all.push_back(units::format(sample.wavelength));
    return all;
}

std::string normalised(std::string_view text)
{
    std::string out;
    for (const char c : text) {
        if (c == ' ' && !out.empty() && out.back() == ' ')
            continue;
        out += c;
    }
    return out;
}

// An invented source with eight lines, each with two exposure cases: more than one page holds.
std::string eightOutputLab(const TempDir& dir)
{
    store::LabContents contents;
    contents.lab.name = "Larkspur Ridge Photonics Laboratory";
    contents.lab.lsoName = "A. N. Example";
    contents.lab.rooms = {{0, "B114", "spectroscopy"}};
    model::Laser laser;
    laser.name = "Test source T8";
    laser.makerModel = "eight-line test source (invented)";
    laser.room = "B114";
    laser.laserClass = model::LaserClass::Class4;
    const std::array<double, 8> lines_nm = {405, 445, 488, 520, 561, 640, 785, 980};
    for (std::size_t i = 0; i < lines_nm.size(); ++i) {
        model::Output output;
        output.name = "line " + std::to_string(i + 1);
        output.emission.spectrum = model::singleLine(units::Wavelength::fromSi(lines_nm[i] * 1e-9));
        output.emission.averagePower = 0.5_W;
        output.beam.diameter = 2_mm;
        output.beam.divergence = 1_mrad;
        model::NamedExposureCase direct;
        direct.name = "intrabeam at the exit";
        model::NamedExposureCase diffuse;
        diffuse.name = "diffuse from the breadboard";
        diffuse.exposureCase.viewing = model::Viewing::Diffuse;
        diffuse.exposureCase.distance = 0.5_m;
        diffuse.exposureCase.reflectance = 0.9;
        output.exposureCases = {direct, diffuse};
        laser.outputs.push_back(output);
    }
    contents.lasers = {laser};
    model::EyewearItem goggle;
    goggle.name = "Goggle T1";
    goggle.description = "invented absorbing filter";
    goggle.spectralOd = {{units::Wavelength::fromSi(190e-9), units::Wavelength::fromSi(1100e-9), 6, true}};
    contents.eyewear = {goggle};
    const std::string path = dir / "eight.bwlab";
    const auto created = store::LabStore::create(path, contents);
    INFO((created ? std::string() : created.error().message()));
    REQUIRE(created.has_value());
    return path;
}

} // namespace

TEST_CASE("sheet: every demo laser gives a PDF with its name, each wavelength and the caution", "[cli][sheet]")
{
    TempDir dir;
    const std::string lab = demoLab(dir);
    const auto lasers = lasersOf(lab);
    REQUIRE(lasers.size() == 7); // vocabulary.md: the demo lab has seven lasers
    const std::string version = runCli({"--version"}).stdoutText.substr(std::string("beamwarden-cli ").size());
    for (const model::Laser& laser : lasers) {
        INFO(laser.name);
        const std::string pdf = dir / (laser.name + ".pdf");
        const auto out = runCli({"sheet", lab, "--laser", laser.name, "--out", pdf});
        INFO(out.stderrText);
        REQUIRE(out.exitCode == 0);
        CHECK(fileStart(pdf, 5) == "%PDF-");
        const int pages = pageCount(pdf);
        CHECK(pages >= 1);
        CHECK(pages <= 2);
        CHECK(out.stdoutText.find(std::to_string(pages) + " page") != std::string::npos);

        const std::string info = pdfInfo(pdf);
        CHECK(infoField(info, "Title") == laser.name + " hazard sheet");
        CHECK(infoField(info, "Creator") == "Beamwarden " + version.substr(0, version.find('\n')));
        CHECK(infoField(info, "Page size").find("(A4)") != std::string::npos);

        const std::string text = pdfText(pdf);
        CHECK(text.find(laser.name) != std::string::npos);
        for (const model::Output& output : laser.outputs) {
            INFO(output.name);
            CHECK(text.find(output.name) != std::string::npos);
            for (const std::string& wavelength : wavelengthTexts(output)) {
                INFO(wavelength);
                CHECK(text.find(wavelength) != std::string::npos);
            }
        }
        CHECK(text.find(normalised(caution())) != std::string::npos);
        // Every mark has its footnote.
        if (text.find("\u2020") != std::string::npos)
            CHECK(text.find("Rests on a limit row reconstructed from public material") != std::string::npos);
    }
}

TEST_CASE("sheet: eight outputs flow onto a second page under a repeated header", "[cli][sheet]")
{
    TempDir dir;
    const std::string lab = eightOutputLab(dir);
    const std::string pdf = dir / "t8.pdf";
    const auto out = runCli({"sheet", lab, "--laser", "Test source T8", "--out", pdf});
    INFO(out.stderrText);
    REQUIRE(out.exitCode == 0);
    CHECK(pageCount(pdf) == 2);
    const std::string text = pdfText(pdf);
    CHECK(text.find("Test source T8 hazard sheet (continued)") != std::string::npos);
    CHECK(text.find("Outputs and exposure cases (continued)") != std::string::npos);
    CHECK(occurrences(text, "MPE (governing rule)") == 2); // the table's column header, on both pages
    CHECK(occurrences(text, "Page 1 of 2") == 1);
    CHECK(occurrences(text, "Page 2 of 2") == 1);
    for (const char* wavelength : {"405 nm", "445 nm", "488 nm", "520 nm", "561 nm", "640 nm", "785 nm", "980 nm"})
        CHECK(text.find(wavelength) != std::string::npos);
}

TEST_CASE("sheet: --page letter writes US Letter pages", "[cli][sheet]")
{
    TempDir dir;
    const std::string lab = demoLab(dir);
    const std::string pdf = dir / "h1.pdf";
    const auto out = runCli({"sheet", lab, "--laser", "Teaching laser H1", "--out", pdf, "--page", "letter"});
    INFO(out.stderrText);
    REQUIRE(out.exitCode == 0);
    const std::string size = infoField(pdfInfo(pdf), "Page size");
    INFO(size);
    // US Letter is 8.5 x 11 in = 612 x 792 pt (common practice).
    CHECK(size.find("612 x 792") != std::string::npos);
    CHECK(size.find("letter") != std::string::npos);
}

TEST_CASE("sheet: --language de writes the sheet in German", "[cli][sheet]")
{
    TempDir dir;
    const std::string lab = demoLab(dir);
    const std::string pdf = dir / "a1-de.pdf";
    const auto out = runCli({"sheet", lab, "--laser", "Amplifier A1", "--out", pdf, "--language", "de"});
    INFO(out.stderrText);
    REQUIRE(out.exitCode == 0);
    const std::string text = pdfText(pdf);
    CHECK(text.find("GEFÄHRDUNGSBLATT") != std::string::npos);
    CHECK(text.find("Ausgänge und Expositionsfälle") != std::string::npos);
    CHECK(text.find("Vorsicht: Diese Werte folgen dem veröffentlichten Formelaufbau") != std::string::npos);
    CHECK(text.find("Laserschutzbeauftragte") != std::string::npos);
    CHECK(text.find("Outputs and exposure cases") == std::string::npos);
    CHECK(infoField(pdfInfo(pdf), "Title") == "Gefährdungsblatt Amplifier A1");
    // Decimal commas where German writes them: 0.5 mrad of the fundamental is "0,5 mrad".
    CHECK(text.find("0,5 mrad") != std::string::npos);
}

TEST_CASE("sheet: a laser not in the lab is refused with exit 2, naming --laser and the lab's lasers", "[cli][sheet]")
{
    TempDir dir;
    const std::string lab = demoLab(dir);
    const std::string pdf = dir / "none.pdf";
    const auto out = runCli({"sheet", lab, "--laser", "Amplifier Z9", "--out", pdf});
    CHECK(out.exitCode == 2);
    CHECK(out.stderrText.find("--laser") != std::string::npos);
    CHECK(out.stderrText.find("Amplifier Z9") != std::string::npos);
    CHECK(out.stderrText.find("Amplifier A1") != std::string::npos);
    CHECK(out.stderrText.find("Cutter C1") != std::string::npos);
    CHECK(!fs::exists(pdf));
}

TEST_CASE("sheet: refused flags exit 2 and an unwritable file exits 1", "[cli][sheet]")
{
    TempDir dir;
    const std::string lab = demoLab(dir);
    const std::string pdf = dir / "a1.pdf";

    const auto page = runCli({"sheet", lab, "--laser", "Amplifier A1", "--out", pdf, "--page", "a5"});
    CHECK(page.exitCode == 2);
    CHECK(page.stderrText.find("--page") != std::string::npos);

    const auto language = runCli({"sheet", lab, "--laser", "Amplifier A1", "--out", pdf, "--language", "xx"});
    CHECK(language.exitCode == 2);
    CHECK(language.stderrText.find("--language") != std::string::npos);

    const auto noOut = runCli({"sheet", lab, "--laser", "Amplifier A1"});
    CHECK(noOut.exitCode == 2);
    CHECK(noOut.stderrText.find("--out") != std::string::npos);

    const auto missingLab = runCli({"sheet", dir / "no-such.bwlab", "--laser", "Amplifier A1", "--out", pdf});
    CHECK(missingLab.exitCode == 2);

    const auto unwritable = runCli({"sheet", lab, "--laser", "Amplifier A1", "--out", dir / "no-such-dir/a1.pdf"});
    CHECK(unwritable.exitCode == 1);
    CHECK(unwritable.stderrText.find("--out") != std::string::npos);
    CHECK(!fs::exists(pdf));
}
