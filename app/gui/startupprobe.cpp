#include "startupprobe.hpp"

#include "mainwindow.hpp"

#include <QApplication>
#include <QEvent>
#include <QTimer>

#include <cstdio>

namespace beamwarden::gui {

namespace {

// Sees the window's first paint event and, once that paint pass has finished (the next turn of the event loop),
// runs the probe's last step.
class FirstPaintWatcher : public QObject {
public:
    FirstPaintWatcher(MainWindow& window, StartupProbe probe) : QObject(&window), m_window(window), m_probe(probe)
    {
        window.installEventFilter(this);
    }

protected:
    bool eventFilter(QObject* watched, QEvent* event) override
    {
        if (watched == &m_window && event->type() == QEvent::Paint && !m_seen) {
            m_seen = true;
            QTimer::singleShot(0, this, [this] { finish(); });
        }
        return false;
    }

private:
    void finish()
    {
        const char* line = "beamwarden: first paint\n";
        if (m_probe == StartupProbe::EveryPanel) {
            // Each panel as a user would open it: shown, laid out and painted before the next one.
            for (int i = 0; i < kPanelCount; ++i) {
                m_window.showPanel(static_cast<Panel>(i));
                QCoreApplication::processEvents();
                m_window.repaint();
            }
            line = "beamwarden: every panel painted\n";
        }
        std::fputs(line, stdout);
        std::fflush(stdout);
        QCoreApplication::exit(0);
    }

    MainWindow& m_window;
    StartupProbe m_probe;
    bool m_seen = false;
};

} // namespace

void installStartupProbe(MainWindow& window, StartupProbe probe)
{
    if (probe != StartupProbe::None)
        new FirstPaintWatcher(window, probe); // owned by the window
}

} // namespace beamwarden::gui
