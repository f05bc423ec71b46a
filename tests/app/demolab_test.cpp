// The desktop application on the demo lab: every panel filled, edits through the fields, undo, refusals marked in
// place, the language switch. Figures shown are the engines' (tested in the core suite against published values);
// here the checks are that the GUI shows them and keeps the records straight.
#include "beamwarden/store/labexport.hpp"
#include "beamwarden/store/labstore.hpp"
#include "document/labdocument.hpp"
#include "mainwindow.hpp"
#include "panels/assessmentpanel.hpp"
#include "panels/eyewearpanel.hpp"
#include "panels/historypanel.hpp"
#include "panels/laserspanel.hpp"
#include "panels/outputeditor.hpp"
#include "widgets/quantityfield.hpp"

#include <catch2/catch.hpp>

#include <QLineEdit>
#include <QListWidget>
#include <QPushButton>
#include <QTableView>
#include <QTemporaryDir>
#include <QTest>
#include <QTranslator>
#include <QTreeWidget>

#include <filesystem>
#include <fstream>
#include <sstream>

using namespace beamwarden;
using gui::MainWindow;

namespace {

// A fresh copy of the demo lab for each test, so no test sees another's edits.
QString demoLabFile(const QTemporaryDir& dir)
{
    std::ifstream in(std::string(BEAMWARDEN_SOURCE_DIR) + "/resources/demo.bwlab.json");
    REQUIRE(in.good());
    std::stringstream text;
    text << in.rdbuf();
    auto contents = store::parseLabExport(text.str());
    INFO((contents ? std::string("ok") : contents.error().message()));
    REQUIRE(contents.has_value());
    const QString path = dir.filePath(QStringLiteral("demo.bwlab"));
    auto created = store::LabStore::create(path.toStdString(), *contents);
    REQUIRE(created.has_value());
    return path;
}

int laserIndex(const MainWindow& window, const std::string& name)
{
    const auto& lasers = window.document()->lasers();
    for (std::size_t i = 0; i < lasers.size(); ++i) {
        if (lasers[i].name == name)
            return static_cast<int>(i);
    }
    return -1;
}

} // namespace

TEST_CASE("Opening the demo lab fills the panels", "[gui][demo]")
{
    QTemporaryDir dir;
    MainWindow window;
    REQUIRE(window.openLab(demoLabFile(dir)).has_value());
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));

    CHECK(window.document()->lasers().size() == 7); // vocabulary.md: seven demo lasers
    CHECK(window.findChild<QListWidget*>(QStringLiteral("laserList"))->count() == 7);
    CHECK(window.findChild<QTableView*>(QStringLiteral("eyewearShelf"))->model()->rowCount() ==
          static_cast<int>(window.document()->eyewear().size()));
    window.selectLaser(laserIndex(window, "Amplifier A1"));
    REQUIRE(window.currentAssessment().has_value());
    // Amplifier A1 has five outputs (vocabulary.md), each with at least one exposure case.
    CHECK(window.assessmentPanel()->resultRowCount() >= 10);
    CHECK(window.windowTitle().contains(QStringLiteral("Larkspur Ridge")));
}

TEST_CASE("A bad value is marked in its field and changes nothing stored", "[gui][edit]")
{
    QTemporaryDir dir;
    MainWindow window;
    REQUIRE(window.openLab(demoLabFile(dir)).has_value());
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));
    const int h1 = laserIndex(window, "Teaching laser H1");
    REQUIRE(h1 >= 0);
    window.selectLaser(h1);
    const model::Laser before = window.document()->lasers()[static_cast<std::size_t>(h1)];

    auto* editor = window.lasersPanel()->findChild<gui::OutputEditor*>();
    REQUIRE(editor != nullptr);
    auto fields = editor->findChildren<gui::QuantityField*>();
    REQUIRE(!fields.isEmpty());
    gui::QuantityField* wavelength = fields.front(); // the first field is the wavelength
    wavelength->lineEdit()->selectAll();
    QTest::keyClicks(wavelength->lineEdit(), QStringLiteral("5 kg"));
    QTest::keyClick(wavelength->lineEdit(), Qt::Key_Return);
    CHECK_FALSE(wavelength->isValid());
    CHECK(wavelength->errorText().contains(QStringLiteral("5 kg")));
    const model::Laser after = window.document()->lasers()[static_cast<std::size_t>(h1)];
    CHECK(after.outputs.front().emission.spectrum.samples.front().wavelength ==
          before.outputs.front().emission.spectrum.samples.front().wavelength);
    CHECK(window.document()->undoStack()->count() == 0);
}

TEST_CASE("An edit recomputes the results at once and undo restores them", "[gui][edit][undo]")
{
    QTemporaryDir dir;
    MainWindow window;
    REQUIRE(window.openLab(demoLabFile(dir)).has_value());
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));
    const int h1 = laserIndex(window, "Teaching laser H1");
    window.selectLaser(h1);
    REQUIRE(window.currentAssessment().has_value());
    const double odBefore = window.currentAssessment()->outputs.front().cases.front().eye.requiredOd;

    auto* editor = window.lasersPanel()->findChild<gui::OutputEditor*>();
    auto fields = editor->findChildren<gui::QuantityField*>();
    // The power field: the one showing the demo's 4 mW (vocabulary.md: H1, 632.8 nm CW, 4 mW).
    gui::QuantityField* power = nullptr;
    for (auto* f : fields) {
        if (f->value() && std::abs(*f->value() - 4e-3) < 1e-9)
            power = f;
    }
    REQUIRE(power != nullptr);
    power->lineEdit()->selectAll();
    QTest::keyClicks(power->lineEdit(), QStringLiteral("40 mW"));
    QTest::keyClick(power->lineEdit(), Qt::Key_Return);
    REQUIRE(window.currentAssessment().has_value());
    const double odAfter = window.currentAssessment()->outputs.front().cases.front().eye.requiredOd;
    // Ten times the power raises the required OD by log10(10) = 1 (definition of OD, hazard-and-eyewear.md 1.1;
    // computed, tolerance 1e-9 where both exposures exceed the MPE).
    CHECK(odAfter == Approx(odBefore + 1.0).margin(1e-9));

    window.document()->undoStack()->undo();
    REQUIRE(window.currentAssessment().has_value());
    CHECK(window.currentAssessment()->outputs.front().cases.front().eye.requiredOd == Approx(odBefore).margin(1e-12));
    CHECK(
        std::abs(window.document()->lasers()[static_cast<std::size_t>(h1)].outputs.front().emission.averagePower.si() -
                 4e-3) < 1e-12);
}

TEST_CASE("The eyewear panel checks the selected item against the selected laser", "[gui][eyewear]")
{
    QTemporaryDir dir;
    MainWindow window;
    REQUIRE(window.openLab(demoLabFile(dir)).has_value());
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));
    window.selectLaser(laserIndex(window, "Amplifier A1"));
    window.showPanel(gui::Panel::Eyewear);
    auto* check = window.findChild<QTreeWidget*>(QStringLiteral("eyewearCheck"));
    REQUIRE(check != nullptr);
    CHECK(check->topLevelItemCount() >= 5); // one row per output and case
}

TEST_CASE("Recording an assessment adds a draft to the history", "[gui][history]")
{
    QTemporaryDir dir;
    MainWindow window;
    REQUIRE(window.openLab(demoLabFile(dir)).has_value());
    window.selectLaser(laserIndex(window, "Oscillator O1"));
    const int before = window.historyPanel()->assessmentCount();
    auto* record = window.historyPanel()->findChild<QPushButton*>();
    REQUIRE(record != nullptr);
    record->click();
    CHECK(window.historyPanel()->assessmentCount() == before + 1);
}

TEST_CASE("Switching the language changes the labels", "[gui][i18n]")
{
    QTranslator german;
    REQUIRE(german.load(QStringLiteral(":/i18n/beamwarden_de.qm")));
    QCoreApplication::installTranslator(&german);
    {
        MainWindow window;
        const auto* rail = window.findChild<QListWidget*>(QStringLiteral("panelRail"));
        CHECK(rail->item(0)->text() == QStringLiteral("Laser"));
        CHECK(rail->item(1)->text() == QStringLiteral("Schutzbrillen"));
        CHECK(rail->item(4)->text() == QStringLiteral("Gefährdungsblatt"));
    }
    QCoreApplication::removeTranslator(&german);
    MainWindow english;
    CHECK(english.findChild<QListWidget*>(QStringLiteral("panelRail"))->item(1)->text() == QStringLiteral("Eyewear"));
}
