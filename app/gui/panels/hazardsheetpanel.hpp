#pragma once
// The Hazard sheet panel: a scrollable preview of the sheet's pages, drawn by the same renderer that prints and
// exports, with the paper size and the Export PDF and Print buttons.
#include "sheetcontent.hpp"

#include <QWidget>

#include <memory>
#include <vector>

class QButtonGroup;
class QLabel;
class QPushButton;
class QScrollArea;
class QTimer;
class QVBoxLayout;

namespace beamwarden::sheet {
class SheetRenderer;
}

namespace beamwarden::gui {

class HazardSheetPanel : public QWidget {
    Q_OBJECT
public:
    explicit HazardSheetPanel(QWidget* parent = nullptr);
    ~HazardSheetPanel() override;

    // Shows the sheet for `content` on the paper chosen in the panel (the content's paper when first shown).
    void showSheet(sheet::SheetContent content); // taken by value: a large shelf's sheet is moved in, not copied
    // Back to the empty state: no laser selected.
    void clear();
    [[nodiscard]] bool hasSheet() const { return m_renderer != nullptr; }
    [[nodiscard]] int pageCount() const;
    [[nodiscard]] sheet::PageSize pageSize() const { return m_pageSize; }
    void setPageSize(sheet::PageSize size);

    // Writes the PDF (no dialog); false, with the reason in lastError(), when it could not be written.
    bool exportPdf(const QString& path);
    // Opens the print dialog and prints the sheet.
    void print();
    [[nodiscard]] QString lastError() const { return m_lastError; }

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;

private:
    void chooseExportPath();
    void rebuildPreview();
    // Renders the pages in and near the view and lets go of the others: a sheet for a large shelf runs to hundreds
    // of pages, and every page held as a picture costs megabytes.
    void renderNearbyPages();

    std::unique_ptr<sheet::SheetRenderer> m_renderer;
    sheet::PageSize m_pageSize = sheet::PageSize::A4;
    bool m_pageSizeChosen = false;
    QString m_lastError;

    QButtonGroup* m_paper = nullptr;
    QPushButton* m_exportButton = nullptr;
    QPushButton* m_printButton = nullptr;
    QLabel* m_pageInfo = nullptr;
    QScrollArea* m_scroll = nullptr;
    QWidget* m_pagesHost = nullptr;
    QVBoxLayout* m_pagesLayout = nullptr;
    QLabel* m_empty = nullptr;
    QTimer* m_refit = nullptr; // re-renders the preview once the view has settled at a new width
    int m_previewWidth = 0;
    double m_previewDpi = 0; // device pixels per inch of the page pictures
    int m_pageHeight = 0;    // of one page's label, in the host's coordinates
    std::vector<QLabel*> m_pageLabels;
};

} // namespace beamwarden::gui
