#include "panels/laserspanel.hpp"

#include "document/labdocument.hpp"
#include "panels/caseeditor.hpp"
#include "panels/outputeditor.hpp"

#include <QComboBox>
#include <QFormLayout>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QScrollArea>
#include <QSplitter>
#include <QVBoxLayout>

namespace beamwarden::gui {

namespace {

enum MergeKey { kName = 1, kMaker, kSerial, kRoom, kClass, kNotes, kOutputs };

QString summary(const model::Laser& laser)
{
    QStringList lines;
    for (const model::Output& o : laser.outputs) {
        if (o.emission.spectrum.samples.empty())
            continue;
        lines << QString::fromStdString(units::format(o.emission.spectrum.centroid(), 4));
    }
    return lines.join(QStringLiteral(", "));
}

} // namespace

LasersPanel::LasersPanel(QWidget* parent) : QWidget(parent)
{
    m_lasers = new QListWidget(this);
    m_lasers->setObjectName(QStringLiteral("laserList"));
    m_addLaser = new QPushButton(tr("Add laser"), this);
    m_removeLaser = new QPushButton(tr("Remove"), this);
    auto* listColumn = new QWidget(this);
    auto* lc = new QVBoxLayout(listColumn);
    lc->setContentsMargins(0, 0, 0, 0);
    lc->addWidget(m_lasers, 1);
    auto* lb = new QHBoxLayout;
    lb->addWidget(m_addLaser);
    lb->addWidget(m_removeLaser);
    lc->addLayout(lb);

    m_name = new QLineEdit(this);
    m_makerModel = new QLineEdit(this);
    m_serial = new QLineEdit(this);
    m_room = new QComboBox(this);
    m_class = new QComboBox(this);
    for (const char* c : {"unknown", "1", "1M", "1C", "2", "2M", "3R", "3B", "4"})
        m_class->addItem(std::string_view(c) == "unknown" ? tr("not known") : tr("Class %1").arg(QString::fromUtf8(c)));
    m_notes = new QPlainTextEdit(this);
    m_notes->setMaximumHeight(56);
    auto* laserBox = new QGroupBox(tr("Laser"), this);
    auto* lf = new QFormLayout(laserBox);
    lf->addRow(tr("Name"), m_name);
    lf->addRow(tr("Maker and model"), m_makerModel);
    lf->addRow(tr("Serial number"), m_serial);
    lf->addRow(tr("Room"), m_room);
    lf->addRow(tr("Class"), m_class);
    lf->addRow(tr("Notes"), m_notes);

    m_outputs = new QListWidget(this);
    m_outputs->setMaximumHeight(110);
    m_addOutput = new QPushButton(tr("Add output"), this);
    m_removeOutput = new QPushButton(tr("Remove output"), this);
    auto* outputsBox = new QGroupBox(tr("Outputs"), this);
    auto* ob = new QVBoxLayout(outputsBox);
    ob->addWidget(m_outputs);
    auto* obb = new QHBoxLayout;
    obb->addWidget(m_addOutput);
    obb->addWidget(m_removeOutput);
    obb->addStretch();
    ob->addLayout(obb);

    m_outputEditor = new OutputEditor(this);
    m_caseEditor = new CaseEditor(this);
    auto* casesBox = new QGroupBox(tr("Exposure cases of this output"), this);
    auto* cb = new QVBoxLayout(casesBox);
    cb->addWidget(m_caseEditor);

    m_editorArea = new QWidget(this);
    auto* columns = new QHBoxLayout(m_editorArea);
    auto* left = new QVBoxLayout;
    left->addWidget(laserBox);
    left->addWidget(outputsBox);
    left->addStretch();
    auto* right = new QVBoxLayout;
    right->addWidget(m_outputEditor);
    right->addWidget(casesBox);
    right->addStretch();
    columns->addLayout(left, 1);
    columns->addLayout(right, 1);
    auto* scroll = new QScrollArea(this);
    scroll->setWidget(m_editorArea);
    scroll->setWidgetResizable(true);
    scroll->setFrameShape(QFrame::NoFrame);

    auto* splitter = new QSplitter(this);
    splitter->addWidget(listColumn);
    splitter->addWidget(scroll);
    splitter->setStretchFactor(1, 1);
    splitter->setSizes({230, 900});
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(splitter);

    connect(m_lasers, &QListWidget::currentRowChanged, this, [this](int row) {
        if (m_loading)
            return;
        showLaser();
        Q_EMIT currentLaserChanged(row);
    });
    connect(m_outputs, &QListWidget::currentRowChanged, this, [this](int row) {
        if (m_loading)
            return;
        showOutput();
        Q_EMIT currentOutputChanged(row);
    });
    connect(m_addLaser, &QPushButton::clicked, this, [this] {
        if (!m_document)
            return;
        model::Laser laser;
        laser.name = tr("New laser %1").arg(m_document->lasers().size() + 1).toStdString();
        model::Output output;
        output.name = tr("main output").toStdString();
        output.emission.spectrum = model::singleLine(units::Wavelength::fromSi(632.8e-9));
        output.emission.averagePower = units::Power::fromSi(1e-3);
        output.beam.diameter = units::Length::fromSi(1e-3);
        output.beam.divergence = units::Angle::fromSi(1e-3);
        laser.outputs.push_back(output);
        m_document->addLaser(laser);
        setCurrentLaser(static_cast<int>(m_document->lasers().size()) - 1);
    });
    connect(m_removeLaser, &QPushButton::clicked, this, [this] {
        if (m_document && currentLaser() >= 0)
            m_document->removeLaser(currentLaser());
    });
    connect(m_name, &QLineEdit::editingFinished, this, [this] { editLaserField(tr("laser name"), kName); });
    connect(m_makerModel, &QLineEdit::editingFinished, this, [this] { editLaserField(tr("maker and model"), kMaker); });
    connect(m_serial, &QLineEdit::editingFinished, this, [this] { editLaserField(tr("serial number"), kSerial); });
    connect(m_room, &QComboBox::activated, this, [this] { editLaserField(tr("room"), kRoom); });
    connect(m_class, &QComboBox::activated, this, [this] { editLaserField(tr("class"), kClass); });
    connect(m_notes, &QPlainTextEdit::textChanged, this, [this] {
        if (!m_notes->hasFocus())
            return;
        editLaserField(tr("notes"), kNotes);
    });
    connect(m_addOutput, &QPushButton::clicked, this, [this] {
        if (!m_document || currentLaser() < 0)
            return;
        model::Laser laser = m_document->lasers()[static_cast<std::size_t>(currentLaser())];
        model::Output output = laser.outputs.empty() ? model::Output{} : laser.outputs.back();
        output.id = 0;
        for (auto& c : output.exposureCases)
            c.id = 0;
        output.name = tr("output %1").arg(laser.outputs.size() + 1).toStdString();
        laser.outputs.push_back(output);
        m_document->editLaser(currentLaser(), laser, tr("Add output"));
    });
    connect(m_removeOutput, &QPushButton::clicked, this, [this] {
        if (!m_document || currentLaser() < 0)
            return;
        model::Laser laser = m_document->lasers()[static_cast<std::size_t>(currentLaser())];
        const int row = m_outputs->currentRow();
        if (row < 0 || laser.outputs.size() <= 1 || static_cast<std::size_t>(row) >= laser.outputs.size())
            return; // a laser keeps at least one output
        laser.outputs.erase(laser.outputs.begin() + row);
        m_document->editLaser(currentLaser(), laser, tr("Remove output"));
    });
    connect(m_outputEditor, &OutputEditor::outputEdited, this,
            [this](const model::Output& output, const QString& field, int mergeKey) {
                const int row = m_outputs->currentRow();
                if (!m_document || currentLaser() < 0 || row < 0)
                    return;
                model::Laser laser = m_document->lasers()[static_cast<std::size_t>(currentLaser())];
                if (static_cast<std::size_t>(row) >= laser.outputs.size())
                    return;
                laser.outputs[static_cast<std::size_t>(row)] = output;
                m_document->editLaser(currentLaser(), laser, tr("Edit %1").arg(field), mergeKey + 1000 * row);
            });
    connect(m_caseEditor, &CaseEditor::casesEdited, this,
            [this](const std::vector<model::NamedExposureCase>& cases, const QString& field, int mergeKey) {
                const int row = m_outputs->currentRow();
                if (!m_document || currentLaser() < 0 || row < 0)
                    return;
                model::Laser laser = m_document->lasers()[static_cast<std::size_t>(currentLaser())];
                if (static_cast<std::size_t>(row) >= laser.outputs.size())
                    return;
                laser.outputs[static_cast<std::size_t>(row)].exposureCases = cases;
                m_document->editLaser(currentLaser(), laser, tr("Edit %1").arg(field), mergeKey + 1000 * row);
            });
}

void LasersPanel::setDocument(LabDocument* document)
{
    m_document = document;
    connect(document, &LabDocument::lasersReset, this, &LasersPanel::reloadList);
    connect(document, &LabDocument::laserChanged, this, [this](int index) {
        if (index < m_lasers->count()) {
            const model::Laser& laser = m_document->lasers()[static_cast<std::size_t>(index)];
            m_lasers->item(index)->setText(QString::fromStdString(laser.name) + QStringLiteral("\n") + summary(laser));
        }
        if (index == currentLaser())
            showLaser();
    });
    reloadList();
}

int LasersPanel::currentLaser() const
{
    return m_lasers->currentRow();
}

int LasersPanel::currentOutput() const
{
    return m_outputs->currentRow();
}

void LasersPanel::setCurrentLaser(int index)
{
    if (index >= 0 && index < m_lasers->count())
        m_lasers->setCurrentRow(index);
}

void LasersPanel::reloadList()
{
    const int row = std::max(0, m_lasers->currentRow());
    m_loading = true;
    m_lasers->clear();
    m_room->clear();
    m_room->addItem(tr("(no room)"));
    if (m_document) {
        for (const model::Room& room : m_document->lab().rooms)
            m_room->addItem(QString::fromStdString(room.name));
        for (const model::Laser& laser : m_document->lasers())
            m_lasers->addItem(QString::fromStdString(laser.name) + QStringLiteral("\n") + summary(laser));
    }
    m_loading = false;
    m_lasers->setCurrentRow(std::min(row, m_lasers->count() - 1));
    showLaser();
    Q_EMIT currentLaserChanged(m_lasers->currentRow());
}

void LasersPanel::showLaser()
{
    const int index = currentLaser();
    const bool has = m_document && index >= 0 && static_cast<std::size_t>(index) < m_document->lasers().size();
    m_editorArea->setEnabled(has);
    m_removeLaser->setEnabled(has);
    if (!has)
        return;
    const model::Laser& laser = m_document->lasers()[static_cast<std::size_t>(index)];
    m_loading = true;
    m_name->setText(QString::fromStdString(laser.name));
    m_makerModel->setText(QString::fromStdString(laser.makerModel));
    m_serial->setText(QString::fromStdString(laser.serial));
    const int room = m_room->findText(QString::fromStdString(laser.room));
    m_room->setCurrentIndex(room < 0 ? 0 : room);
    m_class->setCurrentIndex(static_cast<int>(laser.laserClass));
    if (!m_notes->hasFocus())
        m_notes->setPlainText(QString::fromStdString(laser.notes));
    const int outputRow = std::max(0, m_outputs->currentRow());
    m_outputs->clear();
    for (const model::Output& o : laser.outputs) {
        const QString wl = o.emission.spectrum.samples.empty()
                               ? QString()
                               : QString::fromStdString(units::format(o.emission.spectrum.centroid()));
        m_outputs->addItem(QStringLiteral("%1 — %2").arg(QString::fromStdString(o.name), wl));
    }
    m_outputs->setCurrentRow(std::min(outputRow, m_outputs->count() - 1));
    m_removeOutput->setEnabled(laser.outputs.size() > 1);
    m_loading = false;
    showOutput();
}

void LasersPanel::showOutput()
{
    const int index = currentLaser();
    const int row = m_outputs->currentRow();
    if (!m_document || index < 0 || row < 0)
        return;
    const model::Laser& laser = m_document->lasers()[static_cast<std::size_t>(index)];
    if (static_cast<std::size_t>(row) >= laser.outputs.size())
        return;
    m_outputEditor->setOutput(laser.outputs[static_cast<std::size_t>(row)]);
    m_caseEditor->setCases(laser.outputs[static_cast<std::size_t>(row)].exposureCases);
}

void LasersPanel::editLaserField(const QString& what, int mergeKey)
{
    if (m_loading || !m_document || currentLaser() < 0)
        return;
    model::Laser laser = m_document->lasers()[static_cast<std::size_t>(currentLaser())];
    const model::Laser before = laser;
    laser.name = m_name->text().trimmed().toStdString();
    laser.makerModel = m_makerModel->text().trimmed().toStdString();
    laser.serial = m_serial->text().trimmed().toStdString();
    laser.room = m_room->currentIndex() <= 0 ? std::string() : m_room->currentText().toStdString();
    laser.laserClass = static_cast<model::LaserClass>(std::max(0, m_class->currentIndex()));
    laser.notes = m_notes->toPlainText().toStdString();
    if (laser.name.empty())
        laser.name = before.name; // a laser keeps a name; an empty field is not stored
    const bool unchanged = laser.name == before.name && laser.makerModel == before.makerModel &&
                           laser.serial == before.serial && laser.room == before.room &&
                           laser.laserClass == before.laserClass && laser.notes == before.notes;
    if (!unchanged)
        m_document->editLaser(currentLaser(), laser, tr("Edit %1").arg(what), mergeKey);
}

} // namespace beamwarden::gui
