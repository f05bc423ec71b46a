#pragma once
// The Eyewear panel: the shelf, the editor of the selected item (spectral OD table and markings, validated as they
// are typed), and a check of the selected item against the selected laser.
#include "beamwarden/assessment/assessment.hpp"

#include <QWidget>

#include <optional>

class QLabel;
class QLineEdit;
class QPlainTextEdit;
class QPushButton;
class QSpinBox;
class QTableView;
class QTreeWidget;

namespace beamwarden::gui {

class EyewearShelfModel;
class LabDocument;
class QuantityField;

class EyewearPanel : public QWidget {
    Q_OBJECT
public:
    explicit EyewearPanel(QWidget* parent = nullptr);
    void setDocument(LabDocument* document);
    // The current laser's assessment (its eyewear checks are shown for the selected item), or null; the caller's,
    // kept alive until the next call (a copy of a large shelf's checks would cost tens of megabytes).
    void setAssessment(const assessment::LaserAssessment* assessment);
    [[nodiscard]] int currentItem() const;

private:
    void reload();
    void showItem();
    void showCheck();
    void commitText(); // markings and OD table: validated, stored only when they parse

    LabDocument* m_document = nullptr;
    const assessment::LaserAssessment* m_assessment = nullptr;
    bool m_loading = false;
    EyewearShelfModel* m_shelfModel = nullptr;
    QTableView* m_shelf = nullptr;
    QPushButton* m_add = nullptr;
    QPushButton* m_remove = nullptr;
    QLineEdit* m_name = nullptr;
    QLineEdit* m_description = nullptr;
    QPlainTextEdit* m_en207 = nullptr;
    QPlainTextEdit* m_en208 = nullptr;
    QPlainTextEdit* m_odTable = nullptr;
    QLabel* m_textErrors = nullptr;
    QuantityField* m_transmittance = nullptr;
    QSpinBox* m_count = nullptr;
    QLineEdit* m_location = nullptr;
    QLineEdit* m_inspection = nullptr;
    QLabel* m_checkTitle = nullptr;
    QTreeWidget* m_check = nullptr;
    QWidget* m_editor = nullptr;
};

} // namespace beamwarden::gui
