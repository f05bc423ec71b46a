#pragma once
// A text field that takes a quantity with its unit ("35 fs", "4 mJ", "1 kHz"), shows what it understood beside it,
// and marks a bad entry with the reason in place (no dialog): typing never loses what is stored.
#include "beamwarden/error.hpp"
#include "beamwarden/model/ranges.hpp"

#include <QWidget>

#include <functional>
#include <optional>
#include <string_view>
#include <utility>

class QLabel;
class QLineEdit;

namespace beamwarden::gui {

class QuantityField : public QWidget {
    Q_OBJECT
public:
    // parse: text -> SI value, or an error naming what is expected. format: SI value -> canonical text.
    using Parser = std::function<Result<double>(const QString&)>;
    using Formatter = std::function<QString(double)>;
    // The range a record allows for the value (model::checkRange), so the field is marked as soon as it is typed
    // rather than only when the lab file refuses the record.
    using RangeCheck = std::function<Result<void>(double)>;

    QuantityField(Parser parse, Formatter format, QWidget* parent = nullptr);

    // Shows a stored value (no signal). std::nullopt shows an empty field.
    void setValue(std::optional<double> si);
    [[nodiscard]] std::optional<double> value() const { return m_value; }
    [[nodiscard]] bool isValid() const { return m_valid; }
    [[nodiscard]] QString errorText() const;
    [[nodiscard]] QLineEdit* lineEdit() const { return m_edit; }
    void setPlaceholder(const QString& text);
    void setOptional(bool optional) { m_optional = optional; }
    void setRangeCheck(RangeCheck check) { m_rangeCheck = std::move(check); }

Q_SIGNALS:
    // A valid value was entered and confirmed (Enter or leaving the field). std::nullopt: the field was cleared.
    void valueCommitted(std::optional<double> si);

private:
    void reparse();
    void commit();

    Parser m_parse;
    Formatter m_format;
    RangeCheck m_rangeCheck;
    QLineEdit* m_edit = nullptr;
    QLabel* m_echo = nullptr;
    std::optional<double> m_value;
    bool m_valid = true;
    bool m_optional = false;
    QString m_error;
};

// Ready-made fields for the quantities the editors use.
[[nodiscard]] QuantityField* wavelengthField(QWidget* parent);
[[nodiscard]] QuantityField* durationField(QWidget* parent);
[[nodiscard]] QuantityField* energyField(QWidget* parent);
[[nodiscard]] QuantityField* powerField(QWidget* parent);
[[nodiscard]] QuantityField* frequencyField(QWidget* parent);
[[nodiscard]] QuantityField* lengthField(QWidget* parent);
[[nodiscard]] QuantityField* angleField(QWidget* parent);
// A plain number in [lo, hi] (reflectance, numerical aperture, magnification).
[[nodiscard]] QuantityField* numberField(double lo, double hi, QWidget* parent);
// Marks `field` when its value lies outside the range the record allows for `quantity`; `name` starts the message.
void checkAs(QuantityField* field, model::Quantity quantity, std::string_view name);

} // namespace beamwarden::gui
