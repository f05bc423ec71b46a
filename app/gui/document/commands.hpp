#pragma once
// Undoable edits of the open lab. A command that the lab file refuses is marked obsolete, so the undo stack never
// holds a step that did not happen.
#include "beamwarden/model/records.hpp"

#include <QUndoCommand>

namespace beamwarden::gui {

class LabDocument;

class EditLaserCommand : public QUndoCommand {
public:
    EditLaserCommand(LabDocument* document, int index, model::Laser before, model::Laser after,
                     const QString& description, int mergeKey);
    void redo() override;
    void undo() override;
    [[nodiscard]] int id() const override { return m_mergeKey; }
    bool mergeWith(const QUndoCommand* other) override;

private:
    LabDocument* m_document;
    int m_index;
    model::Laser m_before;
    model::Laser m_after;
    int m_mergeKey;
};

class InsertLaserCommand : public QUndoCommand {
public:
    InsertLaserCommand(LabDocument* document, int index, model::Laser laser);
    void redo() override;
    void undo() override;

private:
    LabDocument* m_document;
    int m_index;
    model::Laser m_laser;
};

class RemoveLaserCommand : public QUndoCommand {
public:
    RemoveLaserCommand(LabDocument* document, int index, model::Laser laser);
    void redo() override;
    void undo() override;

private:
    LabDocument* m_document;
    int m_index;
    model::Laser m_laser;
};

class EditEyewearCommand : public QUndoCommand {
public:
    EditEyewearCommand(LabDocument* document, int index, model::EyewearItem before, model::EyewearItem after,
                       const QString& description, int mergeKey);
    void redo() override;
    void undo() override;
    [[nodiscard]] int id() const override { return m_mergeKey; }
    bool mergeWith(const QUndoCommand* other) override;

private:
    LabDocument* m_document;
    int m_index;
    model::EyewearItem m_before;
    model::EyewearItem m_after;
    int m_mergeKey;
};

class InsertEyewearCommand : public QUndoCommand {
public:
    InsertEyewearCommand(LabDocument* document, int index, model::EyewearItem item);
    void redo() override;
    void undo() override;

private:
    LabDocument* m_document;
    int m_index;
    model::EyewearItem m_item;
};

class RemoveEyewearCommand : public QUndoCommand {
public:
    RemoveEyewearCommand(LabDocument* document, int index, model::EyewearItem item);
    void redo() override;
    void undo() override;

private:
    LabDocument* m_document;
    int m_index;
    model::EyewearItem m_item;
};

} // namespace beamwarden::gui
