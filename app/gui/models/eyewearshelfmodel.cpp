#include "models/eyewearshelfmodel.hpp"

#include <QStringList>

namespace beamwarden::gui {

namespace {

QString q(const std::string& s)
{
    return QString::fromStdString(s);
}

QString markingsText(const model::EyewearItem& item)
{
    QStringList all;
    for (const std::string& m : item.en207Markings)
        all << q(m);
    for (const std::string& m : item.en208Markings)
        all << q(m);
    return all.join(QStringLiteral("; "));
}

} // namespace

EyewearShelfModel::EyewearShelfModel(QObject* parent) : QAbstractTableModel(parent) {}

void EyewearShelfModel::setShelf(const std::vector<model::EyewearItem>* shelf)
{
    beginResetModel();
    m_shelf = shelf;
    endResetModel();
}

int EyewearShelfModel::rowCount(const QModelIndex& parent) const
{
    return parent.isValid() || m_shelf == nullptr ? 0 : static_cast<int>(m_shelf->size());
}

int EyewearShelfModel::columnCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : static_cast<int>(Column::Columns);
}

QVariant EyewearShelfModel::data(const QModelIndex& index, int role) const
{
    if (role != Qt::DisplayRole || !index.isValid() || m_shelf == nullptr ||
        static_cast<std::size_t>(index.row()) >= m_shelf->size())
        return {};
    const model::EyewearItem& item = (*m_shelf)[static_cast<std::size_t>(index.row())];
    switch (static_cast<Column>(index.column())) {
    case Column::Item:
        return q(item.name);
    case Column::Markings:
        return markingsText(item);
    case Column::VisibleTransmittance:
        return item.visibleTransmittance > 0 ? QStringLiteral("%1 %").arg(item.visibleTransmittance * 100, 0, 'f', 0)
                                             : tr("not known");
    case Column::Count:
        return QString::number(item.count);
    case Column::Location:
        return q(item.location);
    case Column::Columns:
        break;
    }
    return {};
}

QVariant EyewearShelfModel::headerData(int section, Qt::Orientation orientation, int role) const
{
    if (role != Qt::DisplayRole || orientation != Qt::Horizontal)
        return {};
    switch (static_cast<Column>(section)) {
    case Column::Item:
        return tr("Item");
    case Column::Markings:
        return tr("EN 207 / EN 208 markings");
    case Column::VisibleTransmittance:
        return tr("Visible transmittance");
    case Column::Count:
        return tr("Count");
    case Column::Location:
        return tr("Location");
    case Column::Columns:
        break;
    }
    return {};
}

} // namespace beamwarden::gui
