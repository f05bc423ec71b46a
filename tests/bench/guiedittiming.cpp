#include "guiedittiming.hpp"

#include "mainwindow.hpp"
#include "panels/laserspanel.hpp"
#include "panels/outputeditor.hpp"
#include "widgets/quantityfield.hpp"

#include <QApplication>
#include <QElapsedTimer>
#include <QEvent>
#include <QLineEdit>
#include <QTest>

#include <cmath>
#include <ctime>

namespace beamwarden::bench {

namespace {

double threadCpuMs()
{
    timespec now{};
    clock_gettime(CLOCK_THREAD_CPUTIME_ID, &now);
    return static_cast<double>(now.tv_sec) * 1e3 + static_cast<double>(now.tv_nsec) / 1e6;
}

// Counts the paint events of every widget, to tell when a repaint has happened and when it is over.
class PaintCounter : public QObject {
public:
    PaintCounter() { qApp->installEventFilter(this); }
    ~PaintCounter() override { qApp->removeEventFilter(this); }
    PaintCounter(const PaintCounter&) = delete;
    PaintCounter& operator=(const PaintCounter&) = delete;
    [[nodiscard]] long count() const { return m_count; }

protected:
    bool eventFilter(QObject* /*watched*/, QEvent* event) override
    {
        if (event->type() == QEvent::Paint)
            ++m_count;
        return false;
    }

private:
    long m_count = 0;
};

// Until some paint has happened since `before` and three passes over the event queue painted nothing more: the
// chart's scene, for one, repaints a pass after the content changed. Gives up after two seconds.
void settleAfter(const PaintCounter& counter, long before)
{
    QElapsedTimer guard;
    guard.start();
    int quiet = 0;
    long seen = counter.count();
    while (guard.elapsed() < 2000) {
        QCoreApplication::sendPostedEvents();
        QCoreApplication::processEvents();
        // What the event loop does when the edit's handler returns: delete what was released with deleteLater
        // (the chart's items for replaced series and axes), which processEvents alone leaves queued.
        QCoreApplication::sendPostedEvents(nullptr, QEvent::DeferredDelete);
        const long now = counter.count();
        quiet = now == seen && now > before ? quiet + 1 : 0;
        seen = now;
        if (quiet >= 3)
            return;
    }
}

QLineEdit* wavelengthEdit(gui::MainWindow& window)
{
    auto* editor = window.lasersPanel()->findChild<gui::OutputEditor*>();
    auto* field = editor ? editor->findChild<gui::QuantityField*>(QStringLiteral("outputWavelength")) : nullptr;
    return field ? field->lineEdit() : nullptr;
}

// The wavelength the recomputed assessment saw for the edited output.
double assessedWavelength_nm(const gui::MainWindow& window, int output)
{
    const auto& assessment = window.currentAssessment();
    if (!assessment || output < 0 || static_cast<std::size_t>(output) >= assessment->laser.outputs.size())
        return NAN;
    return assessment->laser.outputs[static_cast<std::size_t>(output)].emission.spectrum.centroid().nanometres();
}

} // namespace

void settle()
{
    const PaintCounter counter;
    settleAfter(counter, -1);
}

EditTimes timeWavelengthEdits(gui::MainWindow& window, gui::Panel panel, double first, double second, int warmUp,
                              int timed)
{
    EditTimes times;
    QLineEdit* edit = wavelengthEdit(window);
    const int output = window.lasersPanel()->currentOutput();
    if (edit == nullptr || output < 0) {
        times.problem = QStringLiteral("no wavelength field for a selected output");
        return times;
    }
    window.showPanel(panel);
    settle();
    const PaintCounter counter;
    // Start with whichever value the output does not have yet, so that every edit changes it.
    const bool startWithSecond = std::abs(assessedWavelength_nm(window, output) - first) <= 0.01;
    for (int i = 0; i < warmUp + timed; ++i) {
        const double nm = (i % 2 == 0) != startWithSecond ? first : second;
        // Typing is not timed: the budget runs from the confirmed edit.
        edit->selectAll();
        QTest::keyClicks(edit, QStringLiteral("%1 nm").arg(nm));
        settleAfter(counter, -1); // the typed text is painted before the clock starts
        const long before = counter.count();
        QElapsedTimer timer;
        const double cpuStart = threadCpuMs();
        timer.start();
        QTest::keyClick(edit, Qt::Key_Return);
        settleAfter(counter, before);
        const double ms = static_cast<double>(timer.nsecsElapsed()) / 1e6;
        const double cpuMs = threadCpuMs() - cpuStart;
        if (std::abs(assessedWavelength_nm(window, output) - nm) > 0.01) {
            times.problem = QStringLiteral("the edit to %1 nm did not reach the assessment").arg(nm);
            return times;
        }
        if (counter.count() == before) {
            times.problem = QStringLiteral("nothing was repainted after the edit");
            return times;
        }
        if (i == 0)
            times.firstMs = ms;
        if (i >= warmUp) {
            times.ms.push_back(ms);
            times.cpuMs.push_back(cpuMs);
        }
    }
    return times;
}

} // namespace beamwarden::bench
