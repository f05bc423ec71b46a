#pragma once
// The six panels of the main window, in the order the navigation rail shows them.
#include <QString>

namespace beamwarden::gui {

enum class Panel { Lasers, Eyewear, Assessment, LimitCurves, HazardSheet, History, Count };

inline constexpr int kPanelCount = static_cast<int>(Panel::Count);

// The panel's name as the user sees it (translated).
[[nodiscard]] QString panelTitle(Panel panel);
// One sentence saying what the panel holds, shown under its heading.
[[nodiscard]] QString panelPurpose(Panel panel);

} // namespace beamwarden::gui
