#pragma once
// The few colours the sheet uses, copied from the GUI's palette (Okabe-Ito plus neutral inks) because the sheet
// library must not depend on the GUI. Colour never carries meaning alone: every verdict is also in words, and the
// plot tells its curves apart by line style and marker as well.
#include <QColor>

namespace beamwarden::sheet::palette {

inline const QColor kOrange{0xE6, 0x9F, 0x00};
inline const QColor kBluishGreen{0x00, 0x9E, 0x73};
inline const QColor kBlue{0x00, 0x72, 0xB2};
inline const QColor kVermillion{0xD5, 0x5E, 0x00};

inline const QColor kInk{0x1d, 0x25, 0x33};
inline const QColor kNavy{0x1d, 0x35, 0x57};
inline const QColor kCautionBackground{0xFD, 0xF3, 0xDC};
inline const QColor kRail{0xEE, 0xF1, 0xF5};
inline const QColor kMuted{0x55, 0x60, 0x70}; // secondary text: still dark enough to read on paper
inline const QColor kRule{0xB8, 0xC0, 0xCC};  // table rules and plot grid

} // namespace beamwarden::sheet::palette
