#pragma once
// Items with a verdict each and the reasons under each item, as a two-level tree for a QTreeView: the Assessment
// panel's list of every shelf item against the laser. Plain texts, filled by the panel; a shelf of thousands kept
// as tree-widget items cost tens of megabytes and seconds on every recompute.
#include <QAbstractItemModel>
#include <QColor>
#include <QStringList>

#include <vector>

namespace beamwarden::gui {

class VerdictListModel : public QAbstractItemModel {
    Q_OBJECT
public:
    struct Row {
        QStringList columns; // as many as the header has; the verdict's column is drawn in `colour`
        QColor colour;
        QStringList reasons; // one child row each, its text across all columns
    };

    VerdictListModel(QStringList header, int colouredColumn, QObject* parent = nullptr);

    void setRows(std::vector<Row> rows);
    void clear() { setRows({}); }
    [[nodiscard]] bool isReason(const QModelIndex& index) const { return index.isValid() && index.internalId() != 0; }

    [[nodiscard]] QModelIndex index(int row, int column, const QModelIndex& parent = {}) const override;
    [[nodiscard]] QModelIndex parent(const QModelIndex& child) const override;
    [[nodiscard]] int rowCount(const QModelIndex& parent = {}) const override;
    [[nodiscard]] int columnCount(const QModelIndex& parent = {}) const override;
    [[nodiscard]] QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
    [[nodiscard]] QVariant headerData(int section, Qt::Orientation orientation,
                                      int role = Qt::DisplayRole) const override;

private:
    QStringList m_header;
    int m_colouredColumn;
    std::vector<Row> m_rows;
};

} // namespace beamwarden::gui
