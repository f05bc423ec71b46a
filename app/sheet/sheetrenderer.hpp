#pragma once
// The hazard sheet renderer: one painting path for the GUI preview (QImage), printing (QPrinter) and PDF export
// (QPdfWriter), so what the screen shows is what the door gets.
#include "beamwarden/error.hpp"
#include "sheetcontent.hpp"

#include <QImage>
#include <QPageLayout>
#include <QRectF>
#include <QSizeF>
#include <QString>

#include <map>
#include <memory>
#include <utility>

class QPagedPaintDevice;
class QPainter;

namespace beamwarden::sheet {

class SheetLayout;
struct SheetModel;

class SheetRenderer {
public:
    explicit SheetRenderer(SheetContent content);
    ~SheetRenderer();
    SheetRenderer(SheetRenderer&&) noexcept;
    SheetRenderer& operator=(SheetRenderer&&) noexcept;
    SheetRenderer(const SheetRenderer&) = delete;
    SheetRenderer& operator=(const SheetRenderer&) = delete;

    [[nodiscard]] const SheetContent& content() const { return m_content; }
    // "<laser> hazard sheet" (translated): the PDF title and a print job's name.
    [[nodiscard]] QString documentTitle() const;

    // Pages on the content's paper, or on the paper of `layout` (its full page; margins are the sheet's own).
    [[nodiscard]] int pageCount() const;
    [[nodiscard]] int pageCount(const QPageLayout& layout) const;

    // Paints page `page` (0-based) of the content's paper into `pageRect` (device coordinates of the whole
    // paper), scaled to fit and centred; the paper's own shape is kept.
    void paintPage(QPainter& painter, int page, const QRectF& pageRect) const;
    // The same on the paper of `layout`.
    void paintPage(QPainter& painter, int page, const QRectF& pageRect, const QPageLayout& layout) const;

    // Every page onto a PDF writer or printer (newPage() between pages), on the device's paper; returns pages.
    int paintDocument(QPagedPaintDevice& device, QPainter& painter) const;

    // Page `page` as an image of the whole paper at `dpi` (white background), for previews.
    [[nodiscard]] QImage renderPage(int page, double dpi = 96.0) const;

private:
    [[nodiscard]] const SheetLayout& layoutFor(QSizeF paperPoints) const;

    SheetContent m_content;
    std::shared_ptr<const SheetModel> m_model;
    mutable std::map<std::pair<long long, long long>, std::unique_ptr<SheetLayout>> m_layouts;
};

// Writes the sheet as a PDF at `path` on `pageSize` paper, with title and creator set; returns the pages written.
// Refuses (field "path") a file that cannot be written; an existing file is replaced only when all went well.
[[nodiscard]] Result<int> writePdf(const SheetContent& content, const QString& path, PageSize pageSize);

// One page as an image, for previews.
[[nodiscard]] QImage renderPage(const SheetContent& content, int page, double dpi = 96.0);

} // namespace beamwarden::sheet
