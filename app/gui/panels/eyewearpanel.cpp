#include "panels/eyewearpanel.hpp"

#include "beamwarden/eyewear/odtable.hpp"
#include "beamwarden/eyewear/protection.hpp"
#include "document/labdocument.hpp"
#include "models/eyewearshelfmodel.hpp"
#include "widgets/palette.hpp"
#include "widgets/quantityfield.hpp"

#include <QFormLayout>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QRegularExpression>
#include <QSpinBox>
#include <QSplitter>
#include <QTableView>
#include <QTreeWidget>
#include <QVBoxLayout>

namespace beamwarden::gui {

namespace {

enum MergeKey { kName = 500, kDescription, kText, kTransmittance, kCount, kLocation, kInspection };

QString q(const std::string& s)
{
    return QString::fromStdString(s);
}

QStringList lines(const QPlainTextEdit* edit)
{
    QStringList out;
    for (const QString& line : edit->toPlainText().split(QLatin1Char('\n'))) {
        if (!line.trimmed().isEmpty())
            out << line.trimmed();
    }
    return out;
}

std::vector<std::string> toStd(const QStringList& list)
{
    std::vector<std::string> out;
    for (const QString& s : list)
        out.push_back(s.toStdString());
    return out;
}

QString join(const std::vector<std::string>& list)
{
    QStringList out;
    for (const std::string& s : list)
        out << q(s);
    return out.join(QStringLiteral("\n"));
}

} // namespace

EyewearPanel::EyewearPanel(QWidget* parent) : QWidget(parent)
{
    m_shelfModel = new EyewearShelfModel(this);
    m_shelf = new QTableView(this);
    m_shelf->setObjectName(QStringLiteral("eyewearShelf"));
    m_shelf->setModel(m_shelfModel);
    m_shelf->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_shelf->setSelectionMode(QAbstractItemView::SingleSelection);
    m_shelf->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_shelf->verticalHeader()->hide();
    m_shelf->horizontalHeader()->setStretchLastSection(false);
    m_shelf->setWordWrap(false);
    m_shelf->setAlternatingRowColors(true);
    m_add = new QPushButton(tr("Add item"), this);
    m_remove = new QPushButton(tr("Remove"), this);

    m_name = new QLineEdit(this);
    m_description = new QLineEdit(this);
    m_en207 = new QPlainTextEdit(this);
    m_en207->setPlaceholderText(tr("one marked line each, e.g. 740-1100 D LB7 + IR LB8"));
    m_en207->setMaximumHeight(64);
    m_en208 = new QPlainTextEdit(this);
    m_en208->setPlaceholderText(tr("alignment eyewear, e.g. 1 W 2x10^-4 J 632-640 RB3"));
    m_en208->setMaximumHeight(48);
    m_odTable = new QPlainTextEdit(this);
    m_odTable->setPlaceholderText(tr("one row each: FROM-TO OD in nm, e.g. 740-1100 >=7"));
    m_odTable->setMaximumHeight(80);
    m_textErrors = new QLabel(this);
    m_textErrors->setWordWrap(true);
    m_textErrors->setStyleSheet(QStringLiteral("color: %1;").arg(palette::kVermillion.name()));
    m_transmittance = numberField(0.0, 1.0, this);
    m_transmittance->setOptional(true);
    m_transmittance->setPlaceholder(tr("0 to 1, e.g. 0.35"));
    m_count = new QSpinBox(this);
    m_count->setRange(0, 10000);
    m_location = new QLineEdit(this);
    m_inspection = new QLineEdit(this);
    m_inspection->setPlaceholderText(tr("YYYY-MM-DD"));

    m_editor = new QGroupBox(tr("Selected item"), this);
    auto* form = new QFormLayout(m_editor);
    form->addRow(tr("Name"), m_name);
    form->addRow(tr("Description"), m_description);
    form->addRow(tr("EN 207 markings"), m_en207);
    form->addRow(tr("EN 208 markings"), m_en208);
    form->addRow(tr("Spectral OD"), m_odTable);
    form->addRow(QString(), m_textErrors);
    form->addRow(tr("Visible transmittance"), m_transmittance);
    form->addRow(tr("Count"), m_count);
    form->addRow(tr("Location"), m_location);
    form->addRow(tr("Last inspection"), m_inspection);

    m_checkTitle = new QLabel(this);
    m_checkTitle->setWordWrap(true);
    m_check = new QTreeWidget(this);
    m_check->setObjectName(QStringLiteral("eyewearCheck"));
    m_check->setHeaderLabels({tr("Output / case"), tr("Verdict"), tr("Required OD"), tr("Provided OD")});
    auto* checkBox = new QGroupBox(tr("Against the selected laser"), this);
    auto* cl = new QVBoxLayout(checkBox);
    cl->addWidget(m_checkTitle);
    cl->addWidget(m_check);

    auto* leftColumn = new QWidget(this);
    auto* left = new QVBoxLayout(leftColumn);
    left->setContentsMargins(0, 0, 0, 0);
    left->addWidget(m_shelf, 1);
    auto* buttons = new QHBoxLayout;
    buttons->addWidget(m_add);
    buttons->addWidget(m_remove);
    buttons->addStretch();
    left->addLayout(buttons);
    left->addWidget(checkBox, 1);
    auto* split = new QSplitter(this);
    split->addWidget(leftColumn);
    split->addWidget(m_editor);
    split->setSizes({640, 420});
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(split);

    connect(m_shelf->selectionModel(), &QItemSelectionModel::currentChanged, this, [this] {
        if (!m_loading) {
            showItem();
            showCheck();
        }
    });
    connect(m_add, &QPushButton::clicked, this, [this] {
        if (!m_document)
            return;
        model::EyewearItem item;
        item.name = tr("New eyewear %1").arg(m_document->eyewear().size() + 1).toStdString();
        m_document->addEyewear(item);
        m_shelf->selectRow(m_shelfModel->rowCount() - 1);
    });
    connect(m_remove, &QPushButton::clicked, this, [this] {
        if (m_document && currentItem() >= 0)
            m_document->removeEyewear(currentItem());
    });
    auto editText = [this](QLineEdit* edit, std::string model::EyewearItem::*member, const QString& what, int key) {
        connect(edit, &QLineEdit::editingFinished, this, [this, edit, member, what, key] {
            if (m_loading || !m_document || currentItem() < 0)
                return;
            model::EyewearItem item = m_document->eyewear()[static_cast<std::size_t>(currentItem())];
            const std::string text = edit->text().trimmed().toStdString();
            if (item.*member == text)
                return;
            if (member == &model::EyewearItem::lastInspection && !text.empty() &&
                !QRegularExpression(QStringLiteral("^\\d{4}-\\d{2}-\\d{2}$"))
                     .match(edit->text().trimmed())
                     .hasMatch()) {
                m_textErrors->setText(tr("Last inspection: '%1' is not a date; expected YYYY-MM-DD").arg(edit->text()));
                return;
            }
            item.*member = text;
            m_document->editEyewear(currentItem(), item, tr("Edit %1").arg(what), key);
        });
    };
    editText(m_name, &model::EyewearItem::name, tr("eyewear name"), kName);
    editText(m_description, &model::EyewearItem::description, tr("description"), kDescription);
    editText(m_location, &model::EyewearItem::location, tr("location"), kLocation);
    editText(m_inspection, &model::EyewearItem::lastInspection, tr("inspection date"), kInspection);
    connect(m_transmittance, &QuantityField::valueCommitted, this, [this](std::optional<double> v) {
        if (m_loading || !m_document || currentItem() < 0)
            return;
        model::EyewearItem item = m_document->eyewear()[static_cast<std::size_t>(currentItem())];
        item.visibleTransmittance = v.value_or(0.0);
        m_document->editEyewear(currentItem(), item, tr("Edit visible transmittance"), kTransmittance);
    });
    connect(m_count, &QSpinBox::editingFinished, this, [this] {
        if (m_loading || !m_document || currentItem() < 0)
            return;
        model::EyewearItem item = m_document->eyewear()[static_cast<std::size_t>(currentItem())];
        if (item.count == m_count->value())
            return;
        item.count = m_count->value();
        m_document->editEyewear(currentItem(), item, tr("Edit count"), kCount);
    });
    for (QPlainTextEdit* edit : {m_en207, m_en208, m_odTable})
        connect(edit, &QPlainTextEdit::textChanged, this, [this] {
            if (!m_loading)
                commitText();
        });
}

void EyewearPanel::setDocument(LabDocument* document)
{
    m_document = document;
    connect(document, &LabDocument::eyewearChanged, this, &EyewearPanel::reload);
    reload();
}

void EyewearPanel::setAssessment(const assessment::LaserAssessment* assessment)
{
    m_assessment = assessment;
    showCheck();
}

int EyewearPanel::currentItem() const
{
    return m_shelf->currentIndex().row();
}

void EyewearPanel::reload()
{
    m_loading = true;
    const int row = std::max(0, currentItem());
    m_shelfModel->setShelf(m_document ? &m_document->eyewear() : nullptr);
    m_shelf->resizeColumnsToContents();
    m_shelf->horizontalHeader()->setSectionResizeMode(1, QHeaderView::Stretch);
    m_shelf->setCurrentIndex(m_shelfModel->index(std::min(row, m_shelfModel->rowCount() - 1), 0));
    m_loading = false;
    showItem();
    showCheck();
}

void EyewearPanel::showItem()
{
    const int index = currentItem();
    const bool has = m_document && index >= 0 && static_cast<std::size_t>(index) < m_document->eyewear().size();
    m_editor->setEnabled(has);
    m_remove->setEnabled(has);
    if (!has)
        return;
    const model::EyewearItem& item = m_document->eyewear()[static_cast<std::size_t>(index)];
    m_loading = true;
    m_name->setText(q(item.name));
    m_description->setText(q(item.description));
    if (!m_en207->hasFocus())
        m_en207->setPlainText(join(item.en207Markings));
    if (!m_en208->hasFocus())
        m_en208->setPlainText(join(item.en208Markings));
    if (!m_odTable->hasFocus())
        m_odTable->setPlainText(q(eyewear::formatOdTable(item.spectralOd)).trimmed());
    m_textErrors->clear();
    m_transmittance->setValue(item.visibleTransmittance > 0 ? std::optional<double>(item.visibleTransmittance)
                                                            : std::nullopt);
    m_count->setValue(item.count);
    m_location->setText(q(item.location));
    m_inspection->setText(q(item.lastInspection));
    m_loading = false;
}

void EyewearPanel::commitText()
{
    if (!m_document || currentItem() < 0)
        return;
    model::EyewearItem item = m_document->eyewear()[static_cast<std::size_t>(currentItem())];
    item.en207Markings = toStd(lines(m_en207));
    item.en208Markings = toStd(lines(m_en208));
    auto rows = eyewear::parseOdTable(m_odTable->toPlainText().toStdString(), tr("OD table").toStdString());
    QStringList errors;
    if (!rows)
        errors << q(rows.error().message());
    else
        item.spectralOd = *rows;
    auto parsed = eyewear::parseEyewear(item);
    if (!parsed)
        errors << q(parsed.error().message());
    m_textErrors->setText(errors.join(QStringLiteral("\n")));
    if (!errors.isEmpty())
        return; // marked, not stored: the shelf keeps its last sound version
    const model::EyewearItem& stored = m_document->eyewear()[static_cast<std::size_t>(currentItem())];
    if (stored.en207Markings == item.en207Markings && stored.en208Markings == item.en208Markings &&
        eyewear::formatOdTable(stored.spectralOd) == eyewear::formatOdTable(item.spectralOd))
        return;
    m_document->editEyewear(currentItem(), item, tr("Edit markings and OD table"), kText);
}

void EyewearPanel::showCheck()
{
    m_check->clear();
    const int index = currentItem();
    if (!m_assessment || index < 0 || static_cast<std::size_t>(index) >= m_assessment->eyewear.size()) {
        m_checkTitle->setText(tr("Select a laser and an item to check one against the other."));
        return;
    }
    const assessment::EyewearOutcome& outcome = m_assessment->eyewear[static_cast<std::size_t>(index)];
    const QString verdict = outcome.check.verdict == eyewear::Verdict::Covers       ? tr("covers")
                            : outcome.check.verdict == eyewear::Verdict::CannotTell ? tr("cannot tell")
                                                                                    : tr("falls short");
    m_checkTitle->setText(tr("%1 against %2: %3").arg(q(outcome.itemName), q(m_assessment->laser.name), verdict));
    for (const eyewear::OutputCheck& oc : outcome.check.outputs) {
        auto* row = new QTreeWidgetItem(m_check);
        row->setText(0, QStringLiteral("%1 / %2").arg(q(oc.outputName), q(oc.caseName)));
        row->setText(1, oc.verdict == eyewear::Verdict::Covers       ? tr("covers")
                        : oc.verdict == eyewear::Verdict::CannotTell ? tr("cannot tell")
                                                                     : tr("falls short"));
        row->setForeground(1, oc.verdict == eyewear::Verdict::Covers       ? palette::kBluishGreen
                              : oc.verdict == eyewear::Verdict::CannotTell ? palette::kOrange
                                                                           : palette::kVermillion);
        row->setText(2, QString::number(hazard::roundOdUp(oc.requiredOd), 'f', 1));
        row->setText(3, QString::number(oc.providedOd, 'f', 1));
        for (const std::string& reason : oc.reasons) {
            auto* child = new QTreeWidgetItem(row);
            child->setText(0, q(reason));
            child->setFirstColumnSpanned(true);
        }
        row->setExpanded(oc.verdict != eyewear::Verdict::Covers);
    }
    m_check->resizeColumnToContents(0);
}

} // namespace beamwarden::gui
