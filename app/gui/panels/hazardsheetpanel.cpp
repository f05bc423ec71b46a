#include "panels/hazardsheetpanel.hpp"

#include "sheetrenderer.hpp"
#include "widgets/palette.hpp"

#include <QButtonGroup>
#include <QEvent>
#include <QFileDialog>
#include <QHBoxLayout>
#include <QLabel>
#include <QMessageBox>
#include <QPainter>
#include <QPrintDialog>
#include <QPrinter>
#include <QPushButton>
#include <QScrollArea>
#include <QScrollBar>
#include <QTimer>
#include <QVBoxLayout>

#include <algorithm>
#include <cmath>

namespace beamwarden::gui {

namespace {

constexpr int kPageGap = 14;
constexpr double kMaxPreviewDpi = 110.0;
// A short sheet is rendered whole; of a longer one, the pages within this many pages of the view.
constexpr int kShortSheet = 4;
constexpr int kNearbyPages = 1;

} // namespace

HazardSheetPanel::HazardSheetPanel(QWidget* parent) : QWidget(parent)
{
    setObjectName(QStringLiteral("hazardSheetPanel"));

    auto* paperLabel = new QLabel(tr("Paper:"), this);
    auto* a4 = new QPushButton(tr("A4"), this);
    auto* letter = new QPushButton(tr("US Letter"), this);
    a4->setObjectName(QStringLiteral("paperA4"));
    letter->setObjectName(QStringLiteral("paperLetter"));
    for (QPushButton* b : {a4, letter}) {
        b->setCheckable(true);
        b->setAutoDefault(false);
    }
    a4->setChecked(true);
    m_paper = new QButtonGroup(this);
    m_paper->setExclusive(true);
    m_paper->addButton(a4, static_cast<int>(sheet::PageSize::A4));
    m_paper->addButton(letter, static_cast<int>(sheet::PageSize::Letter));
    connect(m_paper, &QButtonGroup::idClicked, this, [this](int id) {
        m_pageSizeChosen = true;
        setPageSize(static_cast<sheet::PageSize>(id));
    });

    m_pageInfo = new QLabel(this);
    m_pageInfo->setObjectName(QStringLiteral("sheetPageInfo"));

    m_exportButton = new QPushButton(tr("Export PDF…"), this);
    m_exportButton->setObjectName(QStringLiteral("exportPdfButton"));
    m_exportButton->setToolTip(tr("Write the hazard sheet as a PDF file"));
    connect(m_exportButton, &QPushButton::clicked, this, &HazardSheetPanel::chooseExportPath);
    m_printButton = new QPushButton(tr("Print…"), this);
    m_printButton->setObjectName(QStringLiteral("printButton"));
    m_printButton->setToolTip(tr("Print the hazard sheet"));
    connect(m_printButton, &QPushButton::clicked, this, &HazardSheetPanel::print);

    auto* bar = new QHBoxLayout;
    bar->setContentsMargins(0, 0, 0, 0);
    bar->addWidget(paperLabel);
    bar->addWidget(a4);
    bar->addWidget(letter);
    bar->addSpacing(12);
    bar->addWidget(m_pageInfo, 1);
    bar->addWidget(m_exportButton);
    bar->addWidget(m_printButton);

    m_pagesHost = new QWidget;
    m_pagesHost->setObjectName(QStringLiteral("sheetPages"));
    m_pagesLayout = new QVBoxLayout(m_pagesHost);
    m_pagesLayout->setContentsMargins(kPageGap, kPageGap, kPageGap, kPageGap);
    m_pagesLayout->setSpacing(kPageGap);
    m_pagesLayout->setAlignment(Qt::AlignHCenter | Qt::AlignTop);

    m_scroll = new QScrollArea(this);
    m_scroll->setObjectName(QStringLiteral("sheetPreview"));
    m_scroll->setWidgetResizable(true);
    m_scroll->setWidget(m_pagesHost);
    m_scroll->setStyleSheet(
        QStringLiteral("#sheetPreview, #sheetPages { background: %1; }").arg(palette::kRail.name()));

    m_scroll->viewport()->installEventFilter(this);
    connect(m_scroll->verticalScrollBar(), &QScrollBar::valueChanged, this, &HazardSheetPanel::renderNearbyPages);
    m_refit = new QTimer(this);
    m_refit->setSingleShot(true);
    m_refit->setInterval(60);
    connect(m_refit, &QTimer::timeout, this, &HazardSheetPanel::rebuildPreview);

    m_empty = new QLabel(tr("Select a laser to preview its hazard sheet."), this);
    m_empty->setAlignment(Qt::AlignCenter);
    m_empty->setStyleSheet(QStringLiteral("color: #6b7686; font-style: italic;"));

    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addLayout(bar);
    layout->addWidget(m_scroll, 1);
    layout->addWidget(m_empty, 1);
    clear();
}

HazardSheetPanel::~HazardSheetPanel() = default;

void HazardSheetPanel::showSheet(sheet::SheetContent content)
{
    sheet::SheetContent shown = std::move(content);
    if (m_pageSizeChosen)
        shown.pageSize = m_pageSize;
    m_pageSize = shown.pageSize;
    m_paper->button(static_cast<int>(m_pageSize))->setChecked(true);
    m_renderer = std::make_unique<sheet::SheetRenderer>(std::move(shown));
    rebuildPreview();
}

void HazardSheetPanel::clear()
{
    m_renderer.reset();
    rebuildPreview();
}

int HazardSheetPanel::pageCount() const
{
    return m_renderer ? m_renderer->pageCount() : 0;
}

void HazardSheetPanel::setPageSize(sheet::PageSize size)
{
    m_pageSize = size;
    m_paper->button(static_cast<int>(size))->setChecked(true);
    if (m_renderer && m_renderer->content().pageSize != size) {
        sheet::SheetContent content = m_renderer->content();
        content.pageSize = size;
        m_renderer = std::make_unique<sheet::SheetRenderer>(std::move(content));
    }
    rebuildPreview();
}

bool HazardSheetPanel::exportPdf(const QString& path)
{
    m_lastError.clear();
    if (!m_renderer) {
        m_lastError = tr("No hazard sheet to export: select a laser first.");
        return false;
    }
    const auto pages = sheet::writePdf(m_renderer->content(), path, m_pageSize);
    if (!pages) {
        m_lastError = tr("Could not write %1: %2").arg(path, QString::fromStdString(pages.error().allowed));
        return false;
    }
    return true;
}

void HazardSheetPanel::print()
{
    if (!m_renderer)
        return;
    QPrinter printer(QPrinter::HighResolution);
    printer.setDocName(m_renderer->documentTitle());
    printer.setPageLayout(sheet::pageLayout(m_pageSize));
    // The sheet draws its own margins; it is scaled to the printable area if the printer needs more.
    printer.setFullPage(true);
    QPrintDialog dialog(&printer, this);
    dialog.setWindowTitle(tr("Print hazard sheet"));
    if (dialog.exec() != QDialog::Accepted)
        return;
    QPainter painter;
    if (!painter.begin(&printer)) {
        QMessageBox::warning(this, tr("Print hazard sheet"), tr("The printer could not be started."));
        return;
    }
    m_renderer->paintDocument(printer, painter);
    painter.end();
}

bool HazardSheetPanel::eventFilter(QObject* watched, QEvent* event)
{
    // The pages are rendered for the view's width; a panel shown or resized later gets them re-rendered to fit.
    if (watched == m_scroll->viewport() && event->type() == QEvent::Resize && m_renderer &&
        std::abs(m_scroll->viewport()->width() - m_previewWidth) > 40)
        m_refit->start();
    return QWidget::eventFilter(watched, event);
}

void HazardSheetPanel::chooseExportPath()
{
    if (!m_renderer)
        return;
    const QString suggested = m_renderer->documentTitle() + QStringLiteral(".pdf");
    const QString path =
        QFileDialog::getSaveFileName(this, tr("Export hazard sheet"), suggested, tr("PDF files (*.pdf)"));
    if (path.isEmpty())
        return;
    if (!exportPdf(path))
        QMessageBox::warning(this, tr("Export hazard sheet"), m_lastError);
}

void HazardSheetPanel::rebuildPreview()
{
    while (QLayoutItem* item = m_pagesLayout->takeAt(0)) {
        delete item->widget();
        delete item;
    }
    m_pageLabels.clear();
    const bool shown = m_renderer != nullptr;
    m_scroll->setVisible(shown);
    m_empty->setVisible(!shown);
    m_exportButton->setEnabled(shown);
    m_printButton->setEnabled(shown);
    if (!shown) {
        m_pageInfo->clear();
        return;
    }
    const int pages = m_renderer->pageCount();
    m_pageInfo->setText(
        tr("%1 page(s), %2").arg(pages).arg(m_pageSize == sheet::PageSize::Letter ? tr("US Letter") : tr("A4")));

    // Pages as wide as the view allows (up to a comfortable reading size), sharp on high-density screens.
    m_previewWidth = m_scroll->viewport()->width();
    const QSizeF paper = sheet::pageLayout(m_pageSize).fullRect(QPageLayout::Point).size();
    const double fitDpi =
        (m_previewWidth - 2 * kPageGap - m_scroll->verticalScrollBar()->sizeHint().width()) / (paper.width() / 72.0);
    const double dpi = std::clamp(fitDpi, 40.0, kMaxPreviewDpi);
    const double ratio = devicePixelRatioF();
    m_previewDpi = dpi * ratio;
    // Every page has the paper's size: each label takes it at once, and its picture when it comes near the view.
    const QSizeF pixels = paper * (m_previewDpi / 72.0) / ratio;
    const QSize labelSize =
        QSize(static_cast<int>(std::lround(pixels.width())), static_cast<int>(std::lround(pixels.height()))) +
        QSize(2, 2); // the border
    m_pageHeight = labelSize.height();
    for (int page = 0; page < pages; ++page) {
        auto* label = new QLabel(m_pagesHost);
        label->setObjectName(QStringLiteral("sheetPage%1").arg(page + 1));
        label->setFixedSize(labelSize);
        label->setStyleSheet(QStringLiteral("border: 1px solid #b8c0cc; background: white;"));
        label->setAccessibleName(tr("Page %1 of %2").arg(page + 1).arg(pages));
        m_pagesLayout->addWidget(label, 0, Qt::AlignHCenter);
        m_pageLabels.push_back(label);
    }
    renderNearbyPages();
}

void HazardSheetPanel::renderNearbyPages()
{
    if (!m_renderer || m_pageLabels.empty() || m_pageHeight <= 0)
        return;
    // The pages are stacked at fixed heights, so the view's scroll position says which are in sight.
    const int stride = m_pageHeight + kPageGap;
    const int top = m_scroll->verticalScrollBar()->value();
    const int first = std::max(0, (top - kPageGap) / stride - kNearbyPages);
    const int last = (top + m_scroll->viewport()->height()) / stride + kNearbyPages;
    const double ratio = devicePixelRatioF();
    for (int page = 0; page < static_cast<int>(m_pageLabels.size()); ++page) {
        QLabel* label = m_pageLabels[static_cast<std::size_t>(page)];
        const bool wanted = static_cast<int>(m_pageLabels.size()) <= kShortSheet || (page >= first && page <= last);
        if (wanted && label->pixmap().isNull()) {
            QImage image = m_renderer->renderPage(page, m_previewDpi);
            image.setDevicePixelRatio(ratio);
            label->setPixmap(QPixmap::fromImage(std::move(image))); // moved: no second copy of the page
        } else if (!wanted && !label->pixmap().isNull()) {
            label->setPixmap(QPixmap());
        }
    }
}

} // namespace beamwarden::gui
