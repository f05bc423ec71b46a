#pragma once
// Beamwarden's colours: the Okabe-Ito colour-blind-safe set, plus neutral inks. Colour never carries meaning
// alone: every coloured verdict also shows its words.
#include <QColor>

namespace beamwarden::gui::palette {

inline const QColor kOrange{0xE6, 0x9F, 0x00};
inline const QColor kSkyBlue{0x56, 0xB4, 0xE9};
inline const QColor kBluishGreen{0x00, 0x9E, 0x73};
inline const QColor kYellow{0xF0, 0xE4, 0x42};
inline const QColor kBlue{0x00, 0x72, 0xB2};
inline const QColor kVermillion{0xD5, 0x5E, 0x00};
inline const QColor kReddishPurple{0xCC, 0x79, 0xA7};

inline const QColor kInk{0x1d, 0x25, 0x33};
inline const QColor kNavy{0x1d, 0x35, 0x57};
inline const QColor kCautionBackground{0xFD, 0xF3, 0xDC};
inline const QColor kRail{0xEE, 0xF1, 0xF5};

} // namespace beamwarden::gui::palette
