#pragma once
// The exposure cases of one output: a list and the editor of the selected case (viewing, duration basis, closest
// approach and the case's own geometry). Fields that do not apply to the chosen viewing are hidden.
#include "beamwarden/model/records.hpp"

#include <QWidget>

class QComboBox;
class QFormLayout;
class QLineEdit;
class QListWidget;
class QPushButton;

namespace beamwarden::gui {

class QuantityField;

class CaseEditor : public QWidget {
    Q_OBJECT
public:
    explicit CaseEditor(QWidget* parent = nullptr);
    void setCases(const std::vector<model::NamedExposureCase>& cases); // no signal

Q_SIGNALS:
    void casesEdited(const std::vector<model::NamedExposureCase>& cases, const QString& field, int mergeKey);

private:
    void showCase(int row);
    void edited(const QString& field, int mergeKey);
    void updateVisibility();
    [[nodiscard]] model::NamedExposureCase* current();

    std::vector<model::NamedExposureCase> m_cases;
    bool m_loading = false;
    QListWidget* m_list = nullptr;
    QPushButton* m_add = nullptr;
    QPushButton* m_remove = nullptr;
    QFormLayout* m_form = nullptr;
    QLineEdit* m_name = nullptr;
    QComboBox* m_viewing = nullptr;
    QuantityField* m_exposure = nullptr;
    QuantityField* m_distance = nullptr;
    QuantityField* m_focal = nullptr;
    QuantityField* m_na = nullptr;
    QuantityField* m_reflectance = nullptr;
    QuantityField* m_angle = nullptr;
    QuantityField* m_magnification = nullptr;
    QuantityField* m_objective = nullptr;
    QuantityField* m_transmission = nullptr;
};

} // namespace beamwarden::gui
