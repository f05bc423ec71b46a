#pragma once
// Times edits made in the Lasers panel's output editor, from the confirming Enter key to the end of the repaint
// that follows: the store write, the recompute, every panel's update and the painting of the shown panel.
#include "panels/panel.hpp"

#include <QString>

#include <vector>

namespace beamwarden::gui {
class MainWindow;
}

namespace beamwarden::bench {

struct EditTimes {
    std::vector<double> ms;    // wall time, one per timed edit
    std::vector<double> cpuMs; // this thread's processor time over the same span: what the work costs without
                               // waiting for the disk or for other programs on a busy machine
    double firstMs = -1;       // the very first edit (a warm-up one): what a lab's first change costs
    QString problem;           // empty, or why the edits could not be timed (an edit that did not take effect)
};

// With `panel` shown, types alternately `first` and `second` nanometres into the wavelength field of the selected
// laser's selected output and confirms each with Enter; the first `warmUp` edits are not timed.
[[nodiscard]] EditTimes timeWavelengthEdits(gui::MainWindow& window, gui::Panel panel, double first, double second,
                                            int warmUp, int timed);

// Processes events until the window has painted and nothing further is painted (used after start-up as well).
void settle();

} // namespace beamwarden::bench
