#include "models/verdictlistmodel.hpp"

namespace beamwarden::gui {

// An index's internal id is 0 for an item and 1 + the item's row for one of its reasons.

VerdictListModel::VerdictListModel(QStringList header, int colouredColumn, QObject* parent)
    : QAbstractItemModel(parent), m_header(std::move(header)), m_colouredColumn(colouredColumn)
{
}

void VerdictListModel::setRows(std::vector<Row> rows)
{
    beginResetModel();
    m_rows = std::move(rows);
    endResetModel();
}

QModelIndex VerdictListModel::index(int row, int column, const QModelIndex& parent) const
{
    if (row < 0 || column < 0 || column >= columnCount())
        return {};
    if (!parent.isValid())
        return static_cast<std::size_t>(row) < m_rows.size() ? createIndex(row, column, quintptr(0)) : QModelIndex();
    if (isReason(parent) || static_cast<std::size_t>(parent.row()) >= m_rows.size() ||
        row >= m_rows[static_cast<std::size_t>(parent.row())].reasons.size())
        return {};
    return createIndex(row, column, static_cast<quintptr>(parent.row()) + 1);
}

QModelIndex VerdictListModel::parent(const QModelIndex& child) const
{
    if (!isReason(child))
        return {};
    return createIndex(static_cast<int>(child.internalId() - 1), 0, quintptr(0));
}

int VerdictListModel::rowCount(const QModelIndex& parent) const
{
    if (!parent.isValid())
        return static_cast<int>(m_rows.size());
    if (isReason(parent) || parent.column() != 0 || static_cast<std::size_t>(parent.row()) >= m_rows.size())
        return 0;
    return static_cast<int>(m_rows[static_cast<std::size_t>(parent.row())].reasons.size());
}

int VerdictListModel::columnCount(const QModelIndex& /*parent*/) const
{
    return static_cast<int>(m_header.size());
}

QVariant VerdictListModel::data(const QModelIndex& index, int role) const
{
    if (!index.isValid())
        return {};
    if (isReason(index)) {
        const Row& item = m_rows[static_cast<std::size_t>(index.internalId() - 1)];
        if (role == Qt::DisplayRole && index.column() == 0)
            return item.reasons.at(index.row());
        return {};
    }
    const Row& item = m_rows[static_cast<std::size_t>(index.row())];
    if (role == Qt::DisplayRole && index.column() < item.columns.size())
        return item.columns.at(index.column());
    if (role == Qt::ForegroundRole && index.column() == m_colouredColumn && item.colour.isValid())
        return item.colour;
    return {};
}

QVariant VerdictListModel::headerData(int section, Qt::Orientation orientation, int role) const
{
    if (role != Qt::DisplayRole || orientation != Qt::Horizontal || section < 0 || section >= m_header.size())
        return {};
    return m_header.at(section);
}

} // namespace beamwarden::gui
