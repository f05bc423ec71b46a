#include "widgets/quantityfield.hpp"

#include "beamwarden/units.hpp"
#include "widgets/palette.hpp"

#include <QHBoxLayout>
#include <QLabel>
#include <QLineEdit>
#include <QLocale>

#include <cmath>

namespace beamwarden::gui {

namespace {

QString fromStd(const std::string& s)
{
    return QString::fromStdString(s);
}

template <typename Q>
QuantityField* makeField(Result<Q> (*parse)(std::string_view, std::string_view), std::string_view field,
                         QWidget* parent)
{
    const std::string name{field};
    return new QuantityField(
        [parse, name](const QString& text) -> Result<double> {
            const std::string utf8 = text.toStdString();
            auto q = parse(utf8, name);
            if (!q)
                return std::unexpected(q.error());
            return q->si();
        },
        [](double si) { return fromStd(units::format(Q::fromSi(si))); }, parent);
}

} // namespace

QuantityField::QuantityField(Parser parse, Formatter format, QWidget* parent)
    : QWidget(parent), m_parse(std::move(parse)), m_format(std::move(format))
{
    m_edit = new QLineEdit(this);
    m_echo = new QLabel(this);
    m_echo->setMinimumWidth(90);
    m_echo->setStyleSheet(QStringLiteral("color: #5a6472;"));
    auto* layout = new QHBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(m_edit, 1);
    layout->addWidget(m_echo);
    setFocusProxy(m_edit);
    connect(m_edit, &QLineEdit::textEdited, this, &QuantityField::reparse);
    connect(m_edit, &QLineEdit::editingFinished, this, &QuantityField::commit);
}

void QuantityField::setValue(std::optional<double> si)
{
    m_value = si;
    m_valid = true;
    m_error.clear();
    m_edit->setText(si ? m_format(*si) : QString());
    m_edit->setStyleSheet(QString());
    m_edit->setToolTip(QString());
    m_echo->setText(QString());
}

QString QuantityField::errorText() const
{
    return m_error;
}

void QuantityField::setPlaceholder(const QString& text)
{
    m_edit->setPlaceholderText(text);
}

void QuantityField::reparse()
{
    const QString text = m_edit->text().trimmed();
    if (text.isEmpty()) {
        m_valid = m_optional;
        m_error = m_optional ? QString() : tr("a value is needed here");
    } else {
        auto parsed = m_parse(text);
        if (parsed && m_rangeCheck) {
            if (auto inRange = m_rangeCheck(*parsed); !inRange) {
                InputError error = inRange.error();
                error.value = text.toStdString(); // quoted as typed, as a parse error is
                parsed = std::unexpected(error);
            }
        }
        m_valid = parsed.has_value();
        m_error = m_valid ? QString() : fromStd(parsed.error().message());
        if (m_valid)
            m_echo->setText(QStringLiteral("= ") + m_format(*parsed));
    }
    if (m_valid) {
        m_edit->setStyleSheet(QString());
        m_edit->setToolTip(QString());
        if (text.isEmpty())
            m_echo->setText(QString());
    } else {
        // Marked in words as well as colour: the echo label says what is wrong.
        m_edit->setStyleSheet(QStringLiteral("border: 2px solid %1;").arg(palette::kVermillion.name()));
        m_edit->setToolTip(m_error);
        m_echo->setText(tr("not accepted"));
    }
}

void QuantityField::commit()
{
    reparse();
    if (!m_valid)
        return; // the stored value stays; the field keeps the user's text and the mark
    const QString text = m_edit->text().trimmed();
    std::optional<double> next;
    if (!text.isEmpty())
        next = *m_parse(text);
    const bool same =
        next.has_value() == m_value.has_value() && (!next || std::abs(*next - *m_value) <= 1e-12 * std::abs(*m_value));
    if (same)
        return;
    m_value = next;
    Q_EMIT valueCommitted(next);
}

QuantityField* wavelengthField(QWidget* parent)
{
    return makeField<units::Wavelength>(units::parseWavelength, "wavelength", parent);
}
QuantityField* durationField(QWidget* parent)
{
    return makeField<units::Duration>(units::parseDuration, "duration", parent);
}
QuantityField* energyField(QWidget* parent)
{
    return makeField<units::Energy>(units::parseEnergy, "energy", parent);
}
QuantityField* powerField(QWidget* parent)
{
    return makeField<units::Power>(units::parsePower, "power", parent);
}
QuantityField* frequencyField(QWidget* parent)
{
    return makeField<units::Frequency>(units::parseFrequency, "frequency", parent);
}
QuantityField* lengthField(QWidget* parent)
{
    return makeField<units::Length>(units::parseLength, "length", parent);
}
QuantityField* angleField(QWidget* parent)
{
    return makeField<units::Angle>(units::parseAngle, "angle", parent);
}

void checkAs(QuantityField* field, model::Quantity quantity, std::string_view name)
{
    field->setRangeCheck(
        [quantity, label = std::string(name)](double si) { return model::checkRange(quantity, si, label); });
}

QuantityField* numberField(double lo, double hi, QWidget* parent)
{
    return new QuantityField(
        [lo, hi](const QString& text) -> Result<double> {
            bool ok = false;
            const double v = QLocale::c().toDouble(text, &ok);
            if (!ok || !std::isfinite(v) || v < lo || v > hi)
                return fail("value", text.toStdString(),
                            "a number from " + std::to_string(lo).substr(0, 4) + " to " + std::to_string(hi));
            return v;
        },
        [](double v) { return QString::number(v, 'g', 6); }, parent);
}

} // namespace beamwarden::gui
