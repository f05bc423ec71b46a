#include "mainwindow.hpp"

#include "beamwarden/caution.hpp"
#include "panels/panelpage.hpp"
#include "widgets/cautionstrip.hpp"
#include "widgets/palette.hpp"

#include <QApplication>
#include <QHBoxLayout>
#include <QLabel>
#include <QListWidget>
#include <QMenuBar>
#include <QMessageBox>
#include <QStackedWidget>
#include <QStatusBar>
#include <QVBoxLayout>

namespace beamwarden::gui {

MainWindow::MainWindow(QWidget* parent) : QMainWindow(parent)
{
    setObjectName(QStringLiteral("mainWindow"));
    setWindowIcon(QIcon(QStringLiteral(":/icons/beamwarden.svg")));

    m_caution = new CautionStrip(this);

    m_navigation = new QListWidget(this);
    m_navigation->setObjectName(QStringLiteral("panelRail"));
    m_navigation->setFrameShape(QFrame::NoFrame);
    m_navigation->setFixedWidth(170);
    m_navigation->setSpacing(2);
    m_navigation->setStyleSheet(QStringLiteral("#panelRail { background: %1; padding-top: 8px; }"
                                               "#panelRail::item { padding: 9px 14px; color: %2; border: none; }"
                                               "#panelRail::item:selected { padding: 9px 14px; background: %2; "
                                               "color: white; }")
                                    .arg(palette::kRail.name(), palette::kNavy.name()));

    m_pages = new QStackedWidget(this);
    for (int i = 0; i < kPanelCount; ++i) {
        const auto panel = static_cast<Panel>(i);
        m_navigation->addItem(panelTitle(panel));
        m_pages->addWidget(new PanelPage(panel, m_pages));
    }
    connect(m_navigation, &QListWidget::currentRowChanged, m_pages, &QStackedWidget::setCurrentIndex);

    auto* body = new QHBoxLayout;
    body->setContentsMargins(0, 0, 0, 0);
    body->setSpacing(0);
    body->addWidget(m_navigation);
    body->addWidget(m_pages, 1);

    auto* central = new QWidget(this);
    auto* column = new QVBoxLayout(central);
    column->setContentsMargins(0, 0, 0, 0);
    column->setSpacing(0);
    column->addWidget(m_caution);
    column->addLayout(body, 1);
    setCentralWidget(central);

    buildMenus();
    buildStatusBar();
    setLab(tr("No lab open"), tr("no file"));
    showPanel(Panel::Lasers);
    resize(1200, 760);
}

void MainWindow::showPanel(Panel panel)
{
    m_navigation->setCurrentRow(static_cast<int>(panel));
}

Panel MainWindow::currentPanel() const
{
    return static_cast<Panel>(m_pages->currentIndex());
}

PanelPage* MainWindow::panelPage(Panel panel) const
{
    return qobject_cast<PanelPage*>(m_pages->widget(static_cast<int>(panel)));
}

void MainWindow::setLab(const QString& labName, const QString& fileLabel)
{
    setWindowTitle(tr("%1 — Beamwarden").arg(labName));
    m_labLabel->setText(tr("Lab file: %1").arg(fileLabel));
}

void MainWindow::buildMenus()
{
    QMenu* file = menuBar()->addMenu(tr("&File"));
    QAction* quit = file->addAction(tr("&Quit"), this, &QWidget::close);
    quit->setShortcut(QKeySequence::Quit);

    QMenu* view = menuBar()->addMenu(tr("&View"));
    for (int i = 0; i < kPanelCount; ++i) {
        const auto panel = static_cast<Panel>(i);
        QAction* action = view->addAction(panelTitle(panel), this, [this, panel] { showPanel(panel); });
        action->setShortcut(QKeySequence(Qt::CTRL | static_cast<Qt::Key>(Qt::Key_1 + i)));
    }

    QMenu* help = menuBar()->addMenu(tr("&Help"));
    help->addAction(tr("&About Beamwarden"), this, &MainWindow::showAbout);
}

void MainWindow::buildStatusBar()
{
    m_labLabel = new QLabel(this);
    // The rule-set choice is the program's default until settings exist: the stricter of the two IEC editions.
    m_ruleSetLabel = new QLabel(tr("Rule set: strictest of IEC 60825-1:2014 and IEC 60825-1:2007"), this);
    statusBar()->addWidget(m_labLabel, 1);
    statusBar()->addPermanentWidget(m_ruleSetLabel);
}

void MainWindow::showAbout()
{
    const std::string_view version = programVersion();
    QMessageBox::about(this, tr("About Beamwarden"),
                       tr("<h3>Beamwarden %1</h3><p>Exposure limits, hazard distances and eyewear checks for laser "
                          "labs.</p><p>%2</p>")
                           .arg(QString::fromUtf8(version.data(), static_cast<qsizetype>(version.size())),
                                m_caution->cautionText().toHtmlEscaped()));
}

} // namespace beamwarden::gui
