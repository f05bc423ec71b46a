#pragma once
// The eyewear shelf as a table for the Eyewear panel: one row per item of the open lab, texts made when a row is
// drawn. A shelf of thousands of items kept as table-widget items cost tens of megabytes and seconds to build.
#include "beamwarden/model/records.hpp"

#include <QAbstractTableModel>

#include <vector>

namespace beamwarden::gui {

class EyewearShelfModel : public QAbstractTableModel {
    Q_OBJECT
public:
    enum class Column { Item, Markings, VisibleTransmittance, Count, Location, Columns };

    explicit EyewearShelfModel(QObject* parent = nullptr);

    // Shows `shelf` (the document's; it must outlive the next call), or nothing for null.
    void setShelf(const std::vector<model::EyewearItem>* shelf);

    [[nodiscard]] int rowCount(const QModelIndex& parent = {}) const override;
    [[nodiscard]] int columnCount(const QModelIndex& parent = {}) const override;
    [[nodiscard]] QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
    [[nodiscard]] QVariant headerData(int section, Qt::Orientation orientation,
                                      int role = Qt::DisplayRole) const override;

private:
    const std::vector<model::EyewearItem>* m_shelf = nullptr;
};

} // namespace beamwarden::gui
