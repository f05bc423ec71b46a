// The editors mark a value outside the range the record allows in its own field, as soon as it is confirmed, and
// pass nothing on (issue 10: "the GUI marks the field; nothing is written"). The ranges are the model's
// (core/include/beamwarden/model/ranges.hpp); the bad-input corpus checks the same refusals on the command line.
#include "panels/caseeditor.hpp"
#include "panels/outputeditor.hpp"
#include "widgets/quantityfield.hpp"

#include <catch2/catch.hpp>

#include <QLineEdit>
#include <QSignalSpy>
#include <QTest>

using namespace beamwarden;
using gui::QuantityField;

namespace {

// The field whose placeholder contains `hint` (the editors' English placeholders name what each field takes).
QuantityField* fieldWithPlaceholder(QWidget& editor, const QString& hint)
{
    for (auto* field : editor.findChildren<QuantityField*>()) {
        if (field->lineEdit()->placeholderText().contains(hint))
            return field;
    }
    return nullptr;
}

void type(QuantityField* field, const QString& text)
{
    field->lineEdit()->selectAll();
    QTest::keyClicks(field->lineEdit(), text);
    QTest::keyClick(field->lineEdit(), Qt::Key_Return);
}

// Pulsed, so that every emission field is enabled: 1 mJ at 10 Hz (10 mW mean), 10 ns pulses.
model::Output pulsedOutput()
{
    model::Output output;
    output.name = "beam";
    output.emission.spectrum = model::singleLine(units::Wavelength::fromSi(1064e-9));
    output.emission.pulsed = true;
    output.emission.averagePower = units::Power::fromSi(10e-3);
    output.emission.pulseEnergy = units::Energy::fromSi(1e-3);
    output.emission.pulseDuration = units::Duration::fromSi(10e-9);
    output.emission.prf = units::Frequency::fromSi(10.0);
    output.beam.diameter = units::Length::fromSi(1e-3);
    output.beam.divergence = units::Angle::fromSi(1e-3);
    return output;
}

} // namespace

TEST_CASE("Output editor: a value outside the record's range is marked in its field and not passed on",
          "[gui][edit][bad]")
{
    gui::OutputEditor editor;
    editor.setOutput(pulsedOutput());
    editor.show();
    QSignalSpy edits(&editor, &gui::OutputEditor::outputEdited);

    QuantityField* power = fieldWithPlaceholder(editor, QStringLiteral("mean power"));
    QuantityField* energy = fieldWithPlaceholder(editor, QStringLiteral("per pulse"));
    QuantityField* wavelength = fieldWithPlaceholder(editor, QStringLiteral("800 nm"));
    QuantityField* diameter = fieldWithPlaceholder(editor, QStringLiteral("at the exit"));
    QuantityField* prf = fieldWithPlaceholder(editor, QStringLiteral("1 kHz"));
    REQUIRE(power != nullptr);
    REQUIRE(energy != nullptr);
    REQUIRE(wavelength != nullptr);
    REQUIRE(diameter != nullptr);
    REQUIRE(prf != nullptr);

    struct Bad {
        QuantityField* field;
        QString typed;
        QString allowed; // the range text of model::allowedRange()
    };
    const Bad cases[] = {
        {power, QStringLiteral("1e300 W"), QStringLiteral("at most 1 GW")},          // ranges.hpp: 1 GW
        {power, QStringLiteral("0 W"), QStringLiteral("a power above 0 W")},         // ranges.hpp: above 0
        {energy, QStringLiteral("1e300 J"), QStringLiteral("at most 1e8 J")},        // ranges.hpp: 100 MJ
        {wavelength, QStringLiteral("1.0001 mm"), QStringLiteral("180 nm to 1 mm")}, // the rule sets' span
        {diameter, QStringLiteral("0 mm"), QStringLiteral("more than 0 m")},         // ranges.hpp: above 0
        {prf, QStringLiteral("1e300 Hz"), QStringLiteral("at most 10 THz")},         // ranges.hpp: 10 THz
    };
    for (const Bad& bad : cases) {
        INFO(bad.typed.toStdString());
        REQUIRE(bad.field->isEnabled()); // typing into a disabled field would prove nothing
        type(bad.field, bad.typed);
        CHECK_FALSE(bad.field->isValid());
        INFO(bad.field->errorText().toStdString());
        // quoted as typed, every digit kept, and the range said
        CHECK(bad.field->errorText().contains(QStringLiteral("'") + bad.typed + QStringLiteral("' is not accepted")));
        CHECK(bad.field->errorText().contains(bad.allowed));
    }
    CHECK(edits.count() == 0);
    CHECK(editor.output().emission.averagePower.si() == 10e-3); // the record as set, exactly
    CHECK(editor.output().emission.pulseEnergy.si() == 1e-3);

    // A value inside the range goes through, so the marks above come from the range and not from the typing.
    type(power, QStringLiteral("40 mW"));
    CHECK(power->isValid());
    CHECK(edits.count() == 1);
    CHECK(editor.output().emission.averagePower.si() == Approx(40e-3).epsilon(1e-15)); // 40 mW as typed
}

TEST_CASE("Case editor: an exposure beyond the tables' end is marked in its field and not passed on",
          "[gui][edit][bad]")
{
    gui::CaseEditor editor;
    editor.setCases({model::NamedExposureCase{0, "intrabeam", {}}});
    editor.show();
    QSignalSpy edits(&editor, &gui::CaseEditor::casesEdited);
    QuantityField* exposure = fieldWithPlaceholder(editor, QStringLiteral("default: 100 s"));
    REQUIRE(exposure != nullptr);

    type(exposure, QStringLiteral("30001 s")); // IEC 60825-1 tables end at 3e4 s
    CHECK_FALSE(exposure->isValid());
    CHECK(exposure->errorText().contains(QStringLiteral("'30001 s' is not accepted")));
    CHECK(exposure->errorText().contains(QStringLiteral("at most 30000 s")));
    CHECK(edits.count() == 0);

    type(exposure, QStringLiteral("30000 s")); // the tables' last duration itself is allowed
    CHECK(exposure->isValid());
    CHECK(edits.count() == 1);
}
