#include "mainwindow.hpp"

#include "beamwarden/caution.hpp"
#include "beamwarden/store/eyewearcsv.hpp"
#include "beamwarden/store/labexport.hpp"
#include "document/labdocument.hpp"
#include "panels/assessmentpanel.hpp"
#include "panels/eyewearpanel.hpp"
#include "panels/hazardsheetpanel.hpp"
#include "panels/historypanel.hpp"
#include "panels/laserspanel.hpp"
#include "panels/limitcurvespanel.hpp"
#include "panels/panelpage.hpp"
#include "settings/settings.hpp"
#include "sheetcontent.hpp"
#include "widgets/cautionstrip.hpp"
#include "widgets/palette.hpp"
#include "widgets/panelstack.hpp"

#include <QActionGroup>
#include <QApplication>
#include <QComboBox>
#include <QDir>
#include <QFile>
#include <QFileDialog>
#include <QFileInfo>
#include <QHBoxLayout>
#include <QLabel>
#include <QListWidget>
#include <QMenuBar>
#include <QMessageBox>
#include <QStandardPaths>
#include <QStatusBar>
#include <QUndoStack>
#include <QVBoxLayout>

#include <fstream>
#include <sstream>

namespace beamwarden::gui {

namespace {

QString q(const std::string& s)
{
    return QString::fromStdString(s);
}

QString q(std::string_view s)
{
    return QString::fromUtf8(s.data(), static_cast<qsizetype>(s.size()));
}

} // namespace

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

    m_lasersPanel = new LasersPanel(this);
    m_assessmentPanel = new AssessmentPanel(this);
    m_eyewearPanel = new EyewearPanel(this);
    m_historyPanel = new HistoryPanel(this);
    m_curvesPanel = new LimitCurvesPanel(this);
    m_sheetPanel = new HazardSheetPanel(this);
    m_curveOutput = new QComboBox(this);
    m_curveOutput->setObjectName(QStringLiteral("curveOutput"));
    m_curveCase = new QComboBox(this);
    m_curveCase->setObjectName(QStringLiteral("curveCase"));
    auto* curvesBody = new QWidget(this);
    auto* cb = new QVBoxLayout(curvesBody);
    cb->setContentsMargins(0, 0, 0, 0);
    auto* curveChoice = new QHBoxLayout;
    auto* outputLabel = new QLabel(tr("Output:"), curvesBody);
    outputLabel->setBuddy(m_curveOutput);
    auto* caseLabel = new QLabel(tr("Exposure case:"), curvesBody);
    caseLabel->setBuddy(m_curveCase);
    curveChoice->addWidget(outputLabel);
    curveChoice->addWidget(m_curveOutput);
    curveChoice->addSpacing(12);
    curveChoice->addWidget(caseLabel);
    curveChoice->addWidget(m_curveCase);
    curveChoice->addStretch();
    cb->addLayout(curveChoice);
    cb->addWidget(m_curvesPanel, 1);
    connect(m_curveOutput, &QComboBox::activated, this, [this] {
        refreshCurveSelectors();
        m_curvesStale = true;
        refreshDeferredPanels();
    });
    connect(m_curveCase, &QComboBox::activated, this, [this] {
        m_curvesStale = true;
        refreshDeferredPanels();
    });

    m_pages = new PanelStack(this);
    for (int i = 0; i < kPanelCount; ++i) {
        const auto panel = static_cast<Panel>(i);
        m_navigation->addItem(panelTitle(panel));
        auto* page = new PanelPage(panel, m_pages);
        switch (panel) {
        case Panel::Lasers:
            page->setBody(m_lasersPanel);
            break;
        case Panel::Assessment:
            page->setBody(m_assessmentPanel);
            break;
        case Panel::Eyewear:
            page->setBody(m_eyewearPanel);
            break;
        case Panel::History:
            page->setBody(m_historyPanel);
            break;
        case Panel::LimitCurves:
            page->setBody(curvesBody);
            break;
        case Panel::HazardSheet:
            page->setBody(m_sheetPanel);
            break;
        case Panel::Count:
            break;
        }
        m_pages->addWidget(page);
    }
    connect(m_navigation, &QListWidget::currentRowChanged, this, [this](int row) {
        m_pages->setCurrentIndex(row);
        refreshDeferredPanels();
    });

    m_laserSelector = new QComboBox(this);
    m_laserSelector->setObjectName(QStringLiteral("laserSelector"));
    m_laserSelector->setMinimumWidth(260);
    auto* selectorRow = new QWidget(this);
    auto* sr = new QHBoxLayout(selectorRow);
    sr->setContentsMargins(12, 6, 12, 6);
    auto* selectorLabel = new QLabel(tr("Laser:"), selectorRow);
    selectorLabel->setBuddy(m_laserSelector);
    sr->addWidget(selectorLabel);
    sr->addWidget(m_laserSelector);
    sr->addStretch();
    connect(m_laserSelector, &QComboBox::currentIndexChanged, this, [this](int index) {
        if (m_selecting)
            return;
        m_lasersPanel->setCurrentLaser(index);
        recompute();
    });
    connect(m_lasersPanel, &LasersPanel::currentLaserChanged, this, [this](int index) {
        if (m_laserSelector->currentIndex() != index) {
            m_selecting = true;
            m_laserSelector->setCurrentIndex(index);
            m_selecting = false;
        }
        recompute();
    });

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
    column->addWidget(selectorRow);
    column->addLayout(body, 1);
    setCentralWidget(central);

    buildMenus();
    buildStatusBar();
    setLab(tr("No lab open"), tr("no file"));
    showPanel(Panel::Lasers);
    resize(1280, 800);
}

MainWindow::~MainWindow() = default;

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

int MainWindow::selectedLaser() const
{
    return m_laserSelector->currentIndex();
}

void MainWindow::selectLaser(int index)
{
    m_laserSelector->setCurrentIndex(index);
}

Result<void> MainWindow::openLab(const QString& path)
{
    auto document = LabDocument::open(path);
    if (!document) {
        statusBar()->showMessage(tr("Not opened: %1").arg(q(document.error().message())), 15000);
        return std::unexpected(document.error());
    }
    attachDocument(std::move(*document));
    Settings::addRecentFile(QFileInfo(path).absoluteFilePath());
    fillRecentMenu();
    return {};
}

Result<void> MainWindow::openDemoLab()
{
    const QString folder = QStandardPaths::writableLocation(QStandardPaths::AppDataLocation);
    QDir().mkpath(folder);
    const QString path = folder + QStringLiteral("/demo.bwlab");
    if (!QFile::exists(path)) {
        QFile resource(QStringLiteral(":/demo.bwlab.json"));
        if (!resource.open(QIODevice::ReadOnly))
            return fail("demo lab", "resources/demo.bwlab.json", "the demo lab bundled with the program");
        const QByteArray text = resource.readAll();
        auto contents =
            store::parseLabExport(std::string_view(text.constData(), static_cast<std::size_t>(text.size())));
        if (!contents)
            return std::unexpected(contents.error());
        auto created = store::LabStore::create(path.toStdString(), *contents);
        if (!created)
            return std::unexpected(created.error());
    }
    return openLab(path);
}

void MainWindow::attachDocument(std::unique_ptr<LabDocument> document)
{
    m_assessment.reset();
    m_eyewearPanel->setAssessment(nullptr); // they point into m_assessment
    m_historyPanel->setLaser(-1, nullptr);
    m_document = std::move(document);
    LabDocument* doc = m_document.get();
    connect(doc, &LabDocument::lasersReset, this, &MainWindow::refreshLaserSelector);
    connect(doc, &LabDocument::laserChanged, this, [this](int index) {
        if (index < m_laserSelector->count())
            m_laserSelector->setItemText(index, q(m_document->lasers()[static_cast<std::size_t>(index)].name));
        recompute();
    });
    connect(doc, &LabDocument::eyewearChanged, this, &MainWindow::recompute);
    connect(doc, &LabDocument::assessmentsChanged, this, [this] {
        m_sheetStale = true;
        refreshDeferredPanels();
    });
    connect(doc, &LabDocument::storeFailed, this,
            [this](const QString& message) { statusBar()->showMessage(tr("Not stored: %1").arg(message), 15000); });
    m_lasersPanel->setDocument(doc);
    m_eyewearPanel->setDocument(doc);
    m_historyPanel->setDocument(doc);
    refreshLaserSelector();
    setLab(q(doc->lab().name), QFileInfo(doc->filePath()).fileName());
    recompute();
}

void MainWindow::refreshLaserSelector()
{
    m_selecting = true;
    const int current = std::max(0, m_laserSelector->currentIndex());
    m_laserSelector->clear();
    if (m_document) {
        for (const model::Laser& laser : m_document->lasers())
            m_laserSelector->addItem(q(laser.name));
    }
    m_laserSelector->setCurrentIndex(std::min(current, m_laserSelector->count() - 1));
    m_selecting = false;
    m_lasersPanel->setCurrentLaser(m_laserSelector->currentIndex());
    recompute();
}

void MainWindow::recompute()
{
    const int index = m_laserSelector->currentIndex();
    m_assessment.reset(); // the eyewear and history panels are given the new one (or null) below
    if (!m_document || index < 0 || static_cast<std::size_t>(index) >= m_document->lasers().size()) {
        m_assessmentPanel->clear();
        m_eyewearPanel->setAssessment(nullptr);
        m_historyPanel->setLaser(-1, nullptr);
        refreshCurveSelectors();
        m_curvesStale = m_sheetStale = true;
        refreshDeferredPanels();
        return;
    }
    const model::Laser& laser = m_document->lasers()[static_cast<std::size_t>(index)];
    const assessment::AssessmentOptions options{Settings::ruleChoice(), Settings::c5Option()};
    auto result = assessment::assessLaser(laser, m_document->eyewear(), options);
    if (!result) {
        m_assessmentPanel->showRefusal(q(laser.name), q(result.error().message()));
    } else {
        m_assessment = std::move(*result);
        m_assessmentPanel->showAssessment(*m_assessment);
    }
    const assessment::LaserAssessment* shown = m_assessment ? &*m_assessment : nullptr;
    m_eyewearPanel->setAssessment(shown);
    m_historyPanel->setLaser(index, shown);
    refreshCurveSelectors();
    m_curvesStale = true;
    m_sheetStale = true;
    refreshDeferredPanels();
}

void MainWindow::refreshCurveSelectors()
{
    const int output = std::max(0, m_curveOutput->currentIndex());
    const int kase = std::max(0, m_curveCase->currentIndex());
    m_curveOutput->clear();
    m_curveCase->clear();
    if (!m_assessment)
        return;
    for (const assessment::OutputAssessment& o : m_assessment->outputs)
        m_curveOutput->addItem(q(o.name));
    m_curveOutput->setCurrentIndex(std::min(output, m_curveOutput->count() - 1));
    const int chosen = m_curveOutput->currentIndex();
    if (chosen >= 0) {
        for (const assessment::CaseAssessment& c : m_assessment->outputs[static_cast<std::size_t>(chosen)].cases)
            m_curveCase->addItem(q(c.name));
    }
    m_curveCase->setCurrentIndex(std::min(kase, m_curveCase->count() - 1));
}

void MainWindow::refreshDeferredPanels()
{
    if (currentPanel() == Panel::LimitCurves && m_curvesStale) {
        m_curvesStale = false;
        if (m_assessment && m_document)
            m_curvesPanel->showAssessment(*m_assessment, m_document->eyewear(), m_curveOutput->currentIndex(),
                                          m_curveCase->currentIndex());
        else
            m_curvesPanel->clear();
    }
    if (currentPanel() == Panel::HazardSheet && m_sheetStale) {
        m_sheetStale = false;
        if (m_assessment && m_document) {
            m_sheetPanel->showSheet(sheet::makeSheetContent(m_document->lab(), *m_assessment, m_document->eyewear(),
                                                            m_document->assessments(m_assessment->laser.id),
                                                            m_sheetPanel->pageSize(), Settings::language()));
        } else {
            m_sheetPanel->clear();
        }
    }
}

void MainWindow::buildMenus()
{
    QMenu* file = menuBar()->addMenu(tr("&File"));
    file->addAction(tr("&New lab…"), this, &MainWindow::newLab);
    QAction* open = file->addAction(tr("&Open…"), this, &MainWindow::chooseAndOpen);
    open->setShortcut(QKeySequence::Open);
    file->addAction(tr("Open &demo lab"), this, [this] {
        if (auto done = openDemoLab(); !done)
            QMessageBox::warning(this, tr("Demo lab"), q(done.error().message()));
    });
    m_recentMenu = file->addMenu(tr("Open &recent"));
    fillRecentMenu();
    file->addSeparator();
    file->addAction(tr("&Import lab export…"), this, &MainWindow::importExport);
    file->addAction(tr("&Export lab…"), this, &MainWindow::exportLab);
    file->addAction(tr("Import eyewear &CSV…"), this, &MainWindow::importEyewearCsv);
    file->addAction(tr("&Backup…"), this, &MainWindow::backupLab);
    file->addSeparator();
    QAction* quit = file->addAction(tr("&Quit"), this, &QWidget::close);
    quit->setShortcut(QKeySequence::Quit);

    QMenu* edit = menuBar()->addMenu(tr("&Edit"));
    QAction* undo = edit->addAction(tr("&Undo"), this, [this] {
        if (m_document)
            m_document->undoStack()->undo();
    });
    undo->setShortcut(QKeySequence::Undo);
    QAction* redo = edit->addAction(tr("&Redo"), this, [this] {
        if (m_document)
            m_document->undoStack()->redo();
    });
    redo->setShortcut(QKeySequence::Redo);

    QMenu* view = menuBar()->addMenu(tr("&View"));
    for (int i = 0; i < kPanelCount; ++i) {
        const auto panel = static_cast<Panel>(i);
        QAction* action = view->addAction(panelTitle(panel), this, [this, panel] { showPanel(panel); });
        action->setShortcut(QKeySequence(Qt::CTRL | static_cast<Qt::Key>(Qt::Key_1 + i)));
    }

    QMenu* settings = menuBar()->addMenu(tr("&Settings"));
    QMenu* rules = settings->addMenu(tr("Rule set"));
    auto* ruleGroup = new QActionGroup(this);
    const std::pair<limits::RuleChoice, QString> ruleChoices[] = {
        {limits::RuleChoice::Strictest, tr("Strictest of IEC 60825-1:2014 and :2007 (default)")},
        {limits::RuleChoice::Iec60825_1_2014, tr("IEC 60825-1:2014 only")},
        {limits::RuleChoice::Iec60825_1_2007, tr("IEC 60825-1:2007 only (EU workplace basis)")}};
    for (const auto& [choice, label] : ruleChoices) {
        QAction* a = rules->addAction(label);
        a->setCheckable(true);
        a->setChecked(Settings::ruleChoice() == choice);
        ruleGroup->addAction(a);
        connect(a, &QAction::triggered, this, [this, c = choice] {
            Settings::setRuleChoice(c);
            refreshRuleSetLabel();
            recompute();
        });
    }
    QMenu* c5 = settings->addMenu(tr("2014 repeated-pulse factor C5"));
    auto* c5Group = new QActionGroup(this);
    const std::pair<limits::C5Option, QString> c5Choices[] = {
        {limits::C5Option::Conservative, tr("Conservative, N^-0.25 (default)")},
        {limits::C5Option::Edition, tr("Candidate edition reading (reconstructed)")}};
    for (const auto& [option, label] : c5Choices) {
        QAction* a = c5->addAction(label);
        a->setCheckable(true);
        a->setChecked(Settings::c5Option() == option);
        c5Group->addAction(a);
        connect(a, &QAction::triggered, this, [this, o = option] {
            Settings::setC5Option(o);
            refreshRuleSetLabel();
            recompute();
        });
    }
    QMenu* language = settings->addMenu(tr("Language"));
    for (const auto& [code, label] :
         {std::pair{QString(), tr("System default")}, std::pair{QStringLiteral("en"), QStringLiteral("English")},
          std::pair{QStringLiteral("de"), QStringLiteral("Deutsch")}})
        language->addAction(label, this, [this, c = code] {
            Settings::setLanguage(c);
            statusBar()->showMessage(tr("The language changes at the next start."), 8000);
        });

    QMenu* help = menuBar()->addMenu(tr("&Help"));
    help->addAction(tr("&About Beamwarden"), this, &MainWindow::showAbout);
}

void MainWindow::buildStatusBar()
{
    m_labLabel = new QLabel(this);
    m_ruleSetLabel = new QLabel(this);
    statusBar()->addWidget(m_labLabel, 1);
    statusBar()->addPermanentWidget(m_ruleSetLabel);
    refreshRuleSetLabel();
}

void MainWindow::refreshRuleSetLabel()
{
    QString text;
    switch (Settings::ruleChoice()) {
    case limits::RuleChoice::Strictest:
        text = tr("Rule set: strictest of IEC 60825-1:2014 and IEC 60825-1:2007");
        break;
    case limits::RuleChoice::Iec60825_1_2014:
        text = tr("Rule set: IEC 60825-1:2014");
        break;
    case limits::RuleChoice::Iec60825_1_2007:
        text = tr("Rule set: IEC 60825-1:2007");
        break;
    }
    if (Settings::c5Option() == limits::C5Option::Edition)
        text += tr(" (C5: edition reading)");
    m_ruleSetLabel->setText(text);
}

void MainWindow::chooseAndOpen()
{
    const QString path =
        QFileDialog::getOpenFileName(this, tr("Open lab file"), QString(), tr("Lab files (*.bwlab);;All files (*)"));
    if (!path.isEmpty())
        (void)openLab(path);
}

void MainWindow::newLab()
{
    const QString path = QFileDialog::getSaveFileName(this, tr("New lab file"), QString(), tr("Lab files (*.bwlab)"));
    if (path.isEmpty())
        return;
    model::Lab lab;
    lab.name = QFileInfo(path).completeBaseName().toStdString();
    auto created = store::LabStore::create(path.toStdString(), lab);
    if (!created) {
        QMessageBox::warning(this, tr("New lab"), q(created.error().message()));
        return;
    }
    (void)openLab(path);
}

void MainWindow::importExport()
{
    const QString in =
        QFileDialog::getOpenFileName(this, tr("Import lab export"), QString(), tr("Lab exports (*.bwlab.json *.json)"));
    if (in.isEmpty())
        return;
    const QString out =
        QFileDialog::getSaveFileName(this, tr("New lab file for the import"), QString(), tr("Lab files (*.bwlab)"));
    if (out.isEmpty())
        return;
    auto imported = store::importLab(in.toStdString(), out.toStdString());
    if (!imported) {
        QMessageBox::warning(this, tr("Import"), tr("Nothing was imported: %1").arg(q(imported.error().message())));
        return;
    }
    (void)openLab(out);
}

void MainWindow::exportLab()
{
    if (!m_document)
        return;
    const QString out =
        QFileDialog::getSaveFileName(this, tr("Export lab"), QString(), tr("Lab exports (*.bwlab.json)"));
    if (out.isEmpty())
        return;
    if (auto done = store::exportLab(m_document->store(), out.toStdString()); !done)
        QMessageBox::warning(this, tr("Export"), q(done.error().message()));
    else
        statusBar()->showMessage(tr("Exported to %1").arg(out), 8000);
}

void MainWindow::importEyewearCsv()
{
    if (!m_document)
        return;
    const QString in = QFileDialog::getOpenFileName(this, tr("Import eyewear inventory"), QString(),
                                                    tr("CSV files (*.csv);;All files (*)"));
    if (in.isEmpty())
        return;
    // All or nothing: the store checks every row before it writes any (docs/lab-export.md lists the columns).
    auto added = store::importEyewearCsv(m_document->store(), in.toStdString());
    if (!added) {
        QMessageBox::warning(this, tr("Import eyewear inventory"),
                             tr("Nothing was imported: %1").arg(q(added.error().message())));
        return;
    }
    // Reopen from the file so the shelf shows exactly what is stored.
    const QString path = m_document->filePath();
    (void)openLab(path);
    statusBar()->showMessage(tr("Imported %n eyewear item(s).", nullptr, static_cast<int>(added->size())), 8000);
}

void MainWindow::backupLab()
{
    if (!m_document)
        return;
    const QString out =
        QFileDialog::getSaveFileName(this, tr("Back up lab file"), QString(), tr("Lab files (*.bwlab)"));
    if (out.isEmpty())
        return;
    if (auto done = m_document->store().backup(out.toStdString()); !done)
        QMessageBox::warning(this, tr("Backup"), q(done.error().message()));
    else
        statusBar()->showMessage(tr("Backed up to %1").arg(out), 8000);
}

void MainWindow::fillRecentMenu()
{
    if (!m_recentMenu)
        return;
    m_recentMenu->clear();
    for (const QString& path : Settings::recentFiles())
        m_recentMenu->addAction(path, this, [this, path] { (void)openLab(path); });
    m_recentMenu->setEnabled(!m_recentMenu->isEmpty());
}

void MainWindow::showAbout()
{
    QMessageBox::about(this, tr("About Beamwarden"),
                       tr("<h3>Beamwarden %1</h3><p>Exposure limits, hazard distances and eyewear checks for laser "
                          "labs.</p><p>%2</p>")
                           .arg(q(programVersion()), m_caution->cautionText().toHtmlEscaped()));
}

} // namespace beamwarden::gui
