// measure_gui BIN_DIR SCRATCH_DIR [edits|start|memory]: the desktop application's budgets (tests/bench/budgets.txt),
// as MEASURE lines.
//   gui_edit_to_update         an edit in the output editor to the repainted window, the slowest of three shown
//                              panels (Lasers, Assessment, Limit curves); median of many edits, demo lab, in-process
//   gui_cold_start             launch of BIN_DIR/beamwarden --demo to its first painted window; median of starts
//   gui_peak_memory_large_lab  peak resident memory of beamwarden --lab LARGE with every panel shown and painted
// Runs on the offscreen platform unless QT_QPA_PLATFORM says otherwise; what it writes (settings, the demo lab) goes
// to SCRATCH_DIR, never to the user's home, and the large lab file to the benchmarks' cache shared with bench_store
// ($BEAMWARDEN_BENCH_SCRATCH, else <build>/bench-scratch), where later runs find it.
#include "childprocess.hpp"
#include "guiedittiming.hpp"
#include "largelab.hpp"

#include "mainwindow.hpp"

#include <QApplication>
#include <QStandardPaths>
#include <QTimer>

#include <algorithm>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <string>
#include <vector>

namespace {

namespace fs = std::filesystem;
using beamwarden::gui::Panel;

constexpr int kEditWarmUp = 5;
constexpr int kEditsTimed = 60;
constexpr int kStarts = 7;
constexpr double kStartTimeout_s = 60;
constexpr double kLargeLabTimeout_s = 900;

double median(std::vector<double> values)
{
    if (values.empty())
        return -1;
    std::sort(values.begin(), values.end());
    const std::size_t n = values.size();
    return n % 2 == 1 ? values[n / 2] : 0.5 * (values[n / 2 - 1] + values[n / 2]);
}

void measure(const char* name, double value, const char* unit)
{
    std::printf("MEASURE %s %.3f %s\n", name, value, unit);
    std::fflush(stdout);
}

void note(const std::string& text)
{
    std::fprintf(stderr, "measure_gui: %s\n", text.c_str());
}

// A private home for this program and the children it starts: settings, the demo lab and Qt's caches land here.
std::vector<std::string> privateHome(const fs::path& scratch)
{
    const fs::path home = fs::absolute(scratch / "gui-home");
    const fs::path runtime = home / "runtime";
    fs::create_directories(runtime);
    fs::permissions(runtime, fs::perms::owner_all, fs::perm_options::replace);
    std::vector<std::string> environment{"HOME=" + home.string(), "XDG_CONFIG_HOME=" + (home / ".config").string(),
                                         "XDG_DATA_HOME=" + (home / ".local/share").string(),
                                         "XDG_CACHE_HOME=" + (home / ".cache").string(),
                                         "XDG_RUNTIME_DIR=" + runtime.string()};
    if (std::getenv("QT_QPA_PLATFORM") == nullptr)
        environment.emplace_back("QT_QPA_PLATFORM=offscreen");
    for (const std::string& entry : environment) {
        const auto eq = entry.find('=');
        ::setenv(entry.substr(0, eq).c_str(), entry.substr(eq + 1).c_str(), 1);
    }
    return environment;
}

// (a) In this process: the real main window on the demo lab, the first laser's first output edited.
bool measureEdits()
{
    beamwarden::gui::MainWindow window;
    if (auto opened = window.openDemoLab(); !opened) {
        note("the demo lab could not be opened: " + opened.error().message());
        return false;
    }
    window.selectLaser(0);
    window.show();
    beamwarden::bench::settle();
    double slowest = -1;
    double slowestCpu = -1;
    const std::pair<Panel, std::string> shown[] = {{Panel::Lasers, "gui_edit_to_update_lasers_panel"},
                                                   {Panel::Assessment, "gui_edit_to_update_assessment_panel"},
                                                   {Panel::LimitCurves, "gui_edit_to_update_limit_curves_panel"}};
    // BEAMWARDEN_MEASURE_EDITS sets fewer edits, for a run under valgrind; BEAMWARDEN_MEASURE_PANEL below.
    const char* count = std::getenv("BEAMWARDEN_MEASURE_EDITS");
    const int timed = count != nullptr ? std::max(1, std::atoi(count)) : kEditsTimed;
    // BEAMWARDEN_MEASURE_PANEL picks one of them (a part of the name, e.g. "curves"), for profiling.
    const char* onlyPanel = std::getenv("BEAMWARDEN_MEASURE_PANEL");
    for (const auto& [panel, name] : shown) {
        if (onlyPanel != nullptr && name.find(onlyPanel) == std::string::npos)
            continue;
        const auto times = beamwarden::bench::timeWavelengthEdits(window, panel, 800, 805, kEditWarmUp, timed);
        if (!times.problem.isEmpty()) {
            note(name + ": " + times.problem.toStdString());
            return false;
        }
        const double m = median(times.ms);
        measure(name.c_str(), m, "ms");
        measure((name + "_cpu").c_str(), median(times.cpuMs), "ms");
        slowest = std::max(slowest, m);
        slowestCpu = std::max(slowestCpu, median(times.cpuMs));
    }
    measure("gui_edit_to_update", slowest, "ms");
    measure("gui_edit_to_update_cpu", slowestCpu, "ms");
    return true;
}

// (a') The same edits on a copy of the large lab (its 10 000 eyewear items are checked on every recompute), with the
// Lasers panel shown: for the scaling, not for a budget. The first edit checks the file's history once.
bool measureLargeLabEdits(const fs::path& program, const fs::path& scratch)
{
    auto lab =
        beamwarden::bench::cachedLargeLab(beamwarden::bench::defaultScratchFolder(), beamwarden::bench::LargeLabSize{},
                                          program.parent_path() / "make_large_lab");
    if (!lab) {
        note("the large lab could not be written: " + lab.error().message());
        return false;
    }
    const fs::path copy = scratch / "large-lab-edited.bwlab"; // the edits must not change the shared file
    fs::copy_file(*lab, copy, fs::copy_options::overwrite_existing);
    bool ok = true;
    {
        beamwarden::gui::MainWindow window;
        if (auto opened = window.openLab(QString::fromStdString(copy.string())); !opened) {
            note("the large lab could not be opened: " + opened.error().message());
            return false;
        }
        window.selectLaser(0);
        window.show();
        beamwarden::bench::settle();
        const auto times = beamwarden::bench::timeWavelengthEdits(window, Panel::Lasers, 1064, 1066, 3, 10);
        if (!times.problem.isEmpty()) {
            note("large lab: " + times.problem.toStdString());
            ok = false;
        } else {
            measure("gui_first_edit_large_lab", times.firstMs, "ms");
            measure("gui_edit_to_update_large_lab_lasers_panel", median(times.ms), "ms");
            measure("gui_edit_to_update_large_lab_lasers_panel_cpu", median(times.cpuMs), "ms");
        }
    }
    std::error_code error;
    for (const char* suffix : {"", "-wal", "-shm"})
        fs::remove(fs::path(copy.string() + suffix), error);
    return ok;
}

// (b) The real program, started as a user starts it, until its window has been painted.
bool measureColdStart(const fs::path& program, const std::vector<std::string>& environment)
{
    // The first start creates the demo lab in the private home; it is not counted.
    std::vector<double> starts;
    std::vector<double> exits;
    for (int i = 0; i <= kStarts; ++i) {
        const auto run = beamwarden::bench::runChild(program, {"--demo", "--exit-after-first-paint"}, environment,
                                                     "beamwarden: first paint", kStartTimeout_s);
        if (run.untilLine_ms < 0 || run.exitCode != 0) {
            note("beamwarden --demo did not report its first paint:\n" + run.output);
            return false;
        }
        if (i == 0) {
            measure("gui_first_start_creating_demo_lab", run.untilLine_ms / 1000, "s");
            continue;
        }
        starts.push_back(run.untilLine_ms);
        exits.push_back(run.untilExit_ms);
    }
    measure("gui_cold_start", median(starts) / 1000, "s");
    measure("gui_cold_start_to_exit", median(exits) / 1000, "s");
    return true;
}

// (c) The real program on the large lab, every panel shown and painted in turn.
bool measurePeakMemory(const fs::path& program, const std::vector<std::string>& environment)
{
    // The large lab lives in the benchmarks' shared cache, beside bench_store's: packaging/bench.sh gives this
    // program a new scratch folder on every run, and writing the file takes the better part of a minute.
    auto lab =
        beamwarden::bench::cachedLargeLab(beamwarden::bench::defaultScratchFolder(), beamwarden::bench::LargeLabSize{},
                                          program.parent_path() / "make_large_lab");
    if (!lab) {
        note("the large lab could not be written: " + lab.error().message());
        return false;
    }
    const auto run = beamwarden::bench::runChild(program, {"--lab", lab->string(), "--exit-after-every-panel"},
                                                 environment, "beamwarden: every panel painted", kLargeLabTimeout_s);
    if (run.untilLine_ms < 0 || run.exitCode != 0 || run.peakResident_kB < 0) {
        note("beamwarden --lab " + lab->string() + " did not paint every panel" + (run.timedOut ? " in time" : "") +
             ":\n" + run.output);
        return false;
    }
    measure("gui_large_lab_every_panel_painted", run.untilLine_ms / 1000, "s");
    measure("gui_peak_memory_large_lab", static_cast<double>(run.peakResident_kB) * 1024 / 1e6, "MB");
    return true;
}

} // namespace

int main(int argc, char* argv[])
{
    // A third argument picks one part, for profiling it alone (valgrind --tool=callgrind measure_gui ... edits).
    const std::string only = argc == 4 ? argv[3] : "";
    if ((argc != 3 && argc != 4) || (argc == 4 && only != "edits" && only != "start" && only != "memory")) {
        std::fputs("usage: measure_gui BIN_DIR SCRATCH_DIR [edits|start|memory]\n", stderr);
        return 2;
    }
    const fs::path program = fs::absolute(fs::path(argv[1]) / "beamwarden");
    const fs::path scratch = fs::absolute(argv[2]);
    if (!fs::exists(program)) {
        note("no program at " + program.string());
        return 2;
    }
    const std::vector<std::string> environment = privateHome(scratch);
    QStandardPaths::setTestModeEnabled(true); // this process's settings and demo lab stay apart from the children's
    int qtArgc = 1;
    QApplication app(qtArgc, argv);
    QApplication::setApplicationName(QStringLiteral("Beamwarden"));
    QApplication::setOrganizationName(QStringLiteral("Beamwarden"));

    bool ok = true;
    // From inside the event loop, as the application handles an edit: work released with deleteLater is then done.
    QTimer::singleShot(0, &app, [&] {
        if (only.empty() || only == "edits")
            ok = measureEdits() && ok;
        if (only.empty() || only == "edits")
            ok = measureLargeLabEdits(program, scratch) && ok;
        if (only.empty() || only == "start")
            ok = measureColdStart(program, environment) && ok;
        if (only.empty() || only == "memory")
            ok = measurePeakMemory(program, environment) && ok;
        QCoreApplication::exit(0);
    });
    QApplication::exec();
    return ok ? 0 : 1;
}
