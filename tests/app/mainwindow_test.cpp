// The main window starts offscreen, shows the six panels of the vocabulary and keeps the caution visible.
#include "beamwarden/caution.hpp"
#include "mainwindow.hpp"
#include "panels/panelpage.hpp"
#include "widgets/cautionstrip.hpp"

#include <catch2/catch.hpp>

#include <QLabel>
#include <QListWidget>
#include <QTest>

using beamwarden::gui::MainWindow;
using beamwarden::gui::Panel;

TEST_CASE("Main window lists the six panels in order", "[gui]")
{
    MainWindow window;
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));

    const auto* rail = window.findChild<QListWidget*>(QStringLiteral("panelRail"));
    REQUIRE(rail != nullptr);
    const QStringList expected = {QStringLiteral("Lasers"),       QStringLiteral("Eyewear"),
                                  QStringLiteral("Assessment"),   QStringLiteral("Limit curves"),
                                  QStringLiteral("Hazard sheet"), QStringLiteral("History")};
    REQUIRE(rail->count() == expected.size());
    for (int i = 0; i < rail->count(); ++i)
        CHECK(rail->item(i)->text() == expected.at(i));
}

TEST_CASE("The caution stays visible on every panel, folded or not", "[gui]")
{
    MainWindow window;
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));
    auto* strip = window.cautionStrip();
    const auto* text = strip->findChild<QLabel*>(QStringLiteral("cautionText"));
    REQUIRE(text != nullptr);
    CHECK(text->text() == QString::fromUtf8(beamwarden::caution().data()));

    for (int i = 0; i < beamwarden::gui::kPanelCount; ++i) {
        const auto panel = static_cast<Panel>(i);
        window.showPanel(panel);
        CHECK(window.currentPanel() == panel);
        CHECK(strip->isVisible());
        CHECK(window.panelPage(panel)->isVisible());
    }

    strip->setFolded(true);
    CHECK(strip->isVisible());
    CHECK(text->text().contains(QStringLiteral("laser safety officer")));
}

TEST_CASE("The caution lupdate sees is the caution core prints", "[gui][i18n]")
{
    CHECK(std::string(beamwarden::gui::kCautionSourceText) == std::string(beamwarden::caution()));
}
