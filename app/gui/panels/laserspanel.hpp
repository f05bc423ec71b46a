#pragma once
// The Lasers panel: the lab's lasers, and the editors of the selected laser, its outputs and exposure cases. Every
// confirmed edit becomes one undoable command on the document; the assessment follows at once.
#include <QWidget>

class QComboBox;
class QLineEdit;
class QListWidget;
class QPlainTextEdit;
class QPushButton;

namespace beamwarden::gui {

class CaseEditor;
class LabDocument;
class OutputEditor;

class LasersPanel : public QWidget {
    Q_OBJECT
public:
    explicit LasersPanel(QWidget* parent = nullptr);
    void setDocument(LabDocument* document);
    [[nodiscard]] int currentLaser() const;
    void setCurrentLaser(int index);
    [[nodiscard]] int currentOutput() const;

Q_SIGNALS:
    void currentLaserChanged(int index);
    void currentOutputChanged(int index);

private:
    void reloadList();
    void showLaser();
    void showOutput();
    void editLaserField(const QString& what, int mergeKey);

    LabDocument* m_document = nullptr;
    bool m_loading = false;
    QListWidget* m_lasers = nullptr;
    QPushButton* m_addLaser = nullptr;
    QPushButton* m_removeLaser = nullptr;
    QLineEdit* m_name = nullptr;
    QLineEdit* m_makerModel = nullptr;
    QLineEdit* m_serial = nullptr;
    QComboBox* m_room = nullptr;
    QComboBox* m_class = nullptr;
    QPlainTextEdit* m_notes = nullptr;
    QListWidget* m_outputs = nullptr;
    QPushButton* m_addOutput = nullptr;
    QPushButton* m_removeOutput = nullptr;
    OutputEditor* m_outputEditor = nullptr;
    CaseEditor* m_caseEditor = nullptr;
    QWidget* m_editorArea = nullptr;
};

} // namespace beamwarden::gui
