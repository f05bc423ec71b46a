#include "widgets/panelstack.hpp"

#include <QStackedLayout>

namespace beamwarden::gui {

// A QStackedLayout whose size hints are those of the current page alone.
class PanelStackLayout : public QStackedLayout {
public:
    using QStackedLayout::QStackedLayout;

    [[nodiscard]] QSize sizeHint() const override
    {
        return current([](QWidget* w) { return w->sizeHint(); });
    }
    [[nodiscard]] QSize minimumSize() const override
    {
        return current([](QWidget* w) { return w->minimumSizeHint().expandedTo(w->minimumSize()); });
    }
    [[nodiscard]] bool hasHeightForWidth() const override
    {
        const QWidget* w = currentWidget();
        return w != nullptr && w->hasHeightForWidth();
    }
    [[nodiscard]] int heightForWidth(int width) const override
    {
        const QWidget* w = currentWidget();
        return w != nullptr && w->hasHeightForWidth() ? w->heightForWidth(width) : -1;
    }

private:
    template <typename Hint>
    QSize current(Hint hint) const
    {
        QWidget* w = currentWidget();
        return w != nullptr ? hint(w).expandedTo(QSize(0, 0)) : QSize(0, 0);
    }
};

PanelStack::PanelStack(QWidget* parent) : QWidget(parent), m_layout(new PanelStackLayout(this))
{
    m_layout->setContentsMargins(0, 0, 0, 0);
    // A page of another size takes over the area when shown: the window's layout is asked again.
    connect(m_layout, &QStackedLayout::currentChanged, this, [this] { updateGeometry(); });
}

void PanelStack::addWidget(QWidget* page)
{
    m_layout->addWidget(page);
}

void PanelStack::setCurrentIndex(int index)
{
    m_layout->setCurrentIndex(index);
}

int PanelStack::currentIndex() const
{
    return m_layout->currentIndex();
}

QWidget* PanelStack::widget(int index) const
{
    return m_layout->widget(index);
}

int PanelStack::count() const
{
    return m_layout->count();
}

} // namespace beamwarden::gui
