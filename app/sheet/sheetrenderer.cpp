#include "sheetrenderer.hpp"

#include "sheetlayout.hpp"
#include "sheetmodel.hpp"
#include "sheettext.hpp"

#include <QPageSize>
#include <QPagedPaintDevice>
#include <QPainter>
#include <QPdfWriter>
#include <QSaveFile>

#include <cmath>

namespace beamwarden::sheet {

namespace {

QSizeF paperPoints(PageSize size)
{
    return pageLayout(size).fullRect(QPageLayout::Point).size();
}

} // namespace

SheetRenderer::SheetRenderer(SheetContent content)
    : m_content(std::move(content)), m_model(std::make_shared<const SheetModel>(buildSheetModel(m_content)))
{
}

SheetRenderer::~SheetRenderer() = default;
SheetRenderer::SheetRenderer(SheetRenderer&&) noexcept = default;
SheetRenderer& SheetRenderer::operator=(SheetRenderer&&) noexcept = default;

QString SheetRenderer::documentTitle() const
{
    return m_model->documentTitle;
}

const SheetLayout& SheetRenderer::layoutFor(QSizeF paper) const
{
    // Keyed by the paper in hundredths of a point: A4 and Letter, or whatever a printer offers.
    const auto key = std::make_pair(std::llround(paper.width() * 100.0), std::llround(paper.height() * 100.0));
    auto it = m_layouts.find(key);
    if (it == m_layouts.end())
        it = m_layouts.emplace(key, std::make_unique<SheetLayout>(m_model, m_content.language, paper)).first;
    return *it->second;
}

int SheetRenderer::pageCount() const
{
    return layoutFor(paperPoints(m_content.pageSize)).pageCount();
}

int SheetRenderer::pageCount(const QPageLayout& layout) const
{
    return layoutFor(layout.fullRect(QPageLayout::Point).size()).pageCount();
}

void SheetRenderer::paintPage(QPainter& painter, int page, const QRectF& pageRect) const
{
    paintPage(painter, page, pageRect, pageLayout(m_content.pageSize));
}

void SheetRenderer::paintPage(QPainter& painter, int page, const QRectF& pageRect, const QPageLayout& layout) const
{
    const SheetLayout& sheet = layoutFor(layout.fullRect(QPageLayout::Point).size());
    const QSizeF paper = sheet.paperUnits();
    const double scale = std::min(pageRect.width() / paper.width(), pageRect.height() / paper.height());
    painter.save();
    painter.setRenderHint(QPainter::Antialiasing, true);
    painter.setRenderHint(QPainter::TextAntialiasing, true);
    painter.translate(pageRect.left() + (pageRect.width() - paper.width() * scale) / 2, pageRect.top());
    painter.scale(scale, scale);
    sheet.paint(painter, page);
    painter.restore();
}

int SheetRenderer::paintDocument(QPagedPaintDevice& device, QPainter& painter) const
{
    const QPageLayout layout = device.pageLayout();
    const QRectF full(0, 0, device.width(), device.height());
    const int pages = pageCount(layout);
    for (int page = 0; page < pages; ++page) {
        if (page > 0)
            device.newPage();
        paintPage(painter, page, full, layout);
    }
    return pages;
}

QImage SheetRenderer::renderPage(int page, double dpi) const
{
    const QSizeF paper = paperPoints(m_content.pageSize);
    const QSize pixels(static_cast<int>(std::lround(paper.width() * dpi / 72.0)),
                       static_cast<int>(std::lround(paper.height() * dpi / 72.0)));
    QImage image(pixels, QImage::Format_ARGB32_Premultiplied);
    const int dotsPerMetre = static_cast<int>(std::lround(dpi / 0.0254));
    image.setDotsPerMeterX(dotsPerMetre);
    image.setDotsPerMeterY(dotsPerMetre);
    image.fill(Qt::white);
    QPainter painter(&image);
    paintPage(painter, page, QRectF(QPointF(0, 0), QSizeF(pixels)));
    painter.end();
    return image;
}

Result<int> writePdf(const SheetContent& content, const QString& path, PageSize pageSize)
{
    SheetContent onPaper = content;
    onPaper.pageSize = pageSize;
    const SheetRenderer renderer(std::move(onPaper));

    QSaveFile file(path);
    if (!file.open(QIODevice::WriteOnly))
        return fail("path", path.toStdString(),
                    "a file that can be written (" + file.errorString().toStdString() + ")");
    int pages = 0;
    {
        QPdfWriter writer(&file);
        writer.setPageLayout(pageLayout(pageSize));
        writer.setResolution(600);
        writer.setTitle(renderer.documentTitle());
        writer.setCreator(QStringLiteral("Beamwarden ") + renderer.content().programVersion);
        QPainter painter;
        if (!painter.begin(&writer))
            return fail("path", path.toStdString(), "a file that can be written");
        pages = renderer.paintDocument(writer, painter);
        painter.end();
    }
    if (!file.commit())
        return fail("path", path.toStdString(),
                    "a file that can be written (" + file.errorString().toStdString() + ")");
    return pages;
}

QImage renderPage(const SheetContent& content, int page, double dpi)
{
    return SheetRenderer(content).renderPage(page, dpi);
}

} // namespace beamwarden::sheet
