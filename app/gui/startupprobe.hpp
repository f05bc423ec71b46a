#pragma once
// Start-up probes for the performance measurements (tests/bench/measure_gui): hidden command-line options that
// report on standard output when the main window has been painted for the first time, or after every panel has been
// shown and painted in turn, and then quit. Not for users, so not in --help and not translated.
#include <cstdint>

namespace beamwarden::gui {

class MainWindow;

enum class StartupProbe : std::uint8_t {
    None,
    FirstPaint, // --exit-after-first-paint: prints "beamwarden: first paint"
    EveryPanel  // --exit-after-every-panel: prints "beamwarden: every panel painted"
};

// Watches `window` from its first paint on; call before the window is shown. Does nothing for StartupProbe::None.
void installStartupProbe(MainWindow& window, StartupProbe probe);

} // namespace beamwarden::gui
