#pragma once
// Editor of one output: its name, emission (line or Gaussian band, CW or pulsed, bursts) and beam. Each confirmed
// field emits the whole updated output; a field that does not parse is marked and emits nothing.
#include "beamwarden/model/records.hpp"

#include <QWidget>

class QButtonGroup;
class QComboBox;
class QLabel;
class QLineEdit;
class QRadioButton;
class QSpinBox;

namespace beamwarden::gui {

class QuantityField;

class OutputEditor : public QWidget {
    Q_OBJECT
public:
    explicit OutputEditor(QWidget* parent = nullptr);

    void setOutput(const model::Output& output); // shows it (no signal)
    [[nodiscard]] const model::Output& output() const { return m_output; }

Q_SIGNALS:
    // `field` names what changed, for the undo text and to merge successive edits of one field.
    void outputEdited(const model::Output& output, const QString& field, int mergeKey);

private:
    void emitEdit(const QString& field, int mergeKey);
    void updatePulsedVisibility();

    model::Output m_output;
    bool m_loading = false;
    QLineEdit* m_name = nullptr;
    QuantityField* m_wavelength = nullptr;
    QuantityField* m_bandwidth = nullptr;
    QRadioButton* m_cw = nullptr;
    QRadioButton* m_pulsed = nullptr;
    QuantityField* m_power = nullptr;
    QuantityField* m_energy = nullptr;
    QuantityField* m_pulseDuration = nullptr;
    QuantityField* m_prf = nullptr;
    QSpinBox* m_burstCount = nullptr;
    QuantityField* m_burstRate = nullptr;
    QuantityField* m_diameter = nullptr;
    QComboBox* m_definition = nullptr;
    QuantityField* m_divergence = nullptr;
    QComboBox* m_profile = nullptr;
    QList<QWidget*> m_pulsedRows;
};

} // namespace beamwarden::gui
