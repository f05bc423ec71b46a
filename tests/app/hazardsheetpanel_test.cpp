// The Hazard sheet panel: previews the pages the renderer draws, switches paper, exports the same sheet as PDF and
// goes back to its empty state. The laser is invented (a teaching He-Ne like the demo's H1), not test truth.
#include "panels/hazardsheetpanel.hpp"
#include "sheetcontent.hpp"
#include "sheetrenderer.hpp"

#include "beamwarden/units.hpp"

#include <catch2/catch.hpp>

#include <QFile>
#include <QLabel>
#include <QPushButton>
#include <QTemporaryDir>
#include <QTest>

using namespace beamwarden;
using namespace beamwarden::units::literals;

namespace {

sheet::SheetContent teachingLaserSheet()
{
    model::Lab lab;
    lab.name = "Larkspur Ridge Photonics Laboratory";
    lab.lsoName = "A. N. Example";
    lab.rooms = {{0, "T03", "teaching"}};
    model::Laser laser;
    laser.name = "Teaching laser H1";
    laser.room = "T03";
    laser.laserClass = model::LaserClass::Class3R;
    model::Output output;
    output.name = "beam";
    output.emission.spectrum = model::singleLine(632.8_nm);
    output.emission.averagePower = 4_mW;
    output.beam.diameter = 0.8_mm;
    output.beam.divergence = 1.2_mrad;
    laser.outputs = {output};
    auto content = sheet::buildSheetContent(lab, laser, {}, {});
    INFO((content ? std::string() : content.error().message()));
    REQUIRE(content.has_value());
    return *content;
}

bool hasInk(const QImage& image)
{
    for (int y = 0; y < image.height(); y += 4) {
        for (int x = 0; x < image.width(); x += 4) {
            if (image.pixelColor(x, y) != QColor(Qt::white))
                return true;
        }
    }
    return false;
}

} // namespace

TEST_CASE("Hazard sheet panel: empty until a sheet is shown, then one preview per page", "[gui][sheet]")
{
    gui::HazardSheetPanel panel;
    panel.resize(900, 700);
    panel.show();
    REQUIRE(QTest::qWaitForWindowExposed(&panel));
    CHECK(!panel.hasSheet());
    CHECK(panel.pageCount() == 0);
    CHECK(!panel.exportPdf(QStringLiteral("/nonexistent/never.pdf")));
    CHECK(!panel.lastError().isEmpty());

    panel.showSheet(teachingLaserSheet());
    REQUIRE(panel.hasSheet());
    REQUIRE(panel.pageCount() >= 1);
    for (int page = 1; page <= panel.pageCount(); ++page) {
        const auto* label = panel.findChild<QLabel*>(QStringLiteral("sheetPage%1").arg(page));
        REQUIRE(label != nullptr);
        CHECK(!label->pixmap().isNull());
    }
    const auto* exportButton = panel.findChild<QPushButton*>(QStringLiteral("exportPdfButton"));
    REQUIRE(exportButton != nullptr);
    CHECK(exportButton->isEnabled());

    panel.clear();
    CHECK(!panel.hasSheet());
    CHECK(panel.findChild<QLabel*>(QStringLiteral("sheetPage1")) == nullptr);
    CHECK(!exportButton->isEnabled());
}

TEST_CASE("Hazard sheet panel: the paper switch and the PDF export use the same sheet", "[gui][sheet]")
{
    gui::HazardSheetPanel panel;
    panel.resize(900, 700);
    panel.show();
    REQUIRE(QTest::qWaitForWindowExposed(&panel));
    panel.showSheet(teachingLaserSheet());
    CHECK(panel.pageSize() == sheet::PageSize::A4);

    auto* letter = panel.findChild<QPushButton*>(QStringLiteral("paperLetter"));
    REQUIRE(letter != nullptr);
    QTest::mouseClick(letter, Qt::LeftButton);
    CHECK(panel.pageSize() == sheet::PageSize::Letter);
    CHECK(letter->isChecked());

    // A sheet shown later keeps the paper the user chose.
    panel.showSheet(teachingLaserSheet());
    CHECK(panel.pageSize() == sheet::PageSize::Letter);

    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString path = dir.filePath(QStringLiteral("h1.pdf"));
    REQUIRE(panel.exportPdf(path));
    QFile pdf(path);
    REQUIRE(pdf.open(QIODevice::ReadOnly));
    CHECK(pdf.read(5) == QByteArray("%PDF-"));
}

TEST_CASE("Hazard sheet renderer: previews have ink, and A4 and Letter both lay out", "[gui][sheet]")
{
    sheet::SheetContent content = teachingLaserSheet();
    const sheet::SheetRenderer a4(content);
    REQUIRE(a4.pageCount() >= 1);
    const QImage page = a4.renderPage(0, 60.0);
    // A4 is 210 x 297 mm (ISO 216), 595.3 x 841.9 pt: at 60 dpi, 496 x 702 pixels once rounded.
    CHECK(page.width() == 496);
    CHECK(page.height() == 702);
    CHECK(hasInk(page));
    CHECK(a4.pageCount(sheet::pageLayout(sheet::PageSize::Letter)) >= 1);
    CHECK(a4.documentTitle() == QStringLiteral("Teaching laser H1 hazard sheet"));
}
