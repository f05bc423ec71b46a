#include "document/commands.hpp"

#include "document/labdocument.hpp"

#include <QCoreApplication>

namespace beamwarden::gui {

EditLaserCommand::EditLaserCommand(LabDocument* document, int index, model::Laser before, model::Laser after,
                                   const QString& description, int mergeKey)
    : QUndoCommand(description), m_document(document), m_index(index), m_before(std::move(before)),
      m_after(std::move(after)), m_mergeKey(mergeKey)
{
}

void EditLaserCommand::redo()
{
    setObsolete(!m_document->applyLaser(m_index, m_after));
}

void EditLaserCommand::undo()
{
    m_document->applyLaser(m_index, m_before);
}

bool EditLaserCommand::mergeWith(const QUndoCommand* other)
{
    const auto* next = dynamic_cast<const EditLaserCommand*>(other);
    if (next == nullptr || next->m_index != m_index || m_mergeKey < 0)
        return false;
    m_after = next->m_after;
    return true;
}

InsertLaserCommand::InsertLaserCommand(LabDocument* document, int index, model::Laser laser)
    : QUndoCommand(QCoreApplication::translate("Commands", "Add laser %1").arg(QString::fromStdString(laser.name))),
      m_document(document), m_index(index), m_laser(std::move(laser))
{
}

void InsertLaserCommand::redo()
{
    setObsolete(!m_document->insertLaserAt(m_index, m_laser));
    if (!isObsolete())
        m_laser = m_document->lasers()[static_cast<std::size_t>(m_index)]; // keep the id the store gave it
}

void InsertLaserCommand::undo()
{
    m_document->removeLaserAt(m_index);
    m_laser.id = 0;
}

RemoveLaserCommand::RemoveLaserCommand(LabDocument* document, int index, model::Laser laser)
    : QUndoCommand(QCoreApplication::translate("Commands", "Remove laser %1").arg(QString::fromStdString(laser.name))),
      m_document(document), m_index(index), m_laser(std::move(laser))
{
}

void RemoveLaserCommand::redo()
{
    setObsolete(!m_document->removeLaserAt(m_index));
}

void RemoveLaserCommand::undo()
{
    model::Laser again = m_laser;
    again.id = 0;
    for (model::Output& o : again.outputs) {
        o.id = 0;
        for (model::NamedExposureCase& c : o.exposureCases)
            c.id = 0;
    }
    m_document->insertLaserAt(m_index, again);
}

EditEyewearCommand::EditEyewearCommand(LabDocument* document, int index, model::EyewearItem before,
                                       model::EyewearItem after, const QString& description, int mergeKey)
    : QUndoCommand(description), m_document(document), m_index(index), m_before(std::move(before)),
      m_after(std::move(after)), m_mergeKey(mergeKey)
{
}

void EditEyewearCommand::redo()
{
    setObsolete(!m_document->applyEyewear(m_index, m_after));
}

void EditEyewearCommand::undo()
{
    m_document->applyEyewear(m_index, m_before);
}

bool EditEyewearCommand::mergeWith(const QUndoCommand* other)
{
    const auto* next = dynamic_cast<const EditEyewearCommand*>(other);
    if (next == nullptr || next->m_index != m_index || m_mergeKey < 0)
        return false;
    m_after = next->m_after;
    return true;
}

InsertEyewearCommand::InsertEyewearCommand(LabDocument* document, int index, model::EyewearItem item)
    : QUndoCommand(QCoreApplication::translate("Commands", "Add eyewear %1").arg(QString::fromStdString(item.name))),
      m_document(document), m_index(index), m_item(std::move(item))
{
}

void InsertEyewearCommand::redo()
{
    setObsolete(!m_document->insertEyewearAt(m_index, m_item));
}

void InsertEyewearCommand::undo()
{
    m_document->removeEyewearAt(m_index);
}

RemoveEyewearCommand::RemoveEyewearCommand(LabDocument* document, int index, model::EyewearItem item)
    : QUndoCommand(QCoreApplication::translate("Commands", "Remove eyewear %1").arg(QString::fromStdString(item.name))),
      m_document(document), m_index(index), m_item(std::move(item))
{
}

void RemoveEyewearCommand::redo()
{
    setObsolete(!m_document->removeEyewearAt(m_index));
}

void RemoveEyewearCommand::undo()
{
    model::EyewearItem again = m_item;
    again.id = 0;
    m_document->insertEyewearAt(m_index, again);
}

} // namespace beamwarden::gui
