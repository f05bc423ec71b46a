#pragma once
// The sheet's pages: the frame every page has (header, caution, footer) and the body blocks flowed between, in the
// sheet's own unit (sheettext.hpp). Built once per paper size; painting a page only replays it.
#include "sheetformat.hpp"
#include "sheetmodel.hpp"

#include <QPointF>
#include <QSizeF>

#include <functional>
#include <memory>
#include <vector>

class QPainter;

namespace beamwarden::sheet {

// A piece of the body that is never split across pages.
struct Block {
    double height = 0;         // including the space below it
    bool keepWithNext = false; // moves to the next page with the block that follows
    int header = -1;           // a table header (index into the layout's headers) repeated above it on a new page
    std::function<void(QPainter&, QPointF)> paint;
};

// A table header: drawn above the first rows of its table on every page, saying "continued" after the first.
struct RepeatedHeader {
    double height = 0;
    double continuedHeight = 0;
    std::function<void(QPainter&, QPointF, bool continued)> paint;
};

struct BodyBlocks {
    std::vector<Block> blocks;
    std::vector<RepeatedHeader> headers;
};

// The body of the sheet for a content width (sheetsections.cpp).
[[nodiscard]] BodyBlocks buildBody(const std::shared_ptr<const SheetModel>& model, const SheetFormat& format,
                                   double width);

class SheetLayout {
public:
    SheetLayout(std::shared_ptr<const SheetModel> model, const QString& language, QSizeF paperPoints);

    [[nodiscard]] int pageCount() const { return static_cast<int>(m_pages.size()); }
    [[nodiscard]] QSizeF paperUnits() const { return m_paper; }
    // Paints page `page` (0-based) with the painter already in sheet units, the paper's top-left at (0, 0).
    void paint(QPainter& painter, int page) const;

private:
    struct Placed {
        bool isHeader = false;
        int index = 0;
        double y = 0;
        bool continued = false;
    };

    [[nodiscard]] double bodyTop(int page) const;
    [[nodiscard]] double bodyBottom() const;
    void paginate();
    void paintFrame(QPainter& painter, int page) const;

    std::shared_ptr<const SheetModel> m_model;
    QSizeF m_paper;
    double m_left = 0;
    double m_top = 0;
    double m_width = 0;
    double m_firstHeader = 0;
    double m_runningHeader = 0;
    double m_caution = 0;
    double m_shortCaution = 0;
    double m_footer = 0;
    BodyBlocks m_body;
    std::vector<std::vector<Placed>> m_pages;
};

} // namespace beamwarden::sheet
