#include "widgets/wrappedlabel.hpp"

namespace beamwarden::gui {

WrappedLabel::WrappedLabel(QWidget* parent) : QLabel(parent)
{
    setWordWrap(true);
}

int WrappedLabel::heightForWidth(int width) const
{
    // Keyed on everything the height depends on, so a change of text, font or margins is never answered stale.
    for (const Entry& e : m_cache) {
        if (e.width == width && e.text == text() && e.font == font() && e.margins == contentsMargins())
            return e.height;
    }
    const int height = QLabel::heightForWidth(width);
    m_cache.at(m_next) = Entry{width, height, text(), font(), contentsMargins()};
    m_next = (m_next + 1) % m_cache.size();
    return height;
}

} // namespace beamwarden::gui
